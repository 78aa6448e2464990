using System.Collections.Generic;
using Microsoft.CodeAnalysis;

namespace FvGen.Analyzers.Extraction;

/// <summary>Maps the engine's opaque origin numbers back to source locations.</summary>
internal sealed class OriginTable
{
    private readonly List<Location> _locations = new();

    public int Add(SyntaxNode syntax)
    {
        _locations.Add(syntax.GetLocation());
        return _locations.Count - 1;
    }

    public Location? this[int origin] => origin >= 0 && origin < _locations.Count ? _locations[origin] : null;
}
