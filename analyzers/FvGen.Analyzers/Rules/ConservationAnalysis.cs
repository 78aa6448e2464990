using System;
using System.Collections.Generic;
using System.Linq;
using System.Runtime.CompilerServices;
using FvGen.Analyzers.Extraction;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Rules;

/// <summary>
/// The checker's state for one compilation (symbols and the purity cache), shared by the methods
/// analyzed in it, and the run of the checker on one method body.
/// </summary>
internal sealed class ConservationAnalysis
{
    private static readonly ConditionalWeakTable<Compilation, ConservationAnalysis> States = new();

    private ConservationAnalysis(KnownSymbols known, Compilation compilation)
    {
        Known = known;
        Purity = new PurityChecker(compilation);
    }

    public KnownSymbols Known { get; }

    public PurityChecker Purity { get; }

    /// <summary>The state of a compilation that references FvGen; null otherwise.</summary>
    public static ConservationAnalysis? For(Compilation compilation)
    {
        if (States.TryGetValue(compilation, out var existing))
        {
            return existing;
        }

        var known = KnownSymbols.TryCreate(compilation);
        return known is null ? null : States.GetValue(compilation, c => new ConservationAnalysis(known, c));
    }

    /// <summary>Prefix of the reason given when the checker itself fails; tests assert it never appears.</summary>
    public const string InternalErrorReason = "the checker hit an internal error";

    /// <summary>What the checker finds in one method body, for every rule.</summary>
    public IReadOnlyList<ConservationIssue> Issues(IMethodSymbol method, IOperation body)
    {
        var context = new MethodContext(Known, Purity, method.ContainingType, body);
        try
        {
            return MethodReader.Analyze(body, context).ToList();
        }
        catch (Exception e) when (e is not OperationCanceledException)
        {
            // Never a crash in the IDE and never a silent pass: the method is reported as not analyzed.
            return new[]
            {
                new ConservationIssue(
                    DiagnosticIds.NotAnalyzed,
                    System.Collections.Immutable.ImmutableArray.Create($"{InternalErrorReason} ({e.GetType().Name}: {e.Message}); please report it"),
                    body.Syntax.GetLocation(),
                    System.Collections.Immutable.ImmutableArray<Location>.Empty,
                    System.Collections.Immutable.ImmutableDictionary<string, string?>.Empty),
            };
        }
    }

    /// <summary>The body among a block's operations: a method, constructor or accessor body.</summary>
    public static IOperation? BodyOf(IEnumerable<IOperation> blocks) =>
        blocks.FirstOrDefault(b => b is IMethodBodyOperation or IConstructorBodyOperation)
        ?? blocks.FirstOrDefault(b => b is IBlockOperation);
}
