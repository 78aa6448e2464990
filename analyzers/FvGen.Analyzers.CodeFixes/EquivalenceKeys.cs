namespace FvGen.Analyzers.CodeFixes;

/// <summary>Stable keys that tell fix-all which fixes are the same kind.</summary>
internal static class EquivalenceKeys
{
    public const string AddCounterpart = "FVC0001.AddCounterpartTerm";

    public const string AddOppositeUpdate = "FVC0004.AddOppositeUpdate";

    public const string ReadOldStateFromCopy = "FVC0005.ReadOldStateFromCopy";

    public const string TwoPassFaceFlux = "FVC0005.TwoPassFaceFlux";
}
