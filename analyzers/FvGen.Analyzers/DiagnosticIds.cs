namespace FvGen.Analyzers;

/// <summary>The diagnostic IDs of the conservation checker. These are a contract: never renumber.</summary>
public static class DiagnosticIds
{
    /// <summary>Dropped face term: a face term enters the update with no counterpart in the neighbouring cell.</summary>
    public const string DroppedFaceTerm = "FVC0001";

    /// <summary>Unbalanced face term: counterparts exist but their signs or weights do not cancel.</summary>
    public const string UnbalancedFaceTerm = "FVC0002";

    /// <summary>Mismatched flux evaluations: the two sides of one face evaluate the flux differently.</summary>
    public const string MismatchedFluxEvaluations = "FVC0003";

    /// <summary>One-sided or self-cancelling scatter in a face loop.</summary>
    public const string OneSidedScatter = "FVC0004";

    /// <summary>In-place sweep: an explicit update writes the array it reads at other cells.</summary>
    public const string InPlaceSweep = "FVC0005";

    /// <summary>Impure numerical flux: a flux function writes state outside itself or calls code that does.</summary>
    public const string ImpureNumericalFlux = "FVC0006";

    /// <summary>Not analyzed: the checker could not model the update, and says why.</summary>
    public const string NotAnalyzed = "FVC0100";
}
