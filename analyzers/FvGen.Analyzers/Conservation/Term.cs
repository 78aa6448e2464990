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
        Factors = Sorted(factors);
        Origins = origins.IsDefault ? ImmutableArray<int>.Empty : origins;
        BodyKey = Factors.Length switch
        {
            0 => string.Empty,
            1 => Factors[0].Key,
            _ => JoinKeys(Factors),
        };
    }

    /// <summary>The factors in ordinal order of their keys (equal keys are equal factors, so the sort need not be stable).</summary>
    private static ImmutableArray<Expr> Sorted(IEnumerable<Expr> factors)
    {
        if (factors is ImmutableArray<Expr> given && IsSorted(given))
        {
            return given;
        }

        var array = factors is ICollection<Expr> collection ? new Expr[collection.Count] : null;
        if (array is not null)
        {
            ((ICollection<Expr>)factors).CopyTo(array, 0);
        }
        else
        {
            array = factors.ToArray();
        }

        // An insertion sort: a body has one to a few factors.
        for (int k = 1; k < array.Length; k++)
        {
            var item = array[k];
            int at = k;
            while (at > 0 && string.CompareOrdinal(array[at - 1].Key, item.Key) > 0)
            {
                array[at] = array[at - 1];
                at--;
            }

            array[at] = item;
        }

        var builder = ImmutableArray.CreateBuilder<Expr>(array.Length);
        builder.AddRange(array);
        return builder.MoveToImmutable();
    }

    private static string JoinKeys(ImmutableArray<Expr> factors)
    {
        var keys = new string[factors.Length];
        for (int k = 0; k < keys.Length; k++)
        {
            keys[k] = factors[k].Key;
        }

        return string.Join("*", keys);
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

    private static bool IsSorted(ImmutableArray<Expr> factors)
    {
        for (int k = 1; k < factors.Length; k++)
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
    public IReadOnlyList<ReadExpr> Reads => _reads ??= Factors.SelectMany(f => f.Reads).ToArray();

    private ReadExpr[]? _reads;

    /// <summary>
    /// The reads the shift matcher anchors on in <paramref name="space"/>: worked out once, since a term is
    /// matched against many others of its loop (kept for the last space asked, in one field so that a
    /// reader never sees the reads of one space with another).
    /// </summary>
    public IReadOnlyList<ReadExpr> AnchorsIn(LoopSpace space)
    {
        var cached = _anchors;
        if (cached is null || !ReferenceEquals(cached.Space, space))
        {
            cached = new AnchorReads(space, ShiftMatcher.Anchors(Reads, space.LatticeVariables));
            _anchors = cached;
        }

        return cached.Reads;
    }

    private AnchorReads? _anchors;

    private sealed record AnchorReads(LoopSpace Space, IReadOnlyList<ReadExpr> Reads);

    public Term WithCoefficient(SymPoly coefficient) => new(coefficient, this);

    /// <summary>The term at iteration <c>i + n</c> (see the overload that also gives the scale).</summary>
    public Term Shift(IReadOnlyDictionary<string, long> shift) => Shift(shift, out _);

    /// <summary>
    /// The term at iteration <c>i + n</c>; the term itself when no factor moves. A reciprocal that
    /// moves is normalised again (its leading coefficient pulled out), exactly as the extraction
    /// builds it, so equal terms keep equal keys. That can pull out another weight than before: the
    /// leading term is the first by key, and offsets sort as text (<c>u[i - 1]</c> before
    /// <c>u[i - 2]</c>, yet <c>u[i - 1]</c> before <c>u[i]</c>), so the weight <c>3</c> pulled out of
    /// <c>1/(2 u[i - 2] + 3 u[i - 1])</c> becomes <c>2</c> one cell on. The shifted coefficient then
    /// differs from this one; <paramref name="scale"/> is the product of the leading weights pulled
    /// out: the shifted body is <c>scale</c> times this body at <c>i + n</c>.
    /// </summary>
    public Term Shift(IReadOnlyDictionary<string, long> shift, out SymPoly scale)
    {
        scale = SymPoly.One;
        int unmoved = 0;
        Expr? firstMoved = null;
        for (; unmoved < Factors.Length; unmoved++)
        {
            var shifted = Factors[unmoved].Shift(shift);
            if (!ReferenceEquals(shifted, Factors[unmoved]))
            {
                firstMoved = shifted;
                break;
            }
        }

        if (firstMoved is null)
        {
            return this;
        }

        var coefficient = Coefficient;
        var factors = new List<Expr>(Factors.Length);
        for (int k = 0; k < Factors.Length; k++)
        {
            var moved = k < unmoved ? Factors[k] : k == unmoved ? firstMoved : Factors[k].Shift(shift);
            if (moved is ReciprocalExpr r && !ReferenceEquals(moved, Factors[k]))
            {
                var normalised = r.Denominator.Reciprocal(SumExpr.OpaqueInvariant);
                if (normalised.Terms.Length == 1)
                {
                    var pulledOut = normalised.Terms[0].Coefficient;
                    coefficient *= pulledOut;
                    if (!pulledOut.IsOne)
                    {
                        // 1/D = (1/lead) · 1/(D/lead): the lead is what this body weighs in the shifted one.
                        scale *= r.Denominator.Terms[0].Coefficient;
                    }

                    factors.AddRange(normalised.Terms[0].Factors);
                    continue;
                }
            }

            factors.Add(moved);
        }

        return new Term(coefficient, factors, Origins);
    }

    /// <summary>C# text of the body (<c>1</c> when there is none).</summary>
    public string RenderBody() => Factors.IsEmpty ? "1" : string.Join(" * ", Factors.Select(f => f is ReciprocalExpr ? "(" + f.Render() + ")" : f.Render()));

    public override string ToString() => Coefficient + " · " + RenderBody();
}
