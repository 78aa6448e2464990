using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Text;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A finite sum of exact rationals times monomials in loop-invariant symbols: a coefficient such as
/// <c>−dt/dx</c>, the sum of a shift class (<c>−1/dx + 1/dx = 0</c>), or the linear part of an index
/// (<c>nx + 1</c>). Zero terms are never stored, so a sum is zero exactly when it has no terms.
/// </summary>
internal sealed class SymPoly : IEquatable<SymPoly>
{
    // Both texts are built on first use: most intermediate coefficients are never compared or printed.
    private string? _key;
    private string? _text;

    private SymPoly(ImmutableArray<SparseEntry<Monomial, Rational>> terms) => Terms = terms;

    private string Key => _key ??= BuildKey();

    private string BuildKey()
    {
        var text = new StringBuilder();
        foreach (var t in Terms)
        {
            text.Append(text.Length == 0 ? string.Empty : " + ").Append(t.Value.ToString()).Append('*').Append(t.Key.Key);
        }

        return text.ToString();
    }

    public static SymPoly Zero { get; } = new(ImmutableArray<SparseEntry<Monomial, Rational>>.Empty);

    public static SymPoly One { get; } = Constant(Rational.One);

    /// <summary>Terms in monomial order, none zero.</summary>
    public ImmutableArray<SparseEntry<Monomial, Rational>> Terms { get; }

    public bool IsZero => Terms.IsEmpty;

    public bool IsOne => Terms.Length == 1 && Terms[0].Key.IsOne && Terms[0].Value.IsOne;

    /// <summary>True when the value is a plain rational number (no symbols).</summary>
    public bool IsConstant => Terms.IsEmpty || (Terms.Length == 1 && Terms[0].Key.IsOne);

    public Rational ConstantValue
    {
        get
        {
            foreach (var t in Terms)
            {
                if (t.Key.IsOne)
                {
                    return t.Value;
                }
            }

            return Rational.Zero;
        }
    }

    public bool IsMonomial => Terms.Length == 1;

    public static SymPoly Constant(Rational value) => Of(new[] { new SparseEntry<Monomial, Rational>(Monomial.One, value) });

    public static SymPoly Constant(long value) => Constant(Rational.FromInteger(value));

    public static SymPoly Symbol(string name, int power = 1) =>
        Of(new[] { new SparseEntry<Monomial, Rational>(Monomial.Symbol(name, power), Rational.One) });

    public static SymPoly Of(IEnumerable<SparseEntry<Monomial, Rational>> terms)
    {
        if (terms is SparseEntry<Monomial, Rational>[] { Length: 1 } single)
        {
            // One term (a constant or a symbol): nothing to merge or order.
            return new SymPoly(single[0].Value.IsZero ? ImmutableArray<SparseEntry<Monomial, Rational>>.Empty : ImmutableArray.Create(single[0]));
        }

        var list = new List<SparseEntry<Monomial, Rational>>();
        foreach (var t in terms)
        {
            list.Add(t);
        }

        return Normalized(list);
    }

    /// <summary>
    /// Terms put in monomial order with equal monomials added and zeros dropped. An insertion sort
    /// with loops of our own: a coefficient has a few terms.
    /// </summary>
    private static SymPoly Normalized(List<SparseEntry<Monomial, Rational>> terms)
    {
        for (int k = 1; k < terms.Count; k++)
        {
            var item = terms[k];
            int at = k;
            while (at > 0 && terms[at - 1].Key.CompareTo(item.Key) > 0)
            {
                terms[at] = terms[at - 1];
                at--;
            }

            terms[at] = item;
        }

        var result = ImmutableArray.CreateBuilder<SparseEntry<Monomial, Rational>>(terms.Count);
        for (int k = 0; k < terms.Count;)
        {
            var monomial = terms[k].Key;
            var value = terms[k].Value;
            for (k++; k < terms.Count && terms[k].Key.CompareTo(monomial) == 0; k++)
            {
                value += terms[k].Value;
            }

            if (!value.IsZero)
            {
                result.Add(new SparseEntry<Monomial, Rational>(monomial, value));
            }
        }

        return new SymPoly(result.Count == result.Capacity ? result.MoveToImmutable() : result.ToImmutable());
    }

    /// <summary>Each term's value changed by <paramref name="map"/> (never to zero: negation and non-zero scaling).</summary>
    private SymPoly MapValues(Func<Rational, Rational> map)
    {
        var result = ImmutableArray.CreateBuilder<SparseEntry<Monomial, Rational>>(Terms.Length);
        foreach (var t in Terms)
        {
            result.Add(new SparseEntry<Monomial, Rational>(t.Key, map(t.Value)));
        }

        return new SymPoly(result.MoveToImmutable());
    }

