using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// The conservation criterion: for every class of shift-equivalent bodies the coefficients sum to
/// zero — except sources (terms that read only the target cell) and, in update form, the old total
/// carried with weight exactly 1. Cell loops, face loops and one-map loops are told apart by the
/// subscripts they write. Speaks about conservation only, never about consistency.
/// </summary>
internal static class BalanceChecker
{
    public static ImmutableArray<Finding> Check(LoopUpdate update)
    {
        if (CellGatherExpansion.Split(update) is { } gathered)
        {
            // A cell loop gathering its faces is checked as the face loop it sums to (and whatever else it writes, as before).
            var parts = gathered.Cells is null ? ImmutableArray<Finding>.Empty : Check(gathered.Cells);
            return parts.AddRange(Check(gathered.Faces));
        }

        RejectNested(update);
        var findings = new List<Finding>();
        findings.AddRange(InPlaceSweeps(update));
        foreach (var group in update.Writes.GroupBy(w => w.Array + "|" + w.Path))
        {
            var writes = group.ToList();
            if (writes.Select(w => w.SubscriptKey).Distinct().Count() > 1)
            {
                findings.AddRange(CheckFaceLoop(update.Space, writes, update.Writes.Select(w => w.Array)));
            }
            else
            {
                findings.AddRange(CheckCellLoop(update.Space, writes));
            }
        }

        return findings.ToImmutableArray();
    }

    /// <summary>A gathered sum hidden inside a call or a reciprocal cannot be rewritten as a face loop.</summary>
    private static void RejectNested(LoopUpdate update)
    {
        foreach (var t in update.Writes.SelectMany(w => w.Value.Terms))
        {
            if (ExprTree.First<CellGatherExpr>(t) is not null)
            {
                throw new ModelLimitException("a sum gathered over the face list is used inside `" + Text.Short(t.RenderBody()) + "`, not added to the cell");
            }
        }
    }

    private static IEnumerable<Finding> CheckCellLoop(LoopSpace space, List<UpdateWrite> writes)
    {
        if (writes.SelectMany(w => w.Value.Terms).FirstOrDefault(t => ExprTree.FirstOpaque(t) is not null) is { } opaque)
        {
            // A value read at a subscript the checker does not model is accepted only as a face value
            // balanced between the two cells of one face.
            throw new ModelLimitException(ExprTree.FirstOpaque(opaque)!.Reason, opaque.Origins.IsEmpty ? -1 : opaque.Origins[0]);
        }

        var live = new List<UpdateWrite>();
        foreach (var w in writes)
        {
            if (w.IsAssignment && !w.Value.Reads.Any(r => IsTargetElement(r, w)))
            {
                live.Clear();
            }

            live.Add(w);
        }

        bool assignment = live.Any(w => w.IsAssignment);
        var measured = live.Select(MeasureWeighted).ToList();
        var terms = measured.SelectMany(m => m.Sum.Terms.Where(t => !t.IsInvariant).Select(t => new AttributedTerm(t, m.Write))).ToList();
        var measures = new HashSet<string>(measured.Where(m => m.Measure is not null).Select(m => m.Measure!.Key), StringComparer.Ordinal);
        var classes = ShiftClass.Build(terms, space);
        bool mapped = writes[0].Subscripts.SelectMany(g => g).Any(s => s is MappedSubscript);

        bool oldTotalClaimed = false;
        var unbalanced = new List<ShiftClass>();
        var carried = new List<CarriedWeight>();
        bool hasFaceTerms = false;
        foreach (var c in classes)
        {
            var sum = c.Sum;
            if (c.Members.All(IsSource))
            {
                if (assignment && IsOldStateClass(c, measures) && ConstantPart(sum) is { IsZero: false } constant)
                {
                    carried.Add(new CarriedWeight(c, constant.ConstantValue));
                }

                continue;
            }

            hasFaceTerms = true;

            if (GivenAndTakenBack(c))
            {
                yield return SelfCancelling(c, writes[0]);
                continue;
            }

            // A class mixing flux members with members at the target cell: the part of the cell's
            // weight in symbols no flux member carries is a source (−decay·u[i], the old u[i]).
            var sourcePart = SourcePart(c);
            sum -= sourcePart;
            if (assignment && IsOldStateClass(c, measures) && ConstantPart(sourcePart) is { IsZero: false } carriedConstant)
            {
                carried.Add(new CarriedWeight(c, carriedConstant.ConstantValue));
            }

            if (assignment && !oldTotalClaimed && sourcePart.IsOne && IsOldStateClass(c, measures))
            {
                oldTotalClaimed = true;
            }

            if (sum.IsZero)
            {
                if (assignment && !oldTotalClaimed && !sourcePart.IsZero && ConstantPart(sourcePart).IsZero
                    && ConstantPart(TargetWeight(c)).IsOne && IsOldStateClass(c, measures) && Positions(c) > 1)
                {
                    // The old value carried at the cell (weight 1) is matched by a flux member, and what
                    // the source reading took away leaves nothing to carry the old total: a slip such as
                    // `- cx * here - u[i - 1]` for `- cx * (here - u[i - 1])`.
                    yield return OldTotal(c);
                }

                continue;
            }

            if (assignment && !oldTotalClaimed && sum.IsOne && IsOldStateClass(c, measures) && Positions(c) > 1)
            {
                oldTotalClaimed = true;
                continue;
            }

            unbalanced.Add(c);
        }

        if (assignment && !oldTotalClaimed && !mapped && hasFaceTerms
            && !unbalanced.Any(c => IsOldStateClass(c, measures) && Positions(c) > 1)
            && CarriedWrongly(carried, out var carriedTotal))
        {
            yield return OldTotalAtTheCell(carried, carriedTotal);
        }

        if (mapped)
        {
            foreach (var c in unbalanced)
            {
                yield return OneSidedMapped(c, writes[0]);
            }

            yield break;
        }

        // Writing a neighbour of the loop's cell (r[i - 1]) is the half of a face loop that was kept:
        // lone face terms, each given to that one cell. A term with counterparts that do not cancel,
        // two lone terms that are one face evaluated two ways, or a target further off than a
        // neighbour (r[i + ng] in an array with ghost cells) say it is the cell's own update at an
        // offset subscript, read as any other.
        if (IsNeighbourOfTheIndex(writes[0]) && AreLoneFaceTerms(unbalanced))
        {
            foreach (var c in unbalanced)
            {
                var finding = OneSided(c, "it goes to " + writes[0].RenderTarget() + " with weight " + c.Sum + " and to no other cell; the other cell of the face must receive the opposite weight");
                var other = OtherCell(c.Representative);
                if (other is not null && c.Members.Count == 1)
                {
                    finding = finding with
                    {
                        Properties = finding.Properties.Add(FindingProperties.OppositeTarget, other),
                        WriteOrigin = c.Representative.Write.Origin,
                    };
                }

                yield return finding;
            }

            yield break;
        }

        var singles = new List<ShiftClass>();
        foreach (var c in unbalanced)
        {
            if (Positions(c) == 1)
            {
                singles.Add(c);
            }
            else if (assignment && IsOldStateClass(c, measures) && IsStateArray(c, terms))
            {
                yield return OldTotal(c);
            }
            else
            {
                yield return Unbalanced(c);
            }
        }

        // A lone term whose weight cancels a similar lone term sitting at another face is one face
        // evaluated two ways. (Two parts of one face flux, such as k[i+1]·u[i+1] and k[i+1]·u[i], sit at
        // the same face: that whole flux is dropped, and each part is reported as such.)
        var paired = new HashSet<ShiftClass>();
        foreach (var a in singles)
        {
            if (paired.Contains(a))
            {
                continue;
            }

            var b = singles.FirstOrDefault(x => x != a && !paired.Contains(x) && EvaluatedTwoWays(a, x));
            if (b is not null)
            {
                paired.Add(a);
                paired.Add(b);
                yield return Mismatched(a, b, classes, space);
                if (a.Representative.Term.BodyShapeKey != b.Representative.Term.BodyShapeKey
                    || !(HasCall(a.Representative.Term) && HasCall(b.Representative.Term)))
                {
                    // Another function, component or array (a copy-pasted `.Energy` for `.Momentum`), or
                    // products of arrays with no flux call (`area[i] * flux[i + 1]` for `area[i + 1] * …`):
                    // beyond the face seen two ways, neither term has a counterpart of its own kind.
                    yield return Dropped(a, classes, space);
                    yield return Dropped(b, classes, space);
                }
            }
        }

        foreach (var a in singles.Where(s => !paired.Contains(s)))
        {
            yield return Dropped(a, classes, space);
        }
    }

