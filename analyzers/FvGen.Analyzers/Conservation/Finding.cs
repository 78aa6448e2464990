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
    ImmutableDictionary<string, string?> Properties);

/// <summary>Names of the properties a finding passes to its code fix.</summary>
internal static class FindingProperties
{
    /// <summary>Loop variable shifts that turn the offending term into its missing counterpart, as <c>i=-1;j=0</c>.</summary>
    public const string CounterpartShift = "CounterpartShift";

    /// <summary>C# text to append to the write: <c>+ fy[i, j] / dy</c>.</summary>
    public const string CounterpartText = "CounterpartText";

    /// <summary>The signed weight of the counterpart relative to the offending term: <c>-1</c> or <c>1</c> times the ratio.</summary>
    public const string CounterpartCoefficient = "CounterpartCoefficient";

    /// <summary>C# text of the target the missing opposite update writes, <c>R[right[f]]</c>.</summary>
    public const string OppositeTarget = "OppositeTarget";

    /// <summary>Which index map the written target uses (<c>left</c>) and which it should also use (<c>right</c>).</summary>
    public const string WrittenMap = "WrittenMap";

    public const string OtherMap = "OtherMap";

    /// <summary>Name of the array that is both written and read (in-place sweep).</summary>
    public const string SweptArray = "SweptArray";
}
