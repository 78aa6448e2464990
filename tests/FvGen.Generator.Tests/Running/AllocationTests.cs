using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Support;
using FvGen.Generator.Tests.Meshes;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Running;

/// <summary>Serial generated residuals allocate nothing per call once the binding has been resolved for the mesh.</summary>
public sealed class AllocationTests
{
    [Fact]
    public void SerialStructuredAndUnstructuredResidualsAllocateNothingPerCall()
    {
        var grid = new StructuredGrid2D(
            GridAxis.Uniform(8, 0, 1), GridAxis.Uniform(6, 0, 1), SideBoundary.Patch("a"), SideBoundary.Patch("b"), SideBoundary.Periodic, SideBoundary.Periodic);
        var gridBinding = new BoundaryBinding<ShallowWater.Boundary>().Bind("a", ShallowWater.Boundary.Wall).Bind("b", ShallowWater.Boundary.Outflow);
        var gridState = RandomStates.Water(new Random(1), grid.CellCount);
        var gridResidual = new WaterState[grid.CellCount];
        var gridTally = new BoundaryFluxTally(grid.PatchNames.Count, 3);

        var mesh = TestMeshes.Cube(TestMeshes.Kind3D.Prisms, 3, 2);
        var meshBinding = new BoundaryBinding<ShallowWater.Boundary>();
        foreach (string name in mesh.PatchNames)
        {
            meshBinding.Bind(name, ShallowWater.Boundary.Wall);
        }

        var meshState = RandomStates.Water(new Random(2), mesh.CellCount);
        var meshResidual = new WaterState[mesh.CellCount];
        var gradients = new Gradient<WaterState>[mesh.CellCount];
        var meshTally = new BoundaryFluxTally(mesh.PatchNames.Count, 3);

        void RunAll()
        {
            ShallowWater.Residual2D(grid, gridState, gridResidual, gridBinding, gridTally);
            ShallowWater.Muscl2D(grid, gridState, gridResidual, gridBinding, gridTally);
            ShallowWater.Serial(mesh, meshState, meshResidual, meshBinding, meshTally);
            ShallowWater.LinearSerial(mesh, meshState, meshResidual, gradients, meshBinding, meshTally);
        }

        RunAll(); // resolves the bindings (once per mesh) and compiles the code
        long before = GC.GetAllocatedBytesForCurrentThread();
        RunAll();
        long allocated = GC.GetAllocatedBytesForCurrentThread() - before;
        Assert.Equal(0, allocated);
    }
}
