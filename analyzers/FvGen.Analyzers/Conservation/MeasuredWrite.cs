namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A write with its cell measure multiplied out: <paramref name="Sum"/> is the write's contribution to the
/// conserved total Σ measure · value, <paramref name="Measure"/> the divisor (or inverse-measure factor) taken
/// out, if any.
/// </summary>
/// <remarks>A class, not a tuple: lists and queries over it then run the framework's shared, precompiled code
/// instead of code the JIT must compile for each value-type instantiation in every fresh compiler process.</remarks>
internal sealed record MeasuredWrite(UpdateWrite Write, SumExpr Sum, Expr? Measure);
