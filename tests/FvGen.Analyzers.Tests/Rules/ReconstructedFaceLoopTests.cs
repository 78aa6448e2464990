using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

/// <summary>
/// A second-order face loop on an unstructured mesh: an earlier cell loop fills a slope per cell, and the
/// face loop reads it at both cells of the face, with offsets built by the runtime's Vec3 arithmetic,
/// to compute one flux given to the two cells with opposite signs. Run with every rule, so "proven"
/// means no FVC diagnostic at all.
/// </summary>
public sealed class ReconstructedFaceLoopTests
{
    private const string Kernel = """
        using FvGen.Geometry;

        static class Slopes
        {
            static double Upwind(double a, double b) => a;

            static double Extrapolate(double u, double slope, Vec3 offset) => u + slope * offset.X;

            [ConservativeUpdate]
            public static void Rate(int[] left, int[] right, Vec3[] faceCentres, Vec3[] cellCentres, double[] u, double[] slope, double[] r)
            {
                for (int c = 1; c < u.Length - 1; c++)
                {
                    __SLOPE__
                }

                for (int f = 0; f < left.Length; f++)
                {
                    int l = left[f];
                    int k = right[f];
                    Vec3 toLeft = faceCentres[f] __OFFSET__ cellCentres[l];
                    Vec3 toRight = faceCentres[f] __OFFSET__ cellCentres[k];
                    double flux = Upwind(Extrapolate(u[l], slope[l], toLeft), Extrapolate(u[k], slope[k], toRight));
                    r[l] -= flux;
                    __RIGHT__
                }
            }
        }
        """;

    internal static string Source(string slope = "slope[c] = Math.Min(u[c + 1] - u[c], u[c] - u[c - 1]);", string offset = "-", string right = "r[k] += flux;") =>
        Kernel.Replace("__SLOPE__", slope).Replace("__OFFSET__", offset).Replace("__RIGHT__", right);

    public static TheoryData<string, string, string> Broken => new()
    {
        { "right cell subtracts too", Source(right: "r[k] -= flux;"), DiagnosticIds.OneSidedScatter },
        { "right cell dropped", Source(right: ";"), DiagnosticIds.OneSidedScatter },
        { "right cell at half weight", Source(right: "r[k] += 0.5 * flux;"), DiagnosticIds.OneSidedScatter },
        // Accumulated, not assigned: the slope loop is no definition but an update of its own, checked (and not conservative).
        { "slopes accumulated", Source(slope: "slope[c] += u[c + 1] - 0.5 * u[c - 1];"), DiagnosticIds.UnbalancedFaceTerm },
    };

    public static TheoryData<string, string, string> NotModelled => new()
    {
        // System.Numerics is trusted pure, but its vectors are not the runtime's geometry values: still not visibly component-wise.
        { "a framework vector operator", Source().Replace("using FvGen.Geometry;", "using System.Numerics;").Replace("Vec3", "Vector3"), "`Vector3.operator -(Vector3, Vector3)` is not visibly component-wise" },
    };

    [Fact]
    public async Task FaceLoopReadingSlopesAtBothCellsIsProven()
    {
        await Verdicts.AssertProvenAsync(Source(), "face loop reading slopes at both cells");
    }

    [Fact]
    public async Task FaceLoopWritingTheSlopesItReadsIsAnInPlaceSweep()
    {
        // The face loop writes the slope array as well as reading it at both cells: it sweeps the slopes in
        // place, and the slope loop is no definition of face data.
        var result = await AnalyzerRun.RunAsync(TestReferences.Usings + Source(right: "r[k] += flux; slope[k] = 0.0;"));
        Assert.Empty(result.CompilerErrors);
        Assert.Empty(result.Exceptions);
        Assert.True(result.Fvc.Any(d => d.Id == DiagnosticIds.InPlaceSweep), "expected FVC0005, got:\n" + AnalyzerRun.Describe(result.Fvc));
    }

    [Theory]
    [MemberData(nameof(Broken))]
    public async Task SlipInTheFaceLoopIsRefuted(string description, string source, string rule)
    {
        await Verdicts.AssertRefutedAsync(source, rule, description);
    }

    [Theory]
    [MemberData(nameof(NotModelled))]
    public async Task ShapesOutsideTheModelAreNotProven(string description, string source, string reason)
    {
        await Verdicts.AssertNotAnalyzedAsync(source, reason, description, only: false);
    }
}
