using System.Runtime.InteropServices;
using FvGen.Boundaries;
using FvGen.Geometry;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Support;
using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Running;

/// <summary>
/// The parallel gather on structured grids: face fluxes into the face buffer in parallel, then each cell
/// sums its faces in the fixed order x-low, x-high, y-low, ... — bitwise identical for 1, 2 and 8 threads,
/// equal to the serial scatter to rounding, and conservative: Σ residual·volume = −Σ tally (the discrete
/// divergence theorem, REFERENCES.md "Geometry").
/// </summary>
public sealed class StructuredGatherTests
{
    private static readonly int[] ThreadCounts = { 1, 2, 8 };

    [Theory]
    [InlineData(false, 41)]
    [InlineData(true, 42)]
    public void Advection1D_GatherIsBitwiseIdenticalForOneTwoAndEightThreads(bool periodic, int seed)
    {
        var random = new Random(seed);
        var (low, high) = RandomGrids.Sides(periodic, "x");
        // More cells than one chunk of 2048, so that several tasks share the faces and cells.
        var grid = new StructuredGrid1D(RandomGrids.Axis(random, 5000), low, high);
        CheckAdvection(grid, random, Advection.Residual1D, (u, r, buffer, b, t, o) => Advection.Gather1D(grid, u, r, buffer, b, t, o));
    }

    [Theory]
    [InlineData(false, false, 43)]
    [InlineData(true, false, 44)]
    [InlineData(false, true, 45)]
    [InlineData(true, true, 46)]
    public void Advection2D_GatherIsBitwiseIdenticalForOneTwoAndEightThreads(bool periodicX, bool periodicY, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid2D(random, 19, 13, periodicX, periodicY);
        CheckAdvection(grid, random, Advection.Residual2D, (u, r, buffer, b, t, o) => Advection.Gather2D(grid, u, r, buffer, b, t, o));
    }

    [Theory]
    [InlineData(false, false, false, 47)]
    [InlineData(true, false, true, 48)]
    [InlineData(false, true, false, 49)]
    public void Advection3D_GatherIsBitwiseIdenticalForOneTwoAndEightThreads(bool px, bool py, bool pz, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid3D(random, 7, 6, 5, px, py, pz);
        CheckAdvection(grid, random, Advection.Residual3D, (u, r, buffer, b, t, o) => Advection.Gather3D(grid, u, r, buffer, b, t, o));
    }

    [Theory]
    [InlineData(false, false, false, 50)]
    [InlineData(true, true, false, 51)]
    public void MusclAdvection3D_GatherIsBitwiseIdenticalForOneTwoAndEightThreads(bool px, bool py, bool pz, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid3D(random, 7, 6, 5, px, py, pz);
        CheckAdvection(grid, random, Advection.MusclVanLeer3D, (u, r, buffer, b, t, o) => Advection.MusclGather3D(grid, u, r, buffer, b, t, o));
    }

    [Theory]
    [InlineData(false, false, 52)]
    [InlineData(true, false, 53)]
    public void MusclShallowWater2D_GatherIsBitwiseIdenticalAndBalances(bool periodicX, bool periodicY, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid2D(random, 23, 17, periodicX, periodicY);
        var binding = Bindings.Each(grid.PatchNames, () => random.Next(2) == 0 ? ShallowWater.Boundary.Wall : ShallowWater.Boundary.Outflow);

        var state = RandomStates.Water(random, grid.CellCount);
        var serial = new WaterState[grid.CellCount];
        var serialTally = new BoundaryFluxTally(grid.PatchNames.Count, WaterState.ComponentCount);
        ShallowWater.Muscl2D(grid, state, serial, binding, serialTally);
        var buffer = new WaterState[grid.FaceCount];
        WaterState[]? first = null;
        foreach (int threads in ThreadCounts)
        {
            var gathered = new WaterState[grid.CellCount];
            var tally = new BoundaryFluxTally(grid.PatchNames.Count, WaterState.ComponentCount);
            ShallowWater.MusclGather2D(grid, state, gathered, buffer, binding, tally, new ParallelOptions { MaxDegreeOfParallelism = threads });
            first ??= gathered;
            Assert.True(MemoryMarshal.AsBytes(first.AsSpan()).SequenceEqual(MemoryMarshal.AsBytes(gathered.AsSpan())), $"{threads} threads differ from 1 thread");
            // The tally is summed serially in face order, as in the serial scatter.
            Assert.Equal(serialTally.Totals.ToArray(), tally.Totals.ToArray());
            Assert.True(Balance.RelativeImbalance(grid, WaterState.AsComponents(gathered.AsSpan()), WaterState.ComponentCount, tally) <= 1e-13);
            AssertAgreesToRounding(WaterState.AsComponents(serial.AsSpan()), WaterState.AsComponents(gathered.AsSpan()));
        }
    }

