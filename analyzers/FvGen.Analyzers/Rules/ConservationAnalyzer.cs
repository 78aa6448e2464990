using System;
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
/// output is checked); symbols are resolved once per compilation, at its first method, and nothing
/// is analyzed when FvGen is not referenced; operation trees are asked for only for methods in scope.
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
            // The FvGen symbols are looked up at the first method, not here: the lookup binds the
            // compilation's references, which the compiler does anyway once it declares symbols, and
            // at compilation start the analyzer would be the one made to wait for it.
            var compilation = start.Compilation;
            var state = new Lazy<ConservationAnalysis?>(() => ConservationAnalysis.For(compilation));

            start.RegisterSymbolAction(
                symbol =>
                {
                    if (state.Value is { } analysis)
                    {
                        DeclaredFluxPurity.Check(symbol, analysis);
                    }
                },
                SymbolKind.Method);

            // Operation trees are asked for only inside scope: out-of-scope methods cost nothing.
            start.RegisterSymbolStartAction(
                symbolStart =>
                {
                    if (state.Value is not { } analysis
                        || symbolStart.Symbol is not IMethodSymbol candidate
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
