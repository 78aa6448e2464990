using Microsoft.CodeAnalysis;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// The FvGen and framework symbols the checker needs, resolved once per compilation. Null when
/// FvGen is not referenced: the analyzers then register nothing.
/// </summary>
internal sealed class KnownSymbols
{
    private KnownSymbols(Compilation compilation, INamedTypeSymbol conservativeUpdate)
    {
        ConservativeUpdate = conservativeUpdate;
        NumericalFlux = compilation.GetTypeByMetadataName("FvGen.NumericalFluxAttribute");
        FaceData = compilation.GetTypeByMetadataName("FvGen.FaceDataAttribute");
        GeometryValue = compilation.GetTypeByMetadataName("FvGen.GeometryValueAttribute");
        BoundaryFlux = compilation.GetTypeByMetadataName("FvGen.BoundaryFluxAttribute");
        FaceField = compilation.GetTypeByMetadataName("FvGen.Fields.FaceField`1");
        CellField = compilation.GetTypeByMetadataName("FvGen.Fields.CellField`1");
        UnstructuredMesh = compilation.GetTypeByMetadataName("FvGen.Meshes.Unstructured.UnstructuredMesh");
        Parallel = compilation.GetTypeByMetadataName("System.Threading.Tasks.Parallel");
        Math = compilation.GetTypeByMetadataName("System.Math");
        MathF = compilation.GetTypeByMetadataName("System.MathF");
        Span = compilation.GetTypeByMetadataName("System.Span`1");
        ReadOnlySpan = compilation.GetTypeByMetadataName("System.ReadOnlySpan`1");
        Enumerable = compilation.GetTypeByMetadataName("System.Linq.Enumerable");
    }

    public INamedTypeSymbol ConservativeUpdate { get; }

    public INamedTypeSymbol? NumericalFlux { get; }

    public INamedTypeSymbol? FaceData { get; }

    /// <summary><c>[GeometryValue]</c>: a type of geometry values, never a conserved state, with members that write nothing.</summary>
    public INamedTypeSymbol? GeometryValue { get; }

    public INamedTypeSymbol? BoundaryFlux { get; }

    public INamedTypeSymbol? FaceField { get; }

    public INamedTypeSymbol? CellField { get; }

    public INamedTypeSymbol? UnstructuredMesh { get; }

    public INamedTypeSymbol? Parallel { get; }

    public INamedTypeSymbol? Math { get; }

    public INamedTypeSymbol? MathF { get; }

    public INamedTypeSymbol? Span { get; }

    public INamedTypeSymbol? ReadOnlySpan { get; }

    public INamedTypeSymbol? Enumerable { get; }

    public static KnownSymbols? TryCreate(Compilation compilation)
    {
        var attribute = compilation.GetTypeByMetadataName("FvGen.ConservativeUpdateAttribute");
        return attribute is null ? null : new KnownSymbols(compilation, attribute);
    }

    public bool HasAttribute(ISymbol symbol, INamedTypeSymbol? attribute)
    {
        if (attribute is null)
        {
            return false;
        }

        foreach (var a in symbol.GetAttributes())
        {
            if (SymbolEqualityComparer.Default.Equals(a.AttributeClass, attribute))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>True for a flux marked <c>[NumericalFlux(Antisymmetric = true)]</c>.</summary>
    public bool IsAntisymmetricFlux(IMethodSymbol method)
    {
        foreach (var a in method.GetAttributes())
        {
            if (SymbolEqualityComparer.Default.Equals(a.AttributeClass, NumericalFlux))
            {
                foreach (var named in a.NamedArguments)
                {
                    if (named.Key == "Antisymmetric" && named.Value.Value is true)
                    {
                        return true;
                    }
                }
            }
        }

        return false;
    }

    /// <summary>True for a type marked <c>[GeometryValue]</c> (the runtime's <c>Vec3</c>, a team's own vector type).</summary>
    public bool IsGeometryValue(ITypeSymbol? type) => type is INamedTypeSymbol named && HasAttribute(named.OriginalDefinition, GeometryValue);

    public bool IsSpan(ITypeSymbol? type) =>
        type is INamedTypeSymbol named
        && (SymbolEqualityComparer.Default.Equals(named.OriginalDefinition, Span) || SymbolEqualityComparer.Default.Equals(named.OriginalDefinition, ReadOnlySpan));

    public bool IsFaceField(ITypeSymbol? type) =>
        type is INamedTypeSymbol named && SymbolEqualityComparer.Default.Equals(named.OriginalDefinition, FaceField);

    public bool IsCellField(ITypeSymbol? type) =>
        type is INamedTypeSymbol named && SymbolEqualityComparer.Default.Equals(named.OriginalDefinition, CellField);
}
