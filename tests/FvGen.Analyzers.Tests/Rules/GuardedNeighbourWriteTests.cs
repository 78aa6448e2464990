using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests.Rules;

/// <summary>
/// One face list for interior and boundary faces, the neighbour of a boundary face marked −1 and its
/// write guarded (common practice in unstructured codes): on an interior face both cells get the flux,
/// on a boundary face it leaves the mesh. Guards that test something else stay "not analyzed".
/// </summary>
public sealed class GuardedNeighbourWriteTests
{
    [Theory]
    [InlineData("if (n >= 0) res[n] += flux;")]
    [InlineData("if (n != -1) { res[n] += flux; }")]
    [InlineData("if (-1 < n) res[n] += flux;")]
    [InlineData("if (nei[f] >= 0) res[nei[f]] += flux;")]
    [InlineData("if (n >= 0) { double given = flux; res[n] += given; }")]
    public async Task GuardedNeighbourWriteConserves(string guarded)
    {
        var result = await AnalyzerRun.RunKernelAsync(Kernel(guarded));
        Assert.True(!result.Fvc.Any(), AnalyzerRun.Describe(result.Fvc));
    }

    [Fact]
    public async Task GuardedWriteWithTheWrongSignIsAOneSidedScatter()
    {
        var result = await AnalyzerRun.RunKernelAsync(Kernel("if (n >= 0) res[n] -= flux;"));
        Assert.Equal(new[] { DiagnosticIds.OneSidedScatter }, result.Fvc.Select(d => d.Id).Distinct());
    }

    [Theory]
    [InlineData("if (n > 0) res[n] += flux;")]
    [InlineData("if (n >= 0) res[o] += flux;")]
    [InlineData("if (n >= 0) { res[n] += flux; flux = 0; }")]
    [InlineData("if (m[f] >= 0) res[n] += flux;")]
    public async Task OtherGuardsAreNotAnalyzed(string guarded)
    {
        var result = await AnalyzerRun.RunKernelAsync(Kernel(guarded));
        Assert.Equal(new[] { DiagnosticIds.NotAnalyzed }, result.Fvc.Select(d => d.Id).Distinct());
    }

    private static string Kernel(string guarded) => $$"""
        static class StormDrain
        {
            [ConservativeUpdate]
            public static void Residual(double[] c, double[] res, int[] own, int[] nei, [FaceData] double[] m)
            {
                for (int f = 0; f < own.Length; f++)
                {
                    int o = own[f], n = nei[f];
                    double flux = m[f] * c[o];
                    res[o] -= flux;
                    {{guarded}}
                }
            }
        }
        """;
}
