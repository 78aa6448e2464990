namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A write with its cell measure multiplied out: <see cref="Sum"/> is the write's contribution to the conserved
/// total Σ measure · value, <see cref="Measure"/> the divisor (or inverse-measure factor) taken out, if any.
/// </summary>
/// <remarks>A class, not a tuple: lists and queries over it then run the framework's shared, precompiled code
/// instead of code the JIT must compile for each value-type instantiation in every fresh compiler process.</remarks>
internal sealed class MeasuredWrite
{
    public MeasuredWrite(UpdateWrite write, SumExpr sum, Expr? measure)
    {
        Write = write;
        Sum = sum;
        Measure = measure;
    }

    public UpdateWrite Write { get; }

    public SumExpr Sum { get; }

    public Expr? Measure { get; }
}
