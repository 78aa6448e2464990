using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Support;
using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Running;

/// <summary>Compile-and-run tests of generated residuals on structured grids (the kernels are in Kernels/).</summary>
public sealed class StructuredResidualTests
{
    private const double Tolerance = 1e-13;

    public static TheoryData<bool, int> Periodicity1D => new() { { true, 1 }, { false, 2 }, { false, 3 } };

    [Theory]
    [MemberData(nameof(Periodicity1D))]
    public void Advection1D_ResidualTimesVolumeSumsToMinusBoundaryFlux(bool periodic, int seed)
    {
        var random = new Random(seed);
        var (low, high) = RandomGrids.Sides(periodic, "x");
        var grid = new StructuredGrid1D(RandomGrids.Axis(random, 37), low, high);
        Check(grid, random, Advection.Residual1D);
    }

    [Theory]
    [InlineData(true, true, 4)]
    [InlineData(true, false, 5)]
    [InlineData(false, true, 6)]
    [InlineData(false, false, 7)]
    public void Advection2D_ResidualTimesVolumeSumsToMinusBoundaryFlux(bool periodicX, bool periodicY, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid2D(random, 13, 9, periodicX, periodicY);
        Check(grid, random, Advection.Residual2D);
    }

    [Theory]
    [InlineData(true, false, true, 8)]
    [InlineData(false, true, false, 9)]
    [InlineData(false, false, false, 10)]
    public void Advection3D_ResidualTimesVolumeSumsToMinusBoundaryFlux(bool px, bool py, bool pz, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid3D(random, 6, 5, 4, px, py, pz);
        Check(grid, random, Advection.Residual3D);
    }

    [Theory]
    [InlineData(false, false, false, 11)]
    [InlineData(true, false, true, 12)]
    public void MusclAdvection3D_ResidualTimesVolumeSumsToMinusBoundaryFlux(bool px, bool py, bool pz, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid3D(random, 6, 5, 4, px, py, pz);
        Check(grid, random, Advection.MusclVanLeer3D);
    }

    [Theory]
    [InlineData(true, false, 41)]
    [InlineData(false, false, 42)]
    public void UserReconstruction2D_ResidualTimesVolumeSumsToMinusBoundaryFlux(bool periodicX, bool periodicY, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid2D(random, 12, 10, periodicX, periodicY);
        Check(grid, random, Advection.Fromm2D);
    }

    [Theory]
    [InlineData(false, false, 13)]
    [InlineData(true, false, 14)]
    public void ShallowWater2D_ResidualTimesVolumeSumsToMinusBoundaryFlux(bool periodicX, bool periodicY, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid2D(random, 11, 8, periodicX, periodicY);
        var state = RandomStates.Water(random, grid.CellCount);
        foreach (var kernel in new Action<StructuredGrid2D, ReadOnlySpan<WaterState>, Span<WaterState>, BoundaryBinding<ShallowWater.Boundary>, BoundaryFluxTally?>[] { ShallowWater.Residual2D, ShallowWater.Muscl2D })
        {
            var binding = Bindings.Each(grid.PatchNames, () => random.Next(2) == 0 ? ShallowWater.Boundary.Wall : ShallowWater.Boundary.Outflow);

            var residual = new WaterState[grid.CellCount];
            var tally = new BoundaryFluxTally(grid.PatchNames.Count, WaterState.ComponentCount);
            kernel(grid, state, residual, binding, tally);
            double imbalance = grid.PatchNames.Count == 0 && periodicX && periodicY
                ? 0
                : Balance.RelativeImbalance(grid, WaterState.AsComponents(residual.AsSpan()), WaterState.ComponentCount, tally);
            Assert.True(imbalance <= Tolerance, $"imbalance {imbalance:E3}");
        }
    }

