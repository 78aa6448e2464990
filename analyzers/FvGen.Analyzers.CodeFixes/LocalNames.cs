using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>Names for the locals a fix introduces: the preferred name unless the enclosing member already uses it, then numbered.</summary>
internal static class LocalNames
{
    /// <summary>A name no identifier of <paramref name="near"/>'s member uses and not in <paramref name="taken"/> (which it joins).</summary>
    public static string Unique(SyntaxNode near, string preferred, ISet<string>? taken = null)
    {
        var scope = near.AncestorsAndSelf().OfType<MemberDeclarationSyntax>().FirstOrDefault() ?? near;
        var used = new HashSet<string>(
            scope.DescendantTokens().Where(t => t.IsKind(SyntaxKind.IdentifierToken)).Select(t => t.ValueText),
            System.StringComparer.Ordinal);
        string name = preferred;
        for (int k = 2; used.Contains(name) || (taken?.Contains(name) ?? false); k++)
        {
            name = preferred + k.ToString(CultureInfo.InvariantCulture);
        }

        taken?.Add(name);
        return name;
    }
}