    /// <summary>The one other cell a face term reads besides the target (<c>r[i]</c> for a term written to <c>r[i - 1]</c>).</summary>
    private static string? OtherCell(AttributedTerm term)
    {
        var write = term.Write;
        var cells = term.Term.Reads
            .Where(r => r.Role == DataRole.Cell && !r.IsLoopIndex && r.Subscripts.Length == write.Subscripts.Length
                && r.Subscripts.Zip(write.Subscripts, (a, b) => a.Length == b.Length && a.Zip(b, (x, y) => x.ShapeKey == y.ShapeKey).All(s => s)).All(s => s))
            .Select(r => r.Subscripts)
            .GroupBy(s => string.Join("][", s.Select(g => string.Join(",", g.Select(x => x.Key)))))
            .Where(g => g.Key != write.SubscriptKey)
            .ToList();
        return cells.Count == 1
            ? write.Array + string.Concat(cells[0].First().Select(g => "[" + string.Join(", ", g.Select(x => x.ToString())) + "]")) + write.Path
            : null;
    }

    /// <summary>Members at one position with opposite signs from different writes: given to a cell and taken back from it.</summary>
    private static bool GivenAndTakenBack(ShiftClass c) =>
        c.Members.Count > 1 // a lone member has nothing to cancel against (most classes: the grouping is skipped)
        && c.Members.GroupBy(m => ShiftKey(m.Shift)).Any(g =>
            g.Select(m => m.Source.Write).Distinct().Count() > 1
            && g.Any(m => m.Weight.LeadingSign > 0) && g.Any(m => m.Weight.LeadingSign < 0)
            && g.Aggregate(SymPoly.Zero, (s, m) => s + m.Weight).IsZero);

    /// <summary>The terms of the target-cell members' weights in monomials that no other member has.</summary>
    private static SymPoly SourcePart(ShiftClass c)
    {
        var local = c.Members.Where(IsSource).ToList();
        if (local.Count == 0 || local.Count == c.Members.Count)
        {
            return SymPoly.Zero;
        }

        var fluxMonomials = new HashSet<Monomial>(c.Members.Where(m => !IsSource(m)).SelectMany(m => m.Weight.Terms.Select(t => t.Key)));
        var localWeight = local.Aggregate(SymPoly.Zero, (s, m) => s + m.Weight);
        return SymPoly.Of(localWeight.Terms.Where(t => !fluxMonomials.Contains(t.Key)));
    }

