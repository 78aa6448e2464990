using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>
/// Shared wiring of the rules: concurrent, generated code reported (FvGen's own output is checked
/// too), symbols resolved at compilation start with an early return when FvGen is not referenced,
/// then one operation-block action for methods in scope.
/// </summary>
public abstract class ConservationRuleAnalyzer : DiagnosticAnalyzer
{
    private readonly DiagnosticDescriptor _rule;

    private protected ConservationRuleAnalyzer(DiagnosticDescriptor rule) => _rule = rule;

    public sealed override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics => ImmutableArray.Create(_rule);

    public sealed override void Initialize(AnalysisContext context)
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

            if (ChecksDeclarations)
            {
                start.RegisterSymbolAction(symbol => CheckDeclaration(symbol, analysis), SymbolKind.Method);
            }

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

                        foreach (var issue in analysis.Issues(method, body).Where(i => i.RuleId == _rule.Id))
                        {
                            block.ReportDiagnostic(Diagnostic.Create(
                                _rule,
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

    /// <summary>True for rules that also look at method declarations.</summary>
    private protected virtual bool ChecksDeclarations => false;

    /// <summary>The declaration check of such a rule.</summary>
    private protected virtual void CheckDeclaration(SymbolAnalysisContext symbol, ConservationAnalysis analysis)
    {
    }
}
