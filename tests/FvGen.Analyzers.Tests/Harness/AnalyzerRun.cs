using System.Collections.Immutable;
using FvGen.Analyzers.Tests.Verifiers;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Tests.Harness;

/// <summary>
/// Compiles a source against .NET 10 and the FvGen runtime and runs every conservation rule on it,
/// collecting analyzer exceptions instead of hiding them (they would surface as AD0001).
/// </summary>
internal static class AnalyzerRun
{
    public sealed record Result(ImmutableArray<Diagnostic> Compiler, ImmutableArray<Diagnostic> Analyzer, IReadOnlyList<Exception> Exceptions)
    {
        public IEnumerable<Diagnostic> Fvc => Analyzer.Where(d => d.Id.StartsWith("FVC", StringComparison.Ordinal));

        public IEnumerable<Diagnostic> CompilerErrors => Compiler.Where(d => d.Severity == DiagnosticSeverity.Error);
    }

    public static Task<Result> RunAsync(string source, DiagnosticAnalyzer[]? analyzers = null)
    {
        var tree = CSharpSyntaxTree.ParseText(source, new CSharpParseOptions(LanguageVersion.Latest), path: "/0/Kernel.cs");
        var compilation = CSharpCompilation.Create(
            "Corpus",
            [tree],
            TestReferences.All,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, allowUnsafe: true));
        return RunAsync(compilation, analyzers: analyzers);
    }

    /// <summary>
    /// Runs the rules on <paramref name="compilation"/>; <paramref name="allMethods"/> sets the .editorconfig key that widens
    /// the scope to every method; <paramref name="analyzers"/> replaces the analyzers of this build (another copy of them).
    /// </summary>
    public static async Task<Result> RunAsync(Compilation compilation, bool allMethods = false, DiagnosticAnalyzer[]? analyzers = null)
    {
        var exceptions = new List<Exception>();
        var analyzerOptions = allMethods
            ? new AnalyzerOptions(ImmutableArray<AdditionalText>.Empty, new AllMethodsOptions())
            : new AnalyzerOptions(ImmutableArray<AdditionalText>.Empty);
        var options = new CompilationWithAnalyzersOptions(
            analyzerOptions,
            (e, _, _) => { lock (exceptions) { exceptions.Add(e); } },
            concurrentAnalysis: false,
            logAnalyzerExecutionTime: false);
        var withAnalyzers = compilation.WithAnalyzers([.. analyzers ?? AllRules.Analyzers()], options);
        var analyzer = await withAnalyzers.GetAnalyzerDiagnosticsAsync();
        return new Result(compilation.GetDiagnostics(), analyzer, exceptions);
    }

    /// <summary>
    /// Runs every rule on a kernel written without usings (the tests' usings are put in front), after
    /// checking that it compiles and that no analyzer threw.
    /// </summary>
    public static async Task<Result> RunKernelAsync(string kernel)
    {
        var result = await RunAsync(TestReferences.Usings + kernel);
        Assert.True(!result.CompilerErrors.Any(), Describe(result.CompilerErrors));
        Assert.Empty(result.Exceptions);
        return result;
    }

    public static string Describe(IEnumerable<Diagnostic> diagnostics) =>
        string.Join("\n", diagnostics.Select(d => $"{d.Id} {d.Location.GetLineSpan().StartLinePosition}: {d.GetMessage(System.Globalization.CultureInfo.InvariantCulture)}"));

    /// <summary>The .editorconfig key that widens the scope to every method, on every tree.</summary>
    private sealed class AllMethodsOptions : AnalyzerConfigOptionsProvider
    {
        private static readonly AnalyzerConfigOptions Options = new Fixed();

        public override AnalyzerConfigOptions GlobalOptions => Options;

        public override AnalyzerConfigOptions GetOptions(SyntaxTree tree) => Options;

        public override AnalyzerConfigOptions GetOptions(AdditionalText textFile) => Options;

        private sealed class Fixed : AnalyzerConfigOptions
        {
            public override bool TryGetValue(string key, out string value)
            {
                value = "true";
                return key == FvGen.Analyzers.Rules.ConservationScope.AllMethodsKey;
            }
        }
    }
}
