using System.Globalization;
using FvGen.Geometry;

namespace FvGen.Meshes.Unstructured;

/// <summary>
/// The geometric checks every mesh passes before use: closed cells, positive volumes, faces with
/// an area. Tolerances are relative to each cell's or face's own size, so the checks mean the
/// same on a chip and on a dam.
/// </summary>
internal static class MeshValidator
{
    /// <summary>|Σ outward S_f| allowed per unit of a cell's surface: far above rounding, far below a missing face.</summary>
    public const double ClosureTolerance = 1e-10;

    /// <summary>Volumes at or below this fraction of h^d (h the cell's node extent) count as degenerate.</summary>
    public const double VolumeTolerance = 1e-12;

    /// <summary>Face areas at or below this fraction of e^(d−1) (e the face's node extent) count as degenerate.</summary>
    public const double AreaTolerance = 1e-12;

    public static List<string> Check(UnstructuredMeshBuilder builder, AssembledFaces faces, MeshGeometry geometry)
    {
        var problems = new List<string>();
        var points = builder.Nodes;
        int d = builder.Dimension;
        for (int c = 0; c < builder.CellCount; c++)
        {
            double h = Extent(points, builder.NodesOf(c));
            double volume = geometry.CellVolumes[c];
            if (!(volume > VolumeTolerance * Math.Pow(h, d)))
            {
                string why = volume < 0
                    ? d == 2 ? "its nodes run clockwise; list them counter-clockwise" : "it is inverted; its nodes are in mirrored order"
                    : "it is degenerate";
                problems.Add($"{builder.DescribeCell(c)} has non-positive {(d == 2 ? "area" : "volume")} {Format(volume)} ({why}).");
                continue;
            }

            Vec3 sum = geometry.CellClosure[c];
            if (!(sum.Length <= ClosureTolerance * geometry.CellSurfaces[c]))
            {
                problems.Add($"{builder.DescribeCell(c)} is not closed: its outward area vectors sum to {sum} (length {Format(sum.Length)}) against a surface of {Format(geometry.CellSurfaces[c])}.");
            }
        }

        for (int f = 0; f < faces.FaceCount; f++)
        {
            double e = Extent(points, faces.NodesOf(f));
            double area = geometry.FaceAreaVectors[f].Length;
            if (!(area > AreaTolerance * Math.Pow(e, d - 1)))
            {
                problems.Add($"The face through {builder.DescribeNodes(faces.NodesOf(f))} near {geometry.FaceCentroids[f]} of {builder.DescribeCell(faces.Left[f])} has zero area.");
            }
        }

        return problems;
    }

    /// <summary>The diagonal of the nodes' bounding box.</summary>
    private static double Extent(ReadOnlySpan<Vec3> points, ReadOnlySpan<int> nodes)
    {
        Vec3 low = points[nodes[0]];
        Vec3 high = low;
        foreach (int n in nodes)
        {
            Vec3 p = points[n];
            low = new Vec3(Math.Min(low.X, p.X), Math.Min(low.Y, p.Y), Math.Min(low.Z, p.Z));
            high = new Vec3(Math.Max(high.X, p.X), Math.Max(high.Y, p.Y), Math.Max(high.Z, p.Z));
        }

        return (high - low).Length;
    }

    private static string Format(double value) => value.ToString("G6", CultureInfo.InvariantCulture);
}
