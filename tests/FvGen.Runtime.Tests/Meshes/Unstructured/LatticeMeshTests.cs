using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace FvGen.Runtime.Tests.Meshes.Unstructured;

public sealed class LatticeMeshTests
{
    [Theory]
    [InlineData(RectangleCellKind.Quadrilaterals, 12, 5 * 3 + 4 * 4 - 14)]
    [InlineData(RectangleCellKind.Triangles, 24, 5 * 3 + 4 * 4 - 14 + 12)]
    public void RectangleHasTheLatticeCountsAndOutwardSides(RectangleCellKind kind, int cells, int interiorFaces)
    {
        // A 4 x 3 lattice has 5*3 + 4*4 = 31 edges, 14 on the boundary; triangles add one diagonal per square.
        var mesh = RectangleMesh.Create(4, 3, -1, 3, 0, 1.5, kind);
        Assert.Equal(cells, mesh.CellCount);
        Assert.Equal(interiorFaces, mesh.InteriorFaceCount);
        Assert.Equal(["west", "east", "south", "north"], mesh.PatchNames);

        // Closed form: each side's area vectors sum to its length times its outward normal.
        AssertSide(mesh, "west", new Vec3(-1.5, 0, 0), 3);
        AssertSide(mesh, "east", new Vec3(1.5, 0, 0), 3);
        AssertSide(mesh, "south", new Vec3(0, -4, 0), 4);
        AssertSide(mesh, "north", new Vec3(0, 4, 0), 4);
        AssertContract(mesh);
    }

    [Theory]
    [InlineData(BoxCellKind.Hexahedra, 24)]
    [InlineData(BoxCellKind.Tetrahedra, 144)]
    [InlineData(BoxCellKind.Prisms, 48)]
    public void BoxHasTheLatticeCountsAndOutwardSides(BoxCellKind kind, int cells)
    {
        var names = new SidePatchNames(West: "inlet", East: "outlet", South: "wall", North: "wall", Bottom: "floor", Top: "lid");
        var mesh = BoxMesh.Create(4, 3, 2, 0, 2, 0, 1.5, -0.5, 0.5, kind, names);
        Assert.Equal(cells, mesh.CellCount);
        Assert.Equal(["inlet", "outlet", "wall", "floor", "lid"], mesh.PatchNames);

        // Closed form: the box 2 x 1.5 x 1; each side's area vectors sum to its area times its outward normal,
        // and the two "wall" sides cancel.
        AssertSide(mesh, "inlet", new Vec3(-1.5, 0, 0), -1);
        AssertSide(mesh, "outlet", new Vec3(1.5, 0, 0), -1);
        AssertSide(mesh, "wall", Vec3.Zero, -1);
        AssertSide(mesh, "floor", new Vec3(0, 0, -3), -1);
        AssertSide(mesh, "lid", new Vec3(0, 0, 3), -1);
        double total = 0;
        foreach (double v in mesh.CellVolumes)
        {
            total += v;
        }

        Assert.Equal(3.0, total, 13);
        AssertContract(mesh);
    }

    [Theory]
    [InlineData(1e-6)]
    [InlineData(1e6)]
    public void ValidationTolerancesScaleWithTheCells(double scale)
    {
        // A micro-channel and a reservoir: the same perturbed tetrahedral box at 1e-6 and 1e6 times the size
        // passes validation, and its volume is the box volume (closed form) to the same relative accuracy.
        var builder = BoxMesh.CreateBuilder(3, 2, 2, 0, 2 * scale, 0, scale, 0, scale, BoxCellKind.Tetrahedra);
        NodePerturbation.PerturbInteriorNodes(builder, 0.2, seed: 8);
        var mesh = builder.Build();
        double total = 0;
        foreach (double v in mesh.CellVolumes)
        {
            total += v;
        }

        Assert.Equal(1.0, total / (2 * scale * scale * scale), 12);
    }

