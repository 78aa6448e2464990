namespace FvGen.Meshes.Unstructured;

/// <summary>Argument checks shared by the lattice builders.</summary>
internal static class LatticeChecks
{
    public static void CheckRange(string axis, double min, double max)
    {
        if (!double.IsFinite(min) || !double.IsFinite(max) || !(max > min))
        {
            throw new ArgumentException($"The {axis} range [{min}, {max}] must be finite with {axis}_max > {axis}_min.");
        }
    }
}
