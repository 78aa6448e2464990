using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A read of an array element, possibly of one component of a struct element:
/// <c>fy[i, j + 1]</c>, <c>q[i][j]</c>, <c>u[left[f]].Energy</c>.
/// </summary>
internal sealed class ReadExpr : Expr
{
    public ReadExpr(string array, ImmutableArray<ImmutableArray<IndexTerm>> subscripts, string path, DataRole role)
    {
        Array = array;
        Subscripts = subscripts;
        Path = path;
        Role = role;
        Key = SubscriptText.Of("R:", array, subscripts, path, shape: false);
    }

    private string? _shapeKey;

    /// <summary>Canonical name of the array (a parameter, local, field or member chain).</summary>
    public string Array { get; }

    /// <summary>One group per pair of brackets: <c>[i, j]</c> is one group of two, <c>[i][j]</c> two groups of one.</summary>
    public ImmutableArray<ImmutableArray<IndexTerm>> Subscripts { get; }

    /// <summary>Component chain after the element (<c>.Momentum.X</c>), empty for the element itself.</summary>
    public string Path { get; }

    public DataRole Role { get; }

    public override string Key { get; }

    /// <summary>Built on first use: shifted copies made only to compare keys never need it.</summary>
    public override string ShapeKey =>
        _shapeKey ??= SubscriptText.Of("R:", Array, Subscripts, Path, shape: true);

    /// <summary>Every subscript, group after group (collected once: the balance asks for them per member).</summary>
    public IReadOnlyList<IndexTerm> AllSubscripts => _allSubscripts ??= Flatten(Subscripts);

    /// <summary>The subscripts group after group, in one array (a loop: this is asked for every read).</summary>
    internal static IndexTerm[] Flatten(ImmutableArray<ImmutableArray<IndexTerm>> groups)
    {
        int count = 0;
        foreach (var g in groups)
        {
            count += g.Length;
        }

        var all = new IndexTerm[count];
        int k = 0;
        foreach (var g in groups)
        {
            foreach (var s in g)
            {
                all[k++] = s;
            }
        }

        return all;
    }

    private IndexTerm[]? _allSubscripts;

    /// <summary>The subscripts' identity, as <see cref="UpdateWrite.SubscriptKey"/> writes it for a target.</summary>
    public string SubscriptKey => _subscriptKey ??= UpdateWrite.KeyOf(Subscripts);

    private string? _subscriptKey;

    public override IEnumerable<ReadExpr> Reads => new[] { this };

    public override Expr Shift(IReadOnlyDictionary<string, long> shift)
    {
        // Shifted.Each over the groups, written out: the groups are structs, and a generic helper over
        // them would be one more value-type instantiation for the JIT in every compiler process.
        ImmutableArray<IndexTerm>[]? moved = null;
        for (int k = 0; k < Subscripts.Length; k++)
        {
            var group = Subscripts[k];
            var shifted = Shifted.Each(group, shift, static (s, n) => s.Shift(n));
            if (moved is null && shifted != group)
            {
                moved = new ImmutableArray<IndexTerm>[Subscripts.Length];
                for (int before = 0; before < k; before++)
                {
                    moved[before] = Subscripts[before];
                }
            }

            if (moved is not null)
            {
                moved[k] = shifted;
            }
        }

        return moved is null ? this : new ReadExpr(Array, ImmutableArray.Create(moved), Path, Role);
    }

    /// <summary>A loop variable used as a value (<c>x0 + i * dx</c>) is a read of the empty array name.</summary>
    public static ReadExpr LoopIndex(string variable) =>
        new(string.Empty, ImmutableArray.Create(ImmutableArray.Create<IndexTerm>(new AffineSubscript(AffineIndex.Variable(variable)))), string.Empty, DataRole.Cell);

    public bool IsLoopIndex => Array.Length == 0;

    public override string Render() =>
        IsLoopIndex ? "(" + Subscripts[0][0] + ")" : Array + string.Concat(Subscripts.Select(g => "[" + string.Join(", ", g.Select(s => s.ToString())) + "]")) + Path;
}
