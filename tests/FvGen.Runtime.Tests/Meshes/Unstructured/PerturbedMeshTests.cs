using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace FvGen.Runtime.Tests.Meshes.Unstructured;

/// <summary>
/// Meshes of every shape with randomly moved interior nodes (warped faces, skewed cells). The
/// checks are the discrete divergence theorem (REFERENCES.md, "Geometry"): for every closed cell
/// the outward area vectors sum to zero, and the cells tile the domain exactly.
/// </summary>
public sealed class PerturbedMeshTests
{
    public static TheoryData<string> Kinds => ["quadrilaterals", "triangles", "hexahedra", "tetrahedra", "prisms", "pyramids"];

    [Theory]
    [MemberData(nameof(Kinds))]
    public void EveryCellIsClosedOnAPerturbedMesh(string kind)
    {
        var mesh = PerturbedMesh(kind, seed: 11);
        var sum = new Vec3[mesh.CellCount];
        for (int f = 0; f < mesh.FaceCount; f++)
        {
            sum[mesh.FaceLeft[f]] += mesh.FaceAreaVectors[f];
            if (mesh.FaceRight[f] >= 0)
            {
                sum[mesh.FaceRight[f]] -= mesh.FaceAreaVectors[f];
            }
        }

        for (int c = 0; c < mesh.CellCount; c++)
        {
            // Divergence theorem: closed surface integral of n dS = 0; to rounding on the cell's own surface scale.
            Assert.True(sum[c].Length <= 1e-14 * mesh.CellSurfaceAreas[c], $"cell {c}: sum of outward area vectors {sum[c]}");
            Assert.True(mesh.CellVolumes[c] > 0, $"cell {c}: volume {mesh.CellVolumes[c]}");
        }
    }

    [Theory]
    [MemberData(nameof(Kinds))]
    public void PerturbedCellsTileTheDomainExactly(string kind)
    {
        // The boundary nodes do not move, so the cells still fill the rectangle 2 x 1 or the box 2 x 1 x 1.5
        // (closed form); sum of (1/d) x_f . S_f over the boundary (divergence theorem) gives the same total.
        var mesh = PerturbedMesh(kind, seed: 5);
        double expected = mesh.Dimension == 2 ? 2.0 : 3.0;
        double total = 0.0;
        foreach (double v in mesh.CellVolumes)
        {
            total += v;
        }

        double fromBoundary = 0.0;
        for (int f = mesh.InteriorFaceCount; f < mesh.FaceCount; f++)
        {
            fromBoundary += Vec3.Dot(mesh.FaceCentroids[f], mesh.FaceAreaVectors[f]) / mesh.Dimension;
        }

        Assert.Equal(expected, total, 12);
        Assert.Equal(expected, fromBoundary, 12);
    }

    [Theory]
    [MemberData(nameof(Kinds))]
    public void CentroidMomentsSumToTheDomainMoment(string kind)
    {
        // Closed form: sum of V_c x_c over the cells = |domain| x_domain, the centroid of the rectangle
        // (1, 0.5) or of the box (1, 0.5, 0.75).
        var mesh = PerturbedMesh(kind, seed: 23);
        var moment = Vec3.Zero;
        for (int c = 0; c < mesh.CellCount; c++)
        {
            moment += mesh.CellVolumes[c] * mesh.CellCentroids[c];
        }

        var expected = mesh.Dimension == 2 ? 2.0 * new Vec3(1, 0.5, 0) : 3.0 * new Vec3(1, 0.5, 0.75);
        SingleCell.AssertClose(expected, moment, 1e-12);
    }

    [Theory]
    [MemberData(nameof(Kinds))]
    public void FaceColouringIsARaceFreePartitionOfTheInteriorFaces(string kind)
    {
        var mesh = PerturbedMesh(kind, seed: 3);
        var colouring = mesh.FaceColouring;
        var seen = new int[mesh.InteriorFaceCount];
        for (int k = 0; k < colouring.ColourCount; k++)
        {
            var cells = new HashSet<int>();
            foreach (int f in colouring.Faces[colouring.ColourOffsets[k]..colouring.ColourOffsets[k + 1]])
            {
                Assert.InRange(f, 0, mesh.InteriorFaceCount - 1);
                seen[f]++;
                Assert.True(cells.Add(mesh.FaceLeft[f]), $"colour {k}: cell {mesh.FaceLeft[f]} touched twice");
                Assert.True(cells.Add(mesh.FaceRight[f]), $"colour {k}: cell {mesh.FaceRight[f]} touched twice");
            }
        }

        Assert.All(seen, count => Assert.Equal(1, count));
    }

    [Fact]
    public void AWarpedSharedFaceIsOneFaceSeenFromBothSides()
    {
        // Move the only interior node of a 2 x 2 x 2 hexahedral box: the twelve interior faces meeting there
        // become warped. The fan rule keeps each one a single face for both cells, so volumes still add up
        // to the box (closed form: 2 x 1 x 1.5) and every cell stays closed.
        var builder = BoxMesh.CreateBuilder(2, 2, 2, 0, 2, 0, 1, 0, 1.5);
        int centre = 13;
        Assert.Equal(new Vec3(1, 0.5, 0.75), builder.GetNode(centre));
        builder.MoveNode(centre, new Vec3(1.2, 0.4, 0.9));
        var mesh = builder.Build();
        double total = 0;
        foreach (double v in mesh.CellVolumes)
        {
            total += v;
        }

        Assert.Equal(3.0, total, 13);
        Assert.Equal(12, mesh.InteriorFaceCount);
    }

    /// <summary>2 x 1 rectangle or 2 x 1 x 1.5 box with its interior nodes moved by up to 20% of the spacing.</summary>
    internal static UnstructuredMesh PerturbedMesh(string kind, int seed)
    {
        var builder = kind switch
        {
            "quadrilaterals" => RectangleMesh.CreateBuilder(8, 5, 0, 2, 0, 1, RectangleCellKind.Quadrilaterals),
            "triangles" => RectangleMesh.CreateBuilder(8, 5, 0, 2, 0, 1, RectangleCellKind.Triangles),
            "hexahedra" => BoxMesh.CreateBuilder(4, 3, 3, 0, 2, 0, 1, 0, 1.5, BoxCellKind.Hexahedra),
            "tetrahedra" => BoxMesh.CreateBuilder(4, 3, 3, 0, 2, 0, 1, 0, 1.5, BoxCellKind.Tetrahedra),
            "prisms" => BoxMesh.CreateBuilder(4, 3, 3, 0, 2, 0, 1, 0, 1.5, BoxCellKind.Prisms),
            "pyramids" => PyramidBricks.CreateBuilder(4, 3, 3, 2, 1, 1.5),
            _ => throw new ArgumentOutOfRangeException(nameof(kind), kind, null),
        };
        NodePerturbation.PerturbInteriorNodes(builder, 0.2, seed);
        return builder.Build();
    }
}
