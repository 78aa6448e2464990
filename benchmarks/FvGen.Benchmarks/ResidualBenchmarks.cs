using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Configs;
using FvGen.Boundaries;
using FvGen.Geometry;
using FvGen.Meshes.Structured;
using FvGen.Meshes.Unstructured;

namespace FvGen.Benchmarks;

/// <summary>Each generated residual against the hand-written loop of the same flux, on the same data.</summary>
[GroupBenchmarksBy(BenchmarkLogicalGroupRule.ByCategory)]
[CategoriesColumn]
public class ResidualBenchmarks
{
    private StructuredGrid2D _grid = null!;
    private StructuredGrid1D _ring = null!;
    private Water[] _ringState = null!, _ringResidual = null!;
    private UnstructuredMesh _mesh = null!;
    private Water[] _gridState = null!, _gridResidual = null!;
    private Water[] _meshState = null!, _meshResidual = null!, _faceFlux = null!;
    private BoundaryBinding<ShallowWaterPhysics.Boundary> _gridWalls = null!, _meshWalls = null!;
    private StructuredGrid3D _cube = null!;
    private Water[] _cubeState = null!, _cubeResidual = null!, _gridFaceFlux = null!;
    private BoundaryBinding<ShallowWaterPhysics.Boundary> _cubeWalls = null!;
    private Gradient<Water>[] _meshGradients = null!;
    private BoundaryBinding<Smoothing.Boundary> _meshInsulated = null!;
    private readonly ParallelOptions _twoThreads = new() { MaxDegreeOfParallelism = 2 };

    [GlobalSetup]
    public void Setup()
    {
        var random = new Random(12);
        _grid = new StructuredGrid2D(
            GridAxis.Uniform(256, 0, 1), GridAxis.Uniform(256, 0, 1),
            SideBoundary.Patch("walls"), SideBoundary.Patch("walls"), SideBoundary.Patch("walls"), SideBoundary.Patch("walls"));
        _gridState = RandomWater(random, _grid.CellCount);
        _gridResidual = new Water[_grid.CellCount];
        _gridWalls = new BoundaryBinding<ShallowWaterPhysics.Boundary>().Bind("walls", ShallowWaterPhysics.Boundary.Wall);

        _ring = new StructuredGrid1D(GridAxis.Uniform(65536, 0, 1), SideBoundary.Periodic, SideBoundary.Periodic);
        _ringState = RandomWater(random, _ring.CellCount);
        _ringResidual = new Water[_ring.CellCount];

        var builder = RectangleMesh.CreateBuilder(160, 160, 0, 1, 0, 1, RectangleCellKind.Triangles);
        NodePerturbation.PerturbInteriorNodes(builder, 0.2, 3);
        _mesh = builder.Build();
        _meshState = RandomWater(random, _mesh.CellCount);
        _meshResidual = new Water[_mesh.CellCount];
        _faceFlux = new Water[_mesh.FaceCount];
        _meshWalls = new BoundaryBinding<ShallowWaterPhysics.Boundary>();
        foreach (string name in _mesh.PatchNames)
        {
            _meshWalls.Bind(name, ShallowWaterPhysics.Boundary.Wall);
        }

        _meshGradients = new Gradient<Water>[_mesh.CellCount];
        _meshInsulated = new BoundaryBinding<Smoothing.Boundary>();
        foreach (string name in _mesh.PatchNames)
        {
            _meshInsulated.Bind(name, Smoothing.Boundary.Insulated);
        }

        _gridFaceFlux = new Water[_grid.FaceCount];
        _cube = new StructuredGrid3D(
            GridAxis.Uniform(64, 0, 1), GridAxis.Uniform(64, 0, 1), GridAxis.Uniform(64, 0, 1),
            SideBoundary.Patch("walls"), SideBoundary.Patch("walls"), SideBoundary.Patch("walls"),
            SideBoundary.Patch("walls"), SideBoundary.Patch("walls"), SideBoundary.Patch("walls"));
        _cubeState = RandomWater(random, _cube.CellCount);
        _cubeResidual = new Water[_cube.CellCount];
        _cubeWalls = new BoundaryBinding<ShallowWaterPhysics.Boundary>().Bind("walls", ShallowWaterPhysics.Boundary.Wall);

        // Both sides of each comparison must do the same work: check that they agree to rounding.
        Agree("structured", HandWrittenStructured, GeneratedStructured, _gridResidual);
        Agree("unstructured", HandWrittenUnstructured, GeneratedUnstructured, _meshResidual);
        Agree("gather", HandWrittenGather, GeneratedGather, _meshResidual);
        Agree("structured slabs", HandWrittenStructuredSlabs, GeneratedStructuredSlabs, _gridResidual);
        Agree("MUSCL", HandWrittenMuscl1D, GeneratedMuscl1D, _ringResidual);
        Agree("coloured", HandWrittenColoured, GeneratedColoured, _meshResidual);
        Agree("structured 3-D", HandWrittenStructured3D, GeneratedStructured3D, _cubeResidual);
        Agree("structured gather", HandWrittenGather2D, GeneratedGather2D, _gridResidual);
        Agree("unstructured second order", HandWrittenUnstructuredLinear, GeneratedUnstructuredLinear, _meshResidual);
        Agree("unstructured diffusion", HandWrittenUnstructuredDiffusion, GeneratedUnstructuredDiffusion, _meshResidual);
    }