    private static bool HasCall(Term t) => t.Factors.Any(f => f is CallExpr);

    private static SymPoly TargetWeight(ShiftClass c) => c.Members.Where(IsSource).Aggregate(SymPoly.Zero, (s, m) => s + m.Weight);

    private static SymPoly ConstantPart(SymPoly p) => SymPoly.Of(p.Terms.Where(t => t.Key.IsOne));

    private static int Positions(ShiftClass c) => c.Members.Select(m => ShiftKey(m.Shift)).Distinct().Count();

    /// <summary>The array of a single-read class is the state when the write also reads it inside a call or a product.</summary>
    private static bool IsStateArray(ShiftClass c, List<AttributedTerm> terms)
    {
        if (c.Representative.Term.Factors.FirstOrDefault() is not ReadExpr read)
        {
            return false;
        }

        return terms.Any(t => t.Term.Factors.Length > 1 || t.Term.Factors.Any(f => f is not ReadExpr)
            ? t.Term.Reads.Any(r => r.Array == read.Array)
            : false);
    }

    private static IEnumerable<Finding> CheckFaceLoop(LoopSpace space, List<UpdateWrite> writes, IEnumerable<string> writtenByLoop)
    {
        var weighted = FaceLoopWeighted(writes);
        var all = weighted.SelectMany(x => x.Sum.Terms.Where(t => !t.IsInvariant).Select(t => new AttributedTerm(t, x.Write))).ToList();
        var opaque = all.Where(t => ExprTree.FirstOpaque(t.Term) is not null).ToList();
        var terms = all.Where(t => ExprTree.FirstOpaque(t.Term) is null).ToList();
        foreach (var finding in CheckOpaqueFaceValues(writes, opaque, writtenByLoop))
        {
            yield return finding;
        }

        bool found = false;
        foreach (var c in ShiftClass.Build(terms, space))
        {
            var sum = c.Sum;
            var cells = c.Members.Select(m => new MemberCell(m, CellKey(m))).ToList();
            if (!sum.IsZero)
            {
                var byCell = cells.GroupBy(x => x.Cell).Select(g => g.First().Member.Source.Write.RenderTarget() + " with weight " + g.Aggregate(SymPoly.Zero, (s, x) => s + x.Member.Weight)).ToList();
                string detail = byCell.Count == 1
                    ? "it goes to " + byCell[0] + " and to no other cell; the other cell of the face must receive the opposite weight"
                    : "it goes to " + string.Join(" and to ", byCell) + ", which sum to " + sum + ", not 0";
                found = true;
                yield return OneSided(c, detail);
            }
            else if (cells.Select(x => x.Cell).Distinct().Count() == 1)
            {
                found = true;
                yield return SelfCancelling(c, c.Representative.Write);
            }
        }

        if (!found && writes.Select(w => w.SubscriptKey).Distinct().Count() == 2)
        {
            // Face by face: the two cells of one iteration must get the same face flux with opposite
            // signs. A flux that is itself a difference of cell values (k·(T[i] − T[i − 1])) telescopes
            // even when given to both cells with one sign, so the sum over faces alone would miss it.
            var oneFace = new LoopSpace(ImmutableArray<LoopVariable>.Empty);
            foreach (var c in ShiftClass.Build(terms, oneFace))
            {
                if (!c.Sum.IsZero)
                {
                    var byCell = c.Members.GroupBy(m => m.Source.Write.SubscriptKey)
                        .Select(g => g.First().Source.Write.RenderTarget() + " with weight " + g.Aggregate(SymPoly.Zero, (sum, m) => sum + m.Weight))
                        .ToList();
                    yield return OneSided(c, "within one face it goes to " + string.Join(" and to ", byCell) + ", which sum to " + c.Sum + ", not 0; the cell in front must receive what the cell behind gives");
                    yield break;
                }
            }
        }
    }

    /// <summary>
    /// Face values read partly at subscripts the checker does not model. Their value is not known, so
    /// they must balance within one face: the same value (the same expression, evaluated once per
    /// face from data the loop does not write) given to the two cells of the iteration with opposite
    /// weights. Then the face adds nothing to the total, whatever the value is.
    /// </summary>
    private static IEnumerable<Finding> CheckOpaqueFaceValues(List<UpdateWrite> writes, List<AttributedTerm> opaque, IEnumerable<string> writtenByLoop)
    {
        if (opaque.Count == 0)
        {
            yield break;
        }

        var first = ExprTree.FirstOpaque(opaque[0].Term)!;
        if (writes.Select(w => w.SubscriptKey).Distinct().Count() != 2)
        {
            throw new ModelLimitException(first.Reason + ", and the loop does not write one face value to exactly two cells", opaque[0].Term.Origins.IsEmpty ? -1 : opaque[0].Term.Origins[0]);
        }

        var written = new HashSet<string>(writtenByLoop, StringComparer.Ordinal);
        foreach (var t in opaque)
        {
            var read = ExprTree.All(t.Term).OfType<OpaqueReadExpr>().FirstOrDefault(q => q.Arrays.Any(written.Contains));
            if (read is not null || t.Term.Reads.Any(r => written.Contains(r.Array)))
            {
                throw new ModelLimitException(first.Reason + ", and the face value reads the array the loop writes");
            }
        }

        var oneFace = new LoopSpace(ImmutableArray<LoopVariable>.Empty);
        foreach (var c in ShiftClass.Build(opaque, oneFace))
        {
            if (!c.Sum.IsZero)
            {
                var byCell = c.Members.GroupBy(m => m.Source.Write.SubscriptKey)
                    .Select(g => g.First().Source.Write.RenderTarget() + " with weight " + g.Aggregate(SymPoly.Zero, (sum, m) => sum + m.Weight))
                    .ToList();
                string detail = byCell.Count == 1
                    ? "within one face it goes to " + byCell[0] + " and to no other cell; the other cell of the face must receive the opposite weight"
                    : "within one face it goes to " + string.Join(" and to ", byCell) + ", which sum to " + c.Sum + ", not 0; the cell in front must receive what the cell behind gives";
                yield return OneSided(c, detail);
            }
            else if (c.Members.Select(m => m.Source.Write.SubscriptKey).Distinct().Count() == 1)
            {
                yield return SelfCancelling(c, c.Representative.Write);
            }
        }
    }

