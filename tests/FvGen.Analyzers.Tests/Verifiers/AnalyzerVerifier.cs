using FvGen.Analyzers.Rules;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Testing;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Testing;

namespace FvGen.Analyzers.Tests.Verifiers;

/// <summary>Verifies one rule on a source with markup (<c>{|#0:…|}</c>).</summary>
internal static class AnalyzerVerifier<TRule>
    where TRule : IRuleUnderTest
{
    public static DiagnosticResult Diagnostic(string id) => new DiagnosticResult(id, id == DiagnosticIds.NotAnalyzed ? DiagnosticSeverity.Info : DiagnosticSeverity.Warning);

    public static Task VerifyAnalyzerAsync(string source, params DiagnosticResult[] expected) =>
        VerifyAnalyzerAsync(source, editorConfig: null, expected);

    public static async Task VerifyAnalyzerAsync(string source, string? editorConfig, params DiagnosticResult[] expected)
    {
        var test = new CSharpAnalyzerTest<ConservationAnalyzer, DefaultVerifier>
        {
            TestCode = TestReferences.Usings + source,
            ReferenceAssemblies = TestReferences.Assemblies,
        };
        test.DisabledDiagnostics.AddRange(AllRules.IdsOtherThan(TRule.Id));
        test.TestState.AdditionalReferences.AddRange(TestReferences.All);
        if (editorConfig is not null)
        {
            test.TestState.AnalyzerConfigFiles.Add(("/.editorconfig", editorConfig));
        }

        test.ExpectedDiagnostics.AddRange(expected);
        await test.RunAsync();
    }
}

/// <summary>The conservation analyzer, which reports every rule (corpus and crash tests), and its rule IDs.</summary>
internal static class AllRules
{
    public static DiagnosticAnalyzer[] Analyzers() => [new ConservationAnalyzer()];

    public static IEnumerable<string> IdsOtherThan(string id) =>
        new ConservationAnalyzer().SupportedDiagnostics.Select(d => d.Id).Where(other => other != id);
}
