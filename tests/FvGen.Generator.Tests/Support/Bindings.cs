using FvGen.Boundaries;

namespace FvGen.Generator.Tests.Support;

/// <summary>Boundary bindings for the running tests.</summary>
internal static class Bindings
{
    /// <summary>Binds every patch, in the mesh's order, to the flux <paramref name="pick"/> returns for it.</summary>
    public static BoundaryBinding<TBoundary> Each<TBoundary>(IReadOnlyList<string> patches, Func<TBoundary> pick)
        where TBoundary : struct, Enum
    {
        var binding = new BoundaryBinding<TBoundary>();
        foreach (string name in patches)
        {
            binding.Bind(name, pick());
        }

        return binding;
    }
}
