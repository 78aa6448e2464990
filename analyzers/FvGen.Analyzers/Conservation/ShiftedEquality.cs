using System;
using System.Collections.Generic;
using System.Collections.Immutable;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Decides whether body B is body A at iteration <c>i + n</c> by walking both, without building
/// A shifted: the same answer as comparing <c>A.Shift(n).BodyKey</c> with B's key, at a fraction of
/// the cost (the matcher asks this for every candidate shift). Products, sums and symmetric calls
/// are compared as multisets, because a shift may change the order their keys sort in.
/// </summary>
/// <remarks>
/// Reciprocals are re-normalised by a shift (their leading coefficient depends on that order), and
/// the rarer factors have keys of their own: for those the answer is <c>null</c>, and the caller
/// compares keys.
/// </remarks>
internal static class ShiftedEquality
{
    public static bool? Bodies(Term a, Term b, IReadOnlyDictionary<string, long> shift) =>
        a.Factors.Length != b.Factors.Length ? false : Factors(a.Factors, b.Factors, shift);

    private static bool? Factors(ImmutableArray<Expr> a, ImmutableArray<Expr> b, IReadOnlyDictionary<string, long> shift)
    {
        if (a.Length == 1)
        {
            return Expr(a[0], b[0], shift);
        }

        return Multiset(a, b, shift, static (x, y, n) => y.ShapeKey != x.ShapeKey ? false : Expr(x, y, n));
    }

    /// <summary>
    /// Each element of A pairs with one of B not yet taken for which <paramref name="equal"/> holds (in
    /// order: equal elements are interchangeable, a shift being one-to-one); null as soon as a comparison
    /// cannot decide.
    /// </summary>
    private static bool? Multiset<T>(ImmutableArray<T> a, ImmutableArray<T> b, IReadOnlyDictionary<string, long> shift, Func<T, T, IReadOnlyDictionary<string, long>, bool?> equal)
    {
        var taken = new bool[b.Length];
        foreach (var x in a)
        {
            bool found = false;
            for (int k = 0; k < b.Length && !found; k++)
            {
                if (taken[k])
                {
                    continue;
                }

                var same = equal(x, b[k], shift);
                if (same is null)
                {
                    return null;
                }

                if (same.Value)
                {
                    taken[k] = true;
                    found = true;
                }
            }

            if (!found)
            {
                return false;
            }
        }

        return true;
    }

    private static bool? Expr(Expr a, Expr b, IReadOnlyDictionary<string, long> shift) => (a, b) switch
    {
        (ReadExpr x, ReadExpr y) => Read(x, y, shift),
        (CallExpr x, CallExpr y) => Call(x, y, shift),
        (ReadExpr or CallExpr, ReadExpr or CallExpr) => false,
        _ => null,
    };

    private static bool Read(ReadExpr a, ReadExpr b, IReadOnlyDictionary<string, long> shift)
    {
        if (a.Array != b.Array || a.Path != b.Path || a.Subscripts.Length != b.Subscripts.Length)
        {
            return false;
        }

        for (int g = 0; g < a.Subscripts.Length; g++)
        {
            var ga = a.Subscripts[g];
            var gb = b.Subscripts[g];
            if (ga.Length != gb.Length)
            {
                return false;
            }

            for (int k = 0; k < ga.Length; k++)
            {
                if (!Subscript(ga[k], gb[k], shift))
                {
                    return false;
                }
            }
        }

        return true;
    }

    private static bool Subscript(IndexTerm a, IndexTerm b, IReadOnlyDictionary<string, long> shift)
    {
        switch (a, b)
        {
            case (AffineSubscript x, AffineSubscript y):
                return Index(x.Index, y.Index, shift);
            case (MappedSubscript x, MappedSubscript y) when x.Map == y.Map && x.Arguments.Length == y.Arguments.Length:
                for (int n = 0; n < x.Arguments.Length; n++)
                {
                    if (!Index(x.Arguments[n], y.Arguments[n], shift))
                    {
                        return false;
                    }
                }

                return true;
            default:
                return false;
        }
    }

    /// <summary>Equal linear parts, and A's constant moved by the shift equal to B's.</summary>
    private static bool Index(AffineIndex a, AffineIndex b, IReadOnlyDictionary<string, long> shift) =>
        a.LinearKey == b.LinearKey && a.Shift(shift).Constant.Equals(b.Constant);

    private static bool? Call(CallExpr a, CallExpr b, IReadOnlyDictionary<string, long> shift)
    {
        if (a.Function != b.Function || a.Arguments.Length != b.Arguments.Length)
        {
            return false;
        }

        if (a.Symmetry != b.Symmetry || a.IsBoundaryFlux != b.IsBoundaryFlux)
        {
            // Not told apart by the keys either: leave it to them.
            return null;
        }

        if (a.Symmetry != CallSymmetry.Symmetric)
        {
            // Arguments keep the order written.
            for (int k = 0; k < a.Arguments.Length; k++)
            {
                var equal = Sum(a.Arguments[k], b.Arguments[k], shift);
                if (equal != true)
                {
                    return equal;
                }
            }

            return true;
        }

        return Multiset(a.Arguments, b.Arguments, shift, static (x, y, n) => Sum(x, y, n));
    }

    /// <summary>Sums as multisets of terms: equal coefficients, bodies equal after the shift.</summary>
    private static bool? Sum(SumExpr a, SumExpr b, IReadOnlyDictionary<string, long> shift)
    {
        if (a.Terms.Length != b.Terms.Length)
        {
            return false;
        }

        return Multiset(a.Terms, b.Terms, shift, static (x, y, n) =>
            y.Factors.Length != x.Factors.Length || y.BodyShapeKey != x.BodyShapeKey || !y.Coefficient.Equals(x.Coefficient) ? false
            : x.IsInvariant ? true
            : Factors(x.Factors, y.Factors, n));
    }
}
