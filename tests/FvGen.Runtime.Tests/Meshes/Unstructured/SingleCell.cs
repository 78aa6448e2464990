using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace FvGen.Runtime.Tests.Meshes.Unstructured;

/// <summary>One-cell meshes for geometry checks: the cell's own faces make one patch, "wall".</summary>
internal static class SingleCell
{
    public static UnstructuredMesh Polygon(params Vec3[] corners)
    {
        var builder = new UnstructuredMeshBuilder(2, "test polygon");
        var nodes = new int[corners.Length];
        for (int i = 0; i < corners.Length; i++)
        {
            nodes[i] = builder.AddNode(corners[i]);
        }

        var shape = corners.Length switch { 3 => CellShape.Triangle, 4 => CellShape.Quadrilateral, _ => CellShape.Polygon };
        builder.AddCell(shape, nodes);
        for (int i = 0; i < corners.Length; i++)
        {
            builder.AddBoundaryFace("wall", nodes[i], nodes[(i + 1) % corners.Length]);
        }

        return builder.Build();
    }

    public static UnstructuredMesh Polyhedron(CellShape shape, params Vec3[] corners)
    {
        var builder = new UnstructuredMeshBuilder(3, "test polyhedron");
        var nodes = new int[corners.Length];
        for (int i = 0; i < corners.Length; i++)
        {
            nodes[i] = builder.AddNode(corners[i]);
        }

        builder.AddCell(shape, nodes);
        foreach (var face in CellTopology.FacesOf(shape))
        {
            builder.AddBoundaryFace("wall", Array.ConvertAll(face, k => nodes[k]));
        }

        return builder.Build();
    }

    public static void AssertClose(Vec3 expected, Vec3 actual, double tolerance)
    {
        Assert.True((expected - actual).MaxAbs <= tolerance, $"expected {expected}, found {actual}");
    }
}
