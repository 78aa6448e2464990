using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A read at a subscript the checker cannot put in affine or mapped form, but which is a
/// well-defined function of the iteration: a conditional of indices (<c>u[k &gt;= 0 ? k : left]</c>,
/// the far neighbour chosen next to a boundary patch). Its value is not interpreted. It may only
/// feed a face value that a face loop gives to its two cells with opposite weights in the same
/// iteration (then the balance does not depend on what the value is); anywhere else the update is
/// not analyzed, with <see cref="Reason"/>.
/// </summary>
internal sealed class OpaqueReadExpr : Expr
{
    public OpaqueReadExpr(string array, ImmutableArray<ImmutableArray<SumExpr>> subscripts, string path, DataRole role, string reason)
    {
        Array = array;
        Subscripts = subscripts;
        Path = path;
        Role = role;
        Reason = reason;
        Key = "Q:" + array + string.Concat(subscripts.Select(g => "[" + string.Join(",", g.Select(s => s.Key)) + "]")) + path;
        ShapeKey = "Q:" + array + string.Concat(subscripts.Select(g => "[" + string.Join(",", g.Select(s => s.ShapeKey)) + "]")) + path;
    }

    public string Array { get; }

    /// <summary>The subscripts as values (conditionals of indices), one group per pair of brackets.</summary>
    public ImmutableArray<ImmutableArray<SumExpr>> Subscripts { get; }

    public string Path { get; }

    public DataRole Role { get; }

    /// <summary>Why the subscript is not modelled: the reason shown when the read ends up anywhere but a balanced face value.</summary>
    public string Reason { get; }

    public override string Key { get; }

    public override string ShapeKey { get; }

    /// <summary>No read the balance could match: the element read is not known, so nothing is exposed to shift or compare.</summary>
    public override IEnumerable<ReadExpr> Reads => Enumerable.Empty<ReadExpr>();

    /// <summary>Every array the value depends on: the one read and those read inside its subscripts.</summary>
    public IEnumerable<string> Arrays => new[] { Array }.Concat(Subscripts.SelectMany(g => g).SelectMany(s => s.Reads).Where(r => !r.IsLoopIndex).Select(r => r.Array));

    public override Expr Shift(IReadOnlyDictionary<string, long> shift) =>
        new OpaqueReadExpr(Array, Subscripts.Select(g => g.Select(s => s.Shift(shift)).ToImmutableArray()).ToImmutableArray(), Path, Role, Reason);

    public override string Render() => Array + string.Concat(Subscripts.Select(g => "[" + string.Join(", ", g.Select(s => s.Render())) + "]")) + Path;
}
