using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Extraction;

/// <summary>
/// A structured face loop with a reconstruction of its own: the far neighbour is chosen by a condition
/// next to the ends of the row, and a pure helper hands the two face states back through out
/// parameters. The face flux is evaluated once and must go to the two cells with opposite signs; the
/// conditional subscripts are accepted there and nowhere else.
/// </summary>
public sealed class ReconstructedFaceValueTests
{
    private const string FaceLoop = """
        static class Row
        {
            static void Slopes(double ll, double l, double r, double rr, out double lf, out double rf)
            {
                lf = l + 0.25 * (r - ll);
                rf = r - 0.25 * (rr - l);
            }

            static double Upwind(double a, double b) => a;

            [ConservativeUpdate]
            public static void Rate(double[] u, double[] res)
            {
                int n = u.Length;
                for (int i = 1; i < n; i++)
                {
                    int left = i - 1;
                    int right = i;
                    int ll = i >= 2 ? left - 1 : -1;
                    int rr = i <= n - 2 ? right + 1 : -1;
                    Slopes(u[ll >= 0 ? ll : left], u[left], u[right], u[rr >= 0 ? rr : right], out double lf, out double rf);
                    double flux = Upwind(lf, rf);
                    __WRITES__
                }
            }
        }
        """;

    private static Task<AnalyzerRun.Result> Run(string writes) => AnalyzerRun.RunAsync(TestReferences.Usings + FaceLoop.Replace("__WRITES__", writes));

    [Fact]
    public async Task FluxGivenToBothCellsWithOppositeSignsIsProven()
    {
        var result = await Run("res[left] -= flux; res[right] += flux;");
        Assert.Empty(result.CompilerErrors);
        Assert.Empty(result.Exceptions);
        Assert.True(!result.Fvc.Any(), AnalyzerRun.Describe(result.Fvc));
    }

    [Theory]
    [InlineData("res[left] -= flux; res[right] -= flux;")]
    [InlineData("res[left] -= flux; res[right] += 0.5 * flux;")]
    [InlineData("res[right] += flux; res[left] += flux;")]
    public async Task SignOrWeightSlipIsAOneSidedScatter(string writes)
    {
        var result = await Run(writes);
        Assert.Empty(result.CompilerErrors);
        var ids = result.Fvc.Select(d => d.Id).ToList();
        Assert.True(ids.Contains(DiagnosticIds.OneSidedScatter) && !ids.Contains(DiagnosticIds.NotAnalyzed), writes + ":\n" + AnalyzerRun.Describe(result.Fvc));
    }

    [Theory]
    [InlineData("res[left] -= flux;")]
    [InlineData("res[left] -= flux; res[left] += flux;")]
    public async Task FaceValueWrittenToOneCellOnlyIsNotAnalyzed(string writes)
    {
        // With one target the face value could still telescope on its own (it is not interpreted), so
        // neither a proof nor a refutation is possible.
        var result = await Run(writes);
        var diagnostics = result.Fvc.ToList();
        Assert.True(
            diagnostics.Count > 0 && diagnostics.All(d => d.Id == DiagnosticIds.NotAnalyzed)
                && diagnostics.Any(d => d.GetMessage(System.Globalization.CultureInfo.InvariantCulture).Contains("is chosen by a condition", StringComparison.Ordinal)),
            writes + ":\n" + AnalyzerRun.Describe(diagnostics));
    }

    [Fact]
    public async Task ConditionalSubscriptInACellLoopIsNotAnalyzed()
    {
        // The same reconstruction written cell by cell: both faces of the cell are evaluated here, and
        // matching them across iterations would need the conditional subscripts interpreted.
        const string source = """
            static class Row
            {
                static double G(double a, double b) => a;

                [ConservativeUpdate]
                public static void Rate(double[] u, double[] res)
                {
                    int n = u.Length;
                    for (int i = 1; i < n - 1; i++)
                    {
                        int ll = i >= 2 ? i - 2 : i - 1;
                        res[i] = -(G(u[i], u[i + 1]) - G(u[ll >= 0 ? ll : i - 1], u[i]));
                    }
                }
            }
            """;
        var result = await AnalyzerRun.RunAsync(TestReferences.Usings + source);
        var diagnostics = result.Fvc.ToList();
        Assert.True(
            diagnostics.Count > 0 && diagnostics.All(d => d.Id == DiagnosticIds.NotAnalyzed)
                && diagnostics.Any(d => d.GetMessage(System.Globalization.CultureInfo.InvariantCulture).Contains("is chosen by a condition", StringComparison.Ordinal)),
            AnalyzerRun.Describe(diagnostics));
    }

    [Fact]
    public async Task HelperWritingOutsideItsOutParametersIsNotAnalyzed()
    {
        const string source = """
            static class Row
            {
                static double _last;

                static void Slopes(double l, double r, out double lf, out double rf)
                {
                    _last = r;
                    lf = l;
                    rf = r;
                }

                [ConservativeUpdate]
                public static void Rate(double[] u, double[] res)
                {
                    for (int i = 1; i < u.Length; i++)
                    {
                        Slopes(u[i - 1], u[i], out double lf, out double rf);
                        res[i - 1] -= lf;
                        res[i] += lf;
                    }
                }
            }
            """;
        var result = await AnalyzerRun.RunAsync(TestReferences.Usings + source);
        var diagnostics = result.Fvc.ToList();
        Assert.True(
            diagnostics.Count > 0 && diagnostics.All(d => d.Id == DiagnosticIds.NotAnalyzed)
                && diagnostics.Any(d => d.GetMessage(System.Globalization.CultureInfo.InvariantCulture).Contains("has an effect beyond its out parameters", StringComparison.Ordinal)),
            AnalyzerRun.Describe(diagnostics));
    }
}
