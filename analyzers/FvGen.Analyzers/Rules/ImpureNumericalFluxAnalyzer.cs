using System.Collections.Immutable;
using System.Linq;
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
        if (purity.Kind == PurityKind.Pure && !purity.WrittenParameters.IsEmpty && method.Locations.Length > 0)
        {
            // A helper may hand results back through out parameters; a declared flux may not.
            var parameter = method.Parameters.First(p => purity.WrittenParameters.Contains(p.Ordinal));
            purity = new Purity(PurityKind.Impure, "writes its parameter `" + parameter.Name + "`; a flux hands back only its return value", method.Locations[0]);
        }

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
