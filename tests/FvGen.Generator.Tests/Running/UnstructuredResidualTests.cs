using System.Runtime.InteropServices;
using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Meshes;
using FvGen.Generator.Tests.Support;
using FvGen.Ledger;
using FvGen.Meshes.Unstructured;

namespace FvGen.Generator.Tests.Running;

/// <summary>Compile-and-run tests of generated residuals on unstructured meshes, in every execution mode.</summary>
public sealed class UnstructuredResidualTests
{
    private const double Tolerance = 1e-13;

    public static TheoryData<string> MeshKinds => new() { "triangles", "quadrilaterals", "tetrahedra", "hexahedra", "prisms" };

    private static UnstructuredMesh Mesh(string kind, int seed) => kind switch
    {
        "triangles" => TestMeshes.Square(TestMeshes.Kind2D.Triangles, 9, seed),
        "quadrilaterals" => TestMeshes.Square(TestMeshes.Kind2D.Quadrilaterals, 10, seed),
        "tetrahedra" => TestMeshes.Cube(TestMeshes.Kind3D.Tetrahedra, 4, seed),
        "hexahedra" => TestMeshes.Cube(TestMeshes.Kind3D.Hexahedra, 5, seed),
        _ => TestMeshes.Cube(TestMeshes.Kind3D.Prisms, 4, seed),
    };

    [Theory]
    [MemberData(nameof(MeshKinds))]
    public void Advection_ResidualTimesVolumeSumsToMinusBoundaryFlux(string kind)
    {
        var random = new Random(kind.Length);
        var mesh = Mesh(kind, kind.Length);
        var binding = new BoundaryBinding<Advection.Boundary>();
        foreach (string name in mesh.PatchNames)
        {
            binding.Bind(name, name == "north" ? Advection.Boundary.Wall : Advection.Boundary.Open);
        }

        var state = new Scalar[mesh.CellCount];
        for (int c = 0; c < state.Length; c++)
        {
            state[c] = new Scalar(random.NextDouble());
        }

        var residual = new Scalar[mesh.CellCount];
        var tally = new BoundaryFluxTally(mesh.PatchNames.Count, 1);
        Advection.ResidualUnstructured(mesh, state, residual, binding, tally);
        double imbalance = Balance.RelativeImbalance(mesh, Scalar.AsComponents(residual.AsSpan()), 1, tally);
        Assert.True(imbalance <= Tolerance, $"imbalance {imbalance:E3}");
    }

    [Theory]
    [MemberData(nameof(MeshKinds))]
    public void ShallowWater_EveryModeBalancesAndAgreesWithSerial(string kind)
    {
        var random = new Random(100 + kind.Length);
        var mesh = Mesh(kind, 7);
        var binding = WaterChecks.RandomBinding(mesh, random);
        var state = RandomStates.Water(random, mesh.CellCount);
        var serial = new WaterState[mesh.CellCount];
        var serialTally = new BoundaryFluxTally(mesh.PatchNames.Count, WaterState.ComponentCount);
        ShallowWater.Serial(mesh, state, serial, binding, serialTally);
        Assert.True(Balance.RelativeImbalance(mesh, WaterState.AsComponents(serial.AsSpan()), 3, serialTally) <= Tolerance);

        var options = new ParallelOptions { MaxDegreeOfParallelism = 2 };
        var gathered = new WaterState[mesh.CellCount];
        var gatherTally = new BoundaryFluxTally(mesh.PatchNames.Count, WaterState.ComponentCount);
        ShallowWater.Gather(mesh, state, gathered, new WaterState[mesh.FaceCount], binding, gatherTally, options);
        Assert.True(Balance.RelativeImbalance(mesh, WaterState.AsComponents(gathered.AsSpan()), 3, gatherTally) <= Tolerance);

        var coloured = new WaterState[mesh.CellCount];
        var colourTally = new BoundaryFluxTally(mesh.PatchNames.Count, WaterState.ComponentCount);
        ShallowWater.Coloured(mesh, state, coloured, binding, colourTally, options);
        Assert.True(Balance.RelativeImbalance(mesh, WaterState.AsComponents(coloured.AsSpan()), 3, colourTally) <= Tolerance);

        // Serial and parallel modes sum the same face fluxes in different orders: equal to rounding.
        WaterChecks.AssertClose(serial, gathered);
        WaterChecks.AssertClose(serial, coloured);
        Assert.Equal(serialTally.Totals.ToArray(), gatherTally.Totals.ToArray());
        Assert.Equal(serialTally.Totals.ToArray(), colourTally.Totals.ToArray());
    }

