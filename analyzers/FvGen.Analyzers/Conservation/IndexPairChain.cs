using System.Collections.Generic;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// The index pairs an alignment search has collected so far, as a persistent chain: each branch of
/// the search extends its parent's chain without copying it, and backtracking just drops the
/// extension. <see cref="Empty"/> holds no pair.
/// </summary>
internal sealed class IndexPairChain
{
    private readonly IndexPair? _pair;
    private readonly IndexPairChain? _rest;

    private IndexPairChain(IndexPair? pair, IndexPairChain? rest, int count)
    {
        _pair = pair;
        _rest = rest;
        Count = count;
    }

    public static IndexPairChain Empty { get; } = new(null, null, 0);

    public int Count { get; }

    /// <summary>This chain followed by <paramref name="pairs"/>, in their order.</summary>
    public IndexPairChain Extend(List<IndexPair> pairs)
    {
        var chain = this;
        foreach (var pair in pairs)
        {
            chain = new IndexPairChain(pair, chain, chain.Count + 1);
        }

        return chain;
    }

    /// <summary>The pairs in the order they were added.</summary>
    public IndexPair[] ToArray()
    {
        var result = new IndexPair[Count];
        int k = Count;
        for (var link = this; link.Count > 0; link = link._rest!)
        {
            result[--k] = link._pair!;
        }

        return result;
    }
}
