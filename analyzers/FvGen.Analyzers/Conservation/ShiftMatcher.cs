using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Decides whether one body is another moved by a lattice shift: the same shape, the same linear
/// part of every index, and offsets that differ by the loop's linear map applied to one integer
/// vector (a multiple of each variable's step; zero for collection variables). Commutative
/// products and symmetric calls may be matched in any order; an antisymmetric flux may be matched
/// swapped, with a sign.
/// </summary>
internal static class ShiftMatcher
{
    /// <summary>Upper bound on alignments tried for one pair of bodies (products and symmetric calls permute).</summary>
    private const int MaxAlignments = 4096;

    /// <summary>
    /// The shift that moves nothing. Shifts are read-only maps from loop variable to move; plain
    /// dictionaries rather than immutable ones, whose generic code over a value type the JIT would
    /// compile afresh in every short-lived compiler process.
    /// </summary>
    public static readonly IReadOnlyDictionary<string, long> NoShift = new Dictionary<string, long>(StringComparer.Ordinal);

    /// <summary>
    /// A found shift: body B equals <see cref="Sign"/> times <see cref="Scale"/> times body A at
    /// iteration <c>i + Shift</c> (the scale is one unless a reciprocal pulled out another weight).
    /// </summary>
    public sealed record Match(IReadOnlyDictionary<string, long> Shift, int Sign, SymPoly Scale)
    {
        public Match(IReadOnlyDictionary<string, long> shift, int sign)
            : this(shift, sign, SymPoly.One)
        {
        }
    }

    /// <summary>Finds how <paramref name="b"/> is a shifted copy of <paramref name="a"/>, or null.</summary>
    public static Match? TryMatch(Term a, Term b, LoopSpace space)
    {
        if (a.BodyShapeKey != b.BodyShapeKey || a.Factors.Length != b.Factors.Length)
        {
            return null;
        }

        var fast = FastMatch(a, b, space);
        if (fast is not null || !NeedsAlignment(a))
        {
            return fast;
        }

        int tried = 0;
        foreach (var (pairs, sign) in MatchFactors(a.Factors, b.Factors, IndexPairChain.Empty, 1))
        {
            if (++tried > MaxAlignments)
            {
                return null;
            }

            var shift = Solve(pairs.ToArray(), space);
            if (shift is not null)
            {
                return new Match(shift, sign);
            }
        }

        return null;
    }

    /// <summary>
    /// Bodies are kept in a canonical order (products and sums sorted by key, symmetric calls'
    /// arguments too), so B is A moved by n exactly when A shifted by n has B's key. The shift must take
    /// A's anchor reads onto reads of B of the same shape: those few candidates are tried. The anchor is
    /// A's first read, or more reads when the first leaves a loop variable out (a coefficient
    /// <c>ax[j]</c> sorts before <c>c[i - 1, j]</c> in <c>ax[j] · c[i - 1, j]</c> and says nothing of i).
    /// </summary>
    private static Match? FastMatch(Term a, Term b, LoopSpace space)
    {
        var readsA = a.Reads;
        if (readsA.Count == 0)
        {
            return a.BodyKey == b.BodyKey ? new Match(ShiftMatcher.NoShift, 1) : null;
        }

        var search = new AnchorSearch(a, b, space, a.AnchorsIn(space));
        return search.Run(0);
    }

    /// <summary>
    /// The reads of a body whose subscripts together name every lattice variable that any of its reads
    /// names: the first read alone in the common case, else the first and, one at a time, the read
    /// naming most of the variables still unnamed.
    /// </summary>
    public static IReadOnlyList<ReadExpr> Anchors(IReadOnlyList<ReadExpr> reads, IReadOnlyList<LoopVariable> lattice)
    {
        if (reads.Count == 1 || lattice.Count < 2 || lattice.Count > 31)
        {
            return new[] { reads[0] };
        }

        var masks = new int[reads.Count];
        int needed = 0;
        for (int r = 0; r < reads.Count; r++)
        {
            masks[r] = VariablesNamed(reads[r], lattice);
            needed |= masks[r];
        }

        int covered = masks[0];
        if (covered == needed)
        {
            return new[] { reads[0] };
        }

        var anchors = new List<ReadExpr> { reads[0] };
        while (covered != needed)
        {
            int best = -1;
            int bestCount = 0;
            for (int r = 1; r < reads.Count; r++)
            {
                int count = BitCount(masks[r] & ~covered);
                if (count > bestCount)
                {
                    best = r;
                    bestCount = count;
                }
            }

            anchors.Add(reads[best]);
            covered |= masks[best];
        }

        return anchors;
    }

