using System.Collections.Generic;

namespace FvGen.Analyzers.Conservation;

/// <summary>The reciprocal of a sum that depends on the loop variables: <c>1 / (x[i + 1] - x[i])</c>.</summary>
internal sealed class ReciprocalExpr : Expr
{
    public ReciprocalExpr(SumExpr denominator)
    {
        Denominator = denominator;
        Key = "1/(" + denominator.Key + ")";
    }

    private string? _shapeKey;

    public SumExpr Denominator { get; }

    public override string Key { get; }

    public override string ShapeKey => _shapeKey ??= "1/(" + Denominator.ShapeKey + ")";

    public override IEnumerable<ReadExpr> Reads => Denominator.Reads;

    public override Expr Shift(IReadOnlyDictionary<string, long> shift)
    {
        var shifted = Denominator.Shift(shift);
        return ReferenceEquals(shifted, Denominator) ? this : new ReciprocalExpr(shifted);
    }

    public override string Render() => "1.0 / (" + Denominator.Render() + ")";
}
