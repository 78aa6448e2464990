using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// One signed term of an expanded update: a coefficient (exact rational times loop-invariant
/// symbols) and a body (a product of loop-dependent factors, kept in a fixed order). Origins are
/// opaque numbers the caller maps back to source locations.
/// </summary>
internal sealed class Term
{
    public Term(SymPoly coefficient, IEnumerable<Expr> factors, ImmutableArray<int> origins)
    {
        Coefficient = coefficient;
        Factors = factors.OrderBy(f => f.Key, StringComparer.Ordinal).ToImmutableArray();
        Origins = origins.IsDefault ? ImmutableArray<int>.Empty : origins;
        BodyKey = Factors.Length == 1 ? Factors[0].Key : string.Join("*", Factors.Select(f => f.Key));
    }

    private string? _bodyShapeKey;

    public SymPoly Coefficient { get; }

    /// <summary>The body; empty for a loop-invariant term.</summary>
    public ImmutableArray<Expr> Factors { get; }

    public ImmutableArray<int> Origins { get; }

    public string BodyKey { get; }

    public string BodyShapeKey => _bodyShapeKey ??= string.Join("*", Factors.Select(f => f.ShapeKey).OrderBy(s => s, StringComparer.Ordinal));

    public bool IsInvariant => Factors.IsEmpty;

    public IEnumerable<ReadExpr> Reads => Factors.SelectMany(f => f.Reads);

    public Term WithCoefficient(SymPoly coefficient) => new(coefficient, Factors, Origins);

    public Term Shift(IReadOnlyDictionary<string, long> shift) => new(Coefficient, Factors.Select(f => f.Shift(shift)), Origins);

    /// <summary>C# text of the body (<c>1</c> when there is none).</summary>
    public string RenderBody() => Factors.IsEmpty ? "1" : string.Join(" * ", Factors.Select(f => f is ReciprocalExpr ? "(" + f.Render() + ")" : f.Render()));

    public override string ToString() => Coefficient + " · " + RenderBody();
}
