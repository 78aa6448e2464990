using System;
using System.Collections.Generic;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Walks the factors of a term at any depth (inside call arguments, reciprocals, opaque subscripts
/// and gathered sums), in pre-order: a factor, then what is inside it. One walker serves both the
/// full listing and the search for a first match, which stops early and allocates nothing (the
/// balance asks it for every term).
/// </summary>
internal static class ExprTree
{
    /// <summary>Every factor of the term at any depth, in pre-order.</summary>
    public static IReadOnlyList<Expr> All(Term term)
    {
        var all = new List<Expr>();
        Find(term, all, static (e, list) =>
        {
            list.Add(e);
            return false;
        });
        return all;
    }

    /// <summary>The first factor of type <typeparamref name="T"/> in pre-order, or null.</summary>
    public static T? First<T>(Term term)
        where T : Expr =>
        Find<object?>(term, null, static (e, _) => e is T) as T;

    /// <summary>The first opaque read anywhere in the term, or null.</summary>
    public static OpaqueReadExpr? FirstOpaque(Term term) => First<OpaqueReadExpr>(term);

    private static Expr? Find<TState>(Term term, TState state, Func<Expr, TState, bool> stop)
    {
        foreach (var f in term.Factors)
        {
            if (Find(f, state, stop) is { } found)
            {
                return found;
            }
        }

        return null;
    }

    private static Expr? Find<TState>(Expr factor, TState state, Func<Expr, TState, bool> stop)
    {
        if (stop(factor, state))
        {
            return factor;
        }

        switch (factor)
        {
            case CallExpr c:
                foreach (var argument in c.Arguments)
                {
                    if (Find(argument, state, stop) is { } inArgument)
                    {
                        return inArgument;
                    }
                }

                return null;
            case ReciprocalExpr r:
                return Find(r.Denominator, state, stop);
            case OpaqueReadExpr q:
                foreach (var group in q.Subscripts)
                {
                    foreach (var subscript in group)
                    {
                        if (Find(subscript, state, stop) is { } inSubscript)
                        {
                            return inSubscript;
                        }
                    }
                }

                return null;
            case CellGatherExpr g:
                return Find(g.Left, state, stop) ?? Find(g.Right, state, stop);
            default:
                return null;
        }
    }

    private static Expr? Find<TState>(SumExpr sum, TState state, Func<Expr, TState, bool> stop)
    {
        foreach (var t in sum.Terms)
        {
            if (Find(t, state, stop) is { } found)
            {
                return found;
            }
        }

        return null;
    }
}
