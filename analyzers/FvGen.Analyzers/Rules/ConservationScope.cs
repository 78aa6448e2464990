using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>Which methods are checked: those marked <c>[FvGen.ConservativeUpdate]</c> (or in a marked type), or all with the option.</summary>
internal static class ConservationScope
{
    /// <summary>The <c>.editorconfig</c> key that widens the scope to every method of a project.</summary>
    public const string AllMethodsKey = "fvgen_conservation_scope_all_methods";

    public static bool IsInScope(ISymbol owner, Extraction.KnownSymbols known, AnalyzerOptions options, SyntaxTree tree)
    {
        if (owner is not IMethodSymbol method)
        {
            return false;
        }

        for (ISymbol? s = method; s is not null; s = s.ContainingSymbol)
        {
            if (s is INamespaceSymbol)
            {
                break;
            }

            if (known.HasAttribute(s, known.ConservativeUpdate))
            {
                return true;
            }
        }

        return options.AnalyzerConfigOptionsProvider.GetOptions(tree).TryGetValue(AllMethodsKey, out var value)
            && string.Equals(value?.Trim(), "true", System.StringComparison.OrdinalIgnoreCase);
    }
}
