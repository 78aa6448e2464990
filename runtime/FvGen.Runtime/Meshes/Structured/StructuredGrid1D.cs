namespace FvGen.Meshes.Structured;

/// <summary>A one-dimensional grid of cells along x; faces have unit area.</summary>
public sealed class StructuredGrid1D : StructuredGrid
{
    /// <summary>Creates a grid on <paramref name="x"/> with the given boundaries on its two ends.</summary>
    public StructuredGrid1D(GridAxis x, SideBoundary low, SideBoundary high)
        : base([x], [low, high])
    {
    }

    /// <summary>Number of cells.</summary>
    public int Nx => Axis(0).CellCount;

    /// <summary>The x axis.</summary>
    public GridAxis X => Axis(0);

    /// <inheritdoc />
    public override string DescribeCell(int cell) => $"({cell})";
}
