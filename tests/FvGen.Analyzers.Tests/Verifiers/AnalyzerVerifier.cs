using FvGen.Analyzers.Rules;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Testing;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Testing;

namespace FvGen.Analyzers.Tests.Verifiers;

/// <summary>
/// Verifies one rule on a source with markup (<c>{|#0:…|}</c>). The one conservation analyzer reports
/// every rule; a rule's tests see only that rule's diagnostics (the others are disabled), as a team
/// sees a rule it enabled alone.
/// </summary>
internal sealed class AnalyzerVerifier(string ruleId)
{
    public DiagnosticResult Diagnostic(string id) => Expected(id);

    public static DiagnosticResult Expected(string id) => new DiagnosticResult(id, id == DiagnosticIds.NotAnalyzed ? DiagnosticSeverity.Info : DiagnosticSeverity.Warning);

    public Task VerifyAnalyzerAsync(string source, params DiagnosticResult[] expected) =>
        VerifyAnalyzerAsync(source, editorConfig: null, expected);

    public async Task VerifyAnalyzerAsync(string source, string? editorConfig, params DiagnosticResult[] expected)
    {
        var test = new CSharpAnalyzerTest<ConservationAnalyzer, DefaultVerifier>
        {
            TestCode = TestReferences.Usings + source,
            ReferenceAssemblies = TestReferences.Assemblies,
        };
        test.DisabledDiagnostics.AddRange(AllRules.IdsOtherThan(ruleId));
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

    public static IEnumerable<string> IdsOtherThan(params string[] ids) =>
        new ConservationAnalyzer().SupportedDiagnostics.Select(d => d.Id).Where(other => !ids.Contains(other));
}
