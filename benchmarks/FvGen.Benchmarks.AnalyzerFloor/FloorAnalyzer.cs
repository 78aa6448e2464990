using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Benchmarks.AnalyzerFloor;

/// <summary>
/// Registers exactly what the FvGen rules register (compilation start, symbol start per method, the
/// scope check, an operation-block action in scope) and only walks the operations it is given. The
/// build time it adds is the cost of asking for operation trees at all; the FvGen analyzers' cost
/// above it is their own.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class FloorAnalyzer : DiagnosticAnalyzer
{
    private static readonly DiagnosticDescriptor Never = new(
        "FVBENCH01", "Benchmark floor", "Never reported", "Benchmark", DiagnosticSeverity.Warning, isEnabledByDefault: true);

    /// <inheritdoc/>
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => ImmutableArray.Create(Never);

    /// <inheritdoc/>
    public override void Initialize(AnalysisContext context)
    {
        context.EnableConcurrentExecution();
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.Analyze | GeneratedCodeAnalysisFlags.ReportDiagnostics);
        context.RegisterCompilationStartAction(start =>
        {
            var marker = start.Compilation.GetTypeByMetadataName("FvGen.ConservativeUpdateAttribute");
            if (marker is null)
            {
                return;
            }

            start.RegisterSymbolStartAction(
                symbolStart =>
                {
                    if (!IsMarked(symbolStart.Symbol, marker))
                    {
                        return;
                    }

                    symbolStart.RegisterOperationBlockAction(block =>
                    {
                        int count = 0;
                        foreach (var root in block.OperationBlocks)
                        {
                            foreach (var _ in root.DescendantsAndSelf())
                            {
                                count++;
                            }
                        }

                        if (count < 0)
                        {
                            block.ReportDiagnostic(Diagnostic.Create(Never, block.OwningSymbol.Locations[0]));
                        }
                    });
                },
                SymbolKind.Method);
        });
    }

    private static bool IsMarked(ISymbol symbol, INamedTypeSymbol marker)
    {
        for (ISymbol? s = symbol; s is not null and not INamespaceSymbol; s = s.ContainingSymbol)
        {
            foreach (var attribute in s.GetAttributes())
            {
                if (SymbolEqualityComparer.Default.Equals(attribute.AttributeClass, marker))
                {
                    return true;
                }
            }
        }

        return false;
    }
}
