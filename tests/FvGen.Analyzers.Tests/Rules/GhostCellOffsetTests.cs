using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests.Rules;

/// <summary>
/// Cell loops over the interior of arrays with ghost cells write their cell at <c>r[i + ng]</c>. The
/// loop variable read as a value is that cell's data, and slips are reported as in a cell loop, not as
/// the kept half of a face loop. (Each of these was misread before: the position-dependent source as a
/// one-sided scatter, the swapped argument as two, the dropped term as one.)
/// </summary>
public sealed class GhostCellOffsetTests
{
    private const string Kernel = """
        using System;
        using FvGen;

        public static class Padded
        {
            static double Godunov(double l, double r) => l <= r ? Math.Min(0.5 * l * l, 0.5 * r * r) : Math.Max(0.5 * l * l, 0.5 * r * r);
            static double Heat(double t, double x) => Math.Exp(-t) * (1 + x * x);

            [ConservativeUpdate]
            public static void Rate(double[] u, double[] r, int n, int ng, double x0, double dx)
            {
                for (int i = 0; i < n; i++)
                {
                    double x = x0 + (i + 0.5) * dx;
                    r[i + ng] = -(Godunov(u[i + ng], u[i + ng + 1]) - Godunov(u[i + ng - 1], u[i + ng])) / dx + Heat(u[i + ng], x);
                }
            }
        }
        """;

    [Fact]
    public async Task ConservativeUpdateWithAPositionDependentSourceIsQuiet()
    {
        var result = await AnalyzerRun.RunAsync(Kernel);
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        Assert.True(!result.Fvc.Any(), AnalyzerRun.Describe(result.Fvc));
    }

    [Fact]
    public async Task SwappedArgumentIsAMismatchedEvaluation()
    {
        var result = await AnalyzerRun.RunAsync(Kernel.Replace("Godunov(u[i + ng - 1], u[i + ng])", "Godunov(u[i + ng], u[i + ng - 1])", StringComparison.Ordinal));
        Assert.Empty(result.Exceptions);
        Assert.Contains(result.Fvc, d => d.Id == DiagnosticIds.MismatchedFluxEvaluations);
        Assert.DoesNotContain(result.Fvc, d => d.Id == DiagnosticIds.OneSidedScatter);
    }

    [Fact]
    public async Task DroppedTermIsADroppedFaceTerm()
    {
        // r[i + ng] is no neighbour of i (that would be r[i - 1] or r[i + 1]): a cell's update missing a face.
        var result = await AnalyzerRun.RunAsync(Kernel.Replace(" - Godunov(u[i + ng - 1], u[i + ng])", string.Empty, StringComparison.Ordinal));
        Assert.Empty(result.Exceptions);
        Assert.Contains(result.Fvc, d => d.Id == DiagnosticIds.DroppedFaceTerm);
        Assert.DoesNotContain(result.Fvc, d => d.Id == DiagnosticIds.OneSidedScatter);
    }
}
