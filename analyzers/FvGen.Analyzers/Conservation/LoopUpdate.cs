using System;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// One write of a loop body into a target array element, expanded: <c>R[i] += increment</c> or
/// <c>Un[i] = value</c>. Compound subtraction is already folded into the sign of the increment.
/// </summary>
internal sealed record UpdateWrite(
    string Array,
    string Path,
    ImmutableArray<ImmutableArray<IndexTerm>> Subscripts,
    SumExpr Value,
    bool IsAssignment,
    int Origin)
{
    // The subscript key and the target's subscripts are asked for in every pass of the balance: built
    // once. A copy made with `with` carries them over, so only Value may change in such a copy (the
    // only one made).

    /// <summary>The subscripts' identity, <c>i,j</c> or <c>left[f]</c> (groups joined by <c>][</c>).</summary>
    public string SubscriptKey { get; } = KeyOf(Subscripts);

    /// <summary>Identifies the target element (array, component and subscripts); asked for rarely, so not kept.</summary>
    public string TargetKey => Array + "|" + Path + "|" + SubscriptKey;

    /// <summary>The target's subscripts, group after group.</summary>
    public ImmutableArray<IndexTerm> AllSubscripts { get; } = ImmutableArray.Create(ReadExpr.Flatten(Subscripts));

    /// <summary>The distinct keys of <see cref="AllSubscripts"/> (one to three: searched in order): a read at only these reads the target cell.</summary>
    public ImmutableArray<string> TargetSubscriptKeys { get; } = DistinctKeys(Subscripts, mappedArguments: false);

    /// <summary>The keys of the arguments of the maps the target is written through (<c>f</c> of <c>left[f]</c>): the boundary face's own data.</summary>
    public ImmutableArray<string> BoundaryFaceKeys { get; } = DistinctKeys(Subscripts, mappedArguments: true);

    /// <summary>
    /// The distinct keys, in first-seen order, of the subscripts or (with <paramref name="mappedArguments"/>)
    /// of the arguments of the mapped ones. A few entries: a list search beats a set.
    /// </summary>
    private static ImmutableArray<string> DistinctKeys(ImmutableArray<ImmutableArray<IndexTerm>> groups, bool mappedArguments)
    {
        var keys = ImmutableArray.CreateBuilder<string>();
        foreach (var g in groups)
        {
            foreach (var s in g)
            {
                if (!mappedArguments)
                {
                    AddOnce(keys, s.Key);
                }
                else if (s is MappedSubscript m)
                {
                    foreach (var a in m.Arguments)
                    {
                        AddOnce(keys, a.Key);
                    }
                }
            }
        }

        return keys.ToImmutable();
    }

    private static void AddOnce(ImmutableArray<string>.Builder keys, string key)
    {
        foreach (var k in keys)
        {
            if (string.Equals(k, key, StringComparison.Ordinal))
            {
                return;
            }
        }

        keys.Add(key);
    }

    /// <summary>The identity of a subscript list, as <see cref="SubscriptKey"/> writes it.</summary>
    public static string KeyOf(ImmutableArray<ImmutableArray<IndexTerm>> subscripts)
    {
        if (subscripts.Length == 1 && subscripts[0].Length == 1)
        {
            return subscripts[0][0].Key;
        }

        var text = new System.Text.StringBuilder();
        for (int g = 0; g < subscripts.Length; g++)
        {
            if (g > 0)
            {
                text.Append("][");
            }

            for (int k = 0; k < subscripts[g].Length; k++)
            {
                if (k > 0)
                {
                    text.Append(',');
                }

                text.Append(subscripts[g][k].Key);
            }
        }

        return text.ToString();
    }

    /// <summary>C# text of the target element.</summary>
    public string RenderTarget() => Array + string.Concat(Subscripts.Select(g => "[" + string.Join(", ", g.Select(s => s.ToString())) + "]")) + Path;

    /// <summary>The cell as a reader sees it: <c>(i, j)</c> or <c>left[f]</c>.</summary>
    public string RenderCell()
    {
        var all = Subscripts.SelectMany(g => g).Select(s => s.ToString()).ToList();
        return all.Count == 1 ? all[0] : "(" + string.Join(", ", all) + ")";
    }
}

/// <summary>The writes of one loop nest, in program order, over its iteration space.</summary>
internal sealed record LoopUpdate(LoopSpace Space, ImmutableArray<UpdateWrite> Writes, bool IsParallel);
