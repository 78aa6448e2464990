using FvGen.Meshes.Unstructured;

namespace FvGen.Runtime.Tests.Meshes.Unstructured;

public sealed class MeshValidationTests
{
    [Fact]
    public void ClockwiseTriangleIsRejectedAsNonPositiveArea()
    {
        var builder = Square("clockwise");
        builder.AddCell(CellShape.Triangle, 0, 2, 1);
        builder.AddCell(CellShape.Triangle, 0, 3, 2);
        AllEdgesInPatch(builder, "wall");
        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.StartsWith("clockwise: the mesh is not valid", ex.Message);
        Assert.Contains("cell 0 near (0.666667, 0.333333, 0) has non-positive area -0.5 (its nodes run clockwise", ex.Message);
        Assert.Contains("cell 1 near", ex.Message);
    }

    [Fact]
    public void MirroredTetrahedronIsRejectedAsInverted()
    {
        var builder = new UnstructuredMeshBuilder(3, "mirrored");
        builder.AddNode(0, 0, 0);
        builder.AddNode(1, 0, 0);
        builder.AddNode(0, 1, 0);
        builder.AddNode(0, 0, 1);
        builder.AddCell(CellShape.Tetrahedron, [0, 2, 1, 3], "element 7");
        foreach (var face in CellTopology.FacesOf(CellShape.Tetrahedron))
        {
            builder.AddBoundaryFace("wall", face);
        }

        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.Contains("cell 0 (element 7) near (0.25, 0.25, 0.25) has non-positive volume -0.166667 (it is inverted", ex.Message);
    }

    [Fact]
    public void CellWithARepeatedNodeWouldPutItselfOnBothSidesOfAFace()
    {
        var builder = Square("repeated node");
        builder.AddCell(CellShape.Triangle, 0, 1, 0);
        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.Contains("has the face through nodes 1, 0 twice, so that face would have the same cell on both sides", ex.Message);
        Assert.Contains("lists node 0 twice", ex.Message);
    }

    [Fact]
    public void FaceOfThreeCellsIsRejected()
    {
        var builder = Square("fin");
        builder.AddNode(0.5, -1);
        builder.AddCell(CellShape.Triangle, 0, 1, 2);
        builder.AddCell(CellShape.Triangle, 0, 2, 3);
        builder.AddCell(CellShape.Triangle, 0, 2, 4);
        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.Contains("The face through nodes 0, 2 near (0.5, 0.5, 0) is shared by more than two cells: cell 0, cell 1 and cell 2", ex.Message);
    }

    [Fact]
    public void BoundaryFaceWithoutAPatchIsListedWithItsCellAndPosition()
    {
        var builder = Square("unpatched");
        builder.AddCell(CellShape.Quadrilateral, 0, 1, 2, 3);
        builder.AddBoundaryFace("inlet", 3, 0);
        builder.AddBoundaryFace("outlet", 1, 2);
        builder.AddBoundaryFace("wall", 0, 1);
        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.Single(ex.Problems);
        Assert.Contains("The boundary face through nodes 2, 3 near (0.5, 1, 0) of cell 0 near (0.5, 0.5, 0) is in no patch", ex.Message);
    }

    [Fact]
    public void BoundaryFaceInTwoPatchesIsRejected()
    {
        var builder = Square("two patches");
        builder.AddCell(CellShape.Quadrilateral, 0, 1, 2, 3);
        AllEdgesInPatch(builder, "wall");
        builder.AddBoundaryFace("lid", 3, 2);
        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.Contains("boundary face 4 of patch 'lid' near (0.5, 1, 0) is in two patches, 'wall' and 'lid' (boundary faces 2 and 4)", ex.Message);
    }

    [Fact]
    public void BoundaryFaceNamedTwiceInOnePatchIsRejected()
    {
        var builder = Square("named twice");
        builder.AddCell(CellShape.Quadrilateral, 0, 1, 2, 3);
        AllEdgesInPatch(builder, "wall");
        builder.AddBoundaryFace("wall", 1, 0);
        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.Contains("is named twice in patch 'wall' (boundary faces 0 and 4)", ex.Message);
    }

    [Fact]
    public void PatchFaceThatIsNoFaceOfTheMeshIsRejected()
    {
        var builder = Square("diagonal");
        builder.AddCell(CellShape.Quadrilateral, 0, 1, 2, 3);
        AllEdgesInPatch(builder, "wall");
        builder.AddBoundaryFace("wall", 0, 2);
        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.Contains("boundary face 4 of patch 'wall' near (0.5, 0.5, 0) is not a face of any cell", ex.Message);
    }

    [Fact]
    public void InteriorFaceInAPatchIsRejected()
    {
        var builder = Square("baffle");
        builder.AddCell(CellShape.Triangle, 0, 1, 2);
        builder.AddCell(CellShape.Triangle, 0, 2, 3);
        AllEdgesInPatch(builder, "wall");
        builder.AddBoundaryFace("baffle", 2, 0);
        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.Contains("is an interior face, between cell 0", ex.Message);
    }

