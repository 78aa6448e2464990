using System.Globalization;
using System.Runtime.InteropServices;
using FvGen.Fields;
using FvGen.Meshes.Structured;

namespace FvGen.Output;

/// <summary>
/// Writes a 1-D profile as CSV: a header <c>x,&lt;component names&gt;</c>, then one row per cell with its
/// centre and values. Invariant culture, shortest round-trip doubles (non-finite values as
/// <c>NaN</c>, <c>Infinity</c>, <c>-Infinity</c>), <c>\n</c> line ends, written through <see cref="AtomicFile"/>.
/// </summary>
public static class CsvProfileWriter
{
    /// <summary>Writes the cell field <paramref name="field"/>, which must live on a 1-D structured grid.</summary>
    public static void Write<TState>(string path, CellField<TState> field)
        where TState : unmanaged
    {
        ArgumentNullException.ThrowIfNull(field);
        if (field.Mesh is not StructuredGrid1D grid)
        {
            throw new ArgumentException($"A CSV profile needs a 1-D structured grid; this field lives on a {field.Mesh.GetType().Name}.", nameof(field));
        }

        Write(path, grid, field.ReadOnlySpan);
    }

    /// <summary>Writes <paramref name="state"/>, one value per cell of <paramref name="grid"/>, to <paramref name="path"/>.</summary>
    public static void Write<TState>(string path, StructuredGrid1D grid, ReadOnlySpan<TState> state)
        where TState : unmanaged
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        ArgumentNullException.ThrowIfNull(grid);
        if (state.Length != grid.CellCount)
        {
            throw new ArgumentException($"The state has {state.Length} cells but the grid has {grid.CellCount}.", nameof(state));
        }

        var names = StateLayout<TState>.ComponentNames;
        foreach (string name in names)
        {
            if (name.Contains(',') || name.Contains('"') || name.Contains('\n'))
            {
                throw new ArgumentException($"Component name '{name}' contains a comma, quote or line break, which a plain CSV header cannot hold.");
            }
        }

        double[] values = MemoryMarshal.Cast<TState, double>(state).ToArray();
        double[] centres = grid.X.Centres.ToArray();
        AtomicFile.Write(path, writer =>
        {
            writer.Write('x');
            foreach (string name in names)
            {
                writer.Write(',');
                writer.Write(name);
            }

            writer.WriteLine();
            int nc = names.Count;
            for (int c = 0; c < centres.Length; c++)
            {
                writer.Write(centres[c].ToString("R", CultureInfo.InvariantCulture));
                for (int k = 0; k < nc; k++)
                {
                    writer.Write(',');
                    writer.Write(values[c * nc + k].ToString("R", CultureInfo.InvariantCulture));
                }

                writer.WriteLine();
            }
        });
    }
}
