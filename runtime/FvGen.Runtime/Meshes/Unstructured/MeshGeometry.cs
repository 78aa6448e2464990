using FvGen.Geometry;

namespace FvGen.Meshes.Unstructured;

/// <summary>
/// Face and cell geometry by the discrete divergence theorem.
/// </summary>
/// <remarks>
/// 2-D: a face is an edge a→b (outward order of its left cell); its area vector is
/// (b_y − a_y, −(b_x − a_x), 0), its centroid the midpoint; cell area and centroid by the shoelace
/// formula. 3-D: a face is split into a fan of triangles about the average of its nodes; its area
/// vector is the sum of the triangles' area vectors and its centroid their area-weighted centroid.
/// That is exact for planar faces, and it is the rule for warped faces: both cells of a face see
/// the same triangles, so the face is consistent and every cell's surface is closed. A cell's
/// volume and centroid are those of the tetrahedra joining the average of its nodes to every fan
/// triangle of its faces, i.e. V = (1/3) Σ_f x_f · S_f over the triangulated surface.
/// </remarks>
internal sealed class MeshGeometry
{
    public required Vec3[] FaceAreaVectors { get; init; }

    public required Vec3[] FaceCentroids { get; init; }

    public required double[] CellVolumes { get; init; }

    public required Vec3[] CellCentroids { get; init; }

    /// <summary>The sum of each cell's outward face area vectors; zero for a closed cell.</summary>
    public required Vec3[] CellClosure { get; init; }

    /// <summary>The sum of each cell's face areas.</summary>
    public required double[] CellSurfaces { get; init; }

    public static MeshGeometry Compute(UnstructuredMeshBuilder builder, AssembledFaces faces)
    {
        var points = builder.Nodes;
        int faceCount = faces.FaceCount;
        int cellCount = builder.CellCount;
        var areaVectors = new Vec3[faceCount];
        var faceCentroids = new Vec3[faceCount];
        var volumes = new double[cellCount];
        var centroids = new Vec3[cellCount];
        var closure = new Vec3[cellCount];
        var surfaces = new double[cellCount];

        for (int f = 0; f < faceCount; f++)
        {
            (areaVectors[f], faceCentroids[f]) = builder.Dimension == 2
                ? EdgeGeometry(points, faces.NodesOf(f))
                : FanGeometry(points, faces.NodesOf(f));
            double area = areaVectors[f].Length;
            closure[faces.Left[f]] += areaVectors[f];
            surfaces[faces.Left[f]] += area;
            if (faces.Right[f] >= 0)
            {
                closure[faces.Right[f]] -= areaVectors[f];
                surfaces[faces.Right[f]] += area;
            }
        }

        if (builder.Dimension == 2)
        {
            for (int c = 0; c < cellCount; c++)
            {
                (volumes[c], centroids[c]) = PolygonGeometry.AreaAndCentroid(points, builder.NodesOf(c));
            }
        }
        else
        {
            AccumulatePyramids(builder, faces, volumes, centroids);
        }

        return new MeshGeometry
        {
            FaceAreaVectors = areaVectors,
            FaceCentroids = faceCentroids,
            CellVolumes = volumes,
            CellCentroids = centroids,
            CellClosure = closure,
            CellSurfaces = surfaces,
        };
    }

    private static (Vec3 AreaVector, Vec3 Centroid) EdgeGeometry(ReadOnlySpan<Vec3> points, ReadOnlySpan<int> nodes)
    {
        Vec3 a = points[nodes[0]];
        Vec3 b = points[nodes[1]];
        return (new Vec3(b.Y - a.Y, -(b.X - a.X), 0.0), 0.5 * (a + b));
    }

    /// <summary>The fan rule: triangles (c0, p_i, p_{i+1}) about the node average c0.</summary>
    private static (Vec3 AreaVector, Vec3 Centroid) FanGeometry(ReadOnlySpan<Vec3> points, ReadOnlySpan<int> nodes)
    {
        Vec3 c0 = NodeAverage(points, nodes);
        Vec3 areaVector = Vec3.Zero;
        Vec3 moment = Vec3.Zero;
        double weight = 0.0;
        for (int i = 0; i < nodes.Length; i++)
        {
            Vec3 a = points[nodes[i]] - c0;
            Vec3 b = points[nodes[(i + 1) % nodes.Length]] - c0;
            Vec3 triangle = 0.5 * Vec3.Cross(a, b);
            double area = triangle.Length;
            areaVector += triangle;
            moment += area / 3.0 * (a + b);
            weight += area;
        }

        return (areaVector, weight > 0.0 ? c0 + moment / weight : c0);
    }

    /// <summary>
    /// Volume and centroid from the tetrahedra (x_c, c0, p_i, p_{i+1}) joining the cell's node
    /// average x_c to each fan triangle of each face, taken outward for both cells of a face.
    /// </summary>
    private static void AccumulatePyramids(UnstructuredMeshBuilder builder, AssembledFaces faces, double[] volumes, Vec3[] centroids)
    {
        var points = builder.Nodes;
        int cellCount = builder.CellCount;
        var apex = new Vec3[cellCount];
        var moments = new Vec3[cellCount];
        for (int c = 0; c < cellCount; c++)
        {
            apex[c] = NodeAverage(points, builder.NodesOf(c));
        }

        for (int f = 0; f < faces.FaceCount; f++)
        {
            var nodes = faces.NodesOf(f);
            Vec3 c0 = NodeAverage(points, nodes);
            for (int i = 0; i < nodes.Length; i++)
            {
                Vec3 a = points[nodes[i]];
                Vec3 b = points[nodes[(i + 1) % nodes.Length]];
                Vec3 triangle = 0.5 * Vec3.Cross(a - c0, b - c0);
                Add(faces.Left[f], triangle, c0, a, b);
                if (faces.Right[f] >= 0)
                {
                    Add(faces.Right[f], -triangle, c0, a, b);
                }
            }
        }

        for (int c = 0; c < cellCount; c++)
        {
            centroids[c] = volumes[c] != 0.0 ? apex[c] + moments[c] / volumes[c] : apex[c];
        }

        void Add(int cell, Vec3 outward, Vec3 c0, Vec3 a, Vec3 b)
        {
            Vec3 x = apex[cell];
            Vec3 ra = a - x;
            Vec3 rb = b - x;
            Vec3 rc = c0 - x;
            double volume = Vec3.Dot(outward, rc + ra + rb) / 9.0;
            volumes[cell] += volume;
            moments[cell] += volume / 4.0 * (ra + rb + rc);
        }
    }

    private static Vec3 NodeAverage(ReadOnlySpan<Vec3> points, ReadOnlySpan<int> nodes)
    {
        Vec3 sum = Vec3.Zero;
        foreach (int n in nodes)
        {
            sum += points[n];
        }

        return sum / nodes.Length;
    }
}
