using System.Collections.Generic;
using Microsoft.CodeAnalysis;

namespace FvGen.Analyzers.Extraction;

/// <summary>Maps the engine's opaque origin numbers back to source locations.</summary>
internal sealed class OriginTable
{
    // Nodes are kept and located on first use: most origins never reach a diagnostic.
    private readonly List<SyntaxNode> _nodes = new();
    private readonly Dictionary<int, Location> _located = new();

    public int Add(SyntaxNode syntax)
    {
        _nodes.Add(syntax);
        return _nodes.Count - 1;
    }

    public Location? this[int origin]
    {
        get
        {
            if (origin < 0 || origin >= _nodes.Count)
            {
                return null;
            }

            if (!_located.TryGetValue(origin, out var location))
            {
                _located[origin] = location = _nodes[origin].GetLocation();
            }

            return location;
        }
    }
}
