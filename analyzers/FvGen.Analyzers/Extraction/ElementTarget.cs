using System.Collections.Immutable;
using FvGen.Analyzers.Conservation;

namespace FvGen.Analyzers.Extraction;

/// <summary>An array element (or a component of one) that is read or written.</summary>
internal sealed record ElementTarget(string Array, ImmutableArray<ImmutableArray<IndexTerm>> Subscripts, string Path, DataRole Role)
{
    public ElementTarget WithPath(string component) => this with { Path = Path + "." + component };

    public ReadExpr ToRead() => new(Array, Subscripts, Path, Role);
}
