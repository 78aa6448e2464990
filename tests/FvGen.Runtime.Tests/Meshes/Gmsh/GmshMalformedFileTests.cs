using FvGen.Meshes.Gmsh;
using FvGen.Meshes.Unstructured;

namespace FvGen.Runtime.Tests.Meshes.Gmsh;

/// <summary>
/// Malformed MSH files, each a small edit of one-triangle.msh: every one must fail with a message
/// naming the file, the line, and what was expected against what was found (MSH 4.1 layout from the
/// Gmsh reference manual, "MSH file format").
/// </summary>
public sealed class GmshMalformedFileTests
{
    public static TheoryData<string, string> Cases => new()
    {
        { "bad-number.msh", "bad-number.msh, line 20: expected the y coordinate of node 2 (a finite number), found '0.0.5'" },
        { "binary-flag.msh", "binary-flag.msh, line 2: expected file type 0 (ASCII), found 1 (binary); save the mesh as ASCII" },
        { "duplicate-node-tag.msh", "duplicate-node-tag.msh, line 18: expected each node tag once, found node tag 2 a second time" },
        { "element-count-mismatch.msh", "element-count-mismatch.msh, line 24: expected 5 elements as the $Elements header declares, found 4 in 2 blocks" },
        { "missing-node-reference.msh", "missing-node-reference.msh, line 30: expected 3 node tags for element 4 (type 2) on its line, found 2" },
        { "lines-only.msh", "lines-only.msh, line 17: expected 2-D elements (triangles, quadrangles) or 3-D elements (tetrahedra, hexahedra, prisms, pyramids), found lines and points only; when physical groups are defined Gmsh saves only their elements, so put the cells in a physical surface or volume" },
        { "misspelt-end-marker.msh", "misspelt-end-marker.msh, line 22: expected $EndNodes, found '$EndNode'" },
        { "no-mesh-format.msh", "no-mesh-format.msh, line 1: expected $MeshFormat as the first section, found '$Nodes'" },
        { "node-count-mismatch.msh", "node-count-mismatch.msh, line 14: expected 4 nodes as the $Nodes header declares, found 3 in 1 block" },
        { "off-plane-node.msh", "off-plane-node.msh, line 21: expected z = 0 for node 3 of a 2-D mesh (FvGen's 2-D meshes lie in the plane z = 0), found z = 0.25" },
        { "repeated-section.msh", "repeated-section.msh, line 23: expected one $Nodes section, found a second one" },
        { "second-order-element.msh", "second-order-element.msh, line 29: expected a first-order element type (1 (line), 2 (triangle), 3 (quadrangle), 4 (tetrahedron), 5 (hexahedron), 6 (prism), 7 (pyramid), 15 (point)), found type 9, a higher-order element; mesh with element order 1" },
        { "truncated.msh", "truncated.msh, line 21: expected the x coordinate of node 3, found the end of the file" },
        { "unclosed-section.msh", "unclosed-section.msh, line 33: expected $EndComments to close the $Comments section opened on line 8, found the end of the file" },
        { "undeclared-entity.msh", "undeclared-entity.msh, line 29: expected element block 2 to belong to an entity declared in $Entities, found entity dimension 2, tag 9, which is not declared" },
        { "undeclared-node.msh", "undeclared-node.msh, line 30: expected element 4 to reference declared nodes, found node tag 7, which $Nodes does not declare" },
        { "unknown-element-type.msh", "unknown-element-type.msh, line 29: expected a supported element type (1 (line), 2 (triangle), 3 (quadrangle), 4 (tetrahedron), 5 (hexahedron), 6 (prism), 7 (pyramid), 15 (point)), found type 99" },
        { "wrong-section-order.msh", "wrong-section-order.msh, line 13: expected $Nodes before $Elements (wrong section order), found $Elements" },
        { "wrong-version.msh", "wrong-version.msh, line 2: expected version 4.1 (MSH 4.1 ASCII), found '2.2'; save the mesh in format version 4.1" },
        { "zero-node-tag.msh", "zero-node-tag.msh, line 16: expected node tag 1 of node block 1 (a positive whole number), found '0'" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public void MalformedFileIsRejectedWithFileLineAndExpectation(string file, string message)
    {
        var ex = Assert.Throws<GmshFormatException>(() => GmshReader.Read(GmshTestFiles.Malformed(file)));
        Assert.Equal(message, ex.Message);
        Assert.Equal(file, ex.FileName);
        Assert.Equal(int.Parse(message.Split(", line ")[1].Split(':')[0], System.Globalization.CultureInfo.InvariantCulture), ex.LineNumber);
    }

    [Fact]
    public void BoundaryEdgesInNoPhysicalGroupAreNamedAsUnpatched()
    {
        var ex = Assert.Throws<MeshValidationException>(() => GmshReader.Read(GmshTestFiles.Malformed("unpatched-edge.msh")));
        Assert.Equal(3, ex.Problems.Count);
        Assert.Equal("The boundary face through node tags 1, 2 near (0.5, 0, 0) of cell 0 (element 4 on line 30) near (0.333333, 0.333333, 0) is in no patch (name it in a patch; if it should be interior, the mesh does not conform there).", ex.Problems[0]);
        Assert.StartsWith("unpatched-edge.msh: the mesh is not valid (3 problems):", ex.Message);
    }

    [Fact]
    public void ClockwiseTriangleIsNamedByItsElementAndLine()
    {
        var ex = Assert.Throws<MeshValidationException>(() => GmshReader.Read(GmshTestFiles.Malformed("clockwise-triangle.msh")));
        Assert.Equal(["cell 0 (element 4 on line 30) near (0.333333, 0.333333, 0) has non-positive area -0.5 (its nodes run clockwise; list them counter-clockwise)."], ex.Problems);
    }

    [Fact]
    public void EveryShippedMalformedFileHasATest()
    {
        var tested = Cases.Select(row => (string)row[0]).Concat(["unpatched-edge.msh", "clockwise-triangle.msh"]).Order();
        var shipped = Directory.GetFiles(Path.GetDirectoryName(GmshTestFiles.Malformed("x"))!).Select(Path.GetFileName).Order();
        Assert.Equal(shipped, tested);
    }
}
