using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Support;

/// <summary>Random stretched grid axes and side boundaries for the structured tests.</summary>
internal static class RandomGrids
{
    public static GridAxis Axis(Random random, int cells)
    {
        var nodes = new double[cells + 1];
        for (int i = 1; i <= cells; i++)
        {
            nodes[i] = nodes[i - 1] + 0.5 + random.NextDouble();
        }

        return GridAxis.FromNodes(nodes);
    }

    /// <summary>The two sides of one direction: periodic, or two patches (named after the direction).</summary>
    public static (SideBoundary Low, SideBoundary High) Sides(bool periodic, string axis) =>
        periodic ? (SideBoundary.Periodic, SideBoundary.Periodic) : (SideBoundary.Patch(axis + "Low"), SideBoundary.Patch(axis + "High"));

    /// <summary>A 2-D grid of random stretched axes, each direction periodic or bounded by two patches.</summary>
    public static StructuredGrid2D Grid2D(Random random, int nx, int ny, bool periodicX, bool periodicY)
    {
        var (xl, xh) = Sides(periodicX, "x");
        var (yl, yh) = Sides(periodicY, "y");
        return new StructuredGrid2D(Axis(random, nx), Axis(random, ny), xl, xh, yl, yh);
    }

    /// <summary>A 3-D grid of random stretched axes, each direction periodic or bounded by two patches.</summary>
    public static StructuredGrid3D Grid3D(Random random, int nx, int ny, int nz, bool periodicX, bool periodicY, bool periodicZ)
    {
        var (xl, xh) = Sides(periodicX, "x");
        var (yl, yh) = Sides(periodicY, "y");
        var (zl, zh) = Sides(periodicZ, "z");
        return new StructuredGrid3D(Axis(random, nx), Axis(random, ny), Axis(random, nz), xl, xh, yl, yh, zl, zh);
    }
}
