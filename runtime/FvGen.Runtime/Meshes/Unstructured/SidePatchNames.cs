namespace FvGen.Meshes.Unstructured;

/// <summary>
/// The patch names the rectangle and box builders give their sides. Sides may share a name (all
/// "wall", say); their faces then form one patch.
/// </summary>
/// <param name="West">The side x = x_min.</param>
/// <param name="East">The side x = x_max.</param>
/// <param name="South">The side y = y_min.</param>
/// <param name="North">The side y = y_max.</param>
/// <param name="Bottom">The side z = z_min (boxes only).</param>
/// <param name="Top">The side z = z_max (boxes only).</param>
public sealed record SidePatchNames(
    string West = "west",
    string East = "east",
    string South = "south",
    string North = "north",
    string Bottom = "bottom",
    string Top = "top")
{
    /// <summary>west, east, south, north, bottom, top.</summary>
    public static SidePatchNames Default { get; } = new();

    /// <summary>Every side in one patch called <paramref name="name"/>.</summary>
    public static SidePatchNames All(string name) => new(name, name, name, name, name, name);
}
