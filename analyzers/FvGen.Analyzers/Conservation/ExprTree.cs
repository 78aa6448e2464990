using System.Collections.Generic;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>Walks the factors of a term at any depth (inside call arguments and reciprocals).</summary>
internal static class ExprTree
{
    public static IEnumerable<Expr> All(Term term) => term.Factors.SelectMany(All);

    public static IEnumerable<Expr> All(Expr factor)
    {
        yield return factor;
        var inner = factor switch
        {
            CallExpr c => c.Arguments.SelectMany(a => a.Terms),
            ReciprocalExpr r => r.Denominator.Terms,
            OpaqueReadExpr q => q.Subscripts.SelectMany(g => g).SelectMany(s => s.Terms),
            CellGatherExpr g => g.Left.Terms.Concat(g.Right.Terms),
            _ => Enumerable.Empty<Term>(),
        };
        foreach (var t in inner)
        {
            foreach (var e in All(t))
            {
                yield return e;
            }
        }
    }

    /// <summary>The first opaque read anywhere in the term, or null.</summary>
    public static OpaqueReadExpr? FirstOpaque(Term term) => First<OpaqueReadExpr>(term);

    /// <summary>The first factor of type <typeparamref name="T"/> in the order of <see cref="All(Term)"/>, or null; walks without enumerators (the balance asks for every term).</summary>
    public static T? First<T>(Term term)
        where T : Expr
    {
        foreach (var f in term.Factors)
        {
            if (First<T>(f) is { } found)
            {
                return found;
            }
        }

        return null;
    }

    private static T? First<T>(Expr factor)
        where T : Expr
    {
        if (factor is T match)
        {
            return match;
        }

        switch (factor)
        {
            case ReadExpr:
                return null;
            case CallExpr c:
                foreach (var argument in c.Arguments)
                {
                    if (First<T>(argument) is { } inArgument)
                    {
                        return inArgument;
                    }
                }

                return null;
            case ReciprocalExpr r:
                return First<T>(r.Denominator);
            case OpaqueReadExpr q:
                foreach (var group in q.Subscripts)
                {
                    foreach (var subscript in group)
                    {
                        if (First<T>(subscript) is { } inSubscript)
                        {
                            return inSubscript;
                        }
                    }
                }

                return null;
            case CellGatherExpr g:
                return First<T>(g.Left) ?? First<T>(g.Right);
            default:
                return null;
        }
    }

    private static T? First<T>(SumExpr sum)
        where T : Expr
    {
        foreach (var t in sum.Terms)
        {
            if (First<T>(t) is { } found)
            {
                return found;
            }
        }

        return null;
    }
}