    /// <summary>The lattice variables a read's subscripts name, as bits in the order of <paramref name="lattice"/>.</summary>
    private static int VariablesNamed(ReadExpr read, IReadOnlyList<LoopVariable> lattice)
    {
        int mask = 0;
        foreach (var subscript in read.AllSubscripts)
        {
            foreach (var index in subscript.AffineParts)
            {
                foreach (var linear in index.Linear)
                {
                    for (int v = 0; v < lattice.Count; v++)
                    {
                        if (lattice[v].Name == linear.Key)
                        {
                            mask |= 1 << v;
                        }
                    }
                }
            }
        }

        return mask;
    }

    private static int BitCount(int mask)
    {
        int count = 0;
        for (; mask != 0; mask &= mask - 1)
        {
            count++;
        }

        return count;
    }

    /// <summary>
    /// Tries every choice of a read of B for each anchor read of A (same shape; each distinct choice once),
    /// solves for the shift the pairs give and compares the bodies under it.
    /// </summary>
    private sealed class AnchorSearch
    {
        private readonly Term _a;
        private readonly Term _b;
        private readonly LoopSpace _space;
        private readonly IReadOnlyList<ReadExpr> _anchors;
        private readonly List<IndexPair> _pairs = new();
        private readonly string[] _chosen;

        // Many reads of B share an anchor's shape (u[•] in a limiter); each distinct choice is tried once.
        private readonly HashSet<string> _tried = new(StringComparer.Ordinal);
        private int _budget = MaxAlignments;

        public AnchorSearch(Term a, Term b, LoopSpace space, IReadOnlyList<ReadExpr> anchors)
        {
            _a = a;
            _b = b;
            _space = space;
            _anchors = anchors;
            _chosen = new string[anchors.Count];
        }

        public Match? Run(int anchor)
        {
            var reads = _b.Reads;
            for (int n = 0; n < reads.Count; n++)
            {
                var candidate = reads[n];
                if (candidate.ShapeKey != _anchors[anchor].ShapeKey)
                {
                    continue;
                }

                int mark = _pairs.Count;
                _chosen[anchor] = candidate.Key;
                if (PairReads(_anchors[anchor], candidate, _pairs))
                {
                    var match = anchor + 1 < _anchors.Count ? Run(anchor + 1) : TryChoice();
                    if (match is not null)
                    {
                        return match;
                    }
                }

                _pairs.RemoveRange(mark, _pairs.Count - mark);
                if (_budget <= 0)
                {
                    return null;
                }
            }

            return null;
        }

        private Match? TryChoice()
        {
            _budget--;
            if (!_tried.Add(_chosen.Length == 1 ? _chosen[0] : string.Join("|", _chosen)))
            {
                return null;
            }

            var shift = Solve(_pairs, _space);
            if (shift is null)
            {
                return null;
            }

            switch (ShiftedEquality.Bodies(_a, _b, shift))
            {
                case true:
                    return new Match(shift, 1);
                case null when _a.Shift(shift, out var scale) is { } moved && moved.BodyKey == _b.BodyKey:
                    return new Match(shift, 1, scale);
                default:
                    return null;
            }
        }
    }

    /// <summary>Only antisymmetric flips need the full alignment search; everything else is canonical.</summary>
    private static bool NeedsAlignment(Term a) => a.Factors.Any(NeedsAlignment);

    private static bool NeedsAlignment(Expr e) => e switch
    {
        CallExpr c => c.Symmetry == CallSymmetry.Antisymmetric || c.Arguments.Any(s => s.Terms.Any(NeedsAlignment)),
        ReciprocalExpr r => r.Denominator.Terms.Any(NeedsAlignment),
        _ => false,
    };

