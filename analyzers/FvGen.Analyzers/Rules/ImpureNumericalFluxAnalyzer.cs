using System.Collections.Immutable;
using FvGen.Analyzers.Diagnostics;
using FvGen.Analyzers.Extraction;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>
/// FVC0006: see <c>docs/rules/FVC0006.md</c>. Reported at call sites of impure functions inside
/// checked updates, and at every method declared <c>[NumericalFlux]</c> that writes outside itself.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class ImpureNumericalFluxAnalyzer : ConservationRuleAnalyzer
{
    public ImpureNumericalFluxAnalyzer()
        : base(Descriptors.ImpureNumericalFlux)
    {
    }

    private protected override bool ChecksDeclarations => true;

    private protected override void CheckDeclaration(SymbolAnalysisContext symbol, ConservationAnalysis analysis)
    {
        if (symbol.Symbol is not IMethodSymbol method || !analysis.Known.HasAttribute(method, analysis.Known.NumericalFlux))
        {
            return;
        }

        var purity = analysis.Purity.Classify(method);
        if (purity.Kind == PurityKind.Impure && method.Locations.Length > 0)
        {
            var where = purity.Location ?? method.Locations[0];
            symbol.ReportDiagnostic(Diagnostic.Create(
                Descriptors.ImpureNumericalFlux,
                where,
                ImmutableArray.Create(method.Locations[0]),
                method.Name,
                purity.Reason));
        }
    }
}