    public static SymPoly operator +(SymPoly a, SymPoly b) => a.IsZero ? b : b.IsZero ? a : Merge(a.Terms, b.Terms);

    /// <summary>
    /// The sum of two canonical term lists (monomial order, none zero) by one ordered merge: the same
    /// result as <see cref="Of"/> on their concatenation, without re-sorting.
    /// </summary>
    private static SymPoly Merge(ImmutableArray<SparseEntry<Monomial, Rational>> a, ImmutableArray<SparseEntry<Monomial, Rational>> b) =>
        new(OrderedMerge.Sum(a, b, static (x, y) => x.CompareTo(y), static (x, y) => x + y, static v => v.IsZero));

    public static SymPoly operator -(SymPoly a) => a.MapValues(static v => -v);

    public static SymPoly operator -(SymPoly a, SymPoly b) => a + (-b);

    public static SymPoly operator *(SymPoly a, SymPoly b)
    {
        if (a.IsZero || b.IsZero)
        {
            return Zero;
        }

        if (a.IsOne)
        {
            return b;
        }

        if (b.IsOne)
        {
            return a;
        }

        if (a.IsMonomial && b.IsMonomial)
        {
            return Of(new[] { new SparseEntry<Monomial, Rational>(a.Terms[0].Key * b.Terms[0].Key, a.Terms[0].Value * b.Terms[0].Value) });
        }

        var products = new List<SparseEntry<Monomial, Rational>>(a.Terms.Length * b.Terms.Length);
        foreach (var x in a.Terms)
        {
            foreach (var y in b.Terms)
            {
                products.Add(new SparseEntry<Monomial, Rational>(x.Key * y.Key, x.Value * y.Value));
            }
        }

        return Normalized(products);
    }

    public static SymPoly operator *(SymPoly a, Rational r) => r.IsZero ? Zero : r.IsOne ? a : a.MapValues(v => v * r);

    /// <summary>The reciprocal of a single monomial; null for a sum (which stays an opaque symbol).</summary>
    public SymPoly? TryReciprocal()
    {
        if (!IsMonomial)
        {
            return null;
        }

        var t = Terms[0];
        return new SymPoly(ImmutableArray.Create(new SparseEntry<Monomial, Rational>(t.Key.Reciprocal(), Rational.One / t.Value)));
    }

    /// <summary>Sign of the leading term (used to pull a sign out of a canonical sum).</summary>
    public int LeadingSign => Terms.IsEmpty ? 0 : Terms[0].Value.Sign;

    public bool Equals(SymPoly? other) => other is not null && (ReferenceEquals(this, other) || Key == other.Key);

    public override bool Equals(object? obj) => obj is SymPoly p && Equals(p);

    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(Key);

    /// <summary>Readable text: <c>-1/dx</c>, <c>dt/dx - dt/dy</c>, <c>0</c>.</summary>
    public override string ToString() => _text ??= Format();

    private string Format()
    {
        if (IsZero)
        {
            return "0";
        }

        var sb = new StringBuilder();
        bool first = true;
        foreach (var t in Terms)
        {
            var value = t.Value;
            if (!first)
            {
                sb.Append(value.Sign < 0 ? " - " : " + ");
                value = value.Abs();
            }

            sb.Append(FormatTerm(value, t.Key));
            first = false;
        }

        return sb.ToString();
    }

    private static string FormatTerm(Rational value, Monomial monomial)
    {
        if (monomial.IsOne)
        {
            return value.ToString();
        }

        string m = monomial.ToString();
        bool startsWithOne = m.StartsWith("1/", StringComparison.Ordinal);
        if (value.IsInteger)
        {
            if (value.Numerator.IsOne)
            {
                return m;
            }

            if (value == Rational.MinusOne)
            {
                return "-" + m;
            }

            return startsWithOne ? value + m.Substring(1) : value + "·" + m;
        }

        string num = value.Numerator.ToString(System.Globalization.CultureInfo.InvariantCulture);
        string den = value.Denominator.ToString(System.Globalization.CultureInfo.InvariantCulture);
        int slash = m.IndexOf('/');
        string up = slash < 0 ? m : m.Substring(0, slash);
        string down = slash < 0 ? string.Empty : m.Substring(slash + 1);
        string upText = up == "1" ? num : (num == "1" ? up : num == "-1" ? "-" + up : num + "·" + up);
        return upText + "/" + (down.Length == 0 ? den : "(" + den + "·" + down + ")");
    }
}