    /// <summary>The integer shift vector that maps every first index of a pair onto its second, or null.</summary>
    public static IReadOnlyDictionary<string, long>? Solve(IReadOnlyList<IndexPair> pairs, LoopSpace space)
    {
        if (AllConstant(pairs))
        {
            return SolveConstant(pairs, space);
        }

        var unknowns = space.LatticeVariables;
        var rowsByMonomial = new List<Rational[]>();
        foreach (var (a, b) in pairs)
        {
            if (a.LinearKey != b.LinearKey)
            {
                return null;
            }

            var difference = b.Constant - a.Constant;
            var monomials = new HashSet<Monomial>(difference.Terms.Select(t => t.Key));
            foreach (var v in unknowns)
            {
                foreach (var t in a.CoefficientOf(v.Name).Terms)
                {
                    monomials.Add(t.Key);
                }
            }

            foreach (var m in monomials)
            {
                var row = new Rational[unknowns.Count + 1];
                for (int k = 0; k < unknowns.Count; k++)
                {
                    row[k] = Coefficient(a.CoefficientOf(unknowns[k].Name), m) * Rational.FromInteger(unknowns[k].Step);
                }

                row[unknowns.Count] = Coefficient(difference, m);
                rowsByMonomial.Add(row);
            }
        }

        return ToShift(LinearSolver.TrySolveSeparated(rowsByMonomial, unknowns.Count, out var separated) ? separated : LinearSolver.Solve(rowsByMonomial, unknowns.Count), unknowns);
    }

    /// <summary>True when no index of any pair carries a symbol: each pair then gives one row of plain numbers.</summary>
    private static bool AllConstant(IReadOnlyList<IndexPair> pairs)
    {
        for (int n = 0; n < pairs.Count; n++)
        {
            var (a, b) = pairs[n];
            if (!a.Constant.IsConstant || !b.Constant.IsConstant)
            {
                return false;
            }

            foreach (var l in a.Linear)
            {
                if (!l.Value.IsConstant)
                {
                    return false;
                }
            }
        }

        return true;
    }

    /// <summary>The shift named by a solution (each unknown counts steps of its variable), or null when there is none or it is not integral.</summary>
    private static IReadOnlyDictionary<string, long>? ToShift(Rational[]? x, IReadOnlyList<LoopVariable> unknowns)
    {
        if (x is null)
        {
            return null;
        }

        foreach (var value in x)
        {
            if (!value.IsInteger)
            {
                return null;
            }
        }

        var result = new Dictionary<string, long>(unknowns.Count, StringComparer.Ordinal);
        for (int k = 0; k < unknowns.Count; k++)
        {
            result[unknowns[k].Name] = (long)x[k].Numerator * unknowns[k].Step;
        }

        return result;
    }

    /// <summary>The same system when no index carries a symbol (the common case): one row per pair.</summary>
    private static IReadOnlyDictionary<string, long>? SolveConstant(IReadOnlyList<IndexPair> pairs, LoopSpace space)
    {
        var unknowns = space.LatticeVariables;
        var rows = new List<Rational[]>(pairs.Count);
        foreach (var (a, b) in pairs)
        {
            if (a.LinearKey != b.LinearKey)
            {
                return null;
            }

            var row = new Rational[unknowns.Count + 1];
            for (int k = 0; k < unknowns.Count; k++)
            {
                row[k] = a.CoefficientOf(unknowns[k].Name).ConstantValue * Rational.FromInteger(unknowns[k].Step);
            }

            row[unknowns.Count] = b.Constant.ConstantValue - a.Constant.ConstantValue;
            if (!IsZeroRow(row))
            {
                rows.Add(row);
            }
        }

        if (rows.Count == 0)
        {
            return ToShift(LinearSolver.Zeros(unknowns.Count), unknowns);
        }

        return ToShift(LinearSolver.TrySolveSeparated(rows, unknowns.Count, out var separated) ? separated : LinearSolver.Solve(rows, unknowns.Count), unknowns);
    }

    private static bool IsZeroRow(Rational[] row)
    {
        foreach (var r in row)
        {
            if (!r.IsZero)
            {
                return false;
            }
        }

        return true;
    }

    private static Rational Coefficient(SymPoly p, Monomial m)
    {
        foreach (var t in p.Terms)
        {
            if (t.Key.Equals(m))
            {
                return t.Value;
            }
        }

        return Rational.Zero;
    }

