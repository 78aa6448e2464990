namespace FvGen.Meshes.Unstructured;

/// <summary>The shape of an unstructured cell; the values are the VTK cell type numbers.</summary>
public enum CellShape
{
    Triangle = 5,
    Polygon = 7,
    Quadrilateral = 9,
    Tetrahedron = 10,
    Hexahedron = 12,
    Prism = 13,
    Pyramid = 14,
    Polyhedron = 42,
}
