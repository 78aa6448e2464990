using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using FvGen.Generator.Boundaries;
using FvGen.Generator.Common;
using FvGen.Generator.Fluxes;
using FvGen.Generator.Kernels;
using FvGen.Generator.States;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Generator;

/// <summary>
/// The FvGen source generator: conserved-state members, the <c>Boundary</c> enum of each type with
/// boundary fluxes, and the bodies of residual kernels (Parse -> equatable Model -> Emit).
/// </summary>
/// <remarks>
/// The generator reports no diagnostics: what it cannot generate it skips, and
/// <see cref="Diagnostics.FvGenUsageAnalyzer"/> reports why from the same parsers, so every FVG
/// diagnostic can be suppressed with <c>#pragma</c> or <c>.editorconfig</c>.
/// </remarks>
[Generator(LanguageNames.CSharp)]
public sealed class FvGenGenerator : IIncrementalGenerator
{
    public void Initialize(IncrementalGeneratorInitializationContext context)
    {
        var states = context.SyntaxProvider
            .ForAttributeWithMetadataName(
                KnownNames.ConservedStateAttribute,
                static (node, _) => node is StructDeclarationSyntax,
                static (ctx, ct) => ctx.TargetSymbol is INamedTypeSymbol type ? ConservedStateParser.Parse(type, problems: null, ct) : null)
            .WithTrackingName(TrackingNames.States)
            .Where(static m => m is not null)
            .Select(static (m, _) => m!);
        context.RegisterSourceOutput(states, static (spc, model) =>
            spc.AddSource(ConservedStateEmitter.HintName(model), ConservedStateEmitter.Emit(model)));

        var boundaryFluxes = context.SyntaxProvider
            .ForAttributeWithMetadataName(
                KnownNames.BoundaryFluxAttribute,
                static (node, _) => node is MethodDeclarationSyntax,
                static (ctx, ct) => FindBoundaryFlux(ctx, ct))
            .WithTrackingName(TrackingNames.BoundaryFluxes)
            .Where(static m => m is not null)
            .Select(static (m, _) => m!);
        var boundarySets = boundaryFluxes
            .Collect()
            .SelectMany(static (all, _) => Group(all))
            .WithTrackingName(TrackingNames.BoundarySets);
        context.RegisterSourceOutput(boundarySets, static (spc, model) =>
            spc.AddSource(BoundaryEnumEmitter.HintName(model), BoundaryEnumEmitter.Emit(model)));

        var kernels = context.SyntaxProvider
            .ForAttributeWithMetadataName(
                KnownNames.ResidualKernelAttribute,
                static (node, _) => node is MethodDeclarationSyntax,
                static (ctx, ct) => ctx.TargetSymbol is IMethodSymbol method && ctx.Attributes.Length == 1
                    ? ResidualKernelParser.Parse(method, ctx.Attributes[0], problems: null, ct)
                    : null)
            .WithTrackingName(TrackingNames.Kernels)
            .Where(static m => m is not null)
            .Select(static (m, _) => m!);
        context.RegisterSourceOutput(kernels, static (spc, model) =>
            spc.AddSource(KernelEmitter.HintName(model), KernelEmitter.Emit(model)));
    }

    private static BoundaryFluxFound? FindBoundaryFlux(GeneratorAttributeSyntaxContext ctx, System.Threading.CancellationToken ct)
    {
        if (ctx.TargetSymbol is not IMethodSymbol method || method.ContainingType is not { } type || ctx.Attributes.Length != 1)
        {
            return null;
        }

        if (!TypeLocation.AllPartial(type, ct)
            || BoundaryNameCheck.Conflict(type) is not null
            || FluxSignature.Boundary(method, ctx.Attributes[0], problems: null) is not { } found)
        {
            return null;
        }

        return new BoundaryFluxFound(TypeLocation.Of(type), found.Entry);
    }

    private static ImmutableArray<BoundarySetModel> Group(ImmutableArray<BoundaryFluxFound> all)
    {
        var sets = new Dictionary<TypeLocation, List<BoundaryFluxEntry>>();
        foreach (var found in all)
        {
            if (!sets.TryGetValue(found.Location, out var list))
            {
                sets[found.Location] = list = new List<BoundaryFluxEntry>();
            }

            if (!list.Any(e => e.Call.Name == found.Entry.Call.Name))
            {
                list.Add(found.Entry);
            }
        }

        return sets
            .OrderBy(pair => pair.Key.HintName, System.StringComparer.Ordinal)
            .Select(pair => new BoundarySetModel(
                pair.Key,
                new EquatableArray<BoundaryFluxEntry>(pair.Value.OrderBy(e => e.Call.Name, System.StringComparer.Ordinal))))
            .ToImmutableArray();
    }
}
