using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using System.Text;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A product of loop-invariant symbols with integer powers, such as <c>dt · dx⁻¹</c>. Symbols are
/// canonical texts of loop-invariant expressions (<c>dt</c>, <c>mesh.Dx</c>, <c>nx</c>).
/// </summary>
internal sealed class Monomial : IEquatable<Monomial>, IComparable<Monomial>
{
    private Monomial(ImmutableArray<SparseEntry<string, int>> powers) => Powers = powers;

    private string? _key;

    /// <summary>A text that identifies the product (equal texts, equal products); built on first use.</summary>
    public string Key => _key ??= string.Join("*", Powers.Select(p => p.Key + "^" + p.Value));

    /// <summary>The empty product, 1.</summary>
    public static Monomial One { get; } = new(ImmutableArray<SparseEntry<string, int>>.Empty);

    /// <summary>Symbols in ordinal order, each with a non-zero power.</summary>
    public ImmutableArray<SparseEntry<string, int>> Powers { get; }

    public bool IsOne => Powers.IsEmpty;

    public static Monomial Symbol(string name, int power = 1) =>
        power == 0 ? One : new Monomial(ImmutableArray.Create(new SparseEntry<string, int>(name, power)));

    public static Monomial operator *(Monomial a, Monomial b)
    {
        if (a.IsOne)
        {
            return b;
        }

        if (b.IsOne)
        {
            return a;
        }

        // Both lists are in ordinal order of their symbols: one ordered merge, zero powers dropped.
        var merged = OrderedMerge.Sum(a.Powers, b.Powers, string.CompareOrdinal, static (x, y) => x + y, static p => p == 0);
        return merged.IsEmpty ? One : new Monomial(merged);
    }

    public Monomial Reciprocal() =>
        new(Powers.Select(p => new SparseEntry<string, int>(p.Key, -p.Value)).ToImmutableArray());

    public int PowerOf(string symbol)
    {
        foreach (var p in Powers)
        {
            if (p.Key == symbol)
            {
                return p.Value;
            }
        }

        return 0;
    }

    public bool Equals(Monomial? other) => other is not null && Key == other.Key;

    public override bool Equals(object? obj) => obj is Monomial m && Equals(m);

    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(Key);

    public int CompareTo(Monomial? other) => string.CompareOrdinal(Key, other?.Key);

    private string? _text;

    /// <summary>Readable text such as <c>dt/dx²</c>; <c>1</c> for the empty product.</summary>
    public override string ToString() => _text ??= Format();

    private string Format()
    {
        var up = Powers.Where(p => p.Value > 0).ToList();
        var down = Powers.Where(p => p.Value < 0).ToList();
        var sb = new StringBuilder();
        sb.Append(up.Count == 0 ? "1" : string.Join("·", up.Select(p => Power(p.Key, p.Value))));
        if (down.Count > 0)
        {
            sb.Append('/');
            string d = string.Join("·", down.Select(p => Power(p.Key, -p.Value)));
            sb.Append(down.Count > 1 ? "(" + d + ")" : d);
        }

        return sb.ToString();
    }

    private static string Power(string symbol, int power)
    {
        string s = symbol.IndexOfAny(new[] { ' ', '+', '-', '*', '/' }) >= 0 ? "(" + symbol + ")" : symbol;
        return power switch
        {
            1 => s,
            2 => s + "²",
            3 => s + "³",
            _ => s + "^" + power,
        };
    }
}
