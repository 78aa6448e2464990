using System.Collections.Generic;
using System.Collections.Immutable;
using FvGen.Generator.Common;
using FvGen.Generator.Fluxes;
using FvGen.Generator.Kernels;
using FvGen.Generator.States;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Generator.Diagnostics;

/// <summary>
/// Reports misuse of the generator's attributes (FVG0001 ...). It runs the generator's own parsers,
/// so it reports exactly what the generator skips, and being an analyzer its diagnostics honour
/// <c>#pragma warning disable</c> and <c>.editorconfig</c> severities.
/// </summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class FvGenUsageAnalyzer : DiagnosticAnalyzer
{
    public override ImmutableArray<DiagnosticDescriptor> SupportedDiagnostics { get; } = ImmutableArray.Create(Descriptors.All);

    public override void Initialize(AnalysisContext context)
    {
        context.EnableConcurrentExecution();
        context.ConfigureGeneratedCodeAnalysis(GeneratedCodeAnalysisFlags.None);
        context.RegisterCompilationStartAction(start =>
        {
            var stateAttribute = start.Compilation.GetTypeByMetadataName(KnownNames.ConservedStateAttribute);
            if (stateAttribute is null)
            {
                return; // FvGen is not referenced.
            }

            var numerical = start.Compilation.GetTypeByMetadataName(KnownNames.NumericalFluxAttribute);
            var boundary = start.Compilation.GetTypeByMetadataName(KnownNames.BoundaryFluxAttribute);
            var kernel = start.Compilation.GetTypeByMetadataName(KnownNames.ResidualKernelAttribute);
            start.RegisterSymbolAction(
                symbol =>
                {
                    if (symbol.Symbol is not INamedTypeSymbol type)
                    {
                        return;
                    }

                    if (Find(type, stateAttribute) is not null)
                    {
                        Report(symbol, problems => ConservedStateParser.Parse(type, problems, symbol.CancellationToken));
                    }

                    if (Boundaries.BoundaryNameCheck.Check(type) is { } taken)
                    {
                        symbol.ReportDiagnostic(taken.ToDiagnostic());
                    }
                },
                SymbolKind.NamedType);
            start.RegisterSymbolAction(
                symbol =>
                {
                    if (symbol.Symbol is not IMethodSymbol method)
                    {
                        return;
                    }

                    if (Find(method, numerical) is not null)
                    {
                        Report(symbol, problems => FluxSignature.Numerical(method, problems));
                    }

                    if (Find(method, boundary) is { } boundaryAttribute)
                    {
                        Report(symbol, problems => FluxSignature.Boundary(method, boundaryAttribute, problems));
                    }

                    if (Find(method, kernel) is { } kernelAttribute)
                    {
                        Report(symbol, problems => ResidualKernelParser.Parse(method, kernelAttribute, problems, symbol.CancellationToken));
                    }
                },
                SymbolKind.Method);
        });
    }

    private static void Report(SymbolAnalysisContext context, System.Action<List<Problem>> parse)
    {
        var problems = new List<Problem>();
        parse(problems);
        foreach (var problem in problems)
        {
            context.ReportDiagnostic(problem.ToDiagnostic());
        }
    }

    private static AttributeData? Find(ISymbol symbol, INamedTypeSymbol? attribute)
    {
        if (attribute is null)
        {
            return null;
        }

        foreach (var a in symbol.GetAttributes())
        {
            if (SymbolEqualityComparer.Default.Equals(a.AttributeClass, attribute))
            {
                return a;
            }
        }

        return null;
    }
}
