using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// One subscript of an array read: either affine in the loop variables (<c>i + 1</c>) or the
/// value of an index map at affine subscripts (<c>left[f]</c>, <c>owner[2*f]</c>).
/// </summary>
internal abstract class IndexTerm : IEquatable<IndexTerm>
{
    /// <summary>Full identity, offsets included.</summary>
    public abstract string Key { get; }

    /// <summary>Identity with every offset erased: equal shapes may differ by a lattice shift.</summary>
    public abstract string ShapeKey { get; }

    /// <summary>The subscript at iteration <c>i + n</c>; the same object when the shift does not move it.</summary>
    public abstract IndexTerm Shift(IReadOnlyDictionary<string, long> shift);

    /// <summary>The affine subscripts inside, in order (the term itself, or a map's arguments).</summary>
    public abstract IEnumerable<AffineIndex> AffineParts { get; }

    public bool Equals(IndexTerm? other) => other is not null && Key == other.Key;

    public override bool Equals(object? obj) => obj is IndexTerm t && Equals(t);

    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(Key);
}

/// <summary>An affine subscript.</summary>
internal sealed class AffineSubscript : IndexTerm
{
    public AffineSubscript(AffineIndex index) => Index = index;

    public AffineIndex Index { get; }

    public override string Key => Index.Key;

    public override string ShapeKey => Index.LinearKey;

    public override IEnumerable<AffineIndex> AffineParts => new[] { Index };

    public override IndexTerm Shift(IReadOnlyDictionary<string, long> shift)
    {
        var shifted = Index.Shift(shift);
        return ReferenceEquals(shifted, Index) ? this : new AffineSubscript(shifted);
    }

    public override string ToString() => Index.ToString();
}

/// <summary>A subscript read from an index map: <c>left[f]</c>.</summary>
internal sealed class MappedSubscript : IndexTerm
{
    public MappedSubscript(string map, ImmutableArray<AffineIndex> arguments)
    {
        Map = map;
        Arguments = arguments;
        Key = map + "[" + string.Join(",", arguments.Select(a => a.Key)) + "]";
    }

    private string? _shapeKey;

    public string Map { get; }

    public ImmutableArray<AffineIndex> Arguments { get; }

    public override string Key { get; }

    public override string ShapeKey => _shapeKey ??= Map + "[" + string.Join(",", Arguments.Select(a => a.LinearKey)) + "]";

    public override IEnumerable<AffineIndex> AffineParts => Arguments;

    public override IndexTerm Shift(IReadOnlyDictionary<string, long> shift)
    {
        var shifted = Shifted.Each(Arguments, shift, static (a, s) => a.Shift(s));
        return shifted == Arguments ? this : new MappedSubscript(Map, shifted);
    }

    public override string ToString() => Map + "[" + string.Join(", ", Arguments) + "]";
}
