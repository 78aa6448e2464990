namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A write with its cell measure multiplied out: <paramref name="Sum"/> is the write's contribution to the
/// conserved total Σ measure · value, <paramref name="Measure"/> the divisor (or inverse-measure factor) taken
/// out, if any.
/// </summary>
/// <remarks>A class, not a tuple: see DEVELOPERS.md, "Precompiled analyzer".</remarks>
internal sealed record MeasuredWrite(UpdateWrite Write, SumExpr Sum, Expr? Measure);
