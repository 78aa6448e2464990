namespace FvGen.Meshes.Unstructured;

/// <summary>
/// 3-D meshes of the box [x_min, x_max] × [y_min, y_max] × [z_min, z_max] on a uniform lattice,
/// with a patch per side (west, east, south, north, bottom, top unless named otherwise).
/// </summary>
public static class BoxMesh
{
    /// <summary>
    /// The six Kuhn tetrahedra of the unit brick as corner bit masks (x = 1, y = 2, z = 4): the
    /// monotone paths from corner 0 to corner 7, each ordered so its volume is positive.
    /// </summary>
    private static readonly int[][] KuhnTetrahedra = MakeKuhnTetrahedra();

    /// <summary>Builds the mesh.</summary>
    public static UnstructuredMesh Create(
        int cellsX, int cellsY, int cellsZ,
        double xMin, double xMax, double yMin, double yMax, double zMin, double zMax,
        BoxCellKind kind = BoxCellKind.Hexahedra, SidePatchNames? patchNames = null) =>
        CreateBuilder(cellsX, cellsY, cellsZ, xMin, xMax, yMin, yMax, zMin, zMax, kind, patchNames).Build();

    /// <summary>The builder, nodes and cells added but not built, e.g. to move nodes first (<see cref="NodePerturbation"/>).</summary>
    public static UnstructuredMeshBuilder CreateBuilder(
        int cellsX, int cellsY, int cellsZ,
        double xMin, double xMax, double yMin, double yMax, double zMin, double zMax,
        BoxCellKind kind = BoxCellKind.Hexahedra, SidePatchNames? patchNames = null)
    {
        ArgumentOutOfRangeException.ThrowIfLessThan(cellsX, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(cellsY, 1);
        ArgumentOutOfRangeException.ThrowIfLessThan(cellsZ, 1);
        LatticeChecks.CheckRange("x", xMin, xMax);
        LatticeChecks.CheckRange("y", yMin, yMax);
        LatticeChecks.CheckRange("z", zMin, zMax);
        var names = patchNames ?? SidePatchNames.Default;
        var builder = new UnstructuredMeshBuilder(3, $"box mesh {cellsX} x {cellsY} x {cellsZ} ({kind})");
        for (int k = 0; k <= cellsZ; k++)
        {
            for (int j = 0; j <= cellsY; j++)
            {
                for (int i = 0; i <= cellsX; i++)
                {
                    builder.AddNode(
                        RectangleMesh.Lerp(xMin, xMax, i, cellsX),
                        RectangleMesh.Lerp(yMin, yMax, j, cellsY),
                        RectangleMesh.Lerp(zMin, zMax, k, cellsZ));
                }
            }
        }

        int Node(int i, int j, int k) => (k * (cellsY + 1) + j) * (cellsX + 1) + i;

        for (int k = 0; k < cellsZ; k++)
        {
            for (int j = 0; j < cellsY; j++)
            {
                for (int i = 0; i < cellsX; i++)
                {
                    int Corner(int bits) => Node(i + (bits & 1), j + ((bits >> 1) & 1), k + ((bits >> 2) & 1));
                    switch (kind)
                    {
                        case BoxCellKind.Hexahedra:
                            builder.AddCell(CellShape.Hexahedron, Corner(0), Corner(1), Corner(3), Corner(2), Corner(4), Corner(5), Corner(7), Corner(6));
                            break;
                        case BoxCellKind.Tetrahedra:
                            foreach (var tet in KuhnTetrahedra)
                            {
                                builder.AddCell(CellShape.Tetrahedron, Corner(tet[0]), Corner(tet[1]), Corner(tet[2]), Corner(tet[3]));
                            }

                            break;
                        case BoxCellKind.Prisms:
                            builder.AddCell(CellShape.Prism, Corner(0), Corner(1), Corner(3), Corner(4), Corner(5), Corner(7));
                            builder.AddCell(CellShape.Prism, Corner(0), Corner(3), Corner(2), Corner(4), Corner(7), Corner(6));
                            break;
                        default:
                            throw new ArgumentOutOfRangeException(nameof(kind), kind, "Unknown box cell kind.");
                    }
                }
            }
        }

        // Each side square as (low, low), (high, low), (high, high), (low, high) in its two in-plane
        // axes; split into triangles along its low-high diagonal, which is the diagonal both the
        // Kuhn split and the prism split put there.
        bool splitSides = kind == BoxCellKind.Tetrahedra;
        bool splitCaps = kind is BoxCellKind.Tetrahedra or BoxCellKind.Prisms;
        foreach (int i in new[] { 0, cellsX })
        {
            string name = i == 0 ? names.West : names.East;
            for (int k = 0; k < cellsZ; k++)
            {
                for (int j = 0; j < cellsY; j++)
                {
                    AddSquare(builder, name, splitSides, Node(i, j, k), Node(i, j + 1, k), Node(i, j + 1, k + 1), Node(i, j, k + 1));
                }
            }
        }

        foreach (int j in new[] { 0, cellsY })
        {
            string name = j == 0 ? names.South : names.North;
            for (int k = 0; k < cellsZ; k++)
            {
                for (int i = 0; i < cellsX; i++)
                {
                    AddSquare(builder, name, splitSides, Node(i, j, k), Node(i + 1, j, k), Node(i + 1, j, k + 1), Node(i, j, k + 1));
                }
            }
        }

        foreach (int k in new[] { 0, cellsZ })
        {
            string name = k == 0 ? names.Bottom : names.Top;
            for (int j = 0; j < cellsY; j++)
            {
                for (int i = 0; i < cellsX; i++)
                {
                    AddSquare(builder, name, splitCaps, Node(i, j, k), Node(i + 1, j, k), Node(i + 1, j + 1, k), Node(i, j + 1, k));
                }
            }
        }

        return builder;
    }

    private static void AddSquare(UnstructuredMeshBuilder builder, string patch, bool split, int a, int b, int c, int d)
    {
        if (split)
        {
            builder.AddBoundaryFace(patch, a, b, c);
            builder.AddBoundaryFace(patch, a, c, d);
        }
        else
        {
            builder.AddBoundaryFace(patch, a, b, c, d);
        }
    }

    private static int[][] MakeKuhnTetrahedra()
    {
        int[][] axisOrders = [[0, 1, 2], [0, 2, 1], [1, 0, 2], [1, 2, 0], [2, 0, 1], [2, 1, 0]];
        var tets = new int[6][];
        for (int t = 0; t < 6; t++)
        {
            int v1 = 1 << axisOrders[t][0];
            int v2 = v1 | (1 << axisOrders[t][1]);
            tets[t] = SignedVolume(0, v1, v2, 7) > 0 ? [0, v1, v2, 7] : [0, v2, v1, 7];
        }

        return tets;
    }

    /// <summary>Six times the signed volume of a tetrahedron of unit-brick corners.</summary>
    private static int SignedVolume(int a, int b, int c, int d)
    {
        Span<int> u = [Bit(b, 0) - Bit(a, 0), Bit(b, 1) - Bit(a, 1), Bit(b, 2) - Bit(a, 2)];
        Span<int> v = [Bit(c, 0) - Bit(a, 0), Bit(c, 1) - Bit(a, 1), Bit(c, 2) - Bit(a, 2)];
        Span<int> w = [Bit(d, 0) - Bit(a, 0), Bit(d, 1) - Bit(a, 1), Bit(d, 2) - Bit(a, 2)];
        return u[0] * (v[1] * w[2] - v[2] * w[1]) - u[1] * (v[0] * w[2] - v[2] * w[0]) + u[2] * (v[0] * w[1] - v[1] * w[0]);

        static int Bit(int corner, int axis) => (corner >> axis) & 1;
    }
}