    private static IEnumerable<Finding> InPlaceSweeps(LoopUpdate update)
    {
        var reported = new HashSet<string>(StringComparer.Ordinal);
        foreach (var w in update.Writes)
        {
            foreach (var other in update.Writes)
            {
                foreach (var t in other.Value.Terms)
                {
                    var read = t.Reads.FirstOrDefault(r => r.Array == w.Array && SubscriptKey(r) != w.SubscriptKey);
                    if (read is not null && reported.Add(w.Array))
                    {
                        var props = ImmutableDictionary<string, string?>.Empty.Add(FindingProperties.SweptArray, w.Array);
                        yield return new Finding(
                            FindingKind.InPlaceSweep,
                            ImmutableArray.Create(w.RenderTarget(), Text.Short(read.Render())),
                            ImmutableArray.Create(w.Origin),
                            t.Origins,
                            props)
                        { WriteOrigin = w.Origin };
                    }
                }
            }
        }
    }

    private static Finding Dropped(ShiftClass c, List<ShiftClass> all, LoopSpace space)
    {
        var rep = c.Representative;
        var weight = c.Sum;
        var (shift, variable) = CounterpartShift(rep, all, space);
        var counterpart = rep.Term.Shift(shift);
        var (sign, text) = CSharpText.SignedProduct(-weight, counterpart.RenderBody());
        string addend = (sign < 0 ? "- " : "+ ") + text;
        bool leaves = weight.LeadingSign < 0;
        var (templateSign, template) = CSharpText.SignedProduct(-weight, "§");
        var props = ImmutableDictionary<string, string?>.Empty
            .Add(FindingProperties.CounterpartShift, ShiftKey(shift))
            .Add(FindingProperties.CounterpartText, addend)
            .Add(FindingProperties.CounterpartTemplate, (templateSign < 0 ? "- " : "+ ") + template);
        if (rep.Term.Factors.Length == 1 && rep.Term.Origins.Length == 1)
        {
            props = props.Add(FindingProperties.SingleFactor, "true");
        }

        return new Finding(
            FindingKind.DroppedFaceTerm,
            ImmutableArray.Create(
                Text.Short(rep.Term.RenderBody()),
                leaves ? "leaves" : "enters",
                rep.Write.RenderCell(),
                weight.ToString(),
                leaves ? "receives" : "gives",
                variable,
                Text.Short(addend)),
            rep.Term.Origins,
            ImmutableArray<int>.Empty,
            props)
        { WriteOrigin = rep.Write.Origin };
    }

    private static Finding Mismatched(ShiftClass a, ShiftClass b, List<ShiftClass> all, LoopSpace space)
    {
        // The primary is the evaluation at the low face; the expected text is the other one moved there.
        if (LeadingOffset(b.Representative) > LeadingOffset(a.Representative))
        {
            (a, b) = (b, a);
        }

        var (shift, _) = CounterpartShift(a.Representative, all, space);
        var expected = a.Representative.Term.Shift(shift).RenderBody();
        return new Finding(
            FindingKind.MismatchedFluxEvaluations,
            ImmutableArray.Create(
                Text.Short(b.Representative.Term.RenderBody()),
                b.Sum.ToString(),
                Text.Short(a.Representative.Term.RenderBody()),
                a.Sum.ToString(),
                Text.Short(expected)),
            b.Representative.Term.Origins,
            a.Representative.Term.Origins,
            ImmutableDictionary<string, string?>.Empty);
    }

    private static Finding Unbalanced(ShiftClass c)
    {
        // Blame the member at the low face (the usual place of a sign slip); the others are counterparts.
        var last = c.Members.OrderBy(m => LeadingOffset(m.Source)).First();
        var others = c.Members.Where(m => m != last).ToList();
        var othersWeight = others.Aggregate(SymPoly.Zero, (s, m) => s + m.Weight);
        var needed = last.InOwnBody(last.Sign > 0 ? -othersWeight : othersWeight);
        string weights = Weights(c);
        return new Finding(
            FindingKind.UnbalancedFaceTerm,
            ImmutableArray.Create(
                Text.Short(last.Source.Term.RenderBody()),
                weights,
                c.Sum.ToString(),
                "0",
                "for the difference to cancel, `" + Text.Short(last.Source.Term.RenderBody()) + "` needs weight " + needed),
            last.Source.Term.Origins,
            others.SelectMany(m => m.Source.Term.Origins).ToImmutableArray(),
            ImmutableDictionary<string, string?>.Empty);
    }

