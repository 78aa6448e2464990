using FvGen.Analyzers.Conservation;

namespace FvGen.Analyzers.Tests.Conservation;

/// <summary>The alignment search's pair chain: branches share their parent and keep the order pairs were added in.</summary>
public sealed class IndexPairChainTests
{
    private static AffineIndex Index(long offset) => AffineIndex.FromConstant(SymPoly.Constant(offset));

    [Fact]
    public void Branches_extend_a_shared_parent_without_changing_it()
    {
        var parent = IndexPairChain.Empty.Extend([new IndexPair(Index(1), Index(2)), new IndexPair(Index(3), Index(4))]);
        var left = parent.Extend([new IndexPair(Index(5), Index(6))]);
        var right = parent.Extend([new IndexPair(Index(7), Index(8)), new IndexPair(Index(9), Index(10))]);

        Assert.Equal(["1~2", "3~4"], Render(parent));
        Assert.Equal(["1~2", "3~4", "5~6"], Render(left));
        Assert.Equal(["1~2", "3~4", "7~8", "9~10"], Render(right));
        Assert.Empty(IndexPairChain.Empty.ToArray());
    }

    private static string[] Render(IndexPairChain chain) =>
        chain.ToArray().Select(p => p.A.ToString() + "~" + p.B.ToString()).ToArray();
}