    [Fact]
    public void CoincidentNodesGiveAZeroAreaFace()
    {
        var builder = new UnstructuredMeshBuilder(2, "collapsed edge");
        builder.AddNode(0, 0);
        builder.AddNode(1, 0);
        builder.AddNode(1, 0);
        builder.AddNode(0, 1);
        builder.AddCell(CellShape.Quadrilateral, 0, 1, 2, 3);
        AllEdgesInPatch(builder, "wall");
        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.Contains("The face through nodes 1, 2 near (1, 0, 0) of cell 0", ex.Message);
        Assert.Contains("has zero area", ex.Message);
    }

    [Fact]
    public void LongProblemListsAreCutAfterTwentyWithTheRestCounted()
    {
        // A 6 x 6 lattice with no patches has 24 unpatched boundary edges.
        var named = RectangleMesh.CreateBuilder(6, 6, 0, 1, 0, 1);
        var builder = new UnstructuredMeshBuilder(2, "no patches");
        for (int n = 0; n < named.NodeCount; n++)
        {
            builder.AddNode(named.GetNode(n));
        }

        for (int c = 0; c < named.CellCount; c++)
        {
            builder.AddCell(CellShape.Quadrilateral, named.NodesOf(c));
        }

        var ex = Assert.Throws<MeshValidationException>(builder.Build);
        Assert.Equal(24, ex.Problems.Count);
        Assert.All(ex.Problems, p => Assert.Contains("is in no patch", p));
        Assert.EndsWith("\n  ... and 4 more.", ex.Message);
        Assert.Equal(1 + 20 + 1, ex.Message.Split('\n').Length);
    }

    [Fact]
    public void CellMissingAFaceIsReportedAsOpen()
    {
        // The builder's shapes always close; this feeds the validator a tetrahedron with one face left out,
        // whose three remaining outward area vectors sum to minus the missing one (divergence theorem).
        var builder = new UnstructuredMeshBuilder(3, "open tetrahedron");
        builder.AddNode(0, 0, 0);
        builder.AddNode(1, 0, 0);
        builder.AddNode(0, 1, 0);
        builder.AddNode(0, 0, 1);
        builder.AddCell(CellShape.Tetrahedron, 0, 1, 2, 3);
        var faces = new AssembledFaces
        {
            InteriorFaceCount = 0,
            Left = [0, 0, 0],
            Right = [-1, -1, -1],
            NodeOffsets = [0, 3, 6, 9],
            Nodes = [0, 2, 1, 0, 1, 3, 0, 3, 2],
            Patches = [new BoundaryPatch("wall", 0, 0, 3)],
            Problems = [],
        };
        var problems = MeshValidator.Check(builder, faces, MeshGeometry.Compute(builder, faces));
        var problem = Assert.Single(problems);
        Assert.StartsWith("cell 0 near (0.25, 0.25, 0.25) is not closed: its outward area vectors sum to (-0.5, -0.5, -0.5)", problem);
    }

    [Fact]
    public void BadInputIsRejectedWhereItIsGiven()
    {
        var builder = new UnstructuredMeshBuilder(2, "inputs");
        Assert.Contains("plane z = 0", Assert.Throws<ArgumentException>(() => builder.AddNode(0, 0, 1)).Message);
        builder.AddNode(0, 0);
        builder.AddNode(1, 0);
        Assert.Contains("A Quadrilateral has 4 nodes; 3 were given", Assert.Throws<ArgumentException>(() => builder.AddCell(CellShape.Quadrilateral, 0, 1, 0)).Message);
        Assert.Contains("node index 5 is not a node of the mesh (it has 2 nodes)", Assert.Throws<ArgumentException>(() => builder.AddCell(CellShape.Triangle, 0, 1, 5)).Message);
        Assert.Contains("is a 3-D cell", Assert.Throws<ArgumentException>(() => builder.AddCell(CellShape.Tetrahedron, 0, 1, 0, 1)).Message);
        Assert.Contains("the mesh has no cells", Assert.Throws<MeshValidationException>(builder.Build).Message);
    }

    private static UnstructuredMeshBuilder Square(string source)
    {
        var builder = new UnstructuredMeshBuilder(2, source);
        builder.AddNode(0, 0);
        builder.AddNode(1, 0);
        builder.AddNode(1, 1);
        builder.AddNode(0, 1);
        return builder;
    }

    private static void AllEdgesInPatch(UnstructuredMeshBuilder builder, string patch)
    {
        builder.AddBoundaryFace(patch, 0, 1);
        builder.AddBoundaryFace(patch, 1, 2);
        builder.AddBoundaryFace(patch, 2, 3);
        builder.AddBoundaryFace(patch, 3, 0);
    }
}
