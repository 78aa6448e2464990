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
}
