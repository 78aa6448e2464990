using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Meshes.Unstructured;

namespace FvGen.Generator.Tests.Support;

/// <summary>Shared pieces of the shallow-water run tests on unstructured meshes.</summary>
internal static class WaterChecks
{
    /// <summary>Binds every patch of <paramref name="mesh"/> to a wall or an outflow at random.</summary>
    public static BoundaryBinding<ShallowWater.Boundary> RandomBinding(UnstructuredMesh mesh, Random random)
    {
        var binding = new BoundaryBinding<ShallowWater.Boundary>();
        foreach (string name in mesh.PatchNames)
        {
            binding.Bind(name, random.Next(2) == 0 ? ShallowWater.Boundary.Wall : ShallowWater.Boundary.Outflow);
        }

        return binding;
    }

    /// <summary>Serial and parallel residuals agree to rounding: 1e-13 of the largest component.</summary>
    public static void AssertClose(WaterState[] expected, WaterState[] actual)
    {
        var e = WaterState.AsComponents(expected.AsSpan());
        var a = WaterState.AsComponents(actual.AsSpan());
        double scale = 0;
        foreach (double v in e)
        {
            scale = Math.Max(scale, Math.Abs(v));
        }

        for (int n = 0; n < e.Length; n++)
        {
            Assert.True(Math.Abs(e[n] - a[n]) <= 1e-13 * scale, $"component {n}: serial {e[n]:R}, parallel {a[n]:R}");
        }
    }
}
