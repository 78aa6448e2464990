using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>A term together with the write it belongs to.</summary>
internal sealed record AttributedTerm(Term Term, UpdateWrite Write);

/// <summary>
/// A member of a shift class: its term, the shift from the representative, the sign of the match,
/// and the scale of its body in the representative's (one, unless a shift made a reciprocal pull out
/// another weight: see <see cref="Term.Shift(IReadOnlyDictionary{string, long}, out SymPoly)"/>).
/// </summary>
internal sealed record ClassMember(AttributedTerm Source, IReadOnlyDictionary<string, long> Shift, int Sign, SymPoly Scale)
{
    /// <summary>The coefficient this member adds to the class sum (in the representative's body).</summary>
    public SymPoly Weight
    {
        get
        {
            var own = Sign > 0 ? Source.Term.Coefficient : -Source.Term.Coefficient;
            return Scale.IsOne ? own : own * Scale;
        }
    }

    /// <summary>A weight in the representative's body as a coefficient of this member's own body.</summary>
    public SymPoly InOwnBody(SymPoly weight) => Scale.IsOne ? weight : weight * (Scale.TryReciprocal() ?? throw new ModelLimitException("a reciprocal's leading weight that cannot be divided out"));
}

/// <summary>
/// Terms whose bodies are equal after a lattice shift: summed over the iteration space they add
/// up to the same thing, up to the boundary. The update conserves when each class sums to zero.
/// </summary>
internal sealed class ShiftClass
{
    public ShiftClass(ClassMember representative) => Members.Add(representative);

    public List<ClassMember> Members { get; } = new();

    public AttributedTerm Representative => Members[0].Source;

    public SymPoly Sum => Members.Aggregate(SymPoly.Zero, (s, m) => s + m.Weight);

    /// <summary>Groups terms into shift classes, keeping the first-seen order.</summary>
    public static List<ShiftClass> Build(IEnumerable<AttributedTerm> terms, LoopSpace space)
    {
        var classes = new List<ShiftClass>();
        var byShape = new Dictionary<string, List<ShiftClass>>(StringComparer.Ordinal);
        var empty = ShiftMatcher.NoShift;
        foreach (var t in terms)
        {
            bool placed = false;
            if (!byShape.TryGetValue(t.Term.BodyShapeKey, out var sameShape))
            {
                byShape[t.Term.BodyShapeKey] = sameShape = new List<ShiftClass>();
            }

            foreach (var c in sameShape)
            {
                var match = ShiftMatcher.TryMatch(c.Representative.Term, t.Term, space);
                if (match is not null)
                {
                    c.Members.Add(new ClassMember(t, match.Shift, match.Sign, match.Scale));
                    placed = true;
                    break;
                }
            }

            if (!placed)
            {
                var created = new ShiftClass(new ClassMember(t, empty, 1, SymPoly.One));
                classes.Add(created);
                sameShape.Add(created);
            }
        }

        return classes;
    }
}