    /// <summary>
    /// Each member with its weight, for a message. A member whose body is a scaled copy of the
    /// representative's (a reciprocal that pulled out another weight) is shown as the representative's
    /// body moved onto it, with the weight the class sum counts, so that the weights shown add up to
    /// the sum shown; the others as written.
    /// </summary>
    private static string Weights(ShiftClass c) => string.Join(", ", c.Members.Select(m => m.Scale.IsOne
        ? "`" + Text.Short(m.Source.Term.RenderBody()) + "` " + m.Source.Term.Coefficient
        : "`" + Text.Short(new Term(SymPoly.One, c.Representative.Term.Factors.Select(f => f.Shift(m.Shift)), ImmutableArray<int>.Empty).RenderBody()) + "` " + m.Weight));

    private static Finding OldTotal(ShiftClass c)
    {
        var rep = c.Representative;
        string weights = Weights(c);
        return new Finding(
            FindingKind.UnbalancedFaceTerm,
            ImmutableArray.Create(
                Text.Short(rep.Term.RenderBody()),
                weights,
                c.Sum.ToString(),
                "1",
                "an update must carry the old total over with weight exactly 1"),
            rep.Term.Origins,
            c.Members.Skip(1).SelectMany(m => m.Source.Term.Origins).ToImmutableArray(),
            ImmutableDictionary<string, string?>.Empty);
    }

    /// <summary>
    /// True, with the total numeric weight with which a new state carries single reads of old states at
    /// its cell, when that cannot be the old total: positive but not 1, with no one state carried with weight
    /// exactly 1 (which leaves the others to be sources, such as <c>u[i] + 0.5 * q[i]</c>). A weight in
    /// symbols is a source the loop cannot judge (<c>(1 - k * dt) * u[i]</c> carries 1 and a decay),
    /// and a negative one a decay in a rate (<c>- 0.5 * u[i]</c>); both are left alone.
    /// </summary>
    private static bool CarriedWrongly(List<CarriedWeight> carried, out Rational total)
    {
        total = Rational.Zero;
        if (carried.Count == 0 || carried.Any(c => c.Constant.IsOne))
        {
            return false;
        }

        foreach (var c in carried)
        {
            total += c.Constant;
        }

        return total.Sign > 0 && !total.IsOne;
    }

    /// <summary>FVC0002 for an update form that carries the old total with a numeric weight other than 1 (<c>0.9 * u[i]</c>, <c>u[i] + u[i]</c>).</summary>
    private static Finding OldTotalAtTheCell(List<CarriedWeight> carried, Rational total)
    {
        var first = carried[0].Class.Representative;
        string weights = string.Join(", ", carried.Select(c => "`" + Text.Short(c.Class.Representative.Term.RenderBody()) + "` " + c.Constant));
        return new Finding(
            FindingKind.UnbalancedFaceTerm,
            ImmutableArray.Create(
                Text.Short(first.Term.RenderBody()),
                weights,
                total.ToString(),
                "1",
                "a new state must carry the old total over with weight exactly 1 (a decay of the state is written with its rate, as in `(1 - k * dt) * u[i]`)"),
            first.Term.Origins,
            carried.SelectMany(c => c.Class.Members).SelectMany(m => m.Source.Term.Origins).Except(first.Term.Origins).ToImmutableArray(),
            ImmutableDictionary<string, string?>.Empty);
    }

    /// <summary>An old state read at the written cell and the numeric part of the weight it is carried with.</summary>
    private sealed record CarriedWeight(ShiftClass Class, Rational Constant);

    private static Finding OneSidedMapped(ShiftClass c, UpdateWrite write)
    {
        var writtenMaps = write.Subscripts.SelectMany(g => g).OfType<MappedSubscript>().Select(m => m.Map).ToList();
        var otherMap = c.Members.SelectMany(m => m.Source.Term.Reads).SelectMany(r => r.AllSubscripts).OfType<MappedSubscript>()
            .Select(m => m.Map).FirstOrDefault(m => !writtenMaps.Contains(m));
        string detail = "it goes to " + write.RenderTarget() + " with weight " + c.Sum + " and to no other cell";
        var props = ImmutableDictionary<string, string?>.Empty;
        if (otherMap is not null && writtenMaps.Count == 1)
        {
            var opposite = write.RenderTarget().Replace(writtenMaps[0] + "[", otherMap + "[");
            detail += "; the face also reads through `" + otherMap + "`, so `" + opposite + "` must receive the opposite weight";
            props = props
                .Add(FindingProperties.OppositeTarget, opposite)
                .Add(FindingProperties.WrittenMap, writtenMaps[0])
                .Add(FindingProperties.OtherMap, otherMap);
        }

        return OneSided(c, detail, props) with { WriteOrigin = c.Members.Count == 1 ? write.Origin : -1 };
    }

    private static Finding OneSided(ShiftClass c, string detail, ImmutableDictionary<string, string?>? props = null) =>
        new(
            FindingKind.OneSidedScatter,
            ImmutableArray.Create(Text.Short(c.Representative.Term.RenderBody()), detail),
            c.Representative.Term.Origins,
            c.Members.Skip(1).SelectMany(m => m.Source.Term.Origins).ToImmutableArray(),
            props ?? ImmutableDictionary<string, string?>.Empty);

    private static Finding SelfCancelling(ShiftClass c, UpdateWrite write) =>
        new(
            FindingKind.OneSidedScatter,
            ImmutableArray.Create(
                Text.Short(c.Representative.Term.RenderBody()),
                "it is taken from and given back to the same cell " + write.RenderTarget() + ", so the other cell of the face gets nothing"),
            c.Members[c.Members.Count - 1].Source.Term.Origins,
            c.Members.Take(c.Members.Count - 1).SelectMany(m => m.Source.Term.Origins).ToImmutableArray(),
            ImmutableDictionary<string, string?>.Empty);

