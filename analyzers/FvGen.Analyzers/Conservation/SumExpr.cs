using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// An expanded expression: a sum of terms with distinct bodies (terms with equal bodies are
/// merged, zero terms dropped). All algebra of the extraction goes through here.
/// </summary>
internal sealed class SumExpr
{
    /// <summary>Expansion stops beyond this many terms (the checker then says it could not model the update).</summary>
    public const int MaxTerms = 512;

    private string? _key;
    private string? _shapeKey;

    private SumExpr(ImmutableArray<Term> terms) => Terms = terms;

    public static SumExpr Zero { get; } = new(ImmutableArray<Term>.Empty);

    public ImmutableArray<Term> Terms { get; }

    /// <summary>Full identity (computed on first use: most intermediate sums never need it).</summary>
    public string Key => _key ??= string.Join("+", Terms.Select(t => "(" + t.Coefficient + ")" + t.BodyKey));

    public string ShapeKey => _shapeKey ??= string.Join("+", Terms.Select(t => t.BodyShapeKey).OrderBy(s => s, StringComparer.Ordinal));

    public bool IsZero => Terms.IsEmpty;

    /// <summary>True when nothing depends on the loop variables.</summary>
    public bool IsInvariant => Terms.All(t => t.IsInvariant);

    /// <summary>The value of an invariant sum as a coefficient.</summary>
    public SymPoly InvariantValue => Terms.Where(t => t.IsInvariant).Select(t => t.Coefficient).Aggregate(SymPoly.Zero, (a, b) => a + b);

    public IEnumerable<ReadExpr> Reads => Terms.SelectMany(t => t.Reads);

    public static SumExpr Invariant(SymPoly value, int origin = -1) =>
        Of(new[] { new Term(value, Array.Empty<Expr>(), origin < 0 ? ImmutableArray<int>.Empty : ImmutableArray.Create(origin)) });

    public static SumExpr Factor(Expr factor, int origin = -1) =>
        Of(new[] { new Term(SymPoly.One, new[] { factor }, origin < 0 ? ImmutableArray<int>.Empty : ImmutableArray.Create(origin)) });

    public static SumExpr Of(IEnumerable<Term> terms)
    {
        if (terms is Term[] { Length: 1 } single)
        {
            // One term: nothing to merge or order.
            return single[0].Coefficient.IsZero ? new SumExpr(ImmutableArray<Term>.Empty) : new SumExpr(ImmutableArray.Create(single[0]));
        }

        var byBody = new Dictionary<string, BodySum>(StringComparer.Ordinal);
        foreach (var t in terms)
        {
            if (byBody.TryGetValue(t.BodyKey, out var current))
            {
                current.Origins ??= new List<int>(current.First.Origins);
                current.Origins.AddRange(t.Origins);
                current.Coefficient += t.Coefficient;
            }
            else
            {
                byBody[t.BodyKey] = new BodySum(t);
            }
        }

        if (byBody.Count > MaxTerms)
        {
            throw new ModelLimitException($"the expansion has more than {MaxTerms} terms");
        }

        var keys = new string[byBody.Count];
        byBody.Keys.CopyTo(keys, 0);
        Array.Sort(keys, StringComparer.Ordinal);
        var result = ImmutableArray.CreateBuilder<Term>(keys.Length);
        foreach (var k in keys)
        {
            var e = byBody[k];
            if (!e.Coefficient.IsZero)
            {
                result.Add(e.Origins is null ? e.First : Merged(e.Coefficient, e.First, e.Origins));
            }
        }

        return new SumExpr(result.ToImmutable());
    }

    /// <summary>Terms of equal body combined: the first term's factors, the summed coefficient, every origin once in order of appearance.</summary>
    private static Term Merged(SymPoly coefficient, Term first, List<int> origins) =>
        new(coefficient, first.Factors, origins.Distinct().ToImmutableArray());

