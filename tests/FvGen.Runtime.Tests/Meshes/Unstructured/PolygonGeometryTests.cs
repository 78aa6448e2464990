using FvGen.Geometry;

namespace FvGen.Runtime.Tests.Meshes.Unstructured;

public sealed class PolygonGeometryTests
{
    [Fact]
    public void RightTriangleHasHalfBaseTimesHeightAndTheVertexMeanAsCentroid()
    {
        // Closed form: area = base * height / 2 = 4 * 3 / 2; centroid = mean of the vertices (any geometry handbook).
        var mesh = SingleCell.Polygon(new(0, 0, 0), new(4, 0, 0), new(0, 3, 0));
        Assert.Equal(6.0, mesh.CellVolumes[0], 14);
        SingleCell.AssertClose(new Vec3(4.0 / 3.0, 1.0, 0), mesh.CellCentroids[0], 1e-14);
    }

    [Fact]
    public void TriangleEdgesAreOutwardAreaVectorsOfTheEdgeLengths()
    {
        // 2-D faces are edges; area = edge length x unit depth; normals point out of the cell (our contract),
        // and the outward area vectors of a closed polygon sum to zero (divergence theorem, REFERENCES.md "Geometry").
        var mesh = SingleCell.Polygon(new(0, 0, 0), new(4, 0, 0), new(0, 3, 0));
        var sum = Vec3.Zero;
        var lengths = new List<double>();
        for (int f = 0; f < mesh.FaceCount; f++)
        {
            sum += mesh.FaceAreaVectors[f];
            lengths.Add(mesh.FaceAreas[f]);
            Assert.True(Vec3.Dot(mesh.FaceAreaVectors[f], mesh.FaceCentroids[f] - mesh.CellCentroids[0]) > 0, $"face {f} points inward");
        }

        lengths.Sort();
        Assert.Equal([3.0, 4.0, 5.0], lengths);
        Assert.True(sum.MaxAbs < 1e-15, $"sum {sum}");
        var south = mesh.FaceNormals[FaceWithCentroid(mesh, new Vec3(2, 0, 0))];
        SingleCell.AssertClose(new Vec3(0, -1, 0), south, 1e-15);
    }

    [Fact]
    public void LShapeMatchesTheCompositeAreaMethod()
    {
        // Composite areas (standard statics method): [0,2]x[0,1] (area 2, centroid (1, 0.5)) plus [0,1]x[1,2]
        // (area 1, centroid (0.5, 1.5)) gives area 3 and centroid (5/6, 5/6).
        var mesh = SingleCell.Polygon(new(0, 0, 0), new(2, 0, 0), new(2, 1, 0), new(1, 1, 0), new(1, 2, 0), new(0, 2, 0));
        Assert.Equal(3.0, mesh.CellVolumes[0], 14);
        SingleCell.AssertClose(new Vec3(5.0 / 6.0, 5.0 / 6.0, 0), mesh.CellCentroids[0], 1e-14);
    }

    [Fact]
    public void RegularHexagonFarFromTheOriginHasTheHandbookArea()
    {
        // Regular hexagon of side s: area = (3 sqrt 3 / 2) s^2, centroid at its centre (any geometry handbook).
        // Placed far from the origin to show that no digits are lost there.
        const double s = 0.7;
        var centre = new Vec3(1.0e4, -3.0e3, 0);
        var corners = new Vec3[6];
        for (int k = 0; k < 6; k++)
        {
            double angle = Math.PI / 3.0 * k;
            corners[k] = centre + new Vec3(s * Math.Cos(angle), s * Math.Sin(angle), 0);
        }

        var mesh = SingleCell.Polygon(corners);
        Assert.Equal(1.5 * Math.Sqrt(3.0) * s * s, mesh.CellVolumes[0], 10);
        SingleCell.AssertClose(centre, mesh.CellCentroids[0], 1e-10);
        Assert.Equal(6 * s, mesh.CellSurfaceAreas[0], 10);
    }

    private static int FaceWithCentroid(FvGen.Meshes.Unstructured.UnstructuredMesh mesh, Vec3 centroid)
    {
        for (int f = 0; f < mesh.FaceCount; f++)
        {
            if ((mesh.FaceCentroids[f] - centroid).MaxAbs < 1e-12)
            {
                return f;
            }
        }

        throw new InvalidOperationException($"no face at {centroid}");
    }
}
