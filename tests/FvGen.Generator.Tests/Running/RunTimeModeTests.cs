using System.Runtime.InteropServices;
using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Support;
using FvGen.Generator.Tests.Meshes;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Running;

/// <summary>A kernel with an ExecutionMode parameter runs the mode the caller picks, exactly as the fixed-mode kernels do.</summary>
public sealed class RunTimeModeTests
{
    [Fact]
    public void EachRunTimeModeEqualsItsFixedModeKernelBitwise()
    {
        var mesh = TestMeshes.Square(TestMeshes.Kind2D.Triangles, 12, 4);
        var random = new Random(4);
        var binding = new BoundaryBinding<ShallowWater.Boundary>();
        foreach (string name in mesh.PatchNames)
        {
            binding.Bind(name, random.Next(2) == 0 ? ShallowWater.Boundary.Wall : ShallowWater.Boundary.Outflow);
        }

        var state = RandomStates.Water(random, mesh.CellCount);
        var options = new ParallelOptions { MaxDegreeOfParallelism = 2 };
        var buffer = new WaterState[mesh.FaceCount];

        var expected = new Dictionary<ExecutionMode, WaterState[]>();
        expected[ExecutionMode.SerialScatter] = new WaterState[mesh.CellCount];
        ShallowWater.Serial(mesh, state, expected[ExecutionMode.SerialScatter], binding, null);
        expected[ExecutionMode.ParallelGather] = new WaterState[mesh.CellCount];
        ShallowWater.Gather(mesh, state, expected[ExecutionMode.ParallelGather], buffer, binding, null, options);
        expected[ExecutionMode.ParallelColouredScatter] = new WaterState[mesh.CellCount];
        ShallowWater.Coloured(mesh, state, expected[ExecutionMode.ParallelColouredScatter], binding, null, options);

        foreach (var (mode, reference) in expected)
        {
            var residual = new WaterState[mesh.CellCount];
            ShallowWater.AnyMode(mesh, state, residual, buffer, binding, null, options, mode);
            Assert.True(MemoryMarshal.AsBytes(reference.AsSpan()).SequenceEqual(MemoryMarshal.AsBytes(residual.AsSpan())), $"{mode} differs from its fixed-mode kernel");
        }
    }

    [Fact]
    public void EachRunTimeModeOnAStructuredGridEqualsItsFixedModeKernelBitwise()
    {
        var random = new Random(5);
        var grid = new StructuredGrid2D(
            GridAxis.Uniform(21, 0, 2), GridAxis.Uniform(15, 0, 1), SideBoundary.Patch("west"), SideBoundary.Patch("east"), SideBoundary.Periodic, SideBoundary.Periodic);
        var binding = new BoundaryBinding<ShallowWater.Boundary>().Bind("west", ShallowWater.Boundary.Wall).Bind("east", ShallowWater.Boundary.Outflow);
        var state = RandomStates.Water(random, grid.CellCount);
        var options = new ParallelOptions { MaxDegreeOfParallelism = 2 };
        var buffer = new WaterState[grid.FaceCount];

        var expected = new Dictionary<ExecutionMode, WaterState[]>();
        expected[ExecutionMode.SerialScatter] = new WaterState[grid.CellCount];
        ShallowWater.Muscl2D(grid, state, expected[ExecutionMode.SerialScatter], binding, null);
        expected[ExecutionMode.ParallelGather] = new WaterState[grid.CellCount];
        ShallowWater.MusclGather2D(grid, state, expected[ExecutionMode.ParallelGather], buffer, binding, null, options);
        expected[ExecutionMode.ParallelColouredScatter] = new WaterState[grid.CellCount];
        ShallowWater.MusclSlabs2D(grid, state, expected[ExecutionMode.ParallelColouredScatter], binding, null, options);

        foreach (var (mode, reference) in expected)
        {
            var residual = new WaterState[grid.CellCount];
            ShallowWater.MusclAnyMode2D(grid, state, residual, buffer, binding, null, options, mode);
            Assert.True(MemoryMarshal.AsBytes(reference.AsSpan()).SequenceEqual(MemoryMarshal.AsBytes(residual.AsSpan())), $"{mode} differs from its fixed-mode kernel");
        }
    }

    [Fact]
    public void AModeTheParametersCannotSupportIsAClearError()
    {
        var grid = new StructuredGrid1D(GridAxis.Uniform(4, 0, 1), SideBoundary.Periodic, SideBoundary.Periodic);
        var state = new WaterState[4];
        Array.Fill(state, new WaterState { Depth = 1 });
        var error = Assert.Throws<ArgumentException>(() =>
            ShallowWater.AnyMode1D(grid, state, new WaterState[4], new BoundaryBinding<ShallowWater.Boundary>(), ExecutionMode.ParallelGather));
        Assert.Contains("ExecutionMode.ParallelGather is not available with these parameters; available: SerialScatter", error.Message);
    }
}
