using FvGen.Geometry;

namespace FvGen.Meshes;

/// <summary>
/// What every mesh kind offers the fields, the integrators and the conservation ledger.
/// </summary>
public interface IMesh
{
    /// <summary>Spatial dimension: 1, 2 or 3.</summary>
    int Dimension { get; }

    /// <summary>Number of cells.</summary>
    int CellCount { get; }

    /// <summary>Cell volumes (areas in two dimensions, lengths in one), one per cell.</summary>
    ReadOnlySpan<double> CellVolumes { get; }

    /// <summary>Cell centroids, one per cell.</summary>
    ReadOnlySpan<Vec3> CellCentroids { get; }

    /// <summary>Sum of the face areas of each cell; what a CFL time step divides by.</summary>
    ReadOnlySpan<double> CellSurfaceAreas { get; }

    /// <summary>Names of the boundary patches, in patch-index order.</summary>
    IReadOnlyList<string> PatchNames { get; }

    /// <summary>A short human-readable label of a cell for messages, e.g. <c>(3, 7)</c> or <c>#42</c>.</summary>
    string DescribeCell(int cell);
}
