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
    // Both keys are asked for in every pass of the balance: built once. A copy made with `with`
    // carries them over, so only Value may change in such a copy (the only one made).

    /// <summary>The subscripts' identity, <c>i,j</c> or <c>left[f]</c> (groups joined by <c>][</c>).</summary>
    public string SubscriptKey { get; } = KeyOf(Subscripts);

    /// <summary>Identifies the target element (array, component and subscripts).</summary>
    public string TargetKey { get; } = Array + "|" + Path + "|" + KeyOf(Subscripts);

    /// <summary>The identity of a subscript list, as <see cref="SubscriptKey"/> writes it.</summary>
    public static string KeyOf(ImmutableArray<ImmutableArray<IndexTerm>> subscripts) =>
        subscripts.Length == 1 && subscripts[0].Length == 1
            ? subscripts[0][0].Key
            : string.Join("][", subscripts.Select(g => string.Join(",", g.Select(s => s.Key))));

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
