using System.Runtime.InteropServices;
using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Meshes;
using FvGen.Generator.Tests.Support;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Meshes.Unstructured;

namespace FvGen.Generator.Tests.Running;

/// <summary>Green–Gauss gradients, Barth–Jespersen limiting and gradient-taking fluxes on unstructured meshes.</summary>
public sealed class UnstructuredGradientTests
{
    private const double Tolerance = 1e-13;

    public static TheoryData<string> MeshKinds => UnstructuredResidualTests.MeshKinds;

    internal static UnstructuredMesh Mesh(string kind, int seed) => kind switch
    {
        "triangles" => TestMeshes.Square(TestMeshes.Kind2D.Triangles, 9, seed),
        "quadrilaterals" => TestMeshes.Square(TestMeshes.Kind2D.Quadrilaterals, 10, seed),
        "tetrahedra" => TestMeshes.Cube(TestMeshes.Kind3D.Tetrahedra, 4, seed),
        "hexahedra" => TestMeshes.Cube(TestMeshes.Kind3D.Hexahedra, 5, seed),
        _ => TestMeshes.Cube(TestMeshes.Kind3D.Prisms, 4, seed),
    };

    [Theory]
    [MemberData(nameof(MeshKinds))]
    public void LinearReconstructionBalancesInEveryModeAndTheModesAgree(string kind)
    {
        var random = new Random(200 + kind.Length);
        var mesh = Mesh(kind, 3);
        var binding = WaterChecks.RandomBinding(mesh, random);
        var state = RandomStates.Water(random, mesh.CellCount);
        var options = new ParallelOptions { MaxDegreeOfParallelism = 2 };

        var serial = new WaterState[mesh.CellCount];
        var tally = new BoundaryFluxTally(mesh.PatchNames.Count, 3);
        ShallowWater.LinearSerial(mesh, state, serial, new Gradient<WaterState>[mesh.CellCount], binding, tally);
        Assert.True(Balance.RelativeImbalance(mesh, WaterState.AsComponents(serial.AsSpan()), 3, tally) <= Tolerance);

        var gathered = new WaterState[mesh.CellCount];
        var gatherTally = new BoundaryFluxTally(mesh.PatchNames.Count, 3);
        ShallowWater.LinearGather(mesh, state, gathered, new Gradient<WaterState>[mesh.CellCount], new WaterState[mesh.FaceCount], binding, gatherTally, options);
        Assert.True(Balance.RelativeImbalance(mesh, WaterState.AsComponents(gathered.AsSpan()), 3, gatherTally) <= Tolerance);

        var coloured = new WaterState[mesh.CellCount];
        var colourTally = new BoundaryFluxTally(mesh.PatchNames.Count, 3);
        ShallowWater.LinearColoured(mesh, state, coloured, new Gradient<WaterState>[mesh.CellCount], binding, colourTally, options);
        Assert.True(Balance.RelativeImbalance(mesh, WaterState.AsComponents(coloured.AsSpan()), 3, colourTally) <= Tolerance);

        WaterChecks.AssertClose(serial, gathered);
        WaterChecks.AssertClose(serial, coloured);

        // The reconstruction must matter: second-order and first-order residuals differ.
        var first = new WaterState[mesh.CellCount];
        ShallowWater.Serial(mesh, state, first, binding, null);
        Assert.False(WaterState.AsComponents(first.AsSpan()).SequenceEqual(WaterState.AsComponents(serial.AsSpan())));
    }

    [Fact]
    public void LinearGatherIsBitwiseIdenticalForOneTwoAndEightThreads()
    {
        var mesh = TestMeshes.Square(TestMeshes.Kind2D.Triangles, 48, 9);
        var random = new Random(9);
        var binding = WaterChecks.RandomBinding(mesh, random);
        var state = RandomStates.Water(random, mesh.CellCount);
        byte[]? reference = null;
        foreach (int threads in new[] { 1, 2, 8 })
        {
            var residual = new WaterState[mesh.CellCount];
            ShallowWater.LinearGather(
                mesh, state, residual, new Gradient<WaterState>[mesh.CellCount], new WaterState[mesh.FaceCount], binding, null, new ParallelOptions { MaxDegreeOfParallelism = threads });
            var bytes = MemoryMarshal.AsBytes(residual.AsSpan()).ToArray();
            reference ??= bytes;
            Assert.True(reference.AsSpan().SequenceEqual(bytes), $"{threads} threads differ bitwise from 1 thread");
        }
    }

