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
        var list = factors as IReadOnlyList<Expr> ?? factors.ToList();
        Factors = IsSorted(list) ? list.ToImmutableArray() : list.OrderBy(f => f.Key, StringComparer.Ordinal).ToImmutableArray();
        Origins = origins.IsDefault ? ImmutableArray<int>.Empty : origins;
        BodyKey = Factors.Length == 1 ? Factors[0].Key : string.Join("*", Factors.Select(f => f.Key));
    }

    /// <summary>The same body with another coefficient: factors and keys carry over as they are.</summary>
    private Term(SymPoly coefficient, Term body)
    {
        Coefficient = coefficient;
        Factors = body.Factors;
        Origins = body.Origins;
        BodyKey = body.BodyKey;
        _bodyShapeKey = body._bodyShapeKey;
    }

    private string? _bodyShapeKey;

    private static bool IsSorted(IReadOnlyList<Expr> factors)
    {
        for (int k = 1; k < factors.Count; k++)
        {
            if (string.CompareOrdinal(factors[k - 1].Key, factors[k].Key) > 0)
            {
                return false;
            }
        }

        return true;
    }

    public SymPoly Coefficient { get; }

    /// <summary>The body; empty for a loop-invariant term.</summary>
    public ImmutableArray<Expr> Factors { get; }

    public ImmutableArray<int> Origins { get; }

    public string BodyKey { get; }

    public string BodyShapeKey => _bodyShapeKey ??= ComputeBodyShapeKey();

    /// <summary>The factors' shape keys in ordinal order (shifting may reorder factors, so their own order will not do).</summary>
    private string ComputeBodyShapeKey()
    {
        if (Factors.Length == 1)
        {
            return Factors[0].ShapeKey;
        }

        var shapes = new string[Factors.Length];
        for (int k = 0; k < shapes.Length; k++)
        {
            shapes[k] = Factors[k].ShapeKey;
        }

        Array.Sort(shapes, StringComparer.Ordinal);
        return string.Join("*", shapes);
    }

    public bool IsInvariant => Factors.IsEmpty;

    /// <summary>Every array read of the body, in factor order (collected once: the matcher and the balance ask often).</summary>
    public IEnumerable<ReadExpr> Reads => _reads ??= Factors.SelectMany(f => f.Reads).ToArray();

    private ReadExpr[]? _reads;

    public Term WithCoefficient(SymPoly coefficient) => new(coefficient, this);

    /// <summary>
    /// The term at iteration <c>i + n</c>. A reciprocal is normalised again (its leading coefficient
    /// pulled out), exactly as the extraction builds it, so equal terms keep equal keys.
    /// </summary>
    public Term Shift(IReadOnlyDictionary<string, long> shift)
    {
        var coefficient = Coefficient;
        var factors = new List<Expr>(Factors.Length);
        foreach (var f in Factors)
        {
            if (f is ReciprocalExpr r)
            {
                var normalised = r.Denominator.Shift(shift).Reciprocal(SumExpr.OpaqueInvariant);
                if (normalised.Terms.Length == 1)
                {
                    coefficient *= normalised.Terms[0].Coefficient;
                    factors.AddRange(normalised.Terms[0].Factors);
                    continue;
                }
            }

            factors.Add(f.Shift(shift));
        }

        return new Term(coefficient, factors, Origins);
    }

    /// <summary>C# text of the body (<c>1</c> when there is none).</summary>
    public string RenderBody() => Factors.IsEmpty ? "1" : string.Join(" * ", Factors.Select(f => f is ReciprocalExpr ? "(" + f.Render() + ")" : f.Render()));

    public override string ToString() => Coefficient + " · " + RenderBody();
}
