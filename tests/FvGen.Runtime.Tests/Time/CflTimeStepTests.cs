using FvGen.Meshes.Structured;
using FvGen.Time;

namespace FvGen.Runtime.Tests.Time;

/// <summary>
/// Δt = CFL · min V/(½ λ S) (common practice); hand-computed values on Cartesian grids, where it
/// reduces to Δx/λ in 1-D and 1/(λ (1/Δx + 1/Δy)) in 2-D.
/// </summary>
public sealed class CflTimeStepTests
{
    private static readonly SideBoundary Wall = SideBoundary.Patch("wall");

    [Fact]
    public void UniformLineGivesCflTimesDxOverSpeed()
    {
        var grid = new StructuredGrid1D(GridAxis.Uniform(10, 0.0, 1.0), Wall, Wall);
        var state = new double[10];
        double dt = CflTimeStep.Compute(grid, state, 0.8, (in double _, int _) => 2.0);
        // 0.8 · 0.1 / 2 = 0.04
        Assert.Equal(0.04, dt, 15);
    }

    [Fact]
    public void StretchedLineTakesTheSmallestCellOverItsOwnSpeed()
    {
        // Widths 0.5, 0.25, 0.125, 0.125 with speeds 1, 4, 1, 0.5: dx/λ = 0.5, 0.0625, 0.125, 0.25; min 0.0625.
        var grid = new StructuredGrid1D(GridAxis.FromNodes([0.0, 0.5, 0.75, 0.875, 1.0]), Wall, Wall);
        double[] speeds = [1.0, 4.0, 1.0, 0.5];
        double dt = CflTimeStep.Compute(grid, new double[4], 0.5, (in double _, int c) => speeds[c]);
        Assert.Equal(0.5 * 0.0625, dt, 15);
    }

    [Fact]
    public void RectangleCellsGiveOneOverSpeedTimesTheSumOfInverseWidths()
    {
        // dx = 0.1, dy = 0.05, λ = 3: 1/(3 (10 + 20)) = 1/90; CFL 0.9 gives 0.01.
        var grid = new StructuredGrid2D(GridAxis.Uniform(5, 0.0, 0.5), GridAxis.Uniform(4, 0.0, 0.2), Wall, Wall, Wall, Wall);
        double dt = CflTimeStep.Compute(grid, new double[20], 0.9, (in double _, int _) => 3.0);
        Assert.Equal(0.01, dt, 15);
    }

    [Fact]
    public void BoxCellsGiveOneOverSpeedTimesTheSumOfInverseWidths()
    {
        // dx = 0.5, dy = 0.25, dz = 0.125, λ = 1: 1/(2 + 4 + 8) = 1/14.
        var grid = new StructuredGrid3D(
            GridAxis.Uniform(2, 0, 1), GridAxis.Uniform(2, 0, 0.5), GridAxis.Uniform(2, 0, 0.25), Wall, Wall, Wall, Wall, Wall, Wall);
        double dt = CflTimeStep.Compute(grid, new double[8], 1.0, (in double _, int _) => 1.0);
        Assert.Equal(1.0 / 14.0, dt, 15);
    }

    [Fact]
    public void ZeroSpeedEverywhereGivesAnUnboundedStep()
    {
        var grid = new StructuredGrid1D(GridAxis.Uniform(3, 0.0, 1.0), Wall, Wall);
        Assert.Equal(double.PositiveInfinity, CflTimeStep.Compute(grid, new double[3], 0.5, (in double _, int _) => 0.0));
    }

    [Fact]
    public void NegativeOrNonFiniteSpeedIsReportedWithTheCell()
    {
        var grid = new StructuredGrid2D(GridAxis.Uniform(3, 0.0, 3.0), GridAxis.Uniform(2, 0.0, 2.0), Wall, Wall, Wall, Wall);
        var ex = Assert.Throws<InvalidOperationException>(
            () => CflTimeStep.Compute(grid, new double[6], 0.5, (in double _, int c) => c == 4 ? double.NaN : 1.0));
        Assert.Contains("cell (1, 1) at (1.5, 1.5, 0) is NaN", ex.Message);
    }
}
