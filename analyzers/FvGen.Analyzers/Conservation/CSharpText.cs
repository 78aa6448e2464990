using System.Collections.Generic;
using System.Linq;
using System.Text;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Writes coefficients as C# (so messages can show what would balance a term, and a code fix can
/// insert it): <c>dt / dx</c>, <c>0.5 * dt</c>, <c>nx + 1</c>.
/// </summary>
internal static class CSharpText
{
    /// <summary>C# text of a whole coefficient.</summary>
    public static string Of(SymPoly value)
    {
        if (value.IsZero)
        {
            return "0";
        }

        var sb = new StringBuilder();
        bool first = true;
        foreach (var t in value.Terms)
        {
            string text = Monomial(t.Value.Abs(), t.Key);
            if (first)
            {
                sb.Append(t.Value.Sign < 0 ? "-" : string.Empty).Append(text);
            }
            else
            {
                sb.Append(t.Value.Sign < 0 ? " - " : " + ").Append(text);
            }

            first = false;
        }

        return sb.ToString();
    }

    /// <summary>
    /// The body times the coefficient as a signed addend: <c>(+1, "fy[i, j] / dy")</c> for
    /// coefficient <c>1/dy</c>, <c>(-1, "dt * F[i] / dx")</c> for <c>-dt/dx</c>.
    /// </summary>
    public static (int Sign, string Text) SignedProduct(SymPoly coefficient, string body)
    {
        if (coefficient.IsMonomial)
        {
            var t = coefficient.Terms[0];
            var magnitude = t.Value.Abs();
            var up = t.Key.Powers.Where(p => p.Value > 0).SelectMany(p => Enumerable.Repeat(Atom(p.Key), p.Value)).ToList();
            var down = t.Key.Powers.Where(p => p.Value < 0).SelectMany(p => Enumerable.Repeat(Atom(p.Key), -p.Value)).ToList();
            var factors = new List<string>();
            if (!magnitude.Numerator.IsOne)
            {
                factors.Add(magnitude.Numerator.ToString(System.Globalization.CultureInfo.InvariantCulture));
            }

            factors.AddRange(up);
            factors.Add(body);
            var sb = new StringBuilder(string.Join(" * ", factors));
            if (!magnitude.Denominator.IsOne)
            {
                down.Insert(0, magnitude.Denominator.ToString(System.Globalization.CultureInfo.InvariantCulture) + ".0");
            }

            foreach (var d in down)
            {
                sb.Append(" / ").Append(d);
            }

            return (t.Value.Sign, sb.ToString());
        }

        return (1, "(" + Of(coefficient) + ") * " + body);
    }

    private static string Monomial(Rational magnitude, Monomial monomial)
    {
        var up = monomial.Powers.Where(p => p.Value > 0).SelectMany(p => Enumerable.Repeat(Atom(p.Key), p.Value)).ToList();
        var down = monomial.Powers.Where(p => p.Value < 0).SelectMany(p => Enumerable.Repeat(Atom(p.Key), -p.Value)).ToList();
        var factors = new List<string>();
        if (!magnitude.IsOne || up.Count == 0)
        {
            factors.Add(down.Count == 0 && magnitude.IsInteger ? magnitude.ToString() : magnitude.ToCSharp());
        }

        factors.AddRange(up);
        string text = string.Join(" * ", factors);
        foreach (var d in down)
        {
            text += " / " + d;
        }

        return text;
    }

    private static string Atom(string symbol) =>
        symbol.IndexOfAny(new[] { ' ', '+', '-', '*', '/', '?' }) >= 0 && !(symbol.StartsWith("(", System.StringComparison.Ordinal) && symbol.EndsWith(")", System.StringComparison.Ordinal))
            ? "(" + symbol + ")"
            : symbol;
}