    [Fact]
    public void TetrahedralBoxIsConforming()
    {
        // Conforming split: every interior triangle has two tetrahedra. Euler count for the Kuhn split of an
        // n^3 lattice of bricks: 6 n^3 tetrahedra, each with 4 faces; boundary triangles 2 * 6 n^2.
        const int n = 3;
        var mesh = BoxMesh.Create(n, n, n, 0, 1, 0, 1, 0, 1, BoxCellKind.Tetrahedra);
        int boundary = 12 * n * n;
        Assert.Equal(boundary, mesh.FaceCount - mesh.InteriorFaceCount);
        Assert.Equal((4 * 6 * n * n * n - boundary) / 2, mesh.InteriorFaceCount);
    }

    [Fact]
    public void InteriorNormalsPointFromLeftToRightOnUnperturbedMeshes()
    {
        // Our contract: the area vector points from the left cell to the right cell.
        foreach (var mesh in new[]
        {
            RectangleMesh.Create(3, 3, 0, 1, 0, 1, RectangleCellKind.Triangles),
            BoxMesh.Create(2, 2, 2, 0, 1, 0, 1, 0, 1, BoxCellKind.Tetrahedra),
            BoxMesh.Create(2, 2, 2, 0, 1, 0, 1, 0, 1, BoxCellKind.Prisms),
        })
        {
            for (int f = 0; f < mesh.InteriorFaceCount; f++)
            {
                Vec3 reach = mesh.CellCentroids[mesh.FaceRight[f]] - mesh.CellCentroids[mesh.FaceLeft[f]];
                Assert.True(Vec3.Dot(reach, mesh.FaceAreaVectors[f]) > 0, $"face {f} points right to left");
            }
        }
    }

    [Fact]
    public void PerturbationIsSeededAndLeavesTheBoundaryInPlace()
    {
        var first = RectangleMesh.CreateBuilder(4, 4, 0, 1, 0, 1);
        var second = RectangleMesh.CreateBuilder(4, 4, 0, 1, 0, 1);
        NodePerturbation.PerturbInteriorNodes(first, 0.2, seed: 42);
        NodePerturbation.PerturbInteriorNodes(second, 0.2, seed: 42);
        int moved = 0;
        for (int n = 0; n < first.NodeCount; n++)
        {
            Assert.Equal(first.GetNode(n), second.GetNode(n));
            var original = new Vec3(n % 5 / 4.0, n / 5 / 4.0, 0);
            bool boundary = n % 5 is 0 or 4 || n / 5 is 0 or 4;
            if (boundary)
            {
                Assert.Equal(original, first.GetNode(n));
            }
            else
            {
                Assert.True((first.GetNode(n) - original).MaxAbs <= 0.2 * 0.25 + 1e-15);
                moved += first.GetNode(n) == original ? 0 : 1;
            }
        }

        Assert.Equal(9, moved);
    }

    private static void AssertSide(UnstructuredMesh mesh, string name, Vec3 expected, int faces)
    {
        var patch = mesh.Patch(name);
        if (faces >= 0)
        {
            Assert.Equal(faces, patch.FaceCount);
        }

        var sum = Vec3.Zero;
        for (int f = patch.FirstFace; f < patch.EndFace; f++)
        {
            sum += mesh.FaceAreaVectors[f];
        }

        SingleCell.AssertClose(expected, sum, 1e-13);
    }

    /// <summary>The numbering contract: interior faces first, then patches contiguous and in index order.</summary>
    private static void AssertContract(UnstructuredMesh mesh)
    {
        for (int f = 0; f < mesh.FaceCount; f++)
        {
            Assert.Equal(f >= mesh.InteriorFaceCount, mesh.FaceRight[f] < 0);
        }

        int next = mesh.InteriorFaceCount;
        for (int p = 0; p < mesh.Patches.Count; p++)
        {
            Assert.Equal(p, mesh.Patches[p].Index);
            Assert.Equal(next, mesh.Patches[p].FirstFace);
            next = mesh.Patches[p].EndFace;
        }

        Assert.Equal(mesh.FaceCount, next);
    }
}
