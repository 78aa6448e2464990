namespace FvGen.Meshes.Structured;

/// <summary>The six sides of a structured grid; a 1-D grid uses the first two, a 2-D grid the first four.</summary>
public enum GridSide
{
    XLow,
    XHigh,
    YLow,
    YHigh,
    ZLow,
    ZHigh,
}