    private static void Agree(string what, Action handWritten, Action generated, Water[] residual)
    {
        handWritten();
        var expected = (Water[])residual.Clone();
        generated();
        double scale = expected.Max(w => Math.Abs(w.Depth) + Math.Abs(w.Flow.X) + Math.Abs(w.Flow.Y));
        for (int c = 0; c < residual.Length; c++)
        {
            double diff = Math.Abs(residual[c].Depth - expected[c].Depth) + Math.Abs(residual[c].Flow.X - expected[c].Flow.X) + Math.Abs(residual[c].Flow.Y - expected[c].Flow.Y);
            if (diff > 1e-12 * scale)
            {
                throw new InvalidOperationException($"{what}: generated and hand-written residuals differ in cell {c} by {diff:E3}; the benchmark would compare different work.");
            }
        }
    }

    [Benchmark(Baseline = true), BenchmarkCategory("Structured 2-D, 256x256, serial")]
    public void HandWrittenStructured() => HandWrittenResiduals.Structured(_grid, _gridState, _gridResidual);

    [Benchmark, BenchmarkCategory("Structured 2-D, 256x256, serial")]
    public void GeneratedStructured() => ShallowWaterPhysics.Structured(_grid, _gridState, _gridResidual, _gridWalls);

    [Benchmark(Baseline = true), BenchmarkCategory("Unstructured triangles, 51 200 cells, serial")]
    public void HandWrittenUnstructured() => HandWrittenResiduals.Unstructured(_mesh, _meshState, _meshResidual);

    [Benchmark, BenchmarkCategory("Unstructured triangles, 51 200 cells, serial")]
    public void GeneratedUnstructured() => ShallowWaterPhysics.Unstructured(_mesh, _meshState, _meshResidual, _meshWalls);

    [Benchmark(Baseline = true), BenchmarkCategory("Unstructured triangles, 51 200 cells, gather, 2 threads")]
    public void HandWrittenGather() => HandWrittenResiduals.UnstructuredGather(_mesh, _meshState, _meshResidual, _faceFlux, _twoThreads);

    [Benchmark, BenchmarkCategory("Unstructured triangles, 51 200 cells, gather, 2 threads")]
    public void GeneratedGather() => ShallowWaterPhysics.UnstructuredGather(_mesh, _meshState, _meshResidual, _faceFlux, _meshWalls, _twoThreads);

    [Benchmark(Baseline = true), BenchmarkCategory("Structured 2-D, 256x256, slabs, 2 threads")]
    public void HandWrittenStructuredSlabs() => HandWrittenResiduals.StructuredSlabs(_grid, _gridState, _gridResidual, _twoThreads);

