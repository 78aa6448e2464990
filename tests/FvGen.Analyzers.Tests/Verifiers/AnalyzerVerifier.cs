using FvGen.Analyzers.Rules;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Testing;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Testing;

namespace FvGen.Analyzers.Tests.Verifiers;

/// <summary>Verifies one rule on a source with markup (<c>{|#0:…|}</c>).</summary>
internal static class AnalyzerVerifier<TAnalyzer>
    where TAnalyzer : DiagnosticAnalyzer, new()
{
    public static DiagnosticResult Diagnostic(string id) => new DiagnosticResult(id, id == DiagnosticIds.NotAnalyzed ? DiagnosticSeverity.Info : DiagnosticSeverity.Warning);

    public static Task VerifyAnalyzerAsync(string source, params DiagnosticResult[] expected) =>
        VerifyAnalyzerAsync(source, editorConfig: null, expected);

    public static async Task VerifyAnalyzerAsync(string source, string? editorConfig, params DiagnosticResult[] expected)
    {
        var test = new CSharpAnalyzerTest<TAnalyzer, DefaultVerifier>
        {
            TestCode = TestReferences.Usings + source,
            ReferenceAssemblies = TestReferences.Assemblies,
        };
        test.TestState.AdditionalReferences.AddRange(TestReferences.All);
        if (editorConfig is not null)
        {
            test.TestState.AnalyzerConfigFiles.Add(("/.editorconfig", editorConfig));
        }

        test.ExpectedDiagnostics.AddRange(expected);
        await test.RunAsync();
    }
}

/// <summary>Runs every conservation rule at once (corpus and crash tests).</summary>
internal static class AllRules
{
    public static DiagnosticAnalyzer[] Analyzers() =>
    [
        new DroppedFaceTermAnalyzer(),
        new UnbalancedFaceTermAnalyzer(),
        new MismatchedFluxEvaluationsAnalyzer(),
        new OneSidedScatterAnalyzer(),
        new InPlaceSweepAnalyzer(),
        new ImpureNumericalFluxAnalyzer(),
        new NotAnalyzedAnalyzer(),
    ];
}
