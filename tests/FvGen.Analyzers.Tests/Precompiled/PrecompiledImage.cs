using System.Reflection;

namespace FvGen.Analyzers.Tests.Precompiled;

/// <summary>
/// Where this build put the precompiled analyzer (analyzers/FvGen.Analyzers/Precompile.targets) and whether it
/// was asked to make one, as the test project's build recorded them.
/// </summary>
internal static class PrecompiledImage
{
    // MSBuild compares property values without regard to case, so "True" asks for the image too.
    public static bool Expected => string.Equals(Metadata("FvGen.PrecompiledAnalyzerExpected"), "true", StringComparison.OrdinalIgnoreCase);

    public static string Path => Metadata("FvGen.PrecompiledAnalyzerPath");

    public static string SelectionTargets => Metadata("FvGen.AnalyzerSelectionTargets");

    public static string PrecompileTargets => Metadata("FvGen.AnalyzerPrecompileTargets");

    private static string Metadata(string key) =>
        typeof(PrecompiledImage).Assembly.GetCustomAttributes<AssemblyMetadataAttribute>()
            .SingleOrDefault(a => a.Key == key)?.Value
        ?? throw new InvalidOperationException($"the test assembly carries no '{key}' metadata: see FvGen.Analyzers.Tests.csproj");
}
