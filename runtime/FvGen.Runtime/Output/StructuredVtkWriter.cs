using System.Globalization;
using System.Runtime.InteropServices;
using FvGen.Fields;
using FvGen.Meshes.Structured;

namespace FvGen.Output;

/// <summary>
/// Writes cell data on a structured grid as a legacy ASCII VTK file (VTK file formats, "simple
/// legacy formats"): <c>STRUCTURED_POINTS</c> when every axis is uniform, <c>RECTILINEAR_GRID</c>
/// otherwise, with one <c>SCALARS</c> array of <c>CELL_DATA</c> per component, named after it.
/// </summary>
/// <remarks>
/// Points are the grid nodes; missing directions of 1-D and 2-D grids have one node at 0, so the
/// cell count VTK derives equals the grid's. Numbers are invariant-culture shortest round-trip
/// doubles. Non-finite values are refused (the legacy format has no agreed spelling for them), with
/// an error naming the cell and component. The file is written through <see cref="AtomicFile"/>.
/// </remarks>
public static class StructuredVtkWriter
{
    private const int ValuesPerLine = 6;

    /// <summary>An axis counts as uniform when every node lies within this fraction of its length of the uniform position.</summary>
    public const double UniformTolerance = 1e-12;

    /// <summary>The layout <see cref="Write{TState}(string, StructuredGrid, ReadOnlySpan{TState}, string)"/> chooses for <paramref name="grid"/>.</summary>
    public static StructuredVtkLayout LayoutFor(StructuredGrid grid)
    {
        ArgumentNullException.ThrowIfNull(grid);
        for (int d = 0; d < grid.Dimension; d++)
        {
            if (!IsUniform(grid.Axis(d)))
            {
                return StructuredVtkLayout.RectilinearGrid;
            }
        }

        return StructuredVtkLayout.StructuredPoints;
    }

    /// <summary>Writes the cell field <paramref name="field"/>, which must live on a structured grid.</summary>
    public static void Write<TState>(string path, CellField<TState> field, string title = "FvGen cell data")
        where TState : unmanaged
    {
        ArgumentNullException.ThrowIfNull(field);
        if (field.Mesh is not StructuredGrid grid)
        {
            throw new ArgumentException($"The structured VTK writer needs a structured grid; this field lives on a {field.Mesh.GetType().Name}.", nameof(field));
        }

        Write(path, grid, field.ReadOnlySpan, title);
    }

    /// <summary>Writes <paramref name="state"/>, one value per cell of <paramref name="grid"/>, to <paramref name="path"/>.</summary>
    public static void Write<TState>(string path, StructuredGrid grid, ReadOnlySpan<TState> state, string title = "FvGen cell data")
        where TState : unmanaged
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        ArgumentNullException.ThrowIfNull(grid);
        ArgumentNullException.ThrowIfNull(title);
        if (state.Length != grid.CellCount)
        {
            throw new ArgumentException($"The state has {state.Length} cells but the grid has {grid.CellCount}.", nameof(state));
        }

        foreach (string name in StateLayout<TState>.ComponentNames)
        {
            if (name.Any(char.IsWhiteSpace))
            {
                throw new ArgumentException($"Component name '{name}' contains white space, which a legacy VTK array name cannot.");
            }
        }

        // The title is one line of at most 256 characters (VTK file formats, part 2 of the header).
        string header = title.ReplaceLineEndings(" ");
        if (header.Length > 256)
        {
            header = header[..256];
        }

        double[] values = MemoryMarshal.Cast<TState, double>(state).ToArray();
        var layout = LayoutFor(grid);
        AtomicFile.Write(path, writer => WriteBody(writer, grid, values, header, layout, StateLayout<TState>.ComponentNames));
    }

    private static void WriteBody(TextWriter writer, StructuredGrid grid, double[] values, string title, StructuredVtkLayout layout, IReadOnlyList<string> names)
    {
        var inv = CultureInfo.InvariantCulture;
        int[] points = new int[3];
        for (int d = 0; d < 3; d++)
        {
            points[d] = d < grid.Dimension ? grid.Axis(d).CellCount + 1 : 1;
        }

        writer.WriteLine("# vtk DataFile Version 3.0");
        writer.WriteLine(title);
        writer.WriteLine("ASCII");
        if (layout == StructuredVtkLayout.StructuredPoints)
        {
            writer.WriteLine("DATASET STRUCTURED_POINTS");
            writer.WriteLine(string.Create(inv, $"DIMENSIONS {points[0]} {points[1]} {points[2]}"));
            var origin = new double[3];
            var spacing = new double[] { 1, 1, 1 };
            for (int d = 0; d < grid.Dimension; d++)
            {
                var axis = grid.Axis(d);
                origin[d] = axis.Nodes[0];
                spacing[d] = axis.Length / axis.CellCount;
            }

            writer.WriteLine($"ORIGIN {Number(origin[0])} {Number(origin[1])} {Number(origin[2])}");
            writer.WriteLine($"SPACING {Number(spacing[0])} {Number(spacing[1])} {Number(spacing[2])}");
        }
        else
        {
            writer.WriteLine("DATASET RECTILINEAR_GRID");
            writer.WriteLine(string.Create(inv, $"DIMENSIONS {points[0]} {points[1]} {points[2]}"));
            for (int d = 0; d < 3; d++)
            {
                writer.WriteLine(string.Create(inv, $"{"XYZ"[d]}_COORDINATES {points[d]} double"));
                ReadOnlySpan<double> nodes = d < grid.Dimension ? grid.Axis(d).Nodes : [0.0];
                WriteValues(writer, nodes, 0, 1);
            }
        }

        int cells = grid.CellCount;
        int nc = names.Count;
        writer.WriteLine(string.Create(inv, $"CELL_DATA {cells}"));
        for (int k = 0; k < nc; k++)
        {
            for (int c = 0; c < cells; c++)
            {
                double v = values[c * nc + k];
                if (!double.IsFinite(v))
                {
                    throw new ArgumentException(
                        $"Cell {grid.DescribeCell(c)} has {names[k]} = {Number(v)}; the legacy VTK format has no agreed spelling for non-finite values, so the file was not written.");
                }
            }

            writer.WriteLine($"SCALARS {names[k]} double 1");
            writer.WriteLine("LOOKUP_TABLE default");
            WriteValues(writer, values, k, nc);
        }
    }

    private static void WriteValues(TextWriter writer, ReadOnlySpan<double> values, int first, int stride)
    {
        int column = 0;
        for (int i = first; i < values.Length; i += stride)
        {
            if (column > 0)
            {
                writer.Write(' ');
            }

            writer.Write(Number(values[i]));
            if (++column == ValuesPerLine)
            {
                writer.WriteLine();
                column = 0;
            }
        }

        if (column > 0)
        {
            writer.WriteLine();
        }
    }

    private static string Number(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static bool IsUniform(GridAxis axis)
    {
        ReadOnlySpan<double> nodes = axis.Nodes;
        double h = axis.Length / axis.CellCount;
        double tolerance = UniformTolerance * axis.Length;
        for (int i = 0; i < nodes.Length; i++)
        {
            if (Math.Abs(nodes[i] - (nodes[0] + i * h)) > tolerance)
            {
                return false;
            }
        }

        return true;
    }
}