    [Theory]
    [MemberData(nameof(MeshKinds))]
    public void BarthJespersenKeepsFaceValuesWithinTheNeighbourRange(string kind)
    {
        // The defining property of the limiter (Barth & Jespersen 1989, from memory): the
        // reconstructed value at every face centroid lies between the cell's and its neighbours' extremes.
        var random = new Random(300 + kind.Length);
        var mesh = Mesh(kind, 5);
        var state = RandomStates.Water(random, mesh.CellCount);
        var gradients = new Gradient<WaterState>[mesh.CellCount];
        ShallowWater.LinearSerial(mesh, state, new WaterState[mesh.CellCount], gradients, WaterChecks.RandomBinding(mesh, random), null);
        bool anyLimitedAwayFromZero = false;
        for (int c = 0; c < mesh.CellCount; c++)
        {
            double min = state[c].Depth, max = min;
            for (int n = mesh.CellFaceOffsets[c]; n < mesh.CellFaceOffsets[c + 1]; n++)
            {
                int f = mesh.CellFaces[n];
                int other = mesh.FaceLeft[f] == c ? mesh.FaceRight[f] : mesh.FaceLeft[f];
                if (other >= 0)
                {
                    min = Math.Min(min, state[other].Depth);
                    max = Math.Max(max, state[other].Depth);
                }
            }

            var g = gradients[c];
            anyLimitedAwayFromZero |= Math.Abs(g.X.Depth) + Math.Abs(g.Y.Depth) + Math.Abs(g.Z.Depth) > 0;
            for (int n = mesh.CellFaceOffsets[c]; n < mesh.CellFaceOffsets[c + 1]; n++)
            {
                var d = mesh.FaceCentroids[mesh.CellFaces[n]] - mesh.CellCentroids[c];
                double value = state[c].Depth + g.X.Depth * d.X + g.Y.Depth * d.Y + g.Z.Depth * d.Z;
                Assert.InRange(value, min - 1e-12, max + 1e-12);
            }
        }

        Assert.True(anyLimitedAwayFromZero, "every gradient was limited to zero, so the check decided nothing");
    }

    [Fact]
    public void GreenGaussIsExactForALinearFieldOnAUniformQuadrilateralMesh()
    {
        // Closed-form geometry: on a uniform Cartesian mesh the face midpoint is the midpoint of the two
        // cell centres, so the mean of two cells is the exact face value of a linear field, and Green–Gauss
        // returns its exact gradient in every cell whose faces are all interior.
        var mesh = TestMeshes.Square(TestMeshes.Kind2D.Quadrilaterals, 8, 1, jitter: 0);
        var temperature = new Scalar[mesh.CellCount];
        for (int c = 0; c < mesh.CellCount; c++)
        {
            temperature[c] = new Scalar(3 * mesh.CellCentroids[c].X - 2 * mesh.CellCentroids[c].Y + 1);
        }

        var gradients = new Gradient<Scalar>[mesh.CellCount];
        var binding = new BoundaryBinding<Conduction.Boundary>();
        foreach (string name in mesh.PatchNames)
        {
            binding.Bind(name, Conduction.Boundary.Insulated);
        }

        Conduction.Serial(mesh, temperature, new Scalar[mesh.CellCount], gradients, binding, null);
        int checkedCells = 0;
        for (int c = 0; c < mesh.CellCount; c++)
        {
            bool interior = true;
            for (int n = mesh.CellFaceOffsets[c]; n < mesh.CellFaceOffsets[c + 1]; n++)
            {
                interior &= mesh.FaceRight[mesh.CellFaces[n]] >= 0;
            }

            if (!interior)
            {
                continue;
            }

            checkedCells++;
            Assert.Equal(3.0, gradients[c].X.Value, 1e-12);
            Assert.Equal(-2.0, gradients[c].Y.Value, 1e-12);
        }

        Assert.Equal(36, checkedCells);
    }

    [Theory]
    [MemberData(nameof(MeshKinds))]
    public void GradientFluxBalancesAndGatherAgreesWithSerial(string kind)
    {
        var random = new Random(400 + kind.Length);
        var mesh = Mesh(kind, 8);
        var binding = new BoundaryBinding<Conduction.Boundary>();
        foreach (string name in mesh.PatchNames)
        {
            binding.Bind(name, random.Next(2) == 0 ? Conduction.Boundary.FixedTemperature : Conduction.Boundary.Insulated);
        }

        var temperature = new Scalar[mesh.CellCount];
        for (int c = 0; c < temperature.Length; c++)
        {
            temperature[c] = new Scalar(random.NextDouble() * 4);
        }

        var serial = new Scalar[mesh.CellCount];
        var tally = new BoundaryFluxTally(mesh.PatchNames.Count, 1);
        Conduction.Serial(mesh, temperature, serial, new Gradient<Scalar>[mesh.CellCount], binding, tally);
        Assert.True(Balance.RelativeImbalance(mesh, Scalar.AsComponents(serial.AsSpan()), 1, tally) <= Tolerance);

        var gathered = new Scalar[mesh.CellCount];
        var gatherTally = new BoundaryFluxTally(mesh.PatchNames.Count, 1);
        Conduction.Gather(mesh, temperature, gathered, new Gradient<Scalar>[mesh.CellCount], new Scalar[mesh.FaceCount], binding, gatherTally, new ParallelOptions());
        Assert.True(Balance.RelativeImbalance(mesh, Scalar.AsComponents(gathered.AsSpan()), 1, gatherTally) <= Tolerance);
        double scale = serial.Max(s => Math.Abs(s.Value));
        for (int c = 0; c < serial.Length; c++)
        {
            Assert.True(Math.Abs(serial[c].Value - gathered[c].Value) <= 1e-13 * scale);
        }
    }

}
