namespace FvGen.Meshes.Structured;

/// <summary>
/// What lies beyond one side of a structured grid: the opposite side (periodic), or a named
/// boundary patch. Several sides may share one patch name.
/// </summary>
public sealed record SideBoundary
{
    private SideBoundary(string? patchName) => PatchName = patchName;

    /// <summary>The side wraps around to the opposite side.</summary>
    public static SideBoundary Periodic { get; } = new((string?)null);

    /// <summary>Name of the patch, or <see langword="null"/> when periodic.</summary>
    public string? PatchName { get; }

    /// <summary>True when the side wraps around to the opposite side.</summary>
    public bool IsPeriodic => PatchName is null;

    /// <summary>A boundary patch called <paramref name="name"/>.</summary>
    public static SideBoundary Patch(string name)
    {
        if (string.IsNullOrWhiteSpace(name))
        {
            throw new ArgumentException("A patch name must not be empty.", nameof(name));
        }

        return new SideBoundary(name);
    }

    /// <inheritdoc />
    public override string ToString() => IsPeriodic ? "periodic" : $"patch '{PatchName}'";
}
