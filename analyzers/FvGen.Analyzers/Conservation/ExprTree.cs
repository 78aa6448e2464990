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
    public static OpaqueReadExpr? FirstOpaque(Term term) => All(term).OfType<OpaqueReadExpr>().FirstOrDefault();
}