    public static SumExpr operator +(SumExpr a, SumExpr b) => a.IsZero ? b : b.IsZero ? a : Merge(a.Terms, b.Terms);

    /// <summary>
    /// The sum of two canonical sums (bodies in ordinal order, distinct, none zero) by one ordered
    /// merge: the same terms as <see cref="Of"/> on their concatenation, without hashing and sorting.
    /// </summary>
    private static SumExpr Merge(ImmutableArray<Term> a, ImmutableArray<Term> b)
    {
        var result = ImmutableArray.CreateBuilder<Term>(a.Length + b.Length);
        int i = 0, j = 0, distinct = 0;
        while (i < a.Length && j < b.Length)
        {
            distinct++;
            int order = string.CompareOrdinal(a[i].BodyKey, b[j].BodyKey);
            if (order < 0)
            {
                result.Add(a[i++]);
            }
            else if (order > 0)
            {
                result.Add(b[j++]);
            }
            else
            {
                var coefficient = a[i].Coefficient + b[j].Coefficient;
                if (!coefficient.IsZero)
                {
                    var origins = new List<int>(a[i].Origins);
                    origins.AddRange(b[j].Origins);
                    result.Add(Merged(coefficient, a[i], origins));
                }

                i++;
                j++;
            }
        }

        distinct += (a.Length - i) + (b.Length - j);
        if (distinct > MaxTerms)
        {
            throw new ModelLimitException($"the expansion has more than {MaxTerms} terms");
        }

        while (i < a.Length)
        {
            result.Add(a[i++]);
        }

        while (j < b.Length)
        {
            result.Add(b[j++]);
        }

        return new SumExpr(result.ToImmutable());
    }

    public static SumExpr operator -(SumExpr a) => a.Scale(-SymPoly.One);

    public static SumExpr operator -(SumExpr a, SumExpr b) => a + (-b);

    public SumExpr Scale(SymPoly factor) =>
        factor.IsZero ? Zero : new SumExpr(Terms.Select(t => t.WithCoefficient(t.Coefficient * factor)).ToImmutableArray());

    public static SumExpr operator *(SumExpr a, SumExpr b)
    {
        if ((long)a.Terms.Length * b.Terms.Length > MaxTerms * 4L)
        {
            throw new ModelLimitException($"the product expands to more than {MaxTerms * 4} terms");
        }

        var products = new Term[a.Terms.Length * b.Terms.Length];
        int n = 0;
        foreach (var x in a.Terms)
        {
            foreach (var y in b.Terms)
            {
                products[n++] = new Term(x.Coefficient * y.Coefficient, Product(x.Factors, y.Factors), x.Origins.AddRange(y.Origins));
            }
        }

        return Of(products);
    }

    /// <summary>The factors of a product of two bodies: one side alone when the other is empty (kept sorted), else both with reciprocal pairs cancelled.</summary>
    private static IEnumerable<Expr> Product(ImmutableArray<Expr> x, ImmutableArray<Expr> y)
    {
        if (x.IsEmpty)
        {
            return y;
        }

        if (y.IsEmpty)
        {
            return x;
        }

        var both = new List<Expr>(x.Length + y.Length);
        both.AddRange(x);
        both.AddRange(y);
        foreach (var f in both)
        {
            if (f is ReciprocalExpr)
            {
                return CancelReciprocals(both);
            }
        }

        return both;
    }

    /// <summary>Removes pairs <c>a · 1/a</c> from a product.</summary>
    private static List<Expr> CancelReciprocals(List<Expr> list)
    {
        for (int k = 0; k < list.Count; k++)
        {
            if (list[k] is ReciprocalExpr r && r.Denominator.Terms.Length == 1 && r.Denominator.Terms[0].Coefficient.IsOne && r.Denominator.Terms[0].Factors.Length == 1)
            {
                int match = list.FindIndex(f => f.Key == r.Denominator.Terms[0].Factors[0].Key);
                if (match >= 0)
                {
                    list.RemoveAt(Math.Max(k, match));
                    list.RemoveAt(Math.Min(k, match));
                    k = -1;
                }
            }
        }

        return list;
    }

