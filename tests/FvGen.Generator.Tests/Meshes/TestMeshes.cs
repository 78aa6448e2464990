using System.Reflection;
using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace FvGen.Generator.Tests.Meshes;

/// <summary>
/// Small unstructured meshes for the compile-and-run tests, made from perturbed lattices of
/// triangles, quadrilaterals, tetrahedra, hexahedra and prisms.
/// </summary>
/// <remarks>
/// The runtime's mesh builder is being written on another branch; until it lands these meshes are
/// assembled here and handed to the mesh's internal constructor by reflection. Geometry follows the
/// discrete Gauss theorem (REFERENCES.md, "Geometry"): face area vectors from the boundary loop of each
/// face, so every closed cell's outward area vectors sum to zero; volumes (1/3) Σ x_f · S_f (3-D) or
/// the polygon area (2-D). Boundary faces go to patches xLow ... zHigh by their outward normal.
/// </remarks>
internal static class TestMeshes
{
    private static readonly string[] SideNames = ["xLow", "xHigh", "yLow", "yHigh", "zLow", "zHigh"];

    public enum Kind2D
    {
        Triangles,
        Quadrilaterals,
    }

    public enum Kind3D
    {
        Tetrahedra,
        Hexahedra,
        Prisms,
    }

    /// <summary>An <paramref name="n"/> x <paramref name="n"/> lattice on the unit square, interior nodes moved at random by up to <paramref name="jitter"/>/2 of a cell.</summary>
    public static UnstructuredMesh Square(Kind2D kind, int n, int seed, double jitter = 0.5)
    {
        var random = new Random(seed);
        var points = new List<Vec3>();
        for (int j = 0; j <= n; j++)
        {
            for (int i = 0; i <= n; i++)
            {
                double x = (double)i / n, y = (double)j / n;
                if (i > 0 && i < n && j > 0 && j < n)
                {
                    x += (random.NextDouble() - 0.5) * jitter / n;
                    y += (random.NextDouble() - 0.5) * jitter / n;
                }

                points.Add(new Vec3(x, y, 0));
            }
        }

        int Node(int i, int j) => i + (n + 1) * j;
        var cells = new List<(CellShape Shape, int[] Nodes)>();
        for (int j = 0; j < n; j++)
        {
            for (int i = 0; i < n; i++)
            {
                int a = Node(i, j), b = Node(i + 1, j), c = Node(i + 1, j + 1), d = Node(i, j + 1);
                if (kind == Kind2D.Quadrilaterals)
                {
                    cells.Add((CellShape.Quadrilateral, [a, b, c, d]));
                }
                else
                {
                    cells.Add((CellShape.Triangle, [a, b, c]));
                    cells.Add((CellShape.Triangle, [a, c, d]));
                }
            }
        }

        return Build2D(points, cells);
    }

    /// <summary>An <paramref name="n"/>³ lattice on the unit cube, interior nodes moved at random by up to a fifth of a cell.</summary>
    public static UnstructuredMesh Cube(Kind3D kind, int n, int seed)
    {
        var random = new Random(seed);
        var points = new List<Vec3>();
        for (int k = 0; k <= n; k++)
        {
            for (int j = 0; j <= n; j++)
            {
                for (int i = 0; i <= n; i++)
                {
                    double x = (double)i / n, y = (double)j / n, z = (double)k / n;
                    if (i > 0 && i < n && j > 0 && j < n && k > 0 && k < n)
                    {
                        x += (random.NextDouble() - 0.5) * 0.4 / n;
                        y += (random.NextDouble() - 0.5) * 0.4 / n;
                        z += (random.NextDouble() - 0.5) * 0.4 / n;
                    }

                    points.Add(new Vec3(x, y, z));
                }
            }
        }

        int Node(int i, int j, int k) => i + (n + 1) * (j + (n + 1) * k);
        var cells = new List<(CellShape Shape, int[] Nodes)>();
        for (int k = 0; k < n; k++)
        {
            for (int j = 0; j < n; j++)
            {
                for (int i = 0; i < n; i++)
                {
                    int[] h =
                    [
                        Node(i, j, k), Node(i + 1, j, k), Node(i + 1, j + 1, k), Node(i, j + 1, k),
                        Node(i, j, k + 1), Node(i + 1, j, k + 1), Node(i + 1, j + 1, k + 1), Node(i, j + 1, k + 1),
                    ];
                    switch (kind)
                    {
                        case Kind3D.Hexahedra:
                            cells.Add((CellShape.Hexahedron, h));
                            break;
                        case Kind3D.Prisms:
                            cells.Add((CellShape.Prism, [h[0], h[1], h[2], h[4], h[5], h[6]]));
                            cells.Add((CellShape.Prism, [h[0], h[2], h[3], h[4], h[6], h[7]]));
                            break;
                        default:
                            // Six tetrahedra around the diagonal 0-6; the same split in every cube is conforming.
                            int[][] paths = [[1, 2], [1, 5], [3, 2], [3, 7], [4, 5], [4, 7]];
                            foreach (var path in paths)
                            {
                                cells.Add((CellShape.Tetrahedron, [h[0], h[path[0]], h[path[1]], h[6]]));
                            }

                            break;
                    }
                }
            }
        }

        return Build3D(points, cells);
    }

