using FvGen.Meshes.Unstructured;

namespace FvGen.Meshes.Gmsh;

/// <summary>The first-order Gmsh element types FvGen reads, with their dimension and node count.</summary>
internal static class GmshElementType
{
    /// <summary>The supported types, as listed in messages.</summary>
    public const string Supported = "1 (line), 2 (triangle), 3 (quadrangle), 4 (tetrahedron), 5 (hexahedron), 6 (prism), 7 (pyramid), 15 (point)";

    /// <summary>Dimension, node count and cell shape (null for lines and points) of a type; false when unsupported.</summary>
    public static bool TryDescribe(long type, out int dimension, out int nodeCount, out CellShape? shape)
    {
        (dimension, nodeCount, shape) = type switch
        {
            1 => (1, 2, (CellShape?)null),
            2 => (2, 3, CellShape.Triangle),
            3 => (2, 4, CellShape.Quadrilateral),
            4 => (3, 4, CellShape.Tetrahedron),
            5 => (3, 8, CellShape.Hexahedron),
            6 => (3, 6, CellShape.Prism),
            7 => (3, 5, CellShape.Pyramid),
            15 => (0, 1, null),
            _ => (-1, 0, null),
        };
        return dimension >= 0;
    }

    /// <summary>The higher-order types of the same families, named in the message that rejects them.</summary>
    public static bool IsHigherOrder(long type) => type is (>= 8 and <= 14) or (>= 16 and <= 19) or 21 or 23 or 25 or 26 or 27 or 28 or 29 or 30 or 31;
}
