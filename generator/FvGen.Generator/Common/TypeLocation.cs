using System.Collections.Generic;
using Microsoft.CodeAnalysis;

namespace FvGen.Generator.Common;

/// <summary>Where a generated partial member lives: its namespace and the chain of containing types, outermost first.</summary>
internal sealed record TypeLocation(string Namespace, EquatableArray<ContainingType> Types)
{
    /// <summary>The location of the members of <paramref name="type"/> (the type itself is the innermost entry).</summary>
    public static TypeLocation Of(INamedTypeSymbol type)
    {
        var chain = new List<ContainingType>();
        for (INamedTypeSymbol? t = type; t is not null; t = t.ContainingType)
        {
            chain.Insert(0, new ContainingType(Keyword(t), t.ToDisplayString(SymbolDisplayFormat.MinimallyQualifiedFormat)));
        }

        string ns = type.ContainingNamespace is { IsGlobalNamespace: false } n ? n.ToDisplayString() : "";
        return new TypeLocation(ns, new EquatableArray<ContainingType>(chain));
    }

    /// <summary>True when every type of the chain is declared <c>partial</c> somewhere.</summary>
    public static bool AllPartial(INamedTypeSymbol type, System.Threading.CancellationToken cancellationToken)
    {
        for (INamedTypeSymbol? t = type; t is not null; t = t.ContainingType)
        {
            if (!IsPartial(t, cancellationToken))
            {
                return false;
            }
        }

        return true;
    }

    public static bool IsPartial(INamedTypeSymbol type, System.Threading.CancellationToken cancellationToken)
    {
        foreach (var reference in type.DeclaringSyntaxReferences)
        {
            if (reference.GetSyntax(cancellationToken) is Microsoft.CodeAnalysis.CSharp.Syntax.TypeDeclarationSyntax declaration)
            {
                foreach (var modifier in declaration.Modifiers)
                {
                    if (modifier.IsKind(Microsoft.CodeAnalysis.CSharp.SyntaxKind.PartialKeyword))
                    {
                        return true;
                    }
                }
            }
        }

        return false;
    }

    /// <summary>A file-name friendly name: namespace and types joined by dots, type arguments dropped.</summary>
    public string HintName
    {
        get
        {
            var parts = new List<string>();
            if (Namespace.Length > 0)
            {
                parts.Add(Namespace);
            }

            foreach (var t in Types)
            {
                int generic = t.Name.IndexOf('<');
                parts.Add(generic < 0 ? t.Name : t.Name.Substring(0, generic));
            }

            return string.Join(".", parts);
        }
    }

    private static string Keyword(INamedTypeSymbol type) => type switch
    {
        { IsRecord: true, TypeKind: TypeKind.Struct } => "record struct",
        { IsRecord: true } => "record",
        { TypeKind: TypeKind.Struct } => "struct",
        { TypeKind: TypeKind.Interface } => "interface",
        _ => "class",
    };
}
