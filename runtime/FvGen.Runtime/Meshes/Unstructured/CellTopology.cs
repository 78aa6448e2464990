namespace FvGen.Meshes.Unstructured;

/// <summary>
/// The local faces of each cell shape, in the Gmsh node order of the shape, each face listed
/// so that the right-hand rule about its nodes points out of the cell.
/// </summary>
/// <remarks>
/// Gmsh node order (the order <c>UnstructuredMeshBuilder.AddCell</c> takes): triangle and
/// quadrilateral counter-clockwise seen from +z; tetrahedron 0,1,2 with node 3 on the side the
/// right-hand normal of 0,1,2 points to; hexahedron 0-3 the bottom face counter-clockwise seen
/// from the top, 4-7 above 0-3; prism 0,1,2 the bottom triangle counter-clockwise seen from the
/// top, 3,4,5 above 0,1,2; pyramid 0-3 the base counter-clockwise seen from the apex, 4 the apex.
/// VTK uses the same order for all of these except the prism (VTK "wedge"), whose first triangle
/// has its right-hand normal pointing away from the second: VTK order = Gmsh 0,2,1,3,5,4.
/// </remarks>
internal static class CellTopology
{
    private static readonly int[][] TetrahedronFaces = [[0, 2, 1], [0, 1, 3], [1, 2, 3], [0, 3, 2]];

    private static readonly int[][] HexahedronFaces =
        [[0, 3, 2, 1], [4, 5, 6, 7], [0, 1, 5, 4], [1, 2, 6, 5], [2, 3, 7, 6], [3, 0, 4, 7]];

    private static readonly int[][] PrismFaces = [[0, 2, 1], [3, 4, 5], [0, 1, 4, 3], [1, 2, 5, 4], [2, 0, 3, 5]];

    private static readonly int[][] PyramidFaces = [[0, 3, 2, 1], [0, 1, 4], [1, 2, 4], [2, 3, 4], [3, 0, 4]];

    private static readonly int[] PrismGmshToVtk = [0, 2, 1, 3, 5, 4];

    /// <summary>The dimension of a shape: 2 for polygons, 3 for polyhedra.</summary>
    public static int DimensionOf(CellShape shape) => shape switch
    {
        CellShape.Triangle or CellShape.Quadrilateral or CellShape.Polygon => 2,
        _ => 3,
    };

    /// <summary>The node count a shape needs, or −1 when any count of at least 3 will do (polygons).</summary>
    public static int NodeCountOf(CellShape shape) => shape switch
    {
        CellShape.Triangle => 3,
        CellShape.Quadrilateral => 4,
        CellShape.Polygon => -1,
        CellShape.Tetrahedron => 4,
        CellShape.Hexahedron => 8,
        CellShape.Prism => 6,
        CellShape.Pyramid => 5,
        _ => throw new ArgumentOutOfRangeException(nameof(shape), shape, "The builder takes triangles, quadrilaterals, polygons, tetrahedra, hexahedra, prisms and pyramids."),
    };

    /// <summary>
    /// The outward local faces of a polyhedron, as positions in its Gmsh node list. Polygons have
    /// no table: their faces are the edges (i, i + 1), outward for counter-clockwise nodes.
    /// </summary>
    public static int[][] FacesOf(CellShape shape) => shape switch
    {
        CellShape.Tetrahedron => TetrahedronFaces,
        CellShape.Hexahedron => HexahedronFaces,
        CellShape.Prism => PrismFaces,
        CellShape.Pyramid => PyramidFaces,
        _ => throw new ArgumentOutOfRangeException(nameof(shape), shape, "Only polyhedra have a face table."),
    };

    /// <summary>The node at VTK position <paramref name="vtkPosition"/> of a cell given in Gmsh order.</summary>
    public static int GmshPositionOfVtk(CellShape shape, int vtkPosition) =>
        shape == CellShape.Prism ? PrismGmshToVtk[vtkPosition] : vtkPosition;
}