    private static UnstructuredMesh Build2D(List<Vec3> points, List<(CellShape Shape, int[] Nodes)> cells)
    {
        var builder = new FaceCollector();
        var volumes = new double[cells.Count];
        var centroids = new Vec3[cells.Count];
        for (int c = 0; c < cells.Count; c++)
        {
            var nodes = cells[c].Nodes;
            double area = 0;
            Vec3 sum = Vec3.Zero;
            for (int m = 0; m < nodes.Length; m++)
            {
                Vec3 a = points[nodes[m]], b = points[nodes[(m + 1) % nodes.Length]];
                double cross = a.X * b.Y - b.X * a.Y;
                area += 0.5 * cross;
                sum += cross * (a + b);
                var edge = b - a;
                builder.Add(c, [nodes[m], nodes[(m + 1) % nodes.Length]], new Vec3(edge.Y, -edge.X, 0), 0.5 * (a + b));
            }

            volumes[c] = area;
            centroids[c] = sum / (6 * area);
        }

        return builder.Finish(2, volumes, centroids, cells, points);
    }

    private static UnstructuredMesh Build3D(List<Vec3> points, List<(CellShape Shape, int[] Nodes)> cells)
    {
        var builder = new FaceCollector();
        var volumes = new double[cells.Count];
        var centroids = new Vec3[cells.Count];
        for (int c = 0; c < cells.Count; c++)
        {
            var nodes = cells[c].Nodes;
            Vec3 centre = Vec3.Zero;
            foreach (int p in nodes)
            {
                centre += points[p];
            }

            centre /= nodes.Length;
            centroids[c] = centre;
            int[][] local = cells[c].Shape switch
            {
                CellShape.Tetrahedron => [[0, 1, 2], [0, 1, 3], [0, 2, 3], [1, 2, 3]],
                CellShape.Prism => [[0, 1, 2], [3, 4, 5], [0, 1, 4, 3], [1, 2, 5, 4], [2, 0, 3, 5]],
                _ => [[0, 1, 2, 3], [4, 5, 6, 7], [0, 1, 5, 4], [1, 2, 6, 5], [2, 3, 7, 6], [3, 0, 4, 7]],
            };
            double volume = 0;
            foreach (var face in local)
            {
                var faceNodes = Array.ConvertAll(face, m => nodes[m]);
                var (area, centroid) = PolygonArea(points, faceNodes);
                if (Vec3.Dot(area, centroid - centre) < 0)
                {
                    Array.Reverse(faceNodes);
                    (area, centroid) = PolygonArea(points, faceNodes);
                }

                volume += Vec3.Dot(centroid, area) / 3.0;
                builder.Add(c, faceNodes, area, centroid);
            }

            volumes[c] = volume;
        }

        return builder.Finish(3, volumes, centroids, cells, points);
    }

    /// <summary>Vector area and centroid of a polygon, from triangles about its node average.</summary>
    private static (Vec3 Area, Vec3 Centroid) PolygonArea(List<Vec3> points, int[] nodes)
    {
        Vec3 centre = Vec3.Zero;
        foreach (int p in nodes)
        {
            centre += points[p];
        }

        centre /= nodes.Length;
        Vec3 area = Vec3.Zero, weighted = Vec3.Zero;
        double total = 0;
        for (int m = 0; m < nodes.Length; m++)
        {
            Vec3 a = points[nodes[m]], b = points[nodes[(m + 1) % nodes.Length]];
            var s = 0.5 * Vec3.Cross(a - centre, b - centre);
            area += s;
            total += s.Length;
            weighted += s.Length * ((centre + a + b) / 3.0);
        }

        return (area, weighted / total);
    }

