using System.Linq;
using FvGen.Generator.Common;
using FvGen.Generator.Diagnostics;
using Microsoft.CodeAnalysis;

namespace FvGen.Generator.Boundaries;

/// <summary>The generated <c>Boundary</c> enum needs its name free in the type that declares boundary fluxes.</summary>
internal static class BoundaryNameCheck
{
    /// <summary>A member named <c>Boundary</c> that the user declared (not the generated enum), or null.</summary>
    public static ISymbol? Conflict(INamedTypeSymbol type) =>
        type.GetMembers(KnownNames.BoundaryEnumName).FirstOrDefault(member =>
            member.DeclaringSyntaxReferences.Any(r => !GeneratedTrees.IsOurs(r.SyntaxTree)) || member.DeclaringSyntaxReferences.Length == 0);

    /// <summary>The FVG0013 problem for <paramref name="type"/>, if any.</summary>
    public static Problem? Check(INamedTypeSymbol type)
    {
        if (Conflict(type) is not { } member || HasBoundaryFluxes(type) == false)
        {
            return null;
        }

        return new Problem(Descriptors.BoundaryNameTaken, member.Locations.FirstOrDefault(), type.Name);
    }

    private static bool HasBoundaryFluxes(INamedTypeSymbol type) =>
        type.GetMembers().OfType<IMethodSymbol>().Any(m =>
            m.GetAttributes().Any(a => a.AttributeClass?.ToDisplayString() == KnownNames.BoundaryFluxAttribute));
}
