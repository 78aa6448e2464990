using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

/// <summary>
/// A cell loop over rows of a face buffer (the structured parallel gather): each cell adds its low face
/// and subtracts its high face, the low face plus the direction's stride, so the sums telescope. The
/// buffer has n + 1 faces per row, the periodic wrap face stored on both end planes. Run with every
/// rule, so "proven" means no FVC diagnostic at all.
/// </summary>
public sealed class FaceBufferRowSumTests
{
    private const string Rows = """
        static class RowGather
        {
            [ConservativeUpdate]
            public static void Rate([FaceData] double[] faceFlux, double[] volumes, double[] residual, int nx, int ny, int first, int end)
            {
                int xPlanes = nx + 1;
                int yFirst = xPlanes * ny;
                for (int j = first; j < end; j++)
                {
                    for (int i = 0; i < nx; i++)
                    {
                        int c = i + nx * j;
                        int xLow = i + xPlanes * j;
                        int xHigh = __XHIGH__;
                        int yLow = yFirst + i + nx * j;
                        int yHigh = yLow + nx;
                        double sum = __SUM__;
                        residual[c] = sum / volumes[c];
                    }
                }
            }
        }
        """;

    private const string Sum = "faceFlux[xLow] - faceFlux[xHigh] + faceFlux[yLow] - faceFlux[yHigh]";

    private static string Kernel(string xHigh = "xLow + 1", string sum = Sum) => Rows.Replace("__XHIGH__", xHigh).Replace("__SUM__", sum);

    public static TheoryData<string, string, string> Broken => new()
    {
        // Each face given to both of its cells with the same sign.
        { "high x face added", Kernel(sum: "faceFlux[xLow] + faceFlux[xHigh] + faceFlux[yLow] - faceFlux[yHigh]"), DiagnosticIds.UnbalancedFaceTerm },
        { "high y face dropped", Kernel(sum: "faceFlux[xLow] - faceFlux[xHigh] + faceFlux[yLow]"), DiagnosticIds.DroppedFaceTerm },
        { "high y face at half weight", Kernel(sum: "faceFlux[xLow] - faceFlux[xHigh] + faceFlux[yLow] - 0.5 * faceFlux[yHigh]"), DiagnosticIds.UnbalancedFaceTerm },
    };

    public static TheoryData<string, string, string> NotModelled => new()
    {
        // The former generated shape: n faces per periodic row, the last cell's high face wrapping to the first.
        { "high face wrapping by a condition", Kernel(xHigh: "i + 1 < nx ? xLow + 1 : xLow - i"), "the index `xHigh` is chosen by a condition" },
    };

    [Fact]
    public async Task RowSumOfLowMinusHighFacesIsProven()
    {
        await Verdicts.AssertProvenAsync(Kernel(), "row sum of low minus high faces");
    }

    [Theory]
    [MemberData(nameof(Broken))]
    public async Task BrokenRowSumIsRefuted(string description, string source, string rule)
    {
        await Verdicts.AssertRefutedAsync(source, rule, description);
    }

    [Theory]
    [MemberData(nameof(NotModelled))]
    public async Task RowSumOutsideTheModelIsNotAnalyzed(string description, string source, string reason)
    {
        await Verdicts.AssertNotAnalyzedAsync(source, reason, description, only: true);
    }
}