    /// <summary>
    /// The shift that turns a lone face term into the counterpart completing its difference: one
    /// step back along the variable in which the term sits ahead of the cell, or one step forward
    /// when it sits at the cell (a face array staggered at the low face). With no offset anywhere the
    /// variable is one no other class of the write differences along.
    /// </summary>
    private static (IReadOnlyDictionary<string, long> Shift, string Variable) CounterpartShift(AttributedTerm term, List<ShiftClass> all, LoopSpace space)
    {
        var lattice = space.Variables.Where(v => v.Kind == LoopVariableKind.Lattice).ToList();
        var target = term.Write.Subscripts.SelectMany(g => g).SelectMany(s => s.AffineParts).ToList();
        var offsets = lattice.ToDictionary(v => v.Name, _ => (Max: long.MinValue, Min: long.MaxValue), StringComparer.Ordinal);
        var used = new HashSet<string>(StringComparer.Ordinal);
        foreach (var read in term.Term.Reads)
        {
            foreach (var part in read.AllSubscripts.SelectMany(s => s.AffineParts))
            {
                foreach (var v in lattice.Where(v => !part.CoefficientOf(v.Name).IsZero))
                {
                    used.Add(v.Name);
                }

                foreach (var t in target.Where(t => t.LinearKey == part.LinearKey))
                {
                    var n = ShiftMatcher.Solve(new[] { new IndexPair(t, part) }, space);
                    if (n is null)
                    {
                        continue;
                    }

                    foreach (var kv in n)
                    {
                        var o = offsets[kv.Key];
                        offsets[kv.Key] = (Math.Max(o.Max, kv.Value), Math.Min(o.Min, kv.Value));
                    }
                }
            }
        }

        var differencing = new HashSet<string>(
            all.Where(c => c.Sum.IsZero).SelectMany(c => c.Members).SelectMany(m => m.Shift).Where(kv => kv.Value != 0).Select(kv => kv.Key),
            StringComparer.Ordinal);
        var step = lattice.ToDictionary(v => v.Name, v => v.Step, StringComparer.Ordinal);
        foreach (var v in lattice.Where(v => offsets[v.Name].Max != long.MinValue && offsets[v.Name].Max > 0))
        {
            return (Unit(lattice, v.Name, -step[v.Name]), v.Name);
        }

        foreach (var v in lattice.Where(v => offsets[v.Name].Min != long.MaxValue && offsets[v.Name].Min < 0))
        {
            return (Unit(lattice, v.Name, step[v.Name]), v.Name);
        }

        var free = lattice.FirstOrDefault(v => used.Contains(v.Name) && !differencing.Contains(v.Name))
            ?? lattice.FirstOrDefault(v => used.Contains(v.Name))
            ?? lattice.FirstOrDefault();
        return free is null
            ? (ShiftMatcher.NoShift, "?")
            : (Unit(lattice, free.Name, step[free.Name]), free.Name);
    }

    /// <summary>The largest offset of any read of the term from its target cell, summed over the loop variables.</summary>
    private static long LeadingOffset(AttributedTerm term)
    {
        var target = term.Write.Subscripts.SelectMany(g => g).SelectMany(s => s.AffineParts).ToList();
        var space = new LoopSpace(term.Term.Reads.SelectMany(r => r.AllSubscripts).SelectMany(s => s.AffineParts)
            .SelectMany(p => p.Linear.Select(l => l.Key)).Distinct().Select(n => new LoopVariable(n, 1, LoopVariableKind.Lattice)).ToImmutableArray());
        long best = long.MinValue;
        foreach (var part in term.Term.Reads.SelectMany(r => r.AllSubscripts).SelectMany(s => s.AffineParts))
        {
            foreach (var t in target.Where(t => t.LinearKey == part.LinearKey))
            {
                var n = ShiftMatcher.Solve(new[] { new IndexPair(t, part) }, space);
                if (n is not null)
                {
                    best = Math.Max(best, n.Values.Sum());
                }
            }
        }

        return best;
    }

    private static IReadOnlyDictionary<string, long> Unit(List<LoopVariable> lattice, string variable, long value) =>
        lattice.ToDictionary(v => v.Name, v => v.Name == variable ? value : 0L, StringComparer.Ordinal);

    /// <summary>Two lone classes are one face seen twice when both bodies are evaluations (a call or a product), not plain reads.</summary>
    private static bool Similar(ShiftClass a, ShiftClass b)
    {
        static bool Evaluation(ImmutableArray<Expr> factors) => factors.Length > 1 || factors.Any(f => f is CallExpr);
        return Evaluation(a.Representative.Term.Factors) && Evaluation(b.Representative.Term.Factors);
    }

    /// <summary>Both bodies are one call of the same function (whose two evaluations may differ only in order or sign).</summary>
    private static bool SameFunction(ShiftClass a, ShiftClass b) =>
        a.Representative.Term.Factors.Length == 1 && b.Representative.Term.Factors.Length == 1
        && a.Representative.Term.Factors[0] is CallExpr ca && b.Representative.Term.Factors[0] is CallExpr cb && ca.Function == cb.Function;

