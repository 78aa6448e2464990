using System;
using Microsoft.CodeAnalysis;

namespace FvGen.Generator.Common;

/// <summary>Recognises the syntax trees this generator added (seen by the usage analyzer after generation).</summary>
internal static class GeneratedTrees
{
    // Generated trees live under "<assembly>/<generator type>/<hint name>".
    private const string Marker = "FvGen.Generator.FvGenGenerator";

    public static bool IsOurs(SyntaxTree tree) =>
        tree.FilePath.IndexOf(Marker, StringComparison.Ordinal) >= 0 && tree.FilePath.EndsWith(".g.cs", StringComparison.Ordinal);
}
