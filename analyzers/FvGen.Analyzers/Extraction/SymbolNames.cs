using Microsoft.CodeAnalysis;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// Name tests on symbols that compare names part by part. Formatting a symbol's display string
/// for a comparison costs the compiler's whole display machinery on every call.
/// </summary>
internal static class SymbolNames
{
    /// <summary>True when <paramref name="ns"/> is the namespace <paramref name="dotted"/> (<c>System.Collections.Generic</c>).</summary>
    public static bool IsNamespace(INamespaceSymbol? ns, string dotted)
    {
        int end = dotted.Length;
        while (end > 0)
        {
            int dot = dotted.LastIndexOf('.', end - 1);
            int start = dot + 1;
            if (ns is null || ns.IsGlobalNamespace || ns.Name.Length != end - start
                || string.CompareOrdinal(ns.Name, 0, dotted, start, end - start) != 0)
            {
                return false;
            }

            ns = ns.ContainingNamespace;
            end = dot < 0 ? 0 : dot;
        }

        return ns is { IsGlobalNamespace: true };
    }

    /// <summary>True when <paramref name="ns"/> is <paramref name="dotted"/> or lies inside it.</summary>
    public static bool IsWithinNamespace(INamespaceSymbol? ns, string dotted)
    {
        for (; ns is { IsGlobalNamespace: false }; ns = ns.ContainingNamespace)
        {
            if (IsNamespace(ns, dotted))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>True for the top-level type <paramref name="name"/> with <paramref name="arity"/> type parameters in namespace <paramref name="dotted"/>.</summary>
    public static bool IsType(ITypeSymbol? type, string dotted, string name, int arity = 0) =>
        type is INamedTypeSymbol named
        && named.Arity == arity
        && named.ContainingType is null
        && named.Name == name
        && IsNamespace(named.ContainingNamespace, dotted);
}