    private static IEnumerable<(IndexPairChain Pairs, int Sign)> MatchFactors(
        ImmutableArray<Expr> a, ImmutableArray<Expr> b, IndexPairChain acc, int sign)
    {
        if (a.IsEmpty)
        {
            if (b.IsEmpty)
            {
                yield return (acc, sign);
            }

            yield break;
        }

        var first = a[0];
        var restA = a.RemoveAt(0);
        for (int k = 0; k < b.Length; k++)
        {
            if (b[k].ShapeKey != first.ShapeKey)
            {
                continue;
            }

            var restB = b.RemoveAt(k);
            foreach (var (pairs, s) in MatchExpr(first, b[k], acc))
            {
                foreach (var result in MatchFactors(restA, restB, pairs, sign * s))
                {
                    yield return result;
                }
            }
        }
    }

    private static IEnumerable<(IndexPairChain Pairs, int Sign)> MatchExpr(
        Expr x, Expr y, IndexPairChain acc)
    {
        switch (x, y)
        {
            case (ReadExpr rx, ReadExpr ry):
                var pairs = MatchReads(rx, ry, acc);
                if (pairs is not null)
                {
                    yield return (pairs, 1);
                }

                yield break;

            case (CallExpr cx, CallExpr cy) when cx.Function == cy.Function && cx.Arguments.Length == cy.Arguments.Length:
                foreach (var r in MatchCall(cx, cy, acc))
                {
                    yield return r;
                }

                yield break;

            case (ReciprocalExpr qx, ReciprocalExpr qy):
                foreach (var r in MatchSum(qx.Denominator, qy.Denominator, acc))
                {
                    yield return r;
                }

                yield break;
        }
    }

    /// <summary>The index pairs of two reads of one array, into <paramref name="pairs"/>; false when their subscripts cannot correspond.</summary>
    private static bool PairReads(ReadExpr x, ReadExpr y, List<IndexPair> pairs)
    {
        if (x.Array != y.Array || x.Path != y.Path || x.Subscripts.Length != y.Subscripts.Length)
        {
            return false;
        }

        for (int g = 0; g < x.Subscripts.Length; g++)
        {
            var gx = x.Subscripts[g];
            var gy = y.Subscripts[g];
            if (gx.Length != gy.Length)
            {
                return false;
            }

            for (int k = 0; k < gx.Length; k++)
            {
                switch (gx[k], gy[k])
                {
                    case (AffineSubscript ax, AffineSubscript ay):
                        pairs.Add(new IndexPair(ax.Index, ay.Index));
                        break;
                    case (MappedSubscript mx, MappedSubscript my) when mx.Map == my.Map && mx.Arguments.Length == my.Arguments.Length:
                        for (int n = 0; n < mx.Arguments.Length; n++)
                        {
                            pairs.Add(new IndexPair(mx.Arguments[n], my.Arguments[n]));
                        }

                        break;
                    default:
                        return false;
                }
            }
        }

        return true;
    }

    private static IndexPairChain? MatchReads(ReadExpr x, ReadExpr y, IndexPairChain acc)
    {
        var pairs = new List<IndexPair>();
        return PairReads(x, y, pairs) ? acc.Extend(pairs) : null;
    }

    private static IEnumerable<(IndexPairChain Pairs, int Sign)> MatchCall(
        CallExpr x, CallExpr y, IndexPairChain acc)
    {
        int n = x.Arguments.Length;
        IEnumerable<ArgumentOrder> orders = x.Symmetry switch
        {
            CallSymmetry.Symmetric => Permutations(n).Select(p => new ArgumentOrder(p, Filled(n, 1), 1)),
            CallSymmetry.Antisymmetric when n >= 2 => new[]
            {
                new ArgumentOrder(Identity(n), Filled(n, 1), 1),
                new ArgumentOrder(FirstTwoSwapped(n), ThirdNegated(n), -1),
            },
            _ => new[] { new ArgumentOrder(Identity(n), Filled(n, 1), 1) },
        };

        foreach (var (order, argumentSigns, sign) in orders)
        {
            foreach (var pairs in MatchArguments(x, y, order, argumentSigns, 0, acc))
            {
                yield return (pairs, sign);
            }
        }
    }

    private static IEnumerable<IndexPairChain> MatchArguments(
        CallExpr x, CallExpr y, int[] order, int[] argumentSigns, int k, IndexPairChain acc)
    {
        if (k == order.Length)
        {
            yield return acc;
            yield break;
        }

        foreach (var (pairs, s) in MatchSum(x.Arguments[k], y.Arguments[order[k]], acc))
        {
            if (s == argumentSigns[k])
            {
                foreach (var r in MatchArguments(x, y, order, argumentSigns, k + 1, pairs))
                {
                    yield return r;
                }
            }
        }
    }

