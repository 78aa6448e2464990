using System.Globalization;
using FvGen.Geometry;

namespace FvGen.Meshes.Structured;

/// <summary>
/// A Cartesian grid of one, two or three dimensions: the product of its axes. Cells are
/// numbered with x fastest: <c>cell = i + nx * (j + ny * k)</c>.
/// </summary>
public abstract class StructuredGrid : IMesh
{
    private readonly GridAxis[] _axes;
    private readonly SideBoundary[] _sides;
    private readonly int[] _sidePatch;
    private readonly string[] _patchNames;
    private readonly double[] _volumes;
    private readonly Vec3[] _centroids;
    private readonly double[] _surfaces;

    private protected StructuredGrid(GridAxis[] axes, SideBoundary[] sides)
    {
        _axes = axes;
        _sides = sides;
        ValidatePeriodicPairs(axes.Length, sides);

        var names = new List<string>();
        _sidePatch = new int[sides.Length];
        for (int s = 0; s < sides.Length; s++)
        {
            if (sides[s].PatchName is not { } name)
            {
                _sidePatch[s] = -1;
                continue;
            }

            int index = names.IndexOf(name);
            if (index < 0)
            {
                index = names.Count;
                names.Add(name);
            }

            _sidePatch[s] = index;
        }

        _patchNames = names.ToArray();
        int nx = axes[0].CellCount;
        int ny = axes.Length > 1 ? axes[1].CellCount : 1;
        int nz = axes.Length > 2 ? axes[2].CellCount : 1;
        long count = (long)nx * ny * nz;
        if (count > int.MaxValue)
        {
            throw new ArgumentException($"A grid of {nx} x {ny} x {nz} cells has more than {int.MaxValue} cells.");
        }

        _volumes = new double[count];
        _centroids = new Vec3[count];
        _surfaces = new double[count];
        for (int k = 0; k < nz; k++)
        {
            double dz = axes.Length > 2 ? axes[2].Widths[k] : 1.0;
            double zc = axes.Length > 2 ? axes[2].Centres[k] : 0.0;
            for (int j = 0; j < ny; j++)
            {
                double dy = axes.Length > 1 ? axes[1].Widths[j] : 1.0;
                double yc = axes.Length > 1 ? axes[1].Centres[j] : 0.0;
                for (int i = 0; i < nx; i++)
                {
                    double dx = axes[0].Widths[i];
                    int c = i + nx * (j + ny * k);
                    _volumes[c] = dx * dy * dz;
                    _centroids[c] = new Vec3(axes[0].Centres[i], yc, zc);
                    _surfaces[c] = axes.Length switch
                    {
                        1 => 2.0,
                        2 => 2.0 * (dx + dy),
                        _ => 2.0 * (dx * dy + dy * dz + dz * dx),
                    };
                }
            }
        }
    }

    /// <inheritdoc />
    public int Dimension => _axes.Length;

    /// <inheritdoc />
    public int CellCount => _volumes.Length;

    /// <inheritdoc />
    public ReadOnlySpan<double> CellVolumes => _volumes;

    /// <inheritdoc />
    public ReadOnlySpan<Vec3> CellCentroids => _centroids;

    /// <inheritdoc />
    public ReadOnlySpan<double> CellSurfaceAreas => _surfaces;

    /// <inheritdoc />
    public IReadOnlyList<string> PatchNames => _patchNames;

    /// <summary>
    /// The length of a <c>ParallelGather</c> kernel's face buffer: along each direction n + 1 node planes
    /// of faces, periodic or not. On a periodic direction the first and last node planes are one face,
    /// which the gather stores on both, so that each cell's high face is its low face plus one stride;
    /// that direction then has n distinct faces per row, one fewer than this counts.
    /// </summary>
    public int FaceCount
    {
        get
        {
            long faces = 0;
            for (int d = 0; d < _axes.Length; d++)
            {
                long planes = _axes[d].CellCount + 1;
                faces += planes * (CellCount / _axes[d].CellCount);
            }

            return checked((int)faces);
        }
    }

    /// <summary>The axis of direction <paramref name="direction"/> (0 = x, 1 = y, 2 = z).</summary>
    public GridAxis Axis(int direction) => _axes[direction];

    /// <summary>What lies beyond <paramref name="side"/>.</summary>
    public SideBoundary Boundary(GridSide side)
    {
        CheckSide(side);
        return _sides[(int)side];
    }

    /// <summary>The index of the patch on <paramref name="side"/>, or −1 when the side is periodic.</summary>
    public int PatchIndex(GridSide side)
    {
        CheckSide(side);
        return _sidePatch[(int)side];
    }

    /// <summary>True when direction <paramref name="direction"/> wraps around.</summary>
    public bool IsPeriodic(int direction) => _sides[2 * direction].IsPeriodic;

    /// <inheritdoc />
    public abstract string DescribeCell(int cell);

    private void CheckSide(GridSide side)
    {
        if ((int)side < 0 || (int)side >= _sides.Length)
        {
            throw new ArgumentOutOfRangeException(nameof(side), side, $"A {Dimension}-D grid has no side {side}.");
        }
    }

    private static void ValidatePeriodicPairs(int dimension, SideBoundary[] sides)
    {
        for (int d = 0; d < dimension; d++)
        {
            if (sides[2 * d].IsPeriodic != sides[2 * d + 1].IsPeriodic)
            {
                char axis = "xyz"[d];
                throw new ArgumentException(
                    string.Create(
                        CultureInfo.InvariantCulture,
                        $"Direction {axis} is periodic on one side only ({(GridSide)(2 * d)} is {sides[2 * d]}, {(GridSide)(2 * d + 1)} is {sides[2 * d + 1]}); a periodic direction must wrap on both sides."));
            }
        }
    }
}
