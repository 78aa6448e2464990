using FvGen.Geometry;
using FvGen.Meshes.Gmsh;
using FvGen.Meshes.Unstructured;
using FvGen.Runtime.Tests.Meshes.Unstructured;

namespace FvGen.Runtime.Tests.Meshes.Gmsh;

/// <summary>
/// The reader on two hand-written MSH 4.1 files (format: Gmsh reference manual, "MSH file format"):
/// an invented plate with a hole (2-D, quadrangles and triangles) and an invented block of every
/// 3-D shape, both with sparse tags, both checked against closed-form geometry.
/// </summary>
public sealed class GmshReaderTests
{
    [Fact]
    public void PlateWithHoleHasTheAreaOfTheRectangleLessTheHole()
    {
        var mesh = GmshReader.Read(GmshTestFiles.Path("plate-with-hole.msh"));
        Assert.Equal(2, mesh.Dimension);
        Assert.Equal(5, mesh.CellCount);
        Assert.Equal([CellShape.Quadrilateral, CellShape.Quadrilateral, CellShape.Quadrilateral, CellShape.Triangle, CellShape.Triangle], mesh.CellShapes.ToArray());

        // Closed form: 3 x 2 plate less the 1 x 1 hole; by symmetry its centroid is the plate's centre (1.5, 1).
        double area = 0;
        var moment = Vec3.Zero;
        for (int c = 0; c < mesh.CellCount; c++)
        {
            area += mesh.CellVolumes[c];
            moment += mesh.CellVolumes[c] * mesh.CellCentroids[c];
        }

        Assert.Equal(5.0, area, 14);
        SingleCell.AssertClose(new Vec3(1.5, 1.0, 0), moment / area, 1e-14);

        // Physical groups become patches in order of first use; 4 trapezoid edges + 1 triangle split are interior.
        Assert.Equal(["rim", "clamp", "hole"], mesh.PatchNames);
        Assert.Equal(5, mesh.InteriorFaceCount);
        Assert.Equal(8.0, PatchLength(mesh, "rim"), 14);
        Assert.Equal(2.0, PatchLength(mesh, "clamp"), 14);
        Assert.Equal(4.0, PatchLength(mesh, "hole"), 14);

        // The hole is a closed curve: its area vectors sum to zero, and each points out of the plate, into the hole.
        var hole = mesh.Patch("hole");
        var sum = Vec3.Zero;
        for (int f = hole.FirstFace; f < hole.EndFace; f++)
        {
            sum += mesh.FaceAreaVectors[f];
            Assert.True(Vec3.Dot(mesh.FaceNormals[f], new Vec3(1.5, 1.0, 0) - mesh.FaceCentroids[f]) > 0, $"hole face {f} points into the plate");
        }

        Assert.True(sum.MaxAbs < 1e-15, $"sum {sum}");
    }

    [Fact]
    public void MixedBlockOfEveryShapeHasTheVolumeOfItsFourCubes()
    {
        var mesh = GmshReader.Read(GmshTestFiles.Path("mixed-block.msh"));
        Assert.Equal(3, mesh.Dimension);
        var shapes = mesh.CellShapes.ToArray();
        Assert.Equal(1, shapes.Count(s => s == CellShape.Hexahedron));
        Assert.Equal(6, shapes.Count(s => s == CellShape.Pyramid));
        Assert.Equal(2, shapes.Count(s => s == CellShape.Prism));
        Assert.Equal(6, shapes.Count(s => s == CellShape.Tetrahedron));

        // Closed form: four unit cubes centred at (0.5, 0.5, 0.5), (1.5, ...), (2.5, ...) and (2.5, 0.5, 1.5):
        // volume 4, centroid (1.75, 0.5, 0.75).
        double volume = 0;
        var moment = Vec3.Zero;
        for (int c = 0; c < mesh.CellCount; c++)
        {
            volume += mesh.CellVolumes[c];
            moment += mesh.CellVolumes[c] * mesh.CellCentroids[c];
        }

        Assert.Equal(4.0, volume, 13);
        SingleCell.AssertClose(new Vec3(1.75, 0.5, 0.75), moment / volume, 1e-13);

        // Outward boundary: inlet (x = 0, area 1), outlet (x = 3, area 2); the closed surface sums to zero, so
        // the walls (including the step at x = 2) sum to (-1, 0, 0).
        Assert.Equal(["inlet", "outlet", "walls"], mesh.PatchNames);
        SingleCell.AssertClose(new Vec3(-1, 0, 0), PatchAreaVector(mesh, "inlet"), 1e-14);
        SingleCell.AssertClose(new Vec3(2, 0, 0), PatchAreaVector(mesh, "outlet"), 1e-14);
        SingleCell.AssertClose(new Vec3(-1, 0, 0), PatchAreaVector(mesh, "walls"), 1e-14);
        Assert.Equal(3, mesh.Patch("outlet").FaceCount);
    }

    [Fact]
    public void WindowsLineEndingsReadTheSame()
    {
        string text = File.ReadAllText(GmshTestFiles.Path("one-triangle.msh")).Replace("\n", "\r\n", StringComparison.Ordinal);
        var mesh = GmshReader.Parse(text, "one-triangle-crlf.msh");
        Assert.Equal(0.5, mesh.CellVolumes[0], 15);
        Assert.Equal(["edge"], mesh.PatchNames);
    }

    [Fact]
    public void UnnamedPhysicalGroupIsNamedByItsTag()
    {
        string text = File.ReadAllText(GmshTestFiles.Path("one-triangle.msh"));
        int start = text.IndexOf("$PhysicalNames", StringComparison.Ordinal);
        int end = text.IndexOf("$Entities", StringComparison.Ordinal);
        var mesh = GmshReader.Parse(text.Remove(start, end - start), "unnamed.msh");
        Assert.Equal(["1"], mesh.PatchNames);
    }

    [Fact]
    public void EntityInTwoPhysicalGroupsPutsItsFacesInTwoPatchesWhichIsRefused()
    {
        string text = File.ReadAllText(GmshTestFiles.Path("one-triangle.msh")).Replace("1 0 0 0 1 1 0 1 1 0", "1 0 0 0 1 1 0 2 1 5 0", StringComparison.Ordinal);
        var ex = Assert.Throws<MeshValidationException>(() => GmshReader.Parse(text, "two-groups.msh"));
        Assert.Equal(3, ex.Problems.Count);
        Assert.Contains("boundary face 1 (element 1 on line 26) of patch '5' near (0.5, 0, 0) is in two patches, 'edge' and '5'", ex.Problems[0]);
    }

    private static double PatchLength(UnstructuredMesh mesh, string name)
    {
        var patch = mesh.Patch(name);
        double length = 0;
        for (int f = patch.FirstFace; f < patch.EndFace; f++)
        {
            length += mesh.FaceAreas[f];
        }

        return length;
    }

    private static Vec3 PatchAreaVector(UnstructuredMesh mesh, string name)
    {
        var patch = mesh.Patch(name);
        var sum = Vec3.Zero;
        for (int f = patch.FirstFace; f < patch.EndFace; f++)
        {
            sum += mesh.FaceAreaVectors[f];
        }

        return sum;
    }
}
