using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Testing;

namespace FvGen.Analyzers.Tests.Verifiers;

/// <summary>
/// References for test sources: the .NET 10 reference assemblies shipped in a package (no download
/// at test time) and the FvGen runtime, so sources can use <c>[FvGen.ConservativeUpdate]</c>.
/// </summary>
internal static class TestReferences
{
    public static ReferenceAssemblies Assemblies { get; } = new("net10.0");

    public static ImmutableArray<MetadataReference> All { get; } =
        Basic.Reference.Assemblies.Net100.References.All.Cast<MetadataReference>()
            .Append(MetadataReference.CreateFromFile(typeof(FvGen.ConservativeUpdateAttribute).Assembly.Location))
            .ToImmutableArray();

    /// <summary>The usings every kernel in the tests starts with.</summary>
    public const string Usings = "using System;\nusing System.Threading.Tasks;\nusing FvGen;\n";
}
