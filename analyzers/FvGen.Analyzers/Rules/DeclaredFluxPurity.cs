using System.Collections.Immutable;
using System.Linq;
using FvGen.Analyzers.Diagnostics;
using FvGen.Analyzers.Extraction;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>
/// FVC0006 at the declaration: every method declared <c>[NumericalFlux]</c> that writes outside
/// itself (call sites of impure functions inside checked updates are reported by the method analysis).
/// </summary>
internal static class DeclaredFluxPurity
{
    public static void Check(SymbolAnalysisContext symbol, ConservationAnalysis analysis)
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