    [Theory]
    [InlineData("triangles")]
    [InlineData("tetrahedra")]
    public void GatherIsBitwiseIdenticalForOneTwoAndEightThreads(string kind)
    {
        // Big enough for several chunks of faces and of cells (the chunk is 2048).
        var mesh = kind == "triangles"
            ? TestMeshes.Square(TestMeshes.Kind2D.Triangles, 48, 3)
            : TestMeshes.Cube(TestMeshes.Kind3D.Tetrahedra, 11, 3);
        Assert.True(mesh.InteriorFaceCount > 3 * 2048 && mesh.CellCount > 2 * 2048, "the mesh must span several parallel chunks");
        var random = new Random(5);
        var binding = WaterChecks.RandomBinding(mesh, random);
        var state = RandomStates.Water(random, mesh.CellCount);
        byte[]? reference = null;
        byte[]? referenceColoured = null;
        foreach (int threads in new[] { 1, 2, 8 })
        {
            var options = new ParallelOptions { MaxDegreeOfParallelism = threads };
            var residual = new WaterState[mesh.CellCount];
            ShallowWater.Gather(mesh, state, residual, new WaterState[mesh.FaceCount], binding, null, options);
            var bytes = MemoryMarshal.AsBytes(residual.AsSpan()).ToArray();
            reference ??= bytes;
            Assert.True(reference.AsSpan().SequenceEqual(bytes), $"gather with {threads} threads differs bitwise from 1 thread");

            var coloured = new WaterState[mesh.CellCount];
            ShallowWater.Coloured(mesh, state, coloured, binding, null, options);
            var colouredBytes = MemoryMarshal.AsBytes(coloured.AsSpan()).ToArray();
            referenceColoured ??= colouredBytes;
            Assert.True(referenceColoured.AsSpan().SequenceEqual(colouredBytes), $"coloured scatter with {threads} threads differs bitwise from 1 thread");
        }
    }

    [Theory]
    [MemberData(nameof(MeshKinds))]
    public void UniformFlowThroughOutflowPatchesGivesZeroResidual(string kind)
    {
        // Free-stream preservation: a uniform state's flux is linear in the normal, and every closed
        // cell's outward area vectors sum to zero (discrete Gauss theorem, REFERENCES.md "Geometry").
        var mesh = Mesh(kind, 11);
        var binding = new BoundaryBinding<ShallowWater.Boundary>();
        foreach (string name in mesh.PatchNames)
        {
            binding.Bind(name, ShallowWater.Boundary.Outflow);
        }

        var state = new WaterState[mesh.CellCount];
        Array.Fill(state, new WaterState { Depth = 1.3, Discharge = new Horizontal { X = 0.4, Y = -0.2 } });
        var residual = new WaterState[mesh.CellCount];
        ShallowWater.Serial(mesh, state, residual, binding, null);
        var surfaces = mesh.CellSurfaceAreas;
        var volumes = mesh.CellVolumes;
        for (int c = 0; c < mesh.CellCount; c++)
        {
            // Scale: the largest flux component (the pressure term g h²/2 ≈ 8.3) times the cell's surface over its volume.
            double scale = 10.0 * surfaces[c] / volumes[c];
            foreach (double value in WaterState.Components(ref residual[c]))
            {
                Assert.True(Math.Abs(value) <= 1e-13 * scale, $"cell {c}: residual {value:E3}");
            }
        }
    }

    [Fact]
    public void GatherRejectsAFaceBufferSmallerThanTheMesh()
    {
        var mesh = TestMeshes.Square(TestMeshes.Kind2D.Quadrilaterals, 3, 1);
        var binding = WaterChecks.RandomBinding(mesh, new Random(1));
        var error = Assert.Throws<ArgumentException>(() =>
            ShallowWater.Gather(mesh, new WaterState[mesh.CellCount], new WaterState[mesh.CellCount], new WaterState[mesh.FaceCount - 1], binding, null, new ParallelOptions()));
        Assert.Contains("face buffer", error.Message);
    }

}