    [Benchmark, BenchmarkCategory("Structured 2-D, 256x256, slabs, 2 threads")]
    public void GeneratedStructuredSlabs() => ShallowWaterPhysics.StructuredSlabs(_grid, _gridState, _gridResidual, _gridWalls, _twoThreads);

    [Benchmark(Baseline = true), BenchmarkCategory("Structured 1-D, 65 536 cells, MUSCL van Leer, serial")]
    public void HandWrittenMuscl1D() => HandWrittenResiduals.Muscl1D(_ring, _ringState, _ringResidual);

    [Benchmark, BenchmarkCategory("Structured 1-D, 65 536 cells, MUSCL van Leer, serial")]
    public void GeneratedMuscl1D() => ShallowWaterPhysics.Muscl1D(_ring, _ringState, _ringResidual);

    [Benchmark(Baseline = true), BenchmarkCategory("Unstructured triangles, 51 200 cells, coloured, 2 threads")]
    public void HandWrittenColoured() => HandWrittenResiduals.UnstructuredColoured(_mesh, _meshState, _meshResidual, _twoThreads);

    [Benchmark, BenchmarkCategory("Unstructured triangles, 51 200 cells, coloured, 2 threads")]
    public void GeneratedColoured() => ShallowWaterPhysics.UnstructuredColoured(_mesh, _meshState, _meshResidual, _meshWalls, _twoThreads);

    [Benchmark(Baseline = true), BenchmarkCategory("Structured 3-D, 64x64x64, serial")]
    public void HandWrittenStructured3D() => HandWrittenResiduals.Structured3D(_cube, _cubeState, _cubeResidual);

    [Benchmark, BenchmarkCategory("Structured 3-D, 64x64x64, serial")]
    public void GeneratedStructured3D() => ShallowWaterPhysics.Structured3D(_cube, _cubeState, _cubeResidual, _cubeWalls);

    [Benchmark(Baseline = true), BenchmarkCategory("Structured 2-D, 256x256, gather, 2 threads")]
    public void HandWrittenGather2D() => HandWrittenResiduals.StructuredGather(_grid, _gridState, _gridResidual, _gridFaceFlux, _twoThreads);

    [Benchmark, BenchmarkCategory("Structured 2-D, 256x256, gather, 2 threads")]
    public void GeneratedGather2D() => ShallowWaterPhysics.StructuredGather(_grid, _gridState, _gridResidual, _gridFaceFlux, _gridWalls, _twoThreads);

    [Benchmark(Baseline = true), BenchmarkCategory("Unstructured triangles, 51 200 cells, Green-Gauss + Barth-Jespersen, serial")]
    public void HandWrittenUnstructuredLinear() => HandWrittenGradientResiduals.UnstructuredLinear(_mesh, _meshState, _meshResidual, _meshGradients);

    [Benchmark, BenchmarkCategory("Unstructured triangles, 51 200 cells, Green-Gauss + Barth-Jespersen, serial")]
    public void GeneratedUnstructuredLinear() => ShallowWaterPhysics.UnstructuredLinear(_mesh, _meshState, _meshResidual, _meshGradients, _meshWalls);

    [Benchmark(Baseline = true), BenchmarkCategory("Unstructured triangles, 51 200 cells, gradient diffusion flux, serial")]
    public void HandWrittenUnstructuredDiffusion() => HandWrittenGradientResiduals.UnstructuredDiffusion(_mesh, _meshState, _meshResidual, _meshGradients);

    [Benchmark, BenchmarkCategory("Unstructured triangles, 51 200 cells, gradient diffusion flux, serial")]
    public void GeneratedUnstructuredDiffusion() => Smoothing.Unstructured(_mesh, _meshState, _meshResidual, _meshGradients, _meshInsulated);

    private static Water[] RandomWater(Random random, int count)
    {
        var state = new Water[count];
        for (int c = 0; c < count; c++)
        {
            state[c].Depth = 1 + random.NextDouble();
            state[c].Flow.X = random.NextDouble() - 0.5;
            state[c].Flow.Y = random.NextDouble() - 0.5;
        }

        return state;
    }
}
