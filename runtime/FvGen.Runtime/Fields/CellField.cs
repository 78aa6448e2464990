using System.Runtime.InteropServices;
using FvGen.Meshes;

namespace FvGen.Fields;

/// <summary>One value of <typeparamref name="T"/> per cell of a mesh, stored contiguously.</summary>
public sealed class CellField<T>
    where T : unmanaged
{
    private readonly T[] _values;

    /// <summary>Creates a zero field on <paramref name="mesh"/>.</summary>
    public CellField(IMesh mesh)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        Mesh = mesh;
        _values = new T[mesh.CellCount];
    }

    /// <summary>The mesh the field lives on.</summary>
    public IMesh Mesh { get; }

    /// <summary>Number of cells.</summary>
    public int Count => _values.Length;

    /// <summary>The values, one per cell.</summary>
    public Span<T> Span => _values;

    /// <summary>The values, read-only.</summary>
    public ReadOnlySpan<T> ReadOnlySpan => _values;

    /// <summary>The value of cell <paramref name="cell"/>.</summary>
    public ref T this[int cell] => ref _values[cell];

    /// <summary>The values seen as a flat span of doubles, cell by cell, component by component.</summary>
    public Span<double> Components => MemoryMarshal.Cast<T, double>(_values.AsSpan());

    /// <summary>Copies the values of <paramref name="source"/>, which must live on a mesh of the same size.</summary>
    public void CopyFrom(CellField<T> source)
    {
        ArgumentNullException.ThrowIfNull(source);
        if (source.Count != Count)
        {
            throw new ArgumentException($"Cannot copy a field of {source.Count} cells into one of {Count} cells.", nameof(source));
        }

        source._values.AsSpan().CopyTo(_values);
    }

    /// <summary>Sets every cell from a function of its centroid.</summary>
    public void Fill(Func<Geometry.Vec3, T> valueAt)
    {
        ArgumentNullException.ThrowIfNull(valueAt);
        var centroids = Mesh.CellCentroids;
        for (int c = 0; c < _values.Length; c++)
        {
            _values[c] = valueAt(centroids[c]);
        }
    }
}