    [Fact]
    public void Conduction3D_GatherWithGradientsIsBitwiseIdenticalAndBalances()
    {
        var random = new Random(54);
        var grid = RandomGrids.Grid3D(random, 7, 6, 5, periodicX: false, periodicY: true, periodicZ: false);
        var binding = Bindings.Each(grid.PatchNames, () => random.Next(2) == 0 ? Conduction.Boundary.FixedTemperature : Conduction.Boundary.Insulated);

        var temperature = RandomStates.Scalars(random, grid.CellCount, 3);

        var serial = new Scalar[grid.CellCount];
        var serialGradients = new Gradient<Scalar>[grid.CellCount];
        Conduction.Grid3D(grid, temperature, serial, serialGradients, binding, null);
        var buffer = new Scalar[grid.FaceCount];
        Scalar[]? first = null;
        foreach (int threads in ThreadCounts)
        {
            var gathered = new Scalar[grid.CellCount];
            var gradients = new Gradient<Scalar>[grid.CellCount];
            var tally = new BoundaryFluxTally(grid.PatchNames.Count, 1);
            Conduction.GridGather3D(grid, temperature, gathered, gradients, buffer, binding, tally, new ParallelOptions { MaxDegreeOfParallelism = threads });
            first ??= gathered;
            Assert.Equal(first, gathered);
            Assert.Equal(serialGradients, gradients);
            Assert.True(Balance.RelativeImbalance(grid, Scalar.AsComponents(gathered.AsSpan()), 1, tally) <= 1e-13);
            AssertAgreesToRounding(Scalar.AsComponents(serial.AsSpan()), Scalar.AsComponents(gathered.AsSpan()));
        }
    }

    [Fact]
    public void FaceBufferSmallerThanTheGridsFaceCountIsRejected()
    {
        var grid = new StructuredGrid2D(GridAxis.Uniform(4, 0, 1), GridAxis.Uniform(3, 0, 1), SideBoundary.Periodic, SideBoundary.Periodic, SideBoundary.Periodic, SideBoundary.Periodic);
        // Periodic in both directions: 5 x 3 x-faces and 4 x 4 y-faces, the wrap faces stored on the first and last node planes.
        Assert.Equal(31, grid.FaceCount);
        // With patches on every side: 5 x 3 x-faces and 4 x 4 y-faces (closed-form count).
        var walled = new StructuredGrid2D(GridAxis.Uniform(4, 0, 1), GridAxis.Uniform(3, 0, 1), SideBoundary.Patch("a"), SideBoundary.Patch("b"), SideBoundary.Patch("c"), SideBoundary.Patch("d"));
        Assert.Equal(31, walled.FaceCount);
        var error = Assert.Throws<ArgumentException>(() =>
            Advection.Gather2D(grid, new Scalar[12], new Scalar[12], new Scalar[30], new BoundaryBinding<Advection.Boundary>(), null, new ParallelOptions()));
        Assert.Contains("the face buffer holds 30 faces; the mesh has 31", error.Message);
    }

    private delegate void SerialKernel<TGrid>(TGrid grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Advection.Boundary> boundaries, BoundaryFluxTally? tally);

    private delegate void GatherKernel(
        ReadOnlyMemory<Scalar> u, Memory<Scalar> dudt, Memory<Scalar> faceFlux, BoundaryBinding<Advection.Boundary> boundaries, BoundaryFluxTally? tally, ParallelOptions options);

    private static void CheckAdvection<TGrid>(TGrid grid, Random random, SerialKernel<TGrid> serialKernel, GatherKernel gather)
        where TGrid : StructuredGrid
    {
        var binding = Bindings.Each(grid.PatchNames, () => random.Next(3) == 0 ? Advection.Boundary.Wall : Advection.Boundary.Open);

        var state = RandomStates.Scalars(random, grid.CellCount, 1, -0.25);

        var serial = new Scalar[grid.CellCount];
        var serialTally = new BoundaryFluxTally(grid.PatchNames.Count, 1);
        serialKernel(grid, state, serial, binding, serialTally);
        var buffer = new Scalar[grid.FaceCount];
        Scalar[]? first = null;
        foreach (int threads in ThreadCounts)
        {
            // A buffer left dirty by the previous call must not matter: every face is written before it is read.
            var gathered = new Scalar[grid.CellCount];
            var tally = new BoundaryFluxTally(grid.PatchNames.Count, 1);
            gather(state, gathered, buffer, binding, tally, new ParallelOptions { MaxDegreeOfParallelism = threads });
            first ??= gathered;
            Assert.True(MemoryMarshal.AsBytes(first.AsSpan()).SequenceEqual(MemoryMarshal.AsBytes(gathered.AsSpan())), $"{threads} threads differ from 1 thread");
            Assert.Equal(serialTally.Totals.ToArray(), tally.Totals.ToArray());
            Assert.True(Balance.RelativeImbalance(grid, Scalar.AsComponents(gathered.AsSpan()), 1, tally) <= 1e-13);
            AssertAgreesToRounding(Scalar.AsComponents(serial.AsSpan()), Scalar.AsComponents(gathered.AsSpan()));
        }
    }

    /// <summary>Serial and gather sum the same face fluxes in different orders: equal to a few ulps of the largest term.</summary>
    private static void AssertAgreesToRounding(ReadOnlySpan<double> serial, ReadOnlySpan<double> gathered)
    {
        double scale = 0;
        for (int n = 0; n < serial.Length; n++)
        {
            scale = Math.Max(scale, Math.Abs(serial[n]));
        }

        Assert.True(scale > 0, "the residual is zero everywhere, so the comparison cannot decide");
        for (int n = 0; n < serial.Length; n++)
        {
            Assert.True(Math.Abs(serial[n] - gathered[n]) <= 1e-12 * scale, $"component {n}: serial {serial[n]:R}, gather {gathered[n]:R}");
        }
    }

}
