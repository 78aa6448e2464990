using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A call of a flux, limiter or other pure function, kept uninterpreted: two calls are the same
/// when the function and the arguments are (after a lattice shift and the symmetries declared).
/// Conditional expressions and comparisons are represented as calls of operator names.
/// </summary>
internal sealed class CallExpr : Expr
{
    public CallExpr(string function, ImmutableArray<SumExpr> arguments, CallSymmetry symmetry, bool isBoundaryFlux = false)
    {
        Function = function;
        IsBoundaryFlux = isBoundaryFlux;

        // Symmetric calls keep their arguments in one canonical order, so equal calls have equal keys.
        Arguments = symmetry == CallSymmetry.Symmetric
            ? arguments.OrderBy(a => a.Key, System.StringComparer.Ordinal).ToImmutableArray()
            : arguments;
        Symmetry = symmetry;
        Key = "C:" + function + "(" + string.Join(",", Arguments.Select(a => a.Key)) + ")";
    }

    /// <summary>Display name of the function (<c>Rusanov</c>, <c>Math.Max</c>, <c>?:</c>).</summary>
    public string Function { get; }

    public ImmutableArray<SumExpr> Arguments { get; }

    public CallSymmetry Symmetry { get; }

    /// <summary>A call of a function declared a boundary flux: the flux through a boundary face, with no counterpart cell.</summary>
    public bool IsBoundaryFlux { get; }

    /// <summary>True for a boundary-flux call, or a component of one (<c>.Mass(Drain(…))</c>).</summary>
    public bool CarriesBoundaryFlux =>
        IsBoundaryFlux || (Function.StartsWith(".", System.StringComparison.Ordinal) && Arguments.Length == 1
            && Arguments[0].Terms.Length == 1 && Arguments[0].Terms[0].Factors.Any(f => f is CallExpr { CarriesBoundaryFlux: true }));

    public override string Key { get; }

    private string? _shapeKey;

    public override string ShapeKey => _shapeKey ??= ComputeShapeKey();

    private string ComputeShapeKey()
    {
        var shapes = Arguments.Select(a => a.ShapeKey).ToList();
        if (Symmetry == CallSymmetry.Symmetric)
        {
            shapes.Sort(System.StringComparer.Ordinal);
        }
        else if (Symmetry == CallSymmetry.Antisymmetric && shapes.Count >= 2 && string.CompareOrdinal(shapes[0], shapes[1]) > 0)
        {
            (shapes[0], shapes[1]) = (shapes[1], shapes[0]);
        }

        return "C:" + Function + "(" + string.Join(",", shapes) + ")";
    }

    public override IEnumerable<ReadExpr> Reads => Arguments.SelectMany(a => a.Reads);

    public override Expr Shift(IReadOnlyDictionary<string, long> shift)
    {
        var shifted = Shifted.Each(Arguments, shift, static (a, n) => a.Shift(n));
        return shifted == Arguments ? this : new CallExpr(Function, shifted, Symmetry, IsBoundaryFlux);
    }

    public override string Render()
    {
        var args = Arguments.Select(a => a.Render()).ToList();
        switch (Function)
        {
            case "?:" when args.Count == 3:
                return "(" + args[0] + " ? " + args[1] + " : " + args[2] + ")";
            case "<" or "<=" or ">" or ">=" or "==" or "!=" or "&&" or "||" when args.Count == 2:
                return args[0] + " " + Function + " " + args[1];
            default:
                return Function + "(" + string.Join(", ", args) + ")";
        }
    }
}