    /// <summary>Matches the faces of neighbouring cells and numbers them interior first, then patch by patch.</summary>
    private sealed class FaceCollector
    {
        private readonly Dictionary<string, int> _byKey = [];
        private readonly List<(int Left, int Right, int[] Nodes, Vec3 Area, Vec3 Centroid)> _faces = [];

        public void Add(int cell, int[] nodes, Vec3 area, Vec3 centroid)
        {
            var sorted = (int[])nodes.Clone();
            Array.Sort(sorted);
            string key = string.Join(",", sorted);
            if (_byKey.TryGetValue(key, out int existing))
            {
                var f = _faces[existing];
                _faces[existing] = (f.Left, cell, f.Nodes, f.Area, f.Centroid);
                return;
            }

            _byKey[key] = _faces.Count;
            _faces.Add((cell, -1, nodes, area, centroid));
        }

        public UnstructuredMesh Finish(int dimension, double[] volumes, Vec3[] centroids, List<(CellShape Shape, int[] Nodes)> cells, List<Vec3> points)
        {
            var interior = _faces.Where(f => f.Right >= 0).ToList();
            var boundary = _faces.Where(f => f.Right < 0).ToList();
            var ordered = new List<(int Left, int Right, int[] Nodes, Vec3 Area, Vec3 Centroid)>(interior);
            var patches = new List<BoundaryPatch>();
            for (int side = 0; side < 2 * dimension; side++)
            {
                var members = boundary.Where(f => SideOf(f.Area) == side).ToList();
                if (members.Count == 0)
                {
                    continue;
                }

                patches.Add(new BoundaryPatch(SideNames[side], patches.Count, ordered.Count, members.Count));
                ordered.AddRange(members);
            }

            var faceNodeOffsets = new List<int> { 0 };
            var faceNodes = new List<int>();
            foreach (var f in ordered)
            {
                faceNodes.AddRange(f.Nodes);
                faceNodeOffsets.Add(faceNodes.Count);
            }

            var cellNodeOffsets = new List<int> { 0 };
            var cellNodes = new List<int>();
            foreach (var c in cells)
            {
                cellNodes.AddRange(c.Nodes);
                cellNodeOffsets.Add(cellNodes.Count);
            }

            var runtime = typeof(UnstructuredMesh).Assembly;
            var dataType = runtime.GetType("FvGen.Meshes.Unstructured.UnstructuredMeshData", throwOnError: true)!;
            object data = Activator.CreateInstance(dataType, nonPublic: true)!;
            void Set(string name, object value) => dataType.GetProperty(name)!.SetValue(data, value);
            Set("Dimension", dimension);
            Set("InteriorFaceCount", interior.Count);
            Set("FaceLeft", ordered.Select(f => f.Left).ToArray());
            Set("FaceRight", ordered.Select(f => f.Right).ToArray());
            Set("FaceAreaVectors", ordered.Select(f => f.Area).ToArray());
            Set("FaceCentroids", ordered.Select(f => f.Centroid).ToArray());
            Set("FaceNodeOffsets", faceNodeOffsets.ToArray());
            Set("FaceNodes", faceNodes.ToArray());
            Set("CellVolumes", volumes);
            Set("CellCentroids", centroids);
            Set("Points", points.ToArray());
            Set("CellNodeOffsets", cellNodeOffsets.ToArray());
            Set("CellNodes", cellNodes.ToArray());
            Set("CellShapes", cells.Select(c => c.Shape).ToArray());
            Set("Patches", patches.ToArray());
            var constructor = typeof(UnstructuredMesh).GetConstructor(BindingFlags.Instance | BindingFlags.NonPublic, [dataType])!;
            return (UnstructuredMesh)constructor.Invoke([data]);
        }

        private static int SideOf(Vec3 normal)
        {
            double ax = Math.Abs(normal.X), ay = Math.Abs(normal.Y), az = Math.Abs(normal.Z);
            int axis = ax >= ay && ax >= az ? 0 : ay >= az ? 1 : 2;
            double component = axis == 0 ? normal.X : axis == 1 ? normal.Y : normal.Z;
            return 2 * axis + (component > 0 ? 1 : 0);
        }
    }
}
