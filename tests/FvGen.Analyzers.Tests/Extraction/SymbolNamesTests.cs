using FvGen.Analyzers.Extraction;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace FvGen.Analyzers.Tests.Extraction;

/// <summary>
/// The part-by-part name tests must agree with the symbols' full names (as the display string
/// spells them) on framework types from metadata and on look-alike types declared in source.
/// </summary>
public sealed class SymbolNamesTests
{
    private static readonly Compilation Compilation = CSharpCompilation.Create(
        "Names",
        [CSharpSyntaxTree.ParseText("""
            namespace Mine.System.Collections.Generic { public class List<T> { } }
            namespace System.NumericsExtra { public struct Vec { } }
            namespace System.Numerics.Deep { public struct Vec { } }
            public class Debug { }
            """)],
        Basic.Reference.Assemblies.Net100.References.All);

    private static INamedTypeSymbol Type(string metadataName) =>
        Compilation.GetTypeByMetadataName(metadataName) ?? throw new InvalidOperationException(metadataName + " not found");

    [Theory]
    [InlineData("System.Collections.Generic.List`1", "System.Collections.Generic", "List", 1, true)]
    [InlineData("System.Collections.Generic.IReadOnlyList`1", "System.Collections.Generic", "IReadOnlyList", 1, true)]
    [InlineData("System.Collections.Generic.List`1", "System.Collections.Generic", "List", 0, false)]
    [InlineData("System.Collections.Generic.List`1", "Collections.Generic", "List", 1, false)]
    [InlineData("Mine.System.Collections.Generic.List`1", "System.Collections.Generic", "List", 1, false)]
    [InlineData("System.Diagnostics.Debug", "System.Diagnostics", "Debug", 0, true)]
    [InlineData("Debug", "System.Diagnostics", "Debug", 0, false)]
    [InlineData("System.Math", "System", "Math", 0, true)]
    public void A_type_is_named_by_its_namespace_name_and_arity(string metadataName, string ns, string name, int arity, bool expected)
    {
        var type = Type(metadataName);
        Assert.Equal(expected, SymbolNames.IsType(type, ns, name, arity));

        // The reference: the full name as the display string spells it.
        string display = type.OriginalDefinition.ToDisplayString();
        string spelled = ns + "." + name + (arity == 0 ? string.Empty : "<" + string.Join(", ", type.TypeParameters.Select(p => p.Name)) + ">");
        Assert.Equal(display == spelled && type.Arity == arity, expected);
    }

    [Theory]
    [InlineData("System.Numerics.Vector3", true)]
    [InlineData("System.Numerics.Deep.Vec", true)]
    [InlineData("System.NumericsExtra.Vec", false)]
    [InlineData("System.Math", false)]
    public void Within_a_namespace_means_in_it_or_below_it(string metadataName, bool expected)
    {
        var ns = Type(metadataName).ContainingNamespace;
        Assert.Equal(expected, SymbolNames.IsWithinNamespace(ns, "System.Numerics"));
        Assert.Equal(expected, ns.ToDisplayString() == "System.Numerics" || ns.ToDisplayString().StartsWith("System.Numerics.", StringComparison.Ordinal));
    }

    [Fact]
    public void The_global_namespace_is_no_named_namespace()
    {
        Assert.False(SymbolNames.IsNamespace(Compilation.GlobalNamespace, "System"));
        Assert.False(SymbolNames.IsNamespace(null, "System"));
        Assert.True(SymbolNames.IsNamespace(Type("System.Math").ContainingNamespace, "System"));
    }
}
