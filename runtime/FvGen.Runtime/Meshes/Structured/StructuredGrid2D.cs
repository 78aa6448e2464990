namespace FvGen.Meshes.Structured;

/// <summary>A two-dimensional Cartesian grid; cell <c>(i, j)</c> has index <c>i + Nx * j</c>.</summary>
public sealed class StructuredGrid2D : StructuredGrid
{
    /// <summary>Creates a grid from its two axes and the boundaries of its four sides.</summary>
    public StructuredGrid2D(GridAxis x, GridAxis y, SideBoundary xLow, SideBoundary xHigh, SideBoundary yLow, SideBoundary yHigh)
        : base([x, y], [xLow, xHigh, yLow, yHigh])
    {
    }

    /// <summary>Cells along x.</summary>
    public int Nx => Axis(0).CellCount;

    /// <summary>Cells along y.</summary>
    public int Ny => Axis(1).CellCount;

    /// <summary>The x axis.</summary>
    public GridAxis X => Axis(0);

    /// <summary>The y axis.</summary>
    public GridAxis Y => Axis(1);

    /// <summary>The index of cell <c>(i, j)</c>.</summary>
    public int CellIndex(int i, int j) => i + Nx * j;

    /// <inheritdoc />
    public override string DescribeCell(int cell) => $"({cell % Nx}, {cell / Nx})";
}
