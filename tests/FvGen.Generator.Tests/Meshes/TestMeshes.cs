using FvGen.Meshes.Unstructured;

namespace FvGen.Generator.Tests.Meshes;

/// <summary>
/// Small unstructured meshes for the compile-and-run tests: the runtime's rectangle and box
/// builders (triangles, quadrilaterals, tetrahedra, hexahedra, prisms), interior nodes moved at
/// random so that cells are neither aligned nor regular.
/// </summary>
internal static class TestMeshes
{
    public enum Kind2D
    {
        Triangles,
        Quadrilaterals,
    }

    public enum Kind3D
    {
        Tetrahedra,
        Hexahedra,
        Prisms,
    }

    /// <summary>An <paramref name="n"/> x <paramref name="n"/> mesh of the unit square, interior nodes moved by up to <paramref name="jitter"/> of the local spacing.</summary>
    public static UnstructuredMesh Square(Kind2D kind, int n, int seed, double jitter = 0.2)
    {
        var builder = RectangleMesh.CreateBuilder(
            n, n, 0, 1, 0, 1, kind == Kind2D.Triangles ? RectangleCellKind.Triangles : RectangleCellKind.Quadrilaterals);
        if (jitter > 0)
        {
            NodePerturbation.PerturbInteriorNodes(builder, jitter, seed);
        }

        return builder.Build();
    }

    /// <summary>An <paramref name="n"/>³ mesh of the unit cube, interior nodes moved by up to a fifth of the local spacing.</summary>
    public static UnstructuredMesh Cube(Kind3D kind, int n, int seed)
    {
        var cells = kind switch
        {
            Kind3D.Tetrahedra => BoxCellKind.Tetrahedra,
            Kind3D.Prisms => BoxCellKind.Prisms,
            _ => BoxCellKind.Hexahedra,
        };
        var builder = BoxMesh.CreateBuilder(n, n, n, 0, 1, 0, 1, 0, 1, cells);
        NodePerturbation.PerturbInteriorNodes(builder, 0.2, seed);
        return builder.Build();
    }
}
