using Microsoft.CodeAnalysis.CSharp;

namespace FvGen.Generator.Common;

/// <summary>Identifiers written into generated source.</summary>
internal static class Identifier
{
    /// <summary><paramref name="name"/> with an <c>@</c> in front when it is a C# keyword (a parameter called <c>@in</c>, say).</summary>
    public static string Escape(string name) =>
        SyntaxFacts.GetKeywordKind(name) != SyntaxKind.None ? "@" + name : name;
}
