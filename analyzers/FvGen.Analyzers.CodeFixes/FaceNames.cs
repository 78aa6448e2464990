using System.Collections.Generic;
using System.Globalization;
using System.Linq;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// The name of the local for the other face: the user's own direction word swapped
/// (<c>fe</c> → <c>fw</c>, <c>fluxRight</c> → <c>fluxLeft</c>, <c>northFlux</c> → <c>southFlux</c>),
/// else the offset written after the name in the usual i-minus-one style (<c>fluxIm1</c>).
/// </summary>
internal static class FaceNames
{
    private static readonly (string A, string B)[] Words =
    {
        ("East", "West"), ("North", "South"), ("Right", "Left"), ("Top", "Bottom"), ("Upper", "Lower"),
        ("Front", "Back"), ("Plus", "Minus"), ("High", "Low"), ("Hi", "Lo"), ("Up", "Down"), ("Next", "Prev"),
    };

    /// <summary>Trailing letters that name a face in short flux names (<c>fe</c>, <c>gN</c>, <c>fip</c>).</summary>
    private static readonly (char A, char B)[] Letters = { ('e', 'w'), ('n', 's'), ('r', 'l'), ('t', 'b'), ('p', 'm') };

    public static string Opposite(string name, IReadOnlyDictionary<string, long> shift)
    {
        foreach (var (a, b) in Words.Concat(Words.Select(w => (w.B, w.A))))
        {
            if (name.Length > a.Length && name.EndsWith(a, System.StringComparison.Ordinal))
            {
                return name.Substring(0, name.Length - a.Length) + b;
            }

            string lowerA = char.ToLowerInvariant(a[0]) + a.Substring(1);
            if (name.Length > a.Length && name.StartsWith(lowerA, System.StringComparison.Ordinal) && char.IsUpper(name[a.Length]))
            {
                return char.ToLowerInvariant(b[0]) + b.Substring(1) + name.Substring(a.Length);
            }
        }

        if (name.Length is 2 or 3)
        {
            char last = name[name.Length - 1];
            foreach (var (a, b) in Letters.Concat(Letters.Select(l => (l.B, l.A))))
            {
                if (char.ToLowerInvariant(last) == a)
                {
                    return name.Substring(0, name.Length - 1) + (char.IsUpper(last) ? char.ToUpperInvariant(b) : b);
                }
            }
        }

        var move = shift.OrderBy(kv => kv.Key, System.StringComparer.Ordinal).FirstOrDefault(kv => kv.Value != 0);
        if (move.Key is null)
        {
            return name + "Other";
        }

        string variable = char.ToUpperInvariant(move.Key[0]) + move.Key.Substring(1);
        return name + variable + (move.Value < 0 ? "m" : "p") + System.Math.Abs(move.Value).ToString(CultureInfo.InvariantCulture);
    }
}
