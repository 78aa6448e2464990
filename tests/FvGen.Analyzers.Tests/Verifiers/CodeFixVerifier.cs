using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp.Testing;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Testing;

namespace FvGen.Analyzers.Tests.Verifiers;

/// <summary>Verifies a rule and its fix: diagnostics in the source, the fixed source, and optionally the fix-all result and which of several actions (by equivalence key).</summary>
internal static class CodeFixVerifier<TCodeFix>
    where TCodeFix : CodeFixProvider, new()
{
    public static DiagnosticResult Diagnostic(string id) => AnalyzerVerifier.Expected(id);

    public static async Task VerifyCodeFixAsync(string source, DiagnosticResult[] expected, string fixedSource, string? batchFixedSource = null, DiagnosticResult[]? remaining = null, string? equivalenceKey = null)
    {
        var test = new CSharpCodeFixTest<FvGen.Analyzers.Rules.ConservationAnalyzer, TCodeFix, DefaultVerifier>
        {
            TestCode = TestReferences.Usings + source,
            FixedCode = TestReferences.Usings + fixedSource,
            ReferenceAssemblies = TestReferences.Assemblies,
            CodeActionEquivalenceKey = equivalenceKey,
        };
        // Only the rules the fix is for are reported, as with that rule enabled alone.
        test.DisabledDiagnostics.AddRange(AllRules.IdsOtherThan([.. new TCodeFix().FixableDiagnosticIds]));
        if (batchFixedSource is not null)
        {
            test.BatchFixedCode = TestReferences.Usings + batchFixedSource;
        }

        test.TestState.AdditionalReferences.AddRange(TestReferences.All);
        test.FixedState.AdditionalReferences.AddRange(TestReferences.All);
        test.BatchFixedState.AdditionalReferences.AddRange(TestReferences.All);
        test.ExpectedDiagnostics.AddRange(expected);
        if (remaining is not null)
        {
            test.FixedState.ExpectedDiagnostics.AddRange(remaining);
        }

        await test.RunAsync();
    }
}
