using FvGen.Fields;
using FvGen.Health;
using FvGen.Ledger;
using FvGen.Meshes.Structured;
using FvGen.Time;

#pragma warning disable CS0649 // some components stay at their default in these tests

namespace FvGen.Runtime.Tests.Health;

public sealed class HealthChecksTests
{
    private struct Momentum
    {
        public double X;
        public double Y;
    }

    private struct Gas
    {
        public double Density;
        public Momentum Momentum;
        public double Energy;
    }

    private static readonly SideBoundary Wall = SideBoundary.Patch("wall");

    // Cells of 0.25 x 0.5: cell (2, 1) has its centroid at (0.625, 0.75).
    private static StructuredGrid2D Plate() => new(GridAxis.Uniform(4, 0.0, 1.0), GridAxis.Uniform(3, 0.0, 1.5), Wall, Wall, Wall, Wall);

    private static Gas[] Calm(int cells) => Enumerable.Repeat(new Gas { Density = 1, Energy = 2.5 }, cells).ToArray();

    [Fact]
    public void NonFiniteComponentIsReportedWithCellPositionStepTimeAndComponent()
    {
        var grid = Plate();
        var state = Calm(grid.CellCount);
        state[grid.CellIndex(2, 1)].Momentum.X = double.NaN;

        var ex = Assert.Throws<UnhealthyStateException>(() => new HealthChecks<Gas>().Check(grid, state, step: 5, time: 0.25));

        Assert.Equal(
            "Health check failed at step 5, t = 0.25: cell (2, 1) at (0.625, 0.75, 0) has a non-finite Momentum.X = NaN " +
            "(cell state: Density = 1, Momentum.X = NaN, Momentum.Y = 0, Energy = 2.5).",
            ex.Message);
        Assert.Equal("Momentum.X", ex.Component);
        Assert.Equal(grid.CellIndex(2, 1), ex.Cell);
        Assert.Equal(5, ex.Step);
    }

    [Fact]
    public void ComponentRequirementNamesTheComponentAndItsValue()
    {
        var grid = Plate();
        var state = Calm(grid.CellCount);
        state[grid.CellIndex(3, 0)].Density = -0.125;
        state[grid.CellIndex(1, 2)].Density = -1;

        var checks = new HealthChecks<Gas>().RequirePositive("Density");
        var ex = Assert.Throws<UnhealthyStateException>(() => checks.Check(grid, state, 12, 1.5));

        // The first failing cell in cell order is reported.
        Assert.StartsWith("Health check failed at step 12, t = 1.5: cell (3, 0) at (0.875, 0.25, 0) violates 'Density > 0': Density = -0.125", ex.Message);
        Assert.Equal("Density", ex.Component);
        Assert.Equal("Density > 0", ex.Requirement);
    }

    [Fact]
    public void WholeStateRequirementNamesTheRequirementAndListsTheState()
    {
        var grid = Plate();
        var state = Calm(grid.CellCount);
        state[0].Momentum.X = 3; // kinetic energy 4.5 > total energy 2.5: negative pressure
        var checks = new HealthChecks<Gas>().Require(
            "positive pressure",
            (in Gas g) => g.Energy - 0.5 * (g.Momentum.X * g.Momentum.X + g.Momentum.Y * g.Momentum.Y) / g.Density > 0);

        var ex = Assert.Throws<UnhealthyStateException>(() => checks.Check(grid, state, 3, 0.5));

        Assert.Contains("cell (0, 0) at (0.125, 0.25, 0) violates 'positive pressure' (cell state: Density = 1, Momentum.X = 3, Momentum.Y = 0, Energy = 2.5)", ex.Message);
        Assert.Null(ex.Component);
    }

    [Fact]
    public void HealthyStatePasses()
    {
        var grid = Plate();
        new HealthChecks<Gas>().RequirePositive("Density").RequireNonNegative("Energy").Check(grid, Calm(grid.CellCount), 0, 0);
    }

    [Fact]
    public void UnknownComponentIsRejectedListingTheKnownOnes()
    {
        var ex = Assert.Throws<ArgumentException>(() => new HealthChecks<Gas>().RequirePositive("Pressure"));
        Assert.Contains("Gas has no component 'Pressure'; its components are Density, Momentum.X, Momentum.Y, Energy.", ex.Message);
    }

    [Fact]
    public void TimeMarchStopsAtTheFirstStepThatBreaksARequirement()
    {
        // A uniform sink dρ/dt = −1 from ρ = 1 with dt = 0.25: ρ = 0 after step 4, which fails ρ > 0.
        // The sink is a genuine volume source, so the ledger is told to leave Density alone.
        var grid = Plate();
        var field = new CellField<Gas>(grid);
        field.Fill(_ => new Gas { Density = 1, Energy = 2.5 });
        ResidualFunction<Gas> sink = (_, r, _, _) =>
        {
            for (int c = 0; c < r.Length; c++)
            {
                r[c] = new Gas { Density = -1 };
            }
        };
        var march = new TimeMarch<Gas>(field, sink, new ForwardEuler<Gas>(grid), TimeStepRule<Gas>.Fixed(0.25), new LedgerOptions { ExemptComponents = ["Density"] });
        march.Health.RequirePositive("Density");

        var ex = Assert.Throws<UnhealthyStateException>(() => march.Run(0.0, 10.0));

        Assert.Equal(4, ex.Step);
        Assert.Equal(1.0, ex.Time);
        Assert.StartsWith("Health check failed at step 4, t = 1: cell (0, 0) at (0.125, 0.25, 0) violates 'Density > 0': Density = 0", ex.Message);
    }
}
