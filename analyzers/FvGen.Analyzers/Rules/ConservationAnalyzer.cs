using System.Collections.Immutable;
using System.Linq;
using FvGen.Analyzers.Diagnostics;
using FvGen.Analyzers.Extraction;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>
/// The conservation rules FVC0001–FVC0006 and FVC0100 (<c>docs/rules/</c>), reported by one
/// analyzer: they are views of one analysis of a method, and the compiler's per-symbol bookkeeping
/// is paid once rather than once per rule. Concurrent; generated code is analyzed too (FvGen's own
/// output is checked); symbols are resolved at compilation start, with nothing registered when
/// FvGen is not referenced; operation trees are asked for only for methods in scope.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class ConservationAnalyzer : DiagnosticAnalyzer
{
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => Descriptors.All;

    public override void Initialize(AnalysisContext context)
    {
        context.EnableConcurrentExecution();
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.Analyze | GeneratedCodeAnalysisFlags.ReportDiagnostics);
        context.RegisterCompilationStartAction(start =>
        {
            var analysis = ConservationAnalysis.For(start.Compilation);
            if (analysis is null)
            {
                return;
            }

            start.RegisterSymbolAction(symbol => DeclaredFluxPurity.Check(symbol, analysis), SymbolKind.Method);

            // Operation trees are asked for only inside scope: out-of-scope methods cost nothing.
            start.RegisterSymbolStartAction(
                symbolStart =>
                {
                    if (symbolStart.Symbol is not IMethodSymbol candidate
                        || candidate.Locations.FirstOrDefault(l => l.IsInSource)?.SourceTree is not { } tree
                        || !ConservationScope.IsInScope(candidate, analysis.Known, symbolStart.Options, tree))
                    {
                        return;
                    }

                    symbolStart.RegisterOperationBlockAction(block =>
                    {
                        if (block.OwningSymbol is not IMethodSymbol method || ConservationAnalysis.BodyOf(block.OperationBlocks) is not { } body)
                        {
                            return;
                        }

                        foreach (var issue in analysis.Issues(method, body))
                        {
                            block.ReportDiagnostic(Diagnostic.Create(
                                Descriptors.For(issue.RuleId),
                                issue.Location,
                                issue.AdditionalLocations,
                                issue.Properties,
                                issue.Arguments.Cast<object>().ToArray()));
                        }
                    });
                },
                SymbolKind.Method);
        });
    }
}
