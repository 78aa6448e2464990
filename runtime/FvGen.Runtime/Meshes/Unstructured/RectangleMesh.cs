namespace FvGen.Meshes.Unstructured;

/// <summary>
/// 2-D meshes of the rectangle [x_min, x_max] × [y_min, y_max] on a uniform lattice, with a patch
/// per side (west, east, south, north unless named otherwise).
/// </summary>
public static class RectangleMesh
{
    /// <summary>Builds the mesh.</summary>
    public static UnstructuredMesh Create(
        int cellsX, int cellsY, double xMin, double xMax, double yMin, double yMax,
        RectangleCellKind kind = RectangleCellKind.Quadrilaterals, SidePatchNames? patchNames = null) =>
        CreateBuilder(cellsX, cellsY, xMin, xMax, yMin, yMax, kind, patchNames).Build();

    /// <summary>The builder, nodes and cells added but not built, e.g. to move nodes first (<see cref="NodePerturbation"/>).</summary>
    public static UnstructuredMeshBuilder CreateBuilder(
        int cellsX, int cellsY, double xMin, double xMax, double yMin, double yMax,
        RectangleCellKind kind = RectangleCellKind.Quadrilaterals, SidePatchNames? patchNames = null)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(cellsX, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(cellsY, 1);
        LatticeChecks.CheckRange("x", xMin, xMax);
        LatticeChecks.CheckRange("y", yMin, yMax);
        var names = patchNames ?? SidePatchNames.Default;
        var builder = new UnstructuredMeshBuilder(2, $"rectangle mesh {cellsX} x {cellsY} ({kind})");
        for (int j = 0; j <= cellsY; j++)
        {
            for (int i = 0; i <= cellsX; i++)
            {
                builder.AddNode(Lerp(xMin, xMax, i, cellsX), Lerp(yMin, yMax, j, cellsY));
            }
        }

        int Node(int i, int j) => j * (cellsX + 1) + i;

        for (int j = 0; j < cellsY; j++)
        {
            for (int i = 0; i < cellsX; i++)
            {
                int n00 = Node(i, j), n10 = Node(i + 1, j), n11 = Node(i + 1, j + 1), n01 = Node(i, j + 1);
                if (kind == RectangleCellKind.Quadrilaterals)
                {
                    builder.AddCell(CellShape.Quadrilateral, n00, n10, n11, n01);
                }
                else
                {
                    builder.AddCell(CellShape.Triangle, n00, n10, n11);
                    builder.AddCell(CellShape.Triangle, n00, n11, n01);
                }
            }
        }

        for (int j = 0; j < cellsY; j++)
        {
            builder.AddBoundaryFace(names.West, Node(0, j), Node(0, j + 1));
        }

        for (int j = 0; j < cellsY; j++)
        {
            builder.AddBoundaryFace(names.East, Node(cellsX, j), Node(cellsX, j + 1));
        }

        for (int i = 0; i < cellsX; i++)
        {
            builder.AddBoundaryFace(names.South, Node(i, 0), Node(i + 1, 0));
        }

        for (int i = 0; i < cellsX; i++)
        {
            builder.AddBoundaryFace(names.North, Node(i, cellsY), Node(i + 1, cellsY));
        }

        return builder;
    }

    /// <summary>Lattice coordinate k of n between a and b, exact at both ends.</summary>
    internal static double Lerp(double a, double b, int k, int n) => k == n ? b : a + (b - a) * k / n;
}
