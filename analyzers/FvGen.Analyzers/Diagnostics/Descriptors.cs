using System.Collections.Immutable;
using Microsoft.CodeAnalysis;

namespace FvGen.Analyzers.Diagnostics;

/// <summary>The descriptors of the conservation rules; titles and messages come from <c>Resources/RuleStrings.resx</c>.</summary>
internal static class Descriptors
{
    /// <summary>
    /// Where the rule pages live; each rule links to <c>docs/rules/&lt;ID&gt;.md</c> under it. A placeholder
    /// until the documentation has a published address; the generator uses the same base.
    /// </summary>
    public const string HelpBase = "https://fvgen.invalid/docs/rules/";

    public const string Category = "Conservation";

    public static readonly DiagnosticDescriptor DroppedFaceTerm = Create(DiagnosticIds.DroppedFaceTerm, DiagnosticSeverity.Warning);

    public static readonly DiagnosticDescriptor UnbalancedFaceTerm = Create(DiagnosticIds.UnbalancedFaceTerm, DiagnosticSeverity.Warning);

    public static readonly DiagnosticDescriptor MismatchedFluxEvaluations = Create(DiagnosticIds.MismatchedFluxEvaluations, DiagnosticSeverity.Warning);

    public static readonly DiagnosticDescriptor OneSidedScatter = Create(DiagnosticIds.OneSidedScatter, DiagnosticSeverity.Warning);

    public static readonly DiagnosticDescriptor InPlaceSweep = Create(DiagnosticIds.InPlaceSweep, DiagnosticSeverity.Warning);

    public static readonly DiagnosticDescriptor ImpureNumericalFlux = Create(DiagnosticIds.ImpureNumericalFlux, DiagnosticSeverity.Warning);

    public static readonly DiagnosticDescriptor NotAnalyzed = Create(DiagnosticIds.NotAnalyzed, DiagnosticSeverity.Info);

    /// <summary>Every rule, in ID order: what the one conservation analyzer supports.</summary>
    public static readonly ImmutableArray<DiagnosticDescriptor> All = ImmutableArray.Create(
        DroppedFaceTerm, UnbalancedFaceTerm, MismatchedFluxEvaluations, OneSidedScatter, InPlaceSweep, ImpureNumericalFlux, NotAnalyzed);

    /// <summary>The descriptor of a rule ID the engine decided.</summary>
    public static DiagnosticDescriptor For(string id)
    {
        foreach (var d in All)
        {
            if (d.Id == id)
            {
                return d;
            }
        }

        throw new System.ArgumentException("no FvGen rule has the ID " + id, nameof(id));
    }

    /// <summary>The one factory: resources by ID, help link derived from the ID.</summary>
    private static DiagnosticDescriptor Create(string id, DiagnosticSeverity severity) =>
        new(
            id,
            Resource(id + "Title"),
            Resource(id + "Message"),
            Category,
            severity,
            isEnabledByDefault: true,
            description: Resource(id + "Description"),
            helpLinkUri: HelpLink(id));

    public static string HelpLink(string id) => HelpBase + id + ".md";

    private static LocalizableResourceString Resource(string name) =>
        new(name, RuleStrings.ResourceManager, typeof(RuleStrings));
}
