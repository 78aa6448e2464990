using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace FvGen.Runtime.Tests.Meshes.Unstructured;

public sealed class PolyhedronGeometryTests
{
    [Fact]
    public void UnitCubeHasUnitVolumeAndOutwardUnitFaces()
    {
        // Closed form: unit cube, volume 1, centroid (1/2, 1/2, 1/2), six faces of area 1 pointing outward.
        var mesh = SingleCell.Polyhedron(CellShape.Hexahedron,
            new(0, 0, 0), new(1, 0, 0), new(1, 1, 0), new(0, 1, 0), new(0, 0, 1), new(1, 0, 1), new(1, 1, 1), new(0, 1, 1));
        Assert.Equal(1.0, mesh.CellVolumes[0], 14);
        SingleCell.AssertClose(new Vec3(0.5, 0.5, 0.5), mesh.CellCentroids[0], 1e-14);
        for (int f = 0; f < mesh.FaceCount; f++)
        {
            Assert.Equal(1.0, mesh.FaceAreas[f], 14);
            Vec3 outward = 2.0 * (mesh.FaceCentroids[f] - mesh.CellCentroids[0]);
            SingleCell.AssertClose(outward, mesh.FaceNormals[f], 1e-14);
        }
    }

    [Fact]
    public void TetrahedronVolumeIsASixthOfTheDeterminant()
    {
        // Closed form: V = |det(b - a, c - a, d - a)| / 6; centroid = mean of the four vertices.
        Vec3 a = new(0.3, -0.2, 1.0), b = new(2.1, 0.4, 0.9), c = new(0.5, 1.7, 1.2), d = new(0.8, 0.6, 2.9);
        double det = Vec3.Dot(b - a, Vec3.Cross(c - a, d - a));
        Assert.True(det > 0, "the test tetrahedron must be right-handed in Gmsh order");
        var mesh = SingleCell.Polyhedron(CellShape.Tetrahedron, a, b, c, d);
        Assert.Equal(Math.Abs(det) / 6.0, mesh.CellVolumes[0], 13);
        SingleCell.AssertClose((a + b + c + d) / 4.0, mesh.CellCentroids[0], 1e-14);
    }

    [Fact]
    public void PrismVolumeIsBaseAreaTimesHeight()
    {
        // Closed form: right prism, V = base area * height = (2 * 1 / 2) * 3; centroid = base-triangle
        // centroid (2/3, 1/3) at mid-height 1.5.
        var mesh = SingleCell.Polyhedron(CellShape.Prism,
            new(0, 0, 0), new(2, 0, 0), new(0, 1, 0), new(0, 0, 3), new(2, 0, 3), new(0, 1, 3));
        Assert.Equal(3.0, mesh.CellVolumes[0], 14);
        SingleCell.AssertClose(new Vec3(2.0 / 3.0, 1.0 / 3.0, 1.5), mesh.CellCentroids[0], 1e-14);
    }

    [Fact]
    public void ObliquePyramidVolumeIsAThirdOfBaseTimesHeight()
    {
        // Closed form: V = base * height / 3 = 4 * 3 / 3 for any apex at height 3 (Cavalieri's principle);
        // the centroid lies a quarter of the way from the base centroid to the apex: 3/4 (1, 1, 0) + 1/4 (0.5, 1.5, 3).
        var mesh = SingleCell.Polyhedron(CellShape.Pyramid,
            new(0, 0, 0), new(2, 0, 0), new(2, 2, 0), new(0, 2, 0), new(0.5, 1.5, 3));
        Assert.Equal(4.0, mesh.CellVolumes[0], 14);
        SingleCell.AssertClose(new Vec3(0.875, 1.125, 0.75), mesh.CellCentroids[0], 1e-14);
    }

    [Fact]
    public void ParallelepipedVolumeIsTheTripleProductOfItsEdges()
    {
        // Closed form: a parallelepiped spanned by u, v, w has volume u . (v x w) and its centroid at the
        // middle of its main diagonal; all its faces are planar parallelograms.
        Vec3 o = new(1, 2, 3), u = new(2, 0.3, 0), v = new(0.4, 1.5, 0.2), w = new(0.3, -0.2, 1.1);
        var mesh = SingleCell.Polyhedron(CellShape.Hexahedron, o, o + u, o + u + v, o + v, o + w, o + u + w, o + u + v + w, o + v + w);
        Assert.Equal(Vec3.Dot(u, Vec3.Cross(v, w)), mesh.CellVolumes[0], 13);
        SingleCell.AssertClose(o + 0.5 * (u + v + w), mesh.CellCentroids[0], 1e-14);
    }

    [Fact]
    public void PrismIsStoredInVtkWedgeOrder()
    {
        // VTK documentation (vtkWedge): points (0,1,2) form a triangle whose right-hand normal points away
        // from the triangle (3,4,5); Gmsh's prism has it pointing towards it, so the mesh stores Gmsh 0,2,1,3,5,4.
        var mesh = SingleCell.Polyhedron(CellShape.Prism,
            new(0, 0, 0), new(2, 0, 0), new(0, 1, 0), new(0, 0, 3), new(2, 0, 3), new(0, 1, 3));
        var p = mesh.Points;
        var n = mesh.CellNodes;
        Vec3 baseNormal = Vec3.Cross(p[n[1]] - p[n[0]], p[n[2]] - p[n[0]]);
        Vec3 towardTop = p[n[3]] - p[n[0]];
        Assert.True(Vec3.Dot(baseNormal, towardTop) < 0);
        Assert.Equal([0, 2, 1, 3, 5, 4], n.ToArray());
    }
}
