using System.Runtime.InteropServices;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Support;
using FvGen.Geometry;
using FvGen.Ledger;

namespace FvGen.Generator.Tests.Running;

/// <summary>
/// User reconstruction on unstructured meshes: the generator calls
/// <c>R(in cell, in gradient, in toFace, out faceState)</c> for both sides of every interior face and for the
/// inside of every boundary face, with the Green–Gauss gradients limited by Barth–Jespersen.
/// </summary>
/// <remarks>
/// The checks compare against the built-in schemes, which are themselves checked against closed forms
/// and observed orders (<see cref="UnstructuredGradientTests"/>, <see cref="UnstructuredOrderTests"/>):
/// a user reconstruction that extrapolates with the gradient must reproduce the built-in linear one,
/// and one that returns the cell value must reproduce first order, both bitwise (the same operations in
/// the same order).
/// </remarks>
public sealed class UnstructuredUserReconstructionTests
{
    public static TheoryData<string> MeshKinds => UnstructuredResidualTests.MeshKinds;

    [Theory]
    [MemberData(nameof(MeshKinds))]
    public void GradientExtrapolationByTheUserReproducesTheBuiltInLinearReconstruction(string kind)
    {
        var random = new Random(300 + kind.Length);
        var mesh = UnstructuredGradientTests.Mesh(kind, 5);
        var binding = WaterChecks.RandomBinding(mesh, random);
        var state = RandomStates.Water(random, mesh.CellCount);

        var builtIn = new WaterState[mesh.CellCount];
        var builtInGradients = new Gradient<WaterState>[mesh.CellCount];
        var builtInTally = new BoundaryFluxTally(mesh.PatchNames.Count, WaterState.ComponentCount);
        ShallowWater.LinearSerial(mesh, state, builtIn, builtInGradients, binding, builtInTally);

        var user = new WaterState[mesh.CellCount];
        var userGradients = new Gradient<WaterState>[mesh.CellCount];
        var userTally = new BoundaryFluxTally(mesh.PatchNames.Count, WaterState.ComponentCount);
        ShallowWater.UserLinearSerial(mesh, state, user, userGradients, binding, userTally);

        AssertBitwise(builtIn, user, "serial");
        Assert.Equal(builtInGradients, userGradients);
        Assert.Equal(builtInTally.Totals.ToArray(), userTally.Totals.ToArray());
        Assert.True(Balance.RelativeImbalance(mesh, WaterState.AsComponents(user.AsSpan()), WaterState.ComponentCount, userTally) <= 1e-13);

        // In the gather mode too, for 1, 2 and 8 threads.
        var expected = new WaterState[mesh.CellCount];
        ShallowWater.LinearGather(mesh, state, expected, new Gradient<WaterState>[mesh.CellCount], new WaterState[mesh.FaceCount], binding, null, new ParallelOptions());
        foreach (int threads in new[] { 1, 2, 8 })
        {
            var gathered = new WaterState[mesh.CellCount];
            ShallowWater.UserLinearGather(
                mesh, state, gathered, new Gradient<WaterState>[mesh.CellCount], new WaterState[mesh.FaceCount], binding, null, new ParallelOptions { MaxDegreeOfParallelism = threads });
            AssertBitwise(expected, gathered, threads + " threads");
        }
    }

    [Theory]
    [MemberData(nameof(MeshKinds))]
    public void CellAverageByTheUserReproducesFirstOrder(string kind)
    {
        var random = new Random(310 + kind.Length);
        var mesh = UnstructuredGradientTests.Mesh(kind, 6);
        var binding = WaterChecks.RandomBinding(mesh, random);
        var state = RandomStates.Water(random, mesh.CellCount);

        var firstOrder = new WaterState[mesh.CellCount];
        ShallowWater.Serial(mesh, state, firstOrder, binding, null);
        var user = new WaterState[mesh.CellCount];
        ShallowWater.UserFirstOrderSerial(mesh, state, user, new Gradient<WaterState>[mesh.CellCount], binding, null);
        AssertBitwise(firstOrder, user, "first order");

        // The reconstruction must matter, or the two checks above could not tell user from built-in.
        var linear = new WaterState[mesh.CellCount];
        ShallowWater.LinearSerial(mesh, state, linear, new Gradient<WaterState>[mesh.CellCount], binding, null);
        Assert.False(MemoryMarshal.AsBytes(linear.AsSpan()).SequenceEqual(MemoryMarshal.AsBytes(user.AsSpan())));
    }

    private static void AssertBitwise(WaterState[] expected, WaterState[] actual, string what) =>
        Assert.True(MemoryMarshal.AsBytes(expected.AsSpan()).SequenceEqual(MemoryMarshal.AsBytes(actual.AsSpan())), what + ": the residuals differ");
}