    [Fact]
    public void UniformStateOnFullyPeriodicGridsGivesZeroResidual()
    {
        var random = new Random(15);
        var p = SideBoundary.Periodic;
        var none = new BoundaryBinding<Advection.Boundary>();
        var g1 = new StructuredGrid1D(RandomGrids.Axis(random, 17), p, p);
        var g2 = new StructuredGrid2D(RandomGrids.Axis(random, 7), RandomGrids.Axis(random, 6), p, p, p, p);
        var g3 = new StructuredGrid3D(RandomGrids.Axis(random, 5), RandomGrids.Axis(random, 4), RandomGrids.Axis(random, 6), p, p, p, p, p, p);
        AssertZero(g1.CellCount, (u, r) => Advection.Residual1D(g1, u, r, none, null));
        AssertZero(g1.CellCount, (u, r) => Advection.MusclSuperbee1D(g1, u, r, none, null));
        AssertZero(g2.CellCount, (u, r) => Advection.Residual2D(g2, u, r, none, null));
        AssertZero(g3.CellCount, (u, r) => Advection.Residual3D(g3, u, r, none, null));
        AssertZero(g3.CellCount, (u, r) => Advection.MusclVanLeer3D(g3, u, r, none, null));

        var water = new BoundaryBinding<ShallowWater.Boundary>();
        var uniform = new WaterState[g2.CellCount];
        Array.Fill(uniform, new WaterState { Depth = 1.7, Discharge = new Horizontal { X = 0.3, Y = -0.4 } });
        var residual = new WaterState[g2.CellCount];
        ShallowWater.Muscl2D(g2, uniform, residual, water, null);
        foreach (double value in WaterState.AsComponents(residual.AsSpan()))
        {
            Assert.True(Math.Abs(value) <= 1e-12, $"residual {value:E3} on a uniform periodic state");
        }
    }

    [Fact]
    public void UnboundPatchIsReportedBeforeTheResidualIsTouched()
    {
        var grid = new StructuredGrid1D(GridAxis.Uniform(4, 0, 1), SideBoundary.Patch("inlet"), SideBoundary.Patch("outlet"));
        var binding = new BoundaryBinding<Advection.Boundary>().Bind("inlet", Advection.Boundary.Open);
        var residual = new Scalar[4];
        Array.Fill(residual, new Scalar(42));
        var error = Assert.Throws<BoundaryBindingException>(() => Advection.Residual1D(grid, new Scalar[4], residual, binding, null));
        Assert.Contains("'outlet'", error.Message);
        Assert.Equal(["outlet"], error.UnboundPatches);
        Assert.All(residual, r => Assert.Equal(42, r.Value));
    }

    [Fact]
    public void WrongSizedStateIsAClearError()
    {
        var grid = new StructuredGrid1D(GridAxis.Uniform(4, 0, 1), SideBoundary.Periodic, SideBoundary.Periodic);
        var error = Assert.Throws<ArgumentException>(() => Advection.Residual1D(grid, new Scalar[3], new Scalar[4], new(), null));
        Assert.Contains("'u' holds 3 cells; the mesh has 4", error.Message);
    }

    internal delegate void Kernel<TGrid>(TGrid grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Advection.Boundary> boundaries, BoundaryFluxTally? tally);

    private static void Check<TGrid>(TGrid grid, Random random, Kernel<TGrid> kernel)
        where TGrid : StructuredGrid
    {
        var binding = Bindings.Each(grid.PatchNames, () => random.Next(3) == 0 ? Advection.Boundary.Wall : Advection.Boundary.Open);

        var state = RandomStates.Scalars(random, grid.CellCount, 2, -0.5);

        var residual = new Scalar[grid.CellCount];
        var tally = new BoundaryFluxTally(grid.PatchNames.Count, Scalar.ComponentCount);
        kernel(grid, state, residual, binding, tally);
        double imbalance = Balance.RelativeImbalance(grid, Scalar.AsComponents(residual.AsSpan()), 1, tally);
        Assert.True(imbalance <= Tolerance, $"imbalance {imbalance:E3}");
        if (grid.PatchNames.Count == 0)
        {
            Assert.All(tally.Totals.ToArray(), t => Assert.Equal(0, t));
        }
    }



    private delegate void Run(ReadOnlySpan<Scalar> u, Span<Scalar> r);

    private static void AssertZero(int cells, Run run)
    {
        var uniform = new Scalar[cells];
        Array.Fill(uniform, new Scalar(0.6180339887));
        var residual = new Scalar[cells];
        Array.Fill(residual, new Scalar(1));
        run(uniform, residual);
        Assert.All(residual, r => Assert.True(Math.Abs(r.Value) <= 1e-14, $"residual {r.Value:E3} on a uniform periodic state"));
    }
}