    /// <summary>Matches two sums term by term; the sign says whether <c>y = x</c> or <c>y = −x</c>.</summary>
    private static IEnumerable<(IndexPairChain Pairs, int Sign)> MatchSum(
        SumExpr x, SumExpr y, IndexPairChain acc)
    {
        if (x.Terms.Length != y.Terms.Length)
        {
            yield break;
        }

        foreach (var r in MatchTerms(x.Terms, y.Terms, acc, 0))
        {
            yield return r;
        }
    }

    private static IEnumerable<(IndexPairChain Pairs, int Sign)> MatchTerms(
        ImmutableArray<Term> x, ImmutableArray<Term> y, IndexPairChain acc, int sign)
    {
        if (x.IsEmpty)
        {
            yield return (acc, sign == 0 ? 1 : sign);
            yield break;
        }

        var first = x[0];
        for (int k = 0; k < y.Length; k++)
        {
            var candidate = y[k];
            if (candidate.BodyShapeKey != first.BodyShapeKey)
            {
                continue;
            }

            if (first.IsInvariant)
            {
                int s = SignRelating(first.Coefficient, candidate.Coefficient, 1);
                if (s != 0 && (sign == 0 || s == sign))
                {
                    foreach (var r in MatchTerms(x.RemoveAt(0), y.RemoveAt(k), acc, s))
                    {
                        yield return r;
                    }
                }

                continue;
            }

            foreach (var (pairs, t) in MatchFactors(first.Factors, candidate.Factors, acc, 1))
            {
                int s = SignRelating(first.Coefficient, candidate.Coefficient, t);
                if (s != 0 && (sign == 0 || s == sign))
                {
                    foreach (var r in MatchTerms(x.RemoveAt(0), y.RemoveAt(k), pairs, s))
                    {
                        yield return r;
                    }
                }
            }
        }
    }

    /// <summary>The overall sign s with <c>cy · t = s · cx</c>, or 0 when the coefficients are not related by a sign.</summary>
    private static int SignRelating(SymPoly cx, SymPoly cy, int t)
    {
        var scaled = t > 0 ? cy : -cy;
        if (scaled.Equals(cx))
        {
            return 1;
        }

        return (-scaled).Equals(cx) ? -1 : 0;
    }

    /// <summary>
    /// How a call's arguments are matched to its counterpart's: the counterpart argument for each, the sign each
    /// must match with, and the sign of the whole call. The small array helpers below stand in for
    /// Enumerable.Range and Repeat over int, whose iterators the JIT would compile in every fresh compiler.
    /// </summary>
    private sealed record ArgumentOrder(int[] Order, int[] ArgumentSigns, int Sign);

    private static int[] Identity(int n)
    {
        var order = new int[n];
        for (int k = 0; k < n; k++)
        {
            order[k] = k;
        }

        return order;
    }

    private static int[] Filled(int n, int value)
    {
        var values = new int[n];
        for (int k = 0; k < n; k++)
        {
            values[k] = value;
        }

        return values;
    }

    /// <summary>The order for an antisymmetric flux, F(a, b, n) = −F(b, a, −n): the first two arguments trade places.</summary>
    private static int[] FirstTwoSwapped(int n)
    {
        var order = Identity(n);
        (order[0], order[1]) = (1, 0);
        return order;
    }

    /// <summary>The signs that go with <see cref="FirstTwoSwapped"/>: a third argument, if any, enters negated.</summary>
    private static int[] ThirdNegated(int n)
    {
        var signs = Filled(n, 1);
        if (n > 2)
        {
            signs[2] = -1;
        }

        return signs;
    }

    private static IEnumerable<int[]> Permutations(int n)
    {
        if (n > 4)
        {
            yield return Identity(n);
            yield break;
        }

        foreach (var p in Permute(new List<int>(Identity(n))))
        {
            yield return p.ToArray();
        }
    }

    private static IEnumerable<List<int>> Permute(List<int> items)
    {
        if (items.Count <= 1)
        {
            yield return new List<int>(items);
            yield break;
        }

        for (int k = 0; k < items.Count; k++)
        {
            var rest = new List<int>(items);
            rest.RemoveAt(k);
            foreach (var p in Permute(rest))
            {
                p.Insert(0, items[k]);
                yield return p;
            }
        }
    }
}
