namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Two indices an alignment must map onto each other: the first of one term's subscript, the second
/// of its counterpart's.
/// </summary>
/// <remarks>A class, not a tuple: see DEVELOPERS.md, "Precompiled analyzer".</remarks>
internal sealed record IndexPair(AffineIndex A, AffineIndex B);
