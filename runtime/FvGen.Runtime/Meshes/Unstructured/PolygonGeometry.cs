using FvGen.Geometry;

namespace FvGen.Meshes.Unstructured;

/// <summary>Area and centroid of a simple polygon in the plane z = 0 by the shoelace formula.</summary>
internal static class PolygonGeometry
{
    /// <summary>
    /// Signed area (positive for counter-clockwise nodes) and centroid, taken about the first node
    /// so that coordinates far from the origin lose no digits.
    /// </summary>
    public static (double Area, Vec3 Centroid) AreaAndCentroid(ReadOnlySpan<Vec3> points, ReadOnlySpan<int> nodes)
    {
        Vec3 origin = points[nodes[0]];
        double twiceArea = 0.0;
        double mx = 0.0;
        double my = 0.0;
        for (int i = 1; i < nodes.Length - 1; i++)
        {
            Vec3 a = points[nodes[i]] - origin;
            Vec3 b = points[nodes[i + 1]] - origin;
            double cross = a.X * b.Y - b.X * a.Y;
            twiceArea += cross;
            mx += (a.X + b.X) * cross;
            my += (a.Y + b.Y) * cross;
        }

        if (twiceArea == 0.0)
        {
            return (0.0, origin);
        }

        return (0.5 * twiceArea, origin + new Vec3(mx / (3.0 * twiceArea), my / (3.0 * twiceArea), 0.0));
    }
}