    /// <summary>
    /// <c>1 / this</c>: exact for a monomial coefficient, a single factor distributes over the product,
    /// and a true sum becomes a <see cref="ReciprocalExpr"/> with its leading coefficient pulled out.
    /// </summary>
    public SumExpr Reciprocal(Func<SymPoly, SymPoly> opaqueInvariant)
    {
        if (IsZero)
        {
            throw new ModelLimitException("a division by zero");
        }

        if (IsInvariant)
        {
            var value = InvariantValue;
            return Invariant(value.TryReciprocal() ?? opaqueInvariant(value));
        }

        var origins = Terms.SelectMany(t => t.Origins).Distinct().ToImmutableArray();
        if (Terms.Length == 1)
        {
            var t = Terms[0];
            var coefficient = t.Coefficient.TryReciprocal() ?? opaqueInvariant(t.Coefficient);
            var result = Invariant(coefficient);
            foreach (var f in t.Factors)
            {
                var inverse = f is ReciprocalExpr r
                    ? r.Denominator
                    : Of(new[] { new Term(SymPoly.One, new Expr[] { new ReciprocalExpr(Of(new[] { new Term(SymPoly.One, new[] { f }, ImmutableArray<int>.Empty) })) }, origins) });
                result *= inverse;
            }

            return result;
        }

        var lead = Terms[0].Coefficient;
        var leadInverse = lead.TryReciprocal();
        if (leadInverse is null)
        {
            return Factor(new ReciprocalExpr(StripOrigins()), -1).WithOrigins(origins);
        }

        return Factor(new ReciprocalExpr(Scale(leadInverse).StripOrigins())).Scale(leadInverse).WithOrigins(origins);
    }

    /// <summary>The sum at iteration <c>i + n</c>; this sum itself when no term moves (it is canonical already).</summary>
    public SumExpr Shift(IReadOnlyDictionary<string, long> shift)
    {
        var shifted = Shifted.Each(Terms, shift, static (t, n) => t.Shift(n));
        return shifted == Terms ? this : Of(shifted);
    }

    /// <summary>An invariant that is a true sum (not a monomial) stands for itself as one opaque symbol.</summary>
    public static SymPoly OpaqueInvariant(SymPoly value) => SymPoly.Symbol("(" + CSharpText.Of(value) + ")");

    public SumExpr StripOrigins() => new(Terms.Select(t => new Term(t.Coefficient, t.Factors, ImmutableArray<int>.Empty)).ToImmutableArray());

    public SumExpr WithOrigins(ImmutableArray<int> origins) => new(Terms.Select(t => new Term(t.Coefficient, t.Factors, origins)).ToImmutableArray());

    /// <summary>C# text.</summary>
    public string Render()
    {
        if (IsZero)
        {
            return "0";
        }

        var parts = new List<string>();
        foreach (var t in Terms)
        {
            var (sign, text) = t.IsInvariant ? (t.Coefficient.LeadingSign, CSharpText.Of(t.Coefficient.LeadingSign < 0 ? -t.Coefficient : t.Coefficient)) : CSharpText.SignedProduct(t.Coefficient, t.RenderBody());
            parts.Add((parts.Count == 0 ? (sign < 0 ? "-" : string.Empty) : (sign < 0 ? " - " : " + ")) + text);
        }

        return string.Concat(parts);
    }

    public override string ToString() => Render();

    /// <summary>
    /// The terms of one body met so far: their summed coefficient, the first of them and, once a second comes,
    /// every origin.
    /// </summary>
    private sealed class BodySum
    {
        public BodySum(Term first)
        {
            First = first;
            Coefficient = first.Coefficient;
        }

        public Term First { get; }

        public SymPoly Coefficient { get; set; }

        public List<int>? Origins { get; set; }
    }
}
