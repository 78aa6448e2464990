namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Two indices an alignment must map onto each other: the first of one term's subscript, the second
/// of its counterpart's.
/// </summary>
/// <remarks>A class, not a tuple: lists and arrays of it run the framework's shared precompiled code
/// instead of code the JIT compiles for each value-type instantiation in every fresh compiler process.</remarks>
internal sealed record IndexPair(AffineIndex A, AffineIndex B);
