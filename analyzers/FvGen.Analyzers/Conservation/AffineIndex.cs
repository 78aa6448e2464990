using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using System.Text;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// An index affine in the loop variables, with coefficients that may be loop-invariant symbols:
/// <c>i + 1</c>, <c>2*i + 1</c>, <c>j*(nx + 1) + i</c>.
/// </summary>
internal sealed class AffineIndex : IEquatable<AffineIndex>
{
    private string? _key;

    public AffineIndex(SymPoly constant, IEnumerable<SparseEntry<string, SymPoly>> linear)
        : this(constant, Canonical(linear), null)
    {
    }

    /// <summary>From a linear part already in canonical form (and its key when known): a shift moves only the constant.</summary>
    private AffineIndex(SymPoly constant, ImmutableArray<SparseEntry<string, SymPoly>> linear, string? linearKey)
    {
        Constant = constant;
        Linear = linear;
        _linearKey = linearKey ?? (linear.IsEmpty ? string.Empty : null);
    }

    private string? _linearKey;

    /// <summary>The non-zero coefficients ordered by variable name (a stable insertion sort: there are one to three).</summary>
    private static ImmutableArray<SparseEntry<string, SymPoly>> Canonical(IEnumerable<SparseEntry<string, SymPoly>> linear)
    {
        var kept = new List<SparseEntry<string, SymPoly>>();
        foreach (var l in linear)
        {
            if (l.Value.IsZero)
            {
                continue;
            }

            int at = kept.Count;
            while (at > 0 && string.CompareOrdinal(kept[at - 1].Key, l.Key) > 0)
            {
                at--;
            }

            kept.Insert(at, l);
        }

        return kept.ToImmutableArray();
    }

    /// <summary>The part that does not depend on a loop variable.</summary>
    public SymPoly Constant { get; }

    /// <summary>Coefficient of each loop variable, ordinal by variable name, none zero.</summary>
    public ImmutableArray<SparseEntry<string, SymPoly>> Linear { get; }

    /// <summary>Identifies the linear part only (the "shape" of the index); built on first use.</summary>
    public string LinearKey => _linearKey ??= string.Join(";", Linear.Select(l => l.Key + ":" + l.Value));

    public string Key => _key ??= LinearKey + "|" + Constant;

    public bool IsConstant => Linear.IsEmpty;

    public static AffineIndex FromConstant(SymPoly constant) =>
        constant.IsZero ? Zero : new(constant, ImmutableArray<SparseEntry<string, SymPoly>>.Empty, string.Empty);

    /// <summary>The index 0.</summary>
    public static AffineIndex Zero { get; } = new(SymPoly.Zero, ImmutableArray<SparseEntry<string, SymPoly>>.Empty, string.Empty);

    public static AffineIndex Variable(string name) =>
        new(SymPoly.Zero, ImmutableArray.Create(new SparseEntry<string, SymPoly>(name, SymPoly.One)), null);

    public SymPoly CoefficientOf(string variable)
    {
        foreach (var l in Linear)
        {
            if (l.Key == variable)
            {
                return l.Value;
            }
        }

        return SymPoly.Zero;
    }

    public static AffineIndex operator +(AffineIndex a, AffineIndex b)
    {
        if (a.Linear.IsEmpty && a.Constant.IsZero)
        {
            return b;
        }

        if (b.Linear.IsEmpty && b.Constant.IsZero)
        {
            return a;
        }

        var constant = a.Constant + b.Constant;
        if (b.Linear.IsEmpty)
        {
            return new(constant, a.Linear, a._linearKey);
        }

        if (a.Linear.IsEmpty)
        {
            return new(constant, b.Linear, b._linearKey);
        }

        return new(constant, Merge(a.Linear, b.Linear), null);
    }

    // Negating or scaling by a non-zero factor keeps every coefficient non-zero and the order: still canonical.
    public static AffineIndex operator -(AffineIndex a) =>
        new(-a.Constant, a.Linear.Select(l => new SparseEntry<string, SymPoly>(l.Key, -l.Value)).ToImmutableArray(), null);

    public static AffineIndex operator -(AffineIndex a, AffineIndex b) => a + (-b);

    /// <summary>Product with a loop-invariant factor.</summary>
    public AffineIndex Scale(SymPoly factor) =>
        factor.IsZero
            ? new(Constant * factor, ImmutableArray<SparseEntry<string, SymPoly>>.Empty, null)
            : new(Constant * factor, Linear.Select(l => new SparseEntry<string, SymPoly>(l.Key, l.Value * factor)).ToImmutableArray(), null);

    /// <summary>The index after the loop variables move by <paramref name="shift"/> (iteration <c>i → i + n</c>).</summary>
    public AffineIndex Shift(IReadOnlyDictionary<string, long> shift)
    {
        var constant = Constant;
        bool moved = false;
        foreach (var l in Linear)
        {
            if (shift.TryGetValue(l.Key, out long n) && n != 0)
            {
                constant += l.Value * Rational.FromInteger(n);
                moved = true;
            }
        }

        return moved ? new AffineIndex(constant, Linear, LinearKey) : this;
    }

    /// <summary>The sum of two canonical linear parts by one ordered merge (zero sums dropped): still canonical.</summary>
    private static ImmutableArray<SparseEntry<string, SymPoly>> Merge(ImmutableArray<SparseEntry<string, SymPoly>> a, ImmutableArray<SparseEntry<string, SymPoly>> b) =>
        OrderedMerge.Sum(a, b, string.CompareOrdinal, static (x, y) => x + y, static v => v.IsZero);

    public bool Equals(AffineIndex? other) => other is not null && Key == other.Key;

    public override bool Equals(object? obj) => obj is AffineIndex a && Equals(a);

    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(Key);

    /// <summary>C# text, variables first: <c>j * (nx + 1) + i + 1</c>.</summary>
    public override string ToString()
    {
        var sb = new StringBuilder();
        for (int k = Linear.Length - 1; k >= 0; k--)
        {
            var (sign, text) = Scaled(Linear[k].Value, Linear[k].Key);
            AppendSigned(sb, sign, text);
        }

        foreach (var t in Constant.Terms)
        {
            var single = SymPoly.Of(new[] { new SparseEntry<Monomial, Rational>(t.Key, t.Value.Abs()) });
            AppendSigned(sb, t.Value.Sign, CSharpText.Of(single));
        }

        return sb.Length == 0 ? "0" : sb.ToString();
    }

    private static void AppendSigned(StringBuilder sb, int sign, string text) =>
        sb.Append(sb.Length == 0 ? (sign < 0 ? "-" : string.Empty) : (sign < 0 ? " - " : " + ")).Append(text);

    private static (int Sign, string Text) Scaled(SymPoly coefficient, string variable)
    {
        if (coefficient.IsOne)
        {
            return (1, variable);
        }

        if (coefficient.IsConstant)
        {
            var c = coefficient.ConstantValue;
            if (c == Rational.MinusOne)
            {
                return (-1, variable);
            }

            return (c.Sign, c.Abs().ToCSharp() + " * " + variable);
        }

        string text = CSharpText.Of(coefficient);
        return (1, variable + " * " + (coefficient.IsMonomial && coefficient.Terms[0].Key.Powers.Length == 1 && coefficient.Terms[0].Value.IsOne ? text : "(" + text + ")"));
    }
}
