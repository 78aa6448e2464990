using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Turns a cell loop that gathers its faces from the cell-to-face list into the face loop it is
/// equivalent to. By the mesh invariant (face <c>f</c> is listed once for cell <c>c</c> exactly when
/// <c>c</c> is <c>left[f]</c> or <c>right[f]</c>, and the two differ), the sum over all cells of
/// <c>k(c) · Σ_{f of c} g(c, f)</c> is the sum over faces of <c>k(left[f]) · g_left(f)</c> plus
/// <c>k(right[f]) · g_right(f)</c>: a face loop writing through both maps. Both writes are always
/// made, even when one side gives nothing, so a dropped side is a one-sided scatter and never a
/// boundary loop.
/// </summary>
internal static class CellGatherExpansion
{
    /// <summary>
    /// Null when no write gathers; otherwise the loop without its gathered terms (null when nothing
    /// is left) and the equivalent face loop. Throws <see cref="ModelLimitException"/> for shapes it
    /// cannot rewrite exactly.
    /// </summary>
    public static (LoopUpdate? Cells, LoopUpdate Faces)? Split(LoopUpdate update)
    {
        if (!update.Writes.Any(w => w.Value.Terms.Any(t => t.Factors.Any(f => f is CellGatherExpr))))
        {
            return null;
        }

        var cellWrites = new List<UpdateWrite>();
        var faceWrites = new List<UpdateWrite>();
        string? faceVariable = null;
        string? faceLoop = null;
        foreach (var group in update.Writes.GroupBy(w => w.TargetKey))
        {
            // Writes overwritten by a later assignment that does not read the element never reach the total.
            var live = new List<UpdateWrite>();
            foreach (var w in group)
            {
                if (w.IsAssignment && !w.Value.Reads.Any(r => r.Array == w.Array && r.Path == w.Path && SubscriptKey(r.Subscripts) == w.SubscriptKey))
                {
                    live.Clear();
                }

                live.Add(w);
            }

            foreach (var w in live)
            {
                var kept = new List<Term>();
                var sides = new Dictionary<string, List<Term>>(System.StringComparer.Ordinal);
                var targets = new Dictionary<string, ImmutableArray<ImmutableArray<IndexTerm>>>(System.StringComparer.Ordinal);
                foreach (var t in w.Value.Terms)
                {
                    var gathers = t.Factors.OfType<CellGatherExpr>().ToList();
                    if (gathers.Count == 0)
                    {
                        kept.Add(t);
                        continue;
                    }

                    if (gathers.Count > 1)
                    {
                        throw new ModelLimitException("a term multiplies two sums gathered over the face list");
                    }

                    var g = gathers[0];
                    if (faceLoop is not null && faceLoop != g.FaceLoopKey)
                    {
                        throw new ModelLimitException("the loop gathers over two different face lists, or compares the cell with different face maps");
                    }

                    faceLoop = g.FaceLoopKey;
                    faceVariable = g.FaceVariable;
                    if (w.Subscripts.Length != 1 || w.Subscripts[0].Length != 1
                        || w.Subscripts[0][0] is not AffineSubscript { Index: var cell }
                        || cell.Key != AffineIndex.Variable(g.CellVariable).Key)
                    {
                        throw new ModelLimitException("the gathered sum of cell `" + g.CellVariable + "` is written to " + w.RenderTarget() + ", not to that cell");
                    }

                    var rest = t.Factors.Where(f => !ReferenceEquals(f, g)).ToList();
                    foreach (var (map, value) in new[] { (g.LeftMap, g.Left), (g.RightMap, g.Right) })
                    {
                        var at = new MappedSubscript(map, ImmutableArray.Create(AffineIndex.Variable(g.FaceVariable)));
                        targets[map] = ImmutableArray.Create(ImmutableArray.Create<IndexTerm>(at));
                        if (!sides.TryGetValue(map, out var list))
                        {
                            sides[map] = list = new List<Term>();
                        }

                        var moved = rest.Select(f => AtCell(f, g.CellVariable, at)).ToList();
                        foreach (var u in value.Terms)
                        {
                            var origins = u.Origins.IsEmpty ? t.Origins : u.Origins;
                            list.Add(new Term(t.Coefficient * u.Coefficient, u.Factors.Concat(moved), origins));
                        }
                    }
                }

                if (kept.Count > 0 || sides.Count == 0)
                {
                    cellWrites.Add(w with { Value = SumExpr.Of(kept) });
                }

                foreach (var side in sides)
                {
                    faceWrites.Add(new UpdateWrite(w.Array, w.Path, targets[side.Key], SumExpr.Of(side.Value), false, w.Origin));
                }
            }
        }

        var faceSpace = new LoopSpace(ImmutableArray.Create(new LoopVariable(faceVariable!, 1, LoopVariableKind.Set)));
        var cells = cellWrites.Count == 0 ? null : new LoopUpdate(update.Space, cellWrites.ToImmutableArray(), update.IsParallel);
        return (cells, new LoopUpdate(faceSpace, faceWrites.ToImmutableArray(), update.IsParallel));
    }

    /// <summary>
    /// A factor of the cell (<c>1 / vol[c]</c>, <c>invVol[c]</c>) read at the cell on one side of the
    /// face (<c>vol[left[f]]</c>). Anything else that depends on the cell cannot be moved exactly.
    /// </summary>
    private static Expr AtCell(Expr factor, string cellVariable, MappedSubscript at)
    {
        switch (factor)
        {
            case ReadExpr r when !r.IsLoopIndex && r.AllSubscripts.All(s => s is AffineSubscript a && a.Index.Key == AffineIndex.Variable(cellVariable).Key):
                return new ReadExpr(r.Array, r.Subscripts.Select(g => g.Select(_ => (IndexTerm)at).ToImmutableArray()).ToImmutableArray(), r.Path, r.Role);
            case ReciprocalExpr q:
                return new ReciprocalExpr(SumExpr.Of(q.Denominator.Terms.Select(t => new Term(t.Coefficient, t.Factors.Select(f => AtCell(f, cellVariable, at)), t.Origins))));
            case ReadExpr r when !r.AllSubscripts.SelectMany(s => s.AffineParts).Any(p => !p.CoefficientOf(cellVariable).IsZero) && !(r.IsLoopIndex):
                return r;
            default:
                if (factor.Reads.Any(r => r.IsLoopIndex || r.AllSubscripts.SelectMany(s => s.AffineParts).Any(p => !p.CoefficientOf(cellVariable).IsZero)))
                {
                    throw new ModelLimitException("the gathered sum is multiplied by `" + Text.Short(factor.Render()) + "`, which depends on the cell in a way the checker cannot move to the face's cells");
                }

                return factor;
        }
    }

    private static string SubscriptKey(ImmutableArray<ImmutableArray<IndexTerm>> subscripts) => UpdateWrite.KeyOf(subscripts);
}
