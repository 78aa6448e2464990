using System.Collections.Generic;
using System.Threading;
using FvGen.Generator.Common;
using FvGen.Generator.Diagnostics;
using Microsoft.CodeAnalysis;

namespace FvGen.Generator.States;

/// <summary>Turns a struct marked <c>[ConservedState]</c> into a <see cref="ConservedStateModel"/>, or into problems.</summary>
internal static class ConservedStateParser
{
    public static ConservedStateModel? Parse(INamedTypeSymbol type, List<Problem>? problems, CancellationToken cancellationToken)
    {
        var location = type.Locations.Length > 0 ? type.Locations[0] : null;
        if (type.TypeKind != TypeKind.Struct || !TypeLocation.AllPartial(type, cancellationToken) || type.IsGenericType)
        {
            problems?.Add(new Problem(Descriptors.StateNotPartialStruct, location, type.Name));
            return null;
        }

        var components = new List<StateComponent>();
        bool ok = Collect(type, type, prefix: "", accessPrefix: "", components, problems, depth: 0);
        if (components.Count == 0 && ok)
        {
            problems?.Add(new Problem(Descriptors.StateComponentNotDouble, location, type.Name, type.Name, "has no double fields"));
            return null;
        }

        if (!ok)
        {
            return null;
        }

        return new ConservedStateModel(
            TypeLocation.Of(type),
            type.ToDisplayString(SymbolDisplayFormat.FullyQualifiedFormat),
            new EquatableArray<StateComponent>(components));
    }

    /// <summary>True when <paramref name="type"/> is a struct marked <c>[ConservedState]</c>.</summary>
    public static bool IsConservedState(ITypeSymbol? type)
    {
        if (type is not INamedTypeSymbol { TypeKind: TypeKind.Struct } named)
        {
            return false;
        }

        foreach (var attribute in named.GetAttributes())
        {
            if (attribute.AttributeClass?.ToDisplayString() == KnownNames.ConservedStateAttribute)
            {
                return true;
            }
        }

        return false;
    }

    private static bool Collect(
        INamedTypeSymbol state,
        INamedTypeSymbol group,
        string prefix,
        string accessPrefix,
        List<StateComponent> components,
        List<Problem>? problems,
        int depth)
    {
        bool ok = true;
        foreach (var member in group.GetMembers())
        {
            if (member.IsStatic || member.IsImplicitlyDeclared && member is not IFieldSymbol)
            {
                continue;
            }

            if (member is IPropertySymbol { IsIndexer: false } property && IsAutoProperty(group, property))
            {
                ok = false;
                problems?.Add(new Problem(
                    Descriptors.StateComponentNotDouble, First(property), prefix + property.Name, state.Name, "is an auto-property; declare it as a field"));
                continue;
            }

            if (member is not IFieldSymbol field || field.IsConst)
            {
                continue;
            }

            if (field.AssociatedSymbol is not null)
            {
                continue; // the backing field of an auto-property, reported above
            }

            string name = prefix + field.Name;
            string access = accessPrefix + Identifier.Escape(field.Name);
            var location = First(field) ?? First(state);
            if (field.IsReadOnly)
            {
                ok = false;
                problems?.Add(new Problem(Descriptors.StateComponentNotDouble, location, name, state.Name, "is readonly"));
                continue;
            }

            if (field.DeclaredAccessibility is Accessibility.Private or Accessibility.Protected && depth > 0)
            {
                ok = false;
                problems?.Add(new Problem(Descriptors.StateComponentNotDouble, location, name, state.Name, "is private to its group"));
                continue;
            }

            if (field.Type.SpecialType == SpecialType.System_Double)
            {
                components.Add(new StateComponent(name, access));
                continue;
            }

            if (field.Type is INamedTypeSymbol { TypeKind: TypeKind.Struct, SpecialType: SpecialType.None } nested
                && depth < 8
                && !SymbolEqualityComparer.Default.Equals(nested, state))
            {
                ok &= Collect(state, nested, name + ".", access + ".", components, problems, depth + 1);
                continue;
            }

            ok = false;
            problems?.Add(new Problem(
                Descriptors.StateComponentNotDouble, location, name, state.Name, "is of type " + field.Type.ToDisplayString()));
        }

        return ok;
    }

    private static bool IsAutoProperty(INamedTypeSymbol group, IPropertySymbol property)
    {
        foreach (var member in group.GetMembers())
        {
            if (member is IFieldSymbol { IsStatic: false } f && SymbolEqualityComparer.Default.Equals(f.AssociatedSymbol, property))
            {
                return true;
            }
        }

        return false;
    }

    private static Location? First(ISymbol symbol) => symbol.Locations.Length > 0 ? symbol.Locations[0] : null;
}