    /// <summary>The old state: every member a single read of one cell array (times the cell measure, once multiplied out).</summary>
    private static bool IsOldStateClass(ShiftClass c, HashSet<string> measures)
    {
        foreach (var m in c.Members)
        {
            var reads = m.Source.Term.Factors.Where(f => !measures.Contains(f.Key)).ToList();
            if (reads.Count != 1 || reads[0] is not ReadExpr r || r.Role != DataRole.Cell)
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>A source reads only the cell it writes: no face data, every subscript one of the target's.</summary>
    private static bool IsSource(ClassMember member)
    {
        if (member.Source.Term.Factors.Any(f => f is CallExpr { CarriesBoundaryFlux: true }))
        {
            // A declared boundary flux is the flux through a boundary face: by declaration no other
            // cell shares that face, so it is a source of the cell it goes to (the ledger balances it).
            return true;
        }

        var targetKeys = member.Source.Write.TargetSubscriptKeys;

        // A boundary loop writes through one map and reads cells through it only; data of its own
        // face (indexed by the map's argument) belongs to that boundary flux.
        var boundaryFace = member.Source.Write.BoundaryFaceKeys;
        foreach (var read in member.Source.Term.Reads)
        {
            bool ownFaceData = boundaryFace.Length > 0 && read.Role != DataRole.InteriorFace && AllIn(read.AllSubscripts, boundaryFace);
            if (ownFaceData || (read.IsLoopIndex && IndexesTarget(read, member.Source.Write)))
            {
                continue;
            }

            if (read.Role != DataRole.Cell || !AllIn(read.AllSubscripts, targetKeys))
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>
    /// True when the write goes to a neighbour of the loop's index: some subscript moved by one
    /// (<c>r[i - 1]</c>, <c>r[i, j + 1]</c>), none by more or by a symbol.
    /// </summary>
    private static bool IsNeighbourOfTheIndex(UpdateWrite write)
    {
        bool moved = false;
        foreach (var group in write.Subscripts)
        {
            foreach (var subscript in group)
            {
                if (subscript is not AffineSubscript { Index: { IsConstant: false } index } || index.Constant.IsZero)
                {
                    continue;
                }

                if (!index.Constant.IsConstant || index.Constant.ConstantValue.Abs() != Rational.One)
                {
                    return false;
                }

                moved = true;
            }
        }

        return moved;
    }

    /// <summary>True when every class holds one term and no two of them are one face evaluated two ways.</summary>
    private static bool AreLoneFaceTerms(List<ShiftClass> classes)
    {
        for (int k = 0; k < classes.Count; k++)
        {
            if (classes[k].Members.Count != 1)
            {
                return false;
            }

            for (int other = k + 1; other < classes.Count; other++)
            {
                if (EvaluatedTwoWays(classes[k], classes[other]))
                {
                    return false;
                }
            }
        }

        return true;
    }

    /// <summary>
    /// Two lone terms that are one face evaluated two ways: similar, with weights that cancel (or equal
    /// weights of the same function, an argument swapped), at two different faces (or cancelling calls
    /// of one function at one face).
    /// </summary>
    private static bool EvaluatedTwoWays(ShiftClass a, ShiftClass x) =>
        Similar(a, x)
        && ((a.Sum + x.Sum).IsZero || (SameFunction(a, x) && (a.Sum - x.Sum).IsZero))
        && (LeadingOffset(a.Representative) != LeadingOffset(x.Representative)
            || (SameFunction(a, x) && (a.Sum + x.Sum).IsZero));

    /// <summary>
    /// True when the loop variable read as a value (<c>x0 + (i + 0.5) * dx</c>) indexes the write's
    /// target cell directly (<c>r[i]</c>, <c>r[i + ng]</c>): the iteration names the cell, so the value
    /// is the cell's own data, wherever the target's offset puts it. Not through an index map: the face
    /// index of a face loop names a face, and its value is face data.
    /// </summary>
    private static bool IndexesTarget(ReadExpr loopIndex, UpdateWrite write)
    {
        if (loopIndex.Subscripts[0][0] is not AffineSubscript { Index.Linear.Length: 1 } index)
        {
            return false;
        }

        var variable = index.Index.Linear[0];

        foreach (var group in write.Subscripts)
        {
            foreach (var subscript in group)
            {
                if (subscript is AffineSubscript affine && affine.Index.Linear.Any(l => l.Key == variable.Key))
                {
                    return true;
                }
            }
        }

        return false;
    }

    /// <summary>True when every subscript's key is one of <paramref name="keys"/> (a few: a scan beats hashing).</summary>
    private static bool AllIn(IReadOnlyList<IndexTerm> subscripts, ImmutableArray<string> keys)
    {
        for (int k = 0; k < subscripts.Count; k++)
        {
            string key = subscripts[k].Key;
            bool found = false;
            foreach (var candidate in keys)
            {
                if (string.Equals(candidate, key, StringComparison.Ordinal))
                {
                    found = true;
                    break;
                }
            }

            if (!found)
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>
    /// Multiplies out the cell measure: a divisor indexed exactly like the target
    /// (<c>/ dx[i]</c>, <c>/ vol[c]</c>), since the conserved total is Σ measure · value.
    /// </summary>
    /// <summary>
    /// The writes of a face loop, each with its cell measure taken out. A precomputed inverse measure
    /// (a factor indexed like the target) counts only when every write of the loop has one from the
    /// same array (<c>* invVol[left]</c>, <c>* invVol[right]</c>): a factor that merely happens to be
    /// indexed like one target (the face area <c>width[i]</c> of a row of faces whose right cell is
    /// <c>i</c>) is part of the flux, not a measure.
    /// </summary>
    private static List<MeasuredWrite> FaceLoopWeighted(List<UpdateWrite> writes)
    {
        var weighted = writes.Select(MeasureWeighted).ToList();
        var inverseArrays = weighted.Select(x => x.Measure is ReciprocalExpr r ? "1/" + string.Join(",", r.Denominator.Reads.Select(read => read.Array + read.Path)) : string.Empty).Distinct(StringComparer.Ordinal).ToList();
        bool inverseConsistent = inverseArrays.Count == 1;
        return weighted
            .Select(x => x.Measure is ReciprocalExpr && !inverseConsistent ? new MeasuredWrite(x.Write, x.Write.Value, null) : x)
            .ToList();
    }

    private static MeasuredWrite MeasureWeighted(UpdateWrite write)
    {
        ReciprocalExpr? divisor = null;
        foreach (var t in write.Value.Terms)
        {
            divisor = t.Factors.OfType<ReciprocalExpr>().FirstOrDefault(r =>
                r.Denominator.Terms.Length == 1
                && r.Denominator.Terms[0].Coefficient.IsOne
                && r.Denominator.Terms[0].Factors.Length == 1
                && r.Denominator.Terms[0].Factors[0] is ReadExpr m
                && m.Role == DataRole.Cell
                && SubscriptKey(m) == write.SubscriptKey);
            if (divisor is not null)
            {
                break;
            }
        }

        if (divisor is null)
        {
            return InverseMeasureWeighted(write);
        }

        var measure = divisor.Denominator.Terms[0].Factors[0];
        var weighted = write.Value.Terms.Select(t =>
        {
            var factors = t.Factors.ToList();
            int k = factors.FindIndex(f => f.Key == divisor.Key);
            if (k >= 0)
            {
                factors.RemoveAt(k);
            }
            else
            {
                factors.Add(measure);
            }

            return new Term(t.Coefficient, factors, t.Origins);
        });
        return new MeasuredWrite(write, SumExpr.Of(weighted), measure);
    }

    /// <summary>
    /// A precomputed inverse measure (<c>* invVol[c]</c>): a factor indexed exactly like the target that
    /// multiplies every term reaching beyond the cell, from an array the write reads nowhere else (so
    /// <c>u[i] * (u[i + 1] - u[i - 1])</c> is not mistaken for one). The conserved total is then
    /// Σ value / factor, and the factor is divided out.
    /// </summary>
    private static MeasuredWrite InverseMeasureWeighted(UpdateWrite write)
    {
        var targetKeys = write.TargetSubscriptKeys;
        bool ReachesBeyond(Term t) => t.Reads.Any(r => r.Role != DataRole.Cell || !AllIn(r.AllSubscripts, targetKeys));
        var beyond = write.Value.Terms.Where(ReachesBeyond).ToList();
        if (beyond.Count == 0)
        {
            return new MeasuredWrite(write, write.Value, null);
        }

        var candidate = beyond[0].Factors.OfType<ReadExpr>().FirstOrDefault(w =>
            w.Role == DataRole.Cell && !w.IsLoopIndex && SubscriptKey(w) == write.SubscriptKey
            && beyond.All(t => t.Factors.Any(f => f.Key == w.Key))
            && write.Value.Terms.All(t => t.Reads.All(r => r.Array != w.Array || r.Key == w.Key)));
        if (candidate is null)
        {
            return new MeasuredWrite(write, write.Value, null);
        }

        var inverse = new ReciprocalExpr(SumExpr.Factor(candidate).StripOrigins());
        var weighted = write.Value.Terms.Select(t =>
        {
            var factors = t.Factors.ToList();
            int k = factors.FindIndex(f => f.Key == candidate.Key);
            if (k >= 0)
            {
                factors.RemoveAt(k);
            }
            else
            {
                factors.Add(inverse);
            }

            return new Term(t.Coefficient, factors, t.Origins);
        });
        return new MeasuredWrite(write, SumExpr.Of(weighted), inverse);
    }

    private static bool IsTargetElement(ReadExpr read, UpdateWrite write) =>
        read.Array == write.Array && read.Path == write.Path && SubscriptKey(read) == write.SubscriptKey;

    private static string SubscriptKey(ReadExpr read) => read.SubscriptKey;

    private static string CellKey(ClassMember m)
    {
        var back = m.Shift.ToDictionary(kv => kv.Key, kv => -kv.Value, StringComparer.Ordinal);
        return string.Join("][", m.Source.Write.Subscripts.Select(g => string.Join(",", g.Select(s => s.Shift(back).Key))));
    }

    /// <summary>
    /// The non-zero moves in ordinal order of the variables, <c>i=1;j=-1</c>, with invariant digits: equal
    /// texts, equal shifts; the FVC0001 fix parses it back (LoopShift.Parse).
    /// </summary>
    private static string ShiftKey(IReadOnlyDictionary<string, long> shift)
    {
        var moves = new List<KeyValuePair<string, long>>(shift.Count);
        foreach (var kv in shift)
        {
            if (kv.Value == 0)
            {
                continue;
            }

            int at = moves.Count;
            while (at > 0 && string.CompareOrdinal(moves[at - 1].Key, kv.Key) > 0)
            {
                at--;
            }

            moves.Insert(at, kv);
        }

        if (moves.Count == 0)
        {
            return string.Empty;
        }

        var text = new System.Text.StringBuilder();
        foreach (var move in moves)
        {
            text.Append(text.Length == 0 ? string.Empty : ";").Append(move.Key).Append('=').Append(move.Value.ToString(System.Globalization.CultureInfo.InvariantCulture));
        }

        return text.ToString();
    }

    /// <summary>A class member and the cell it updates.</summary>
    private sealed record MemberCell(ClassMember Member, string Cell);
}
