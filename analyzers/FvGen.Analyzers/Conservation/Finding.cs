using System.Collections.Immutable;

namespace FvGen.Analyzers.Conservation;

/// <summary>What the balance found wrong.</summary>
internal enum FindingKind
{
    /// <summary>FVC0001: a face term with no counterpart.</summary>
    DroppedFaceTerm,

    /// <summary>FVC0002: counterparts whose weights do not cancel (also an old total not carried with weight 1).</summary>
    UnbalancedFaceTerm,

    /// <summary>FVC0003: the two sides of a face evaluate the flux differently.</summary>
    MismatchedFluxEvaluations,

    /// <summary>FVC0004: a face loop that gives a flux to one cell only, unequally, or to the cell it took it from.</summary>
    OneSidedScatter,

    /// <summary>FVC0005: the loop reads neighbours of the array it overwrites.</summary>
    InPlaceSweep,
}

/// <summary>
/// One verdict of the balance, with the message arguments (plain text), the origins of the
/// offending term (primary) and of its counterparts (additional), and data for a code fix.
/// </summary>
internal sealed record Finding(
    FindingKind Kind,
    ImmutableArray<string> Arguments,
    ImmutableArray<int> Primary,
    ImmutableArray<int> Additional,
    ImmutableDictionary<string, string?> Properties)
{
    /// <summary>Origin of the write the finding is about (for a fix that edits it); -1 when none.</summary>
    public int WriteOrigin { get; init; } = -1;
}

/// <summary>Names of the properties a finding passes to its code fix.</summary>
internal static class FindingProperties
{
    /// <summary>Loop variable shifts that turn the offending term into its missing counterpart, as <c>i=-1;j=0</c>.</summary>
    public const string CounterpartShift = "CounterpartShift";

    /// <summary>C# text to append to the write: <c>+ fy[i, j] / dy</c>.</summary>
    public const string CounterpartText = "CounterpartText";

    /// <summary>The counterpart as an addend with <c>§</c> for the shifted term: <c>+ § / dy</c>.</summary>
    public const string CounterpartTemplate = "CounterpartTemplate";

    /// <summary>Present when the body is one read or call, so shifting its syntax gives the counterpart.</summary>
    public const string SingleFactor = "SingleFactor";

    /// <summary>Start and length of the write the fix edits (added by the extraction layer).</summary>
    public const string WriteStart = "WriteStart";

    public const string WriteLength = "WriteLength";

    /// <summary>C# text of the target the missing opposite update writes, <c>R[right[f]]</c>.</summary>
    public const string OppositeTarget = "OppositeTarget";

    /// <summary>Which index map the written target uses (<c>left</c>) and which it should also use (<c>right</c>).</summary>
    public const string WrittenMap = "WrittenMap";

    public const string OtherMap = "OtherMap";

    /// <summary>Name of the array that is both written and read (in-place sweep).</summary>
    public const string SweptArray = "SweptArray";
}
