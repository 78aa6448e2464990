using System.Globalization;
using FvGen.Analyzers.Tests.Verifiers;
using Microsoft.CodeAnalysis;

namespace FvGen.Analyzers.Tests.Harness;

/// <summary>
/// The three verdicts a rule test asks of a kernel run with every rule: proven (no FVC diagnostic),
/// refuted by a given rule (and not merely "not analyzed"), or not analyzed with a given reason.
/// Each first checks that the kernel compiles and that no analyzer threw.
/// </summary>
internal static class Verdicts
{
    public static async Task AssertProvenAsync(string source, string description)
    {
        var result = await RunCleanAsync(source);
        Assert.True(!result.Fvc.Any(), description + ": expected a proof, got:\n" + AnalyzerRun.Describe(result.Fvc));
    }

    public static async Task AssertRefutedAsync(string source, string rule, string description)
    {
        var result = await RunCleanAsync(source);
        var ids = result.Fvc.Select(d => d.Id).ToList();
        Assert.True(
            ids.Contains(rule) && !ids.Contains(DiagnosticIds.NotAnalyzed),
            description + ": expected " + rule + ", got:\n" + AnalyzerRun.Describe(result.Fvc));
    }

    /// <summary>
    /// FVC0100 with a message containing <paramref name="reason"/>; with <paramref name="only"/>, no other
    /// FVC diagnostic beside it.
    /// </summary>
    public static async Task AssertNotAnalyzedAsync(string source, string reason, string description, bool only)
    {
        var result = await RunCleanAsync(source);
        var diagnostics = result.Fvc.ToList();
        bool says = diagnostics.Any(d => d.Id == DiagnosticIds.NotAnalyzed && Message(d).Contains(reason, StringComparison.Ordinal));
        bool nothingElse = diagnostics.All(d => d.Id == DiagnosticIds.NotAnalyzed);
        Assert.True(
            says && (!only || nothingElse),
            description + ": expected " + (only ? "only " : "") + "FVC0100 saying `" + reason + "`, got:\n" + AnalyzerRun.Describe(diagnostics));
    }

    private static async Task<AnalyzerRun.Result> RunCleanAsync(string source)
    {
        var result = await AnalyzerRun.RunAsync(TestReferences.Usings + source);
        Assert.Empty(result.CompilerErrors);
        Assert.Empty(result.Exceptions);
        return result;
    }

    private static string Message(Diagnostic d) => d.GetMessage(CultureInfo.InvariantCulture);
}
