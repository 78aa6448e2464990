namespace FvGen.Analyzers.Tests.Verifiers;

/// <summary>
/// The rule a verifier test is about. The one conservation analyzer reports every rule; a rule's
/// tests see only that rule's diagnostics (the others are disabled), as a team sees a rule they enabled alone.
/// </summary>
internal interface IRuleUnderTest
{
    static abstract string Id { get; }
}

internal sealed class DroppedFaceTerm : IRuleUnderTest
{
    public static string Id => DiagnosticIds.DroppedFaceTerm;
}

internal sealed class UnbalancedFaceTerm : IRuleUnderTest
{
    public static string Id => DiagnosticIds.UnbalancedFaceTerm;
}

internal sealed class MismatchedFluxEvaluations : IRuleUnderTest
{
    public static string Id => DiagnosticIds.MismatchedFluxEvaluations;
}

internal sealed class OneSidedScatter : IRuleUnderTest
{
    public static string Id => DiagnosticIds.OneSidedScatter;
}

internal sealed class InPlaceSweep : IRuleUnderTest
{
    public static string Id => DiagnosticIds.InPlaceSweep;
}

internal sealed class ImpureNumericalFlux : IRuleUnderTest
{
    public static string Id => DiagnosticIds.ImpureNumericalFlux;
}

internal sealed class NotAnalyzed : IRuleUnderTest
{
    public static string Id => DiagnosticIds.NotAnalyzed;
}
