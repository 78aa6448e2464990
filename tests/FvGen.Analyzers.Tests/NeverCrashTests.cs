using FvGen.Analyzers.Tests.Harness;
using Microsoft.CodeAnalysis.CSharp;

namespace FvGen.Analyzers.Tests;

/// <summary>
/// The analyzers must never throw (which the compiler reports as AD0001): not on a source cut after
/// any token, as an IDE sees it while typing, and not on malformed code.
/// </summary>
public sealed class NeverCrashTests
{
    public static TheoryData<string> Kernels() => [.. CorpusKernel.All.Select(k => k.Name)];

    [Theory]
    [MemberData(nameof(Kernels))]
    public async Task EveryTokenPrefixOfACorpusKernel(string kernel)
    {
        var source = CorpusKernel.All.Single(k => k.Name == kernel).Source;
        await AssertNoCrashOnPrefixes(source);
    }

    [Theory]
    [MemberData(nameof(Kernels))]
    public async Task EveryTokenPrefixOfEachMutant(string kernel)
    {
        var k = CorpusKernel.All.Single(x => x.Name == kernel);
        foreach (var mutant in k.Mutants.Take(1))
        {
            await AssertNoCrashOnPrefixes(k.Apply(mutant));
        }
    }

    public static TheoryData<string> RuleTestFiles() =>
        [.. Directory.GetFiles(Path.Combine(RepositoryRoot(), "tests", "FvGen.Analyzers.Tests", "Rules"), "*.cs").Select(f => Path.GetFileName(f))];

    /// <summary>The kernels written inline in the rule tests (raw strings, markup removed).</summary>
    [Theory]
    [MemberData(nameof(RuleTestFiles))]
    public async Task EveryTokenPrefixOfTheRuleTestSources(string file)
    {
        string text = File.ReadAllText(Path.Combine(RepositoryRoot(), "tests", "FvGen.Analyzers.Tests", "Rules", file));
        var sources = System.Text.RegularExpressions.Regex.Matches(text, "\"\"\"\\n(?<body>.*?)\"\"\"", System.Text.RegularExpressions.RegexOptions.Singleline)
            .Select(m => System.Text.RegularExpressions.Regex.Replace(m.Groups["body"].Value, @"\{\|#\d+:|\|\}|\{\{\w+\}\}", string.Empty))
            .ToList();
        Assert.NotEmpty(sources);
        foreach (var source in sources)
        {
            await AssertNoCrashOnPrefixes("using System;\nusing System.Threading.Tasks;\nusing FvGen;\n" + source);
        }
    }

    private static string RepositoryRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "FvGen.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("FvGen.sln not found above the test directory.");
    }

    [Theory]
    [InlineData("[ConservativeUpdate] static void M(double[] r) { for (int i = 0; i < ; i++) r[i] = r[i +; }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r, double[] f) { for (int i = 0;; ) r[i] -= f[i + 1] - f[; }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r) { for (;;) { r[i] = 1; } }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r, int n) { for (int i = 0; i < n; i += n) r[i] = r[i - 1]; }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r, int[] m) { foreach (var x in m) r[x] = r[m[x]] / 0; }")]
    [InlineData("[ConservativeUpdate] static void M(double[,] r) { for (int i = 0; i < 3; i++) r[i] = r[i, i, i]; }")]
    [InlineData("[ConservativeUpdate] static void M(Span<double> r) { Parallel.For(0, 3, i => r[i] = 0); }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r) { Parallel.For(0, 3, Body); void Body(int i) { r[i] = r[i + 1]; } }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r) { for (int i = 0; i < 9; i++) for (int j = 0; j < 9; j++) for (int k = 0; k < 9; k++) for (int l = 0; l < 9; l++) for (int m = 0; m < 9; m++) r[i] = r[m + 1]; }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r, double[] u) { for (int i = 1; i < 9; i++) r[i] = (u[i] + u[i-1] + u[i+1]) * (u[i] + u[i-1] + u[i+1]) * (u[i] + u[i-1] + u[i+1]) * (u[i] + u[i-1] + u[i+1]) * (u[i] + u[i-1] + u[i+1]) * (u[i] + u[i-1] + u[i+1]) * (u[i] + u[i-1] + u[i+1]); }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r, double[] u) { for (int i = 1; i < 9; i++) r[i] = 1e308 * 1e308 * u[i] - double.NaN * u[i - 1] + 1.0 / 0.0; }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r) { for (int i = 0; i < 9; i++) { ref double x = ref r[i]; x = x + r[i + 1]; } }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r) { for (int i = 0; i < 9; i++) r[i] = M2(r[i + 1]); } static double M2(double x) => M2(x);")]
    [InlineData("[ConservativeUpdate] static unsafe void M(double* r) { for (int i = 0; i < 9; i++) r[i] = r[i + 1]; }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r, (double a, double b)[] t) { for (int i = 0; i < 9; i++) r[i] = t[i + 1].a - t[i].b; }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r) { int i = 0; while (i < 9) { r[i] = r[i + 1]; i++; } }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r) { for (int i = 0; i < 9; i++) { switch (i) { case 0: r[i] = 1; break; } } }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r, double[] u) { for (int i = 0; i < 9; i++) { (r[i], u[i]) = (u[i + 1], r[i - 1]); } }")]
    [InlineData("[ConservativeUpdate] static void M(double[] r, double[] u) { for (int i = 0; i < 9; i++) r[i] += (long)u[i] % 3 + (i / 2) + u[i >> 1]; }")]
    [InlineData("[NumericalFlux] static double F(double a) { F(a); return a; }")]
    [InlineData("[NumericalFlux] static ref double F(double[] a) => ref a[0];")]
    [InlineData("[ConservativeUpdate] class C { void M(double[] r) { for (int i = 0; i < 9; i++) r[i] = this.M2()[i + 1]; } double[] M2() => new double[9]; }")]
    public async Task MalformedOrUnusualCode(string member)
    {
        string source = "using System;\nusing System.Threading.Tasks;\nusing FvGen;\nstatic unsafe class Malformed\n{\n" + member + "\n}\n";
        var result = await AnalyzerRun.RunAsync(source);
        Assert.Empty(result.Exceptions);
        Assert.DoesNotContain(result.Analyzer, d => d.Id == "AD0001");
        Assert.DoesNotContain(result.Analyzer, IsInternalError);
    }

    private static bool IsInternalError(Microsoft.CodeAnalysis.Diagnostic d) =>
        d.GetMessage(System.Globalization.CultureInfo.InvariantCulture).Contains(FvGen.Analyzers.Rules.ConservationAnalysis.InternalErrorReason, StringComparison.Ordinal);

    private static async Task AssertNoCrashOnPrefixes(string source)
    {
        var tokens = CSharpSyntaxTree.ParseText(source).GetRoot().DescendantTokens().ToList();
        foreach (var token in tokens)
        {
            string prefix = source[..token.Span.End];
            var result = await AnalyzerRun.RunAsync(prefix);
            Assert.True(result.Exceptions.Count == 0, $"cut after `{token}` at {token.Span.End}: {result.Exceptions.FirstOrDefault()}");
            Assert.DoesNotContain(result.Analyzer, d => d.Id == "AD0001");
            Assert.False(result.Analyzer.Any(IsInternalError), $"cut after `{token}` at {token.Span.End}: " + AnalyzerRun.Describe(result.Analyzer.Where(IsInternalError)));
        }
    }
}
