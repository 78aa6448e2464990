using System.Collections.Generic;
using System.Collections.Immutable;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Extraction;

/// <summary>What every loop of one method shares: symbols, origins, face arrays, purity, the issues found.</summary>
internal sealed class MethodContext
{
    /// <summary>The context of a method whose body is <paramref name="body"/> (walked once here, see <see cref="OperationIndex"/>).</summary>
    public MethodContext(KnownSymbols known, PurityChecker purity, INamedTypeSymbol? containingType, IOperation body)
        : this(known, purity, containingType, OperationIndex.Of(body), new OriginTable(), new List<ConservationIssue>(), new HashSet<IMethodSymbol>(SymbolEqualityComparer.Default))
    {
    }

    private MethodContext(KnownSymbols known, PurityChecker purity, INamedTypeSymbol? containingType, OperationIndex operations, OriginTable origins, List<ConservationIssue> issues, HashSet<IMethodSymbol> impureReported)
    {
        Operations = operations;
        Known = known;
        Purity = purity;
        ContainingType = containingType;
        Origins = origins;
        Issues = issues;
        _impureReported = impureReported;
    }

    /// <summary>
    /// The context of a local function of this method: the same symbols, origins and issue list, but
    /// face arrays of its own (its loops fill and read its own buffers).
    /// </summary>
    public MethodContext ForLocalFunction(IEnumerable<IParameterSymbol> faceParameters)
    {
        var context = new MethodContext(Known, Purity, ContainingType, Operations, Origins, Issues, _impureReported);
        context.FaceParameters.UnionWith(faceParameters);
        return context;
    }

    /// <summary>
    /// Parameters of a local function that every call in the enclosing body passes face data
    /// (a <c>[FaceData]</c> buffer handed down by the generator's face passes): face data inside it too.
    /// </summary>
    public HashSet<IParameterSymbol> FaceParameters { get; } = new(SymbolEqualityComparer.Default);

    public KnownSymbols Known { get; }

    /// <summary>The method body's operations, walked once; local functions share it (their bodies are inside).</summary>
    public OperationIndex Operations { get; }

    public PurityChecker Purity { get; }

    public INamedTypeSymbol? ContainingType { get; }

    public OriginTable Origins { get; }

    /// <summary>Arrays filled by an earlier loop of the method (definitions): face data for later loops.</summary>
    public HashSet<string> FaceArrays { get; } = new(System.StringComparer.Ordinal);

    /// <summary>Those of <see cref="FaceArrays"/> whose definition read cells through two index maps.</summary>
    public HashSet<string> InteriorFaceArrays { get; } = new(System.StringComparer.Ordinal);

    public List<ConservationIssue> Issues { get; }

    /// <summary>Local arrays of constants nothing in the method changes (<see cref="ConstantTables"/>), by name.</summary>
    public Dictionary<string, ImmutableArray<Conservation.Rational>> ConstantTables { get; } = new(System.StringComparer.Ordinal);

    private readonly HashSet<IMethodSymbol> _impureReported;

    public void ReportImpureCall(IInvocationOperation invocation, IMethodSymbol method, Purity purity)
    {
        if (!_impureReported.Add(method))
        {
            return;
        }

        var additional = purity.Location is null ? ImmutableArray<Location>.Empty : ImmutableArray.Create(purity.Location);
        Issues.Add(new ConservationIssue(
            DiagnosticIds.ImpureNumericalFlux,
            ImmutableArray.Create(method.Name, purity.Reason),
            invocation.Syntax.GetLocation(),
            additional,
            ImmutableDictionary<string, string?>.Empty));
    }

    public void ReportNotAnalyzed(string reason, SyntaxNode where) => ReportNotAnalyzed(reason, where.GetLocation());

    public void ReportNotAnalyzed(string reason, Location where) =>
        Issues.Add(new ConservationIssue(
            DiagnosticIds.NotAnalyzed,
            ImmutableArray.Create(reason),
            where,
            ImmutableArray<Location>.Empty,
            ImmutableDictionary<string, string?>.Empty));
}
