using System.Runtime.InteropServices;

namespace FvGen.Fields;

/// <summary>One value of <typeparamref name="T"/> per face, stored contiguously; a face flux buffer, say.</summary>
public sealed class FaceField<T>
    where T : unmanaged
{
    private readonly T[] _values;

    /// <summary>Creates a zero field of <paramref name="faceCount"/> faces.</summary>
    public FaceField(int faceCount)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(faceCount);
        _values = new T[faceCount];
    }

    /// <summary>Number of faces.</summary>
    public int Count => _values.Length;

    /// <summary>The values, one per face.</summary>
    public Span<T> Span => _values;

    /// <summary>The values, read-only.</summary>
    public ReadOnlySpan<T> ReadOnlySpan => _values;

    /// <summary>The value of face <paramref name="face"/>.</summary>
    public ref T this[int face] => ref _values[face];

    /// <summary>The values seen as a flat span of doubles.</summary>
    public Span<double> Components => MemoryMarshal.Cast<T, double>(_values.AsSpan());
}
