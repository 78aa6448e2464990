using System.Runtime.InteropServices;
using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Support;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Running;

/// <summary>Fluxes that take the two cells' gradients, on structured grids.</summary>
public sealed class StructuredGradientTests
{
    [Fact]
    public void GradientsOfALinearFieldAreExactAwayFromPatchesOnAUniformGrid()
    {
        // Closed form: on uniform spacing the mean of two neighbours is the exact face value of a
        // linear field, so (U_high - U_low)/h is its exact slope in every cell not next to a patch.
        var grid = new StructuredGrid2D(
            GridAxis.Uniform(9, 0, 3), GridAxis.Uniform(7, -1, 1),
            SideBoundary.Patch("west"), SideBoundary.Patch("east"), SideBoundary.Patch("south"), SideBoundary.Patch("north"));
        var temperature = new Scalar[grid.CellCount];
        for (int c = 0; c < temperature.Length; c++)
        {
            temperature[c] = new Scalar(1.5 * grid.CellCentroids[c].X - 0.25 * grid.CellCentroids[c].Y + 4);
        }

        var gradients = new Gradient<Scalar>[grid.CellCount];
        Conduction.Grid2D(grid, temperature, new Scalar[grid.CellCount], gradients, Insulated(grid), null);
        int checkedCells = 0;
        for (int j = 1; j < grid.Ny - 1; j++)
        {
            for (int i = 1; i < grid.Nx - 1; i++)
            {
                var g = gradients[grid.CellIndex(i, j)];
                Assert.Equal(1.5, g.X.Value, 1e-12);
                Assert.Equal(-0.25, g.Y.Value, 1e-12);
                checkedCells++;
            }
        }

        Assert.Equal(35, checkedCells);
    }

    [Theory]
    [InlineData(false, 51)]
    [InlineData(true, 52)]
    public void GradientFluxBalancesAndSlabsEqualSerialBitwise(bool periodicY, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid3D(random, 6, 5, 4, false, periodicY, false);
        var binding = Bindings.Each(grid.PatchNames, () => random.Next(2) == 0 ? Conduction.Boundary.FixedTemperature : Conduction.Boundary.Insulated);

        var temperature = RandomStates.Scalars(random, grid.CellCount, 3);

        var serial = new Scalar[grid.CellCount];
        var tally = new BoundaryFluxTally(grid.PatchNames.Count, 1);
        Conduction.Grid3D(grid, temperature, serial, new Gradient<Scalar>[grid.CellCount], binding, tally);
        Assert.True(Balance.RelativeImbalance(grid, Scalar.AsComponents(serial.AsSpan()), 1, tally) <= 1e-13);

        foreach (int threads in new[] { 1, 2, 8 })
        {
            var parallel = new Scalar[grid.CellCount];
            Conduction.GridSlabs3D(grid, temperature, parallel, new Gradient<Scalar>[grid.CellCount], binding, null, new ParallelOptions { MaxDegreeOfParallelism = threads });
            Assert.True(MemoryMarshal.AsBytes(serial.AsSpan()).SequenceEqual(MemoryMarshal.AsBytes(parallel.AsSpan())), $"{threads} threads differ from serial");
        }
    }

    [Fact]
    public void AGradientBufferOfTheWrongSizeIsAClearError()
    {
        var grid = new StructuredGrid2D(GridAxis.Uniform(3, 0, 1), GridAxis.Uniform(2, 0, 1), SideBoundary.Periodic, SideBoundary.Periodic, SideBoundary.Periodic, SideBoundary.Periodic);
        var error = Assert.Throws<ArgumentException>(() =>
            Conduction.Grid2D(grid, new Scalar[6], new Scalar[6], new Gradient<Scalar>[5], new BoundaryBinding<Conduction.Boundary>(), null));
        Assert.Contains("'gradients' holds 5 gradients; the mesh has 6", error.Message);
    }

    private static BoundaryBinding<Conduction.Boundary> Insulated(StructuredGrid grid)
    {
        var binding = Bindings.Each(grid.PatchNames, () => Conduction.Boundary.Insulated);

        return binding;
    }
}
