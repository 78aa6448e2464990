using System.Globalization;

namespace FvGen.Meshes.Structured;

/// <summary>
/// The node coordinates of one direction of a structured grid: uniform or stretched.
/// Cell <c>i</c> lies between nodes <c>i</c> and <c>i + 1</c>.
/// </summary>
public sealed class GridAxis
{
    private readonly double[] _nodes;
    private readonly double[] _widths;
    private readonly double[] _centres;

    private GridAxis(double[] nodes)
    {
        _nodes = nodes;
        _widths = new double[nodes.Length - 1];
        _centres = new double[nodes.Length - 1];
        for (int i = 0; i < _widths.Length; i++)
        {
            _widths[i] = nodes[i + 1] - nodes[i];
            _centres[i] = 0.5 * (nodes[i] + nodes[i + 1]);
        }
    }

    /// <summary>Number of cells along this axis.</summary>
    public int CellCount => _widths.Length;

    /// <summary>Node coordinates, <see cref="CellCount"/> + 1 of them, strictly increasing.</summary>
    public ReadOnlySpan<double> Nodes => _nodes;

    /// <summary>Cell widths.</summary>
    public ReadOnlySpan<double> Widths => _widths;

    /// <summary>Cell centres.</summary>
    public ReadOnlySpan<double> Centres => _centres;

    /// <summary>Length of the axis.</summary>
    public double Length => _nodes[^1] - _nodes[0];

    /// <summary>Creates <paramref name="cellCount"/> equal cells on [<paramref name="start"/>, <paramref name="end"/>].</summary>
    public static GridAxis Uniform(int cellCount, double start, double end)
    {
        if (cellCount < 1)
        {
            throw new ArgumentOutOfRangeException(nameof(cellCount), cellCount, "A grid axis needs at least one cell.");
        }

        if (!(double.IsFinite(start) && double.IsFinite(end) && end > start))
        {
            throw new ArgumentException(
                string.Create(CultureInfo.InvariantCulture, $"A grid axis needs finite ends with end > start; got [{start}, {end}]."));
        }

        var nodes = new double[cellCount + 1];
        double h = (end - start) / cellCount;
        for (int i = 0; i <= cellCount; i++)
        {
            nodes[i] = start + i * h;
        }

        nodes[cellCount] = end;
        return new GridAxis(nodes);
    }

    /// <summary>Creates a stretched axis from its node coordinates, which must be finite and strictly increasing.</summary>
    public static GridAxis FromNodes(ReadOnlySpan<double> nodes)
    {
        if (nodes.Length < 2)
        {
            throw new ArgumentException($"A grid axis needs at least two nodes; got {nodes.Length}.", nameof(nodes));
        }

        for (int i = 0; i < nodes.Length; i++)
        {
            if (!double.IsFinite(nodes[i]))
            {
                throw new ArgumentException(
                    string.Create(CultureInfo.InvariantCulture, $"Grid node {i} is not finite ({nodes[i]})."), nameof(nodes));
            }

            if (i > 0 && !(nodes[i] > nodes[i - 1]))
            {
                throw new ArgumentException(
                    string.Create(
                        CultureInfo.InvariantCulture,
                        $"Grid nodes must be strictly increasing: node {i} = {nodes[i]:R} is not greater than node {i - 1} = {nodes[i - 1]:R}."),
                    nameof(nodes));
            }
        }

        return new GridAxis(nodes.ToArray());
    }

    /// <summary>
    /// Creates an axis whose cell widths grow geometrically by <paramref name="ratio"/> from
    /// <paramref name="start"/> to <paramref name="end"/>; common practice near walls.
    /// </summary>
    public static GridAxis Geometric(int cellCount, double start, double end, double ratio)
    {
        if (!(ratio > 0 && double.IsFinite(ratio)))
        {
            throw new ArgumentOutOfRangeException(nameof(ratio), ratio, "The growth ratio must be positive and finite.");
        }

        if (ratio == 1.0)
        {
            return Uniform(cellCount, start, end);
        }

        var nodes = new double[cellCount + 1];
        double first = (end - start) * (ratio - 1) / (Math.Pow(ratio, cellCount) - 1);
        nodes[0] = start;
        double width = first;
        for (int i = 1; i < cellCount; i++)
        {
            nodes[i] = nodes[i - 1] + width;
            width *= ratio;
        }

        nodes[cellCount] = end;
        return FromNodes(nodes);
    }
}
