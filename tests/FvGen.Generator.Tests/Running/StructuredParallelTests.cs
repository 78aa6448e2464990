using System.Runtime.InteropServices;
using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Support;
using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Running;

/// <summary>
/// The slab-parallel scatter on structured grids: each task owns a slab of cells across the face
/// direction, so every cell receives its faces in the serial order and the result is bitwise the
/// serial one, for any thread count.
/// </summary>
public sealed class StructuredParallelTests
{
    [Theory]
    [InlineData(false, false, 31)]
    [InlineData(true, false, 32)]
    [InlineData(true, true, 33)]
    public void MusclSlabsEqualSerialBitwiseForOneTwoAndEightThreads(bool periodicX, bool periodicY, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid2D(random, 23, 17, periodicX, periodicY);
        var binding = Bindings.Each(grid.PatchNames, () => random.Next(2) == 0 ? ShallowWater.Boundary.Wall : ShallowWater.Boundary.Outflow);

        var state = RandomStates.Water(random, grid.CellCount);
        var serial = new WaterState[grid.CellCount];
        var serialTally = new BoundaryFluxTally(grid.PatchNames.Count, 3);
        ShallowWater.Muscl2D(grid, state, serial, binding, serialTally);
        foreach (int threads in new[] { 1, 2, 8 })
        {
            var parallel = new WaterState[grid.CellCount];
            var tally = new BoundaryFluxTally(grid.PatchNames.Count, 3);
            ShallowWater.MusclSlabs2D(grid, state, parallel, binding, tally, new ParallelOptions { MaxDegreeOfParallelism = threads });
            Assert.True(MemoryMarshal.AsBytes(serial.AsSpan()).SequenceEqual(MemoryMarshal.AsBytes(parallel.AsSpan())), $"{threads} threads differ from serial");
            Assert.Equal(serialTally.Totals.ToArray(), tally.Totals.ToArray());
        }
    }

    [Fact]
    public void AdvectionSlabs3DEqualSerialAndBalance()
    {
        var random = new Random(34);
        var (xl, xh) = RandomGrids.Sides(false, "x");
        var (zl, zh) = RandomGrids.Sides(false, "z");
        var grid = new StructuredGrid3D(
            RandomGrids.Axis(random, 7), RandomGrids.Axis(random, 6), RandomGrids.Axis(random, 5), xl, xh, SideBoundary.Periodic, SideBoundary.Periodic, zl, zh);
        var binding = Bindings.Each(grid.PatchNames, () => Advection.Boundary.Open);

        var state = RandomStates.Scalars(random, grid.CellCount);

        var serial = new Scalar[grid.CellCount];
        Advection.Residual3D(grid, state, serial, binding, null);
        var parallel = new Scalar[grid.CellCount];
        var tally = new BoundaryFluxTally(grid.PatchNames.Count, 1);
        Advection.Slabs3D(grid, state, parallel, binding, tally, new ParallelOptions { MaxDegreeOfParallelism = 2 });
        Assert.Equal(serial, parallel);
        Assert.True(Balance.RelativeImbalance(grid, Scalar.AsComponents(parallel.AsSpan()), 1, tally) <= 1e-13);
    }
}
