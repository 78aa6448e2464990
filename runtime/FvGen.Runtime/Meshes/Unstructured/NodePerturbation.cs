using FvGen.Geometry;

namespace FvGen.Meshes.Unstructured;

/// <summary>
/// Moves the interior nodes of a mesh under construction by random amounts, to test geometry and
/// schemes on cells that are not aligned, planar or regular. Seeded: the same call moves the same
/// nodes the same way on every run.
/// </summary>
public static class NodePerturbation
{
    /// <summary>
    /// Moves every node that lies on no named boundary face by up to <paramref name="fraction"/> of
    /// its local spacing (the distance to the nearest other node of a cell it belongs to) in each
    /// coordinate (x and y in 2-D, and z in 3-D), uniformly at random. A fraction up to 0.2 keeps
    /// the builders' lattice cells valid.
    /// </summary>
    public static void PerturbInteriorNodes(UnstructuredMeshBuilder builder, double fraction, int seed)
    {
        ArgumentNullException.ThrowIfNull(builder);
        if (!(fraction >= 0.0 && fraction < 0.5))
        {
            throw new ArgumentOutOfRangeException(nameof(fraction), fraction, "The fraction of the spacing must be in [0, 0.5).");
        }

        var onBoundary = builder.BoundaryNodeMask();
        var spacing = new double[builder.NodeCount];
        Array.Fill(spacing, double.PositiveInfinity);
        for (int c = 0; c < builder.CellCount; c++)
        {
            var nodes = builder.NodesOf(c);
            foreach (int a in nodes)
            {
                foreach (int b in nodes)
                {
                    if (a != b)
                    {
                        spacing[a] = Math.Min(spacing[a], (builder.GetNode(a) - builder.GetNode(b)).Length);
                    }
                }
            }
        }

        var random = new Random(seed);
        for (int n = 0; n < builder.NodeCount; n++)
        {
            if (onBoundary[n] || double.IsInfinity(spacing[n]))
            {
                continue;
            }

            double step = fraction * spacing[n];
            double dz = builder.Dimension == 3 ? Offset() : 0.0;
            builder.MoveNode(n, builder.GetNode(n) + new Vec3(Offset(), Offset(), dz));

            double Offset() => step * (2.0 * random.NextDouble() - 1.0);
        }
    }
}
