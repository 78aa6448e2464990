using FvGen.Meshes.Structured;

namespace FvGen.Runtime.Tests.Meshes;

public sealed class StructuredGridTests
{
    [Fact]
    public void StretchedAxisVolumesSumToTheBoxVolume()
    {
        // Exact: the cells of a Cartesian product tile the box [0,2] x [1,4] x [0,0.5].
        var x = GridAxis.Geometric(7, 0.0, 2.0, 1.3);
        var y = GridAxis.FromNodes([1.0, 1.5, 2.75, 4.0]);
        var z = GridAxis.Uniform(2, 0.0, 0.5);
        var wall = SideBoundary.Patch("wall");
        var grid = new StructuredGrid3D(x, y, z, SideBoundary.Periodic, SideBoundary.Periodic, wall, wall, SideBoundary.Patch("floor"), SideBoundary.Patch("lid"));

        double total = 0;
        foreach (double v in grid.CellVolumes)
        {
            total += v;
        }

        Assert.Equal(2.0 * 3.0 * 0.5, total, 14);
        Assert.Equal(7 * 3 * 2, grid.CellCount);
        Assert.Equal(["wall", "floor", "lid"], grid.PatchNames);
        Assert.Equal(-1, grid.PatchIndex(GridSide.XLow));
        Assert.Equal(0, grid.PatchIndex(GridSide.YHigh));
        Assert.Equal("(6, 2, 1)", grid.DescribeCell(grid.CellIndex(6, 2, 1)));
    }

    [Fact]
    public void GeometricAxisGrowsByTheRatio()
    {
        var x = GridAxis.Geometric(5, 0.0, 1.0, 2.0);
        for (int i = 1; i < 5; i++)
        {
            Assert.Equal(2.0, x.Widths[i] / x.Widths[i - 1], 12);
        }

        Assert.Equal(1.0, x.Nodes[^1]);
    }

    [Fact]
    public void PeriodicOnOneSideOnlyIsRejectedWithTheSidesNamed()
    {
        var ex = Assert.Throws<ArgumentException>(() => new StructuredGrid1D(GridAxis.Uniform(4, 0, 1), SideBoundary.Periodic, SideBoundary.Patch("outlet")));
        Assert.Contains("XLow is periodic", ex.Message);
        Assert.Contains("XHigh is patch 'outlet'", ex.Message);
    }

    [Fact]
    public void NonIncreasingNodesAreRejectedNamingTheNode()
    {
        var ex = Assert.Throws<ArgumentException>(() => GridAxis.FromNodes([0.0, 0.5, 0.5, 1.0]));
        Assert.Contains("node 2", ex.Message);
    }

    [Fact]
    public void FaceCountCountsNodePlanesPerDirectionWithThePeriodicWrapFaceOnBothPlanes()
    {
        // Counted by hand: x periodic (5 planes of 3 x 2 faces, the wrap face on the first and last), y walled (4 planes of 4 x 2), z walled (3 planes of 4 x 3).
        var wall = SideBoundary.Patch("wall");
        var grid = new StructuredGrid3D(
            GridAxis.Uniform(4, 0, 1), GridAxis.Uniform(3, 0, 1), GridAxis.Uniform(2, 0, 1),
            SideBoundary.Periodic, SideBoundary.Periodic, wall, wall, wall, wall);

        Assert.Equal(5 * 3 * 2 + 4 * 4 * 2 + 3 * 4 * 3, grid.FaceCount);
        Assert.Equal(11, new StructuredGrid1D(GridAxis.Uniform(10, 0, 1), wall, wall).FaceCount);
        Assert.Equal(11, new StructuredGrid1D(GridAxis.Uniform(10, 0, 1), SideBoundary.Periodic, SideBoundary.Periodic).FaceCount);
    }
}
