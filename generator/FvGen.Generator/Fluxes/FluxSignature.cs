using System.Collections.Generic;
using FvGen.Generator.Common;
using FvGen.Generator.Diagnostics;
using FvGen.Generator.States;
using Microsoft.CodeAnalysis;

namespace FvGen.Generator.Fluxes;

/// <summary>Checks the signatures of numerical and boundary fluxes and reads how to call them.</summary>
internal static class FluxSignature
{
    /// <summary>
    /// Checks <c>static TState F(in TState left, in TState right, in FaceGeometry face)</c>; returns the call
    /// and the state type, or null after adding a problem.
    /// </summary>
    public static (FluxCall Call, ITypeSymbol State)? Numerical(IMethodSymbol method, List<Problem>? problems)
    {
        string? why = null;
        var parameters = method.Parameters;
        if (!method.IsStatic)
        {
            why = "it is not static";
        }
        else if (method.IsGenericMethod)
        {
            why = "it is generic";
        }
        else if (parameters.Length != 3 && parameters.Length != 5)
        {
            why = "it takes " + parameters.Length + " parameter(s), not 3 (or 5 with the two cells' gradients)";
        }
        else if (!ConservedStateParser.IsConservedState(method.ReturnType))
        {
            why = "its return type '" + method.ReturnType.ToDisplayString() + "' is not a [ConservedState] struct";
        }
        else if (!SymbolEqualityComparer.Default.Equals(parameters[0].Type, method.ReturnType)
            || !SymbolEqualityComparer.Default.Equals(parameters[1].Type, method.ReturnType))
        {
            why = "the left and right states must both be of its return type '" + method.ReturnType.ToDisplayString() + "'";
        }
        else if (parameters[2].Type.ToDisplayString() != KnownNames.FaceGeometry)
        {
            why = "the third parameter must be a FvGen.Geometry.FaceGeometry";
        }
        else if (!ByValueOrIn(parameters[0]) || !ByValueOrIn(parameters[1]) || !ByValueOrIn(parameters[2]))
        {
            why = "parameters must be passed by value or 'in'";
        }
        else if (parameters[0].RefKind != parameters[1].RefKind)
        {
            why = "the left and right states must be passed the same way";
        }
        else if (parameters.Length == 5
            && (!IsGradientOf(parameters[3].Type, method.ReturnType) || !IsGradientOf(parameters[4].Type, method.ReturnType)
                || !ByValueOrIn(parameters[3]) || parameters[3].RefKind != parameters[4].RefKind))
        {
            why = "the fourth and fifth parameters must be the left and right cells' FvGen.Geometry.Gradient<" + method.ReturnType.Name + ">, passed the same way";
        }

        if (why is not null)
        {
            problems?.Add(new Problem(Descriptors.NumericalFluxSignature, First(method), method.Name, why));
            return null;
        }

        string? gradients = parameters.Length == 5 ? Modifier(parameters[3]) : null;
        return (new FluxCall(method.Name, Modifier(parameters[0]), Modifier(parameters[2]), gradients), method.ReturnType);
    }

    /// <summary>Checks <c>static TState B(in TState inside, in FaceGeometry face)</c> and its kind.</summary>
    public static (BoundaryFluxEntry Entry, ITypeSymbol State)? Boundary(IMethodSymbol method, AttributeData attribute, List<Problem>? problems)
    {
        string? why = null;
        var parameters = method.Parameters;
        if (!method.IsStatic)
        {
            why = "it is not static";
        }
        else if (method.IsGenericMethod)
        {
            why = "it is generic";
        }
        else if (parameters.Length != 2)
        {
            why = "it takes " + parameters.Length + " parameter(s), not 2";
        }
        else if (!ConservedStateParser.IsConservedState(method.ReturnType))
        {
            why = "its return type '" + method.ReturnType.ToDisplayString() + "' is not a [ConservedState] struct";
        }
        else if (!SymbolEqualityComparer.Default.Equals(parameters[0].Type, method.ReturnType))
        {
            why = "the inside state must be of its return type '" + method.ReturnType.ToDisplayString() + "'";
        }
        else if (parameters[1].Type.ToDisplayString() != KnownNames.FaceGeometry)
        {
            why = "the second parameter must be a FvGen.Geometry.FaceGeometry";
        }
        else if (!ByValueOrIn(parameters[0]) || !ByValueOrIn(parameters[1]))
        {
            why = "parameters must be passed by value or 'in'";
        }

        if (why is not null)
        {
            problems?.Add(new Problem(Descriptors.BoundaryFluxSignature, First(method), method.Name, why));
            return null;
        }

        string? kind = KindName(attribute);
        if (kind is null)
        {
            object? raw = attribute.ConstructorArguments.Length == 1 ? attribute.ConstructorArguments[0].Value : null;
            problems?.Add(new Problem(Descriptors.BoundaryKindUnknown, First(method), method.Name, raw?.ToString() ?? "(none)"));
            return null;
        }

        return (new BoundaryFluxEntry(new FluxCall(method.Name, Modifier(parameters[0]), Modifier(parameters[1])), kind), method.ReturnType);
    }

    private static readonly string[] Kinds = { "Wall", "Inflow", "Outflow", "Symmetry", "UserDefined" };

    private static string? KindName(AttributeData attribute)
    {
        if (attribute.ConstructorArguments.Length != 1 || attribute.ConstructorArguments[0].Value is not int value)
        {
            return null;
        }

        return value >= 0 && value < Kinds.Length ? Kinds[value] : null;
    }

    /// <summary>True when <paramref name="type"/> is <c>FvGen.Geometry.Gradient&lt;state&gt;</c>.</summary>
    public static bool IsGradientOf(ITypeSymbol type, ITypeSymbol state) =>
        type is INamedTypeSymbol { IsGenericType: true } named
        && named.OriginalDefinition.ToDisplayString() == KnownNames.GradientOpen
        && SymbolEqualityComparer.Default.Equals(named.TypeArguments[0], state);

    private static bool ByValueOrIn(IParameterSymbol p) => p.RefKind is RefKind.None or RefKind.In;

    private static string Modifier(IParameterSymbol p) => p.RefKind == RefKind.In ? "in " : "";

    private static Location? First(ISymbol symbol) => symbol.Locations.Length > 0 ? symbol.Locations[0] : null;
}
