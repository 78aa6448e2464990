namespace FvGen.Meshes.Structured;

/// <summary>A three-dimensional Cartesian grid; cell <c>(i, j, k)</c> has index <c>i + Nx * (j + Ny * k)</c>.</summary>
public sealed class StructuredGrid3D : StructuredGrid
{
    /// <summary>Creates a grid from its three axes and the boundaries of its six sides.</summary>
    public StructuredGrid3D(
        GridAxis x,
        GridAxis y,
        GridAxis z,
        SideBoundary xLow,
        SideBoundary xHigh,
        SideBoundary yLow,
        SideBoundary yHigh,
        SideBoundary zLow,
        SideBoundary zHigh)
        : base([x, y, z], [xLow, xHigh, yLow, yHigh, zLow, zHigh])
    {
    }

    /// <summary>Cells along x.</summary>
    public int Nx => Axis(0).CellCount;

    /// <summary>Cells along y.</summary>
    public int Ny => Axis(1).CellCount;

    /// <summary>Cells along z.</summary>
    public int Nz => Axis(2).CellCount;

    /// <summary>The x axis.</summary>
    public GridAxis X => Axis(0);

    /// <summary>The y axis.</summary>
    public GridAxis Y => Axis(1);

    /// <summary>The z axis.</summary>
    public GridAxis Z => Axis(2);

    /// <summary>The index of cell <c>(i, j, k)</c>.</summary>
    public int CellIndex(int i, int j, int k) => i + Nx * (j + Ny * k);

    /// <inheritdoc />
    public override string DescribeCell(int cell) => $"({cell % Nx}, {cell / Nx % Ny}, {cell / (Nx * Ny)})";
}
