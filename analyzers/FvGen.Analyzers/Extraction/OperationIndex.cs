using System;
using System.Collections.Generic;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// One pre-order walk of a method body, kept. The reader asks "what is inside this loop" many times
/// (writes, reads, assigned locals, index maps, nested loops); each answer is a slice of this walk
/// instead of another walk of the operation tree, which was a fifth of the checker's time.
/// </summary>
/// <remarks>The order is that of <see cref="OperationExtensions.Descendants(IOperation)"/>: a node, then its children in order.</remarks>
internal sealed class OperationIndex
{
    private readonly IOperation[] _nodes;
    private readonly int[] _ends;
    private readonly Dictionary<IOperation, int> _positions;

    private OperationIndex(IOperation[] nodes, int[] ends, Dictionary<IOperation, int> positions)
    {
        _nodes = nodes;
        _ends = ends;
        _positions = positions;
    }

    /// <summary>Walks <paramref name="root"/> once (with a stack of its own: expression trees can be deep).</summary>
    public static OperationIndex Of(IOperation root)
    {
        var nodes = new List<IOperation> { root };
        var ends = new List<int> { 0 };
        var open = new List<(int Position, IOperation.OperationList.Enumerator Children)> { (0, root.ChildOperations.GetEnumerator()) };
        while (open.Count > 0)
        {
            int top = open.Count - 1;
            var (position, children) = open[top];
            if (children.MoveNext())
            {
                // The enumerator is a struct: store it back with its new position.
                open[top] = (position, children);
                var child = children.Current;
                nodes.Add(child);
                ends.Add(0);
                open.Add((nodes.Count - 1, child.ChildOperations.GetEnumerator()));
            }
            else
            {
                open.RemoveAt(top);
                ends[position] = nodes.Count;
            }
        }

        var positions = new Dictionary<IOperation, int>(nodes.Count, ReferenceComparer.Instance);
        for (int k = 0; k < nodes.Count; k++)
        {
            positions[nodes[k]] = k;
        }

        return new OperationIndex(nodes.ToArray(), ends.ToArray(), positions);
    }

    /// <summary>Every operation under <paramref name="operation"/>, in pre-order, itself excluded.</summary>
    public ArraySegment<IOperation> Descendants(IOperation operation) => Slice(operation, self: false);

    /// <summary><paramref name="operation"/> and every operation under it, in pre-order.</summary>
    public ArraySegment<IOperation> DescendantsAndSelf(IOperation operation) => Slice(operation, self: true);

    private ArraySegment<IOperation> Slice(IOperation operation, bool self)
    {
        if (!_positions.TryGetValue(operation, out int at))
        {
            // Only operations of the walked body are asked about; anything else is a bug of the caller.
            throw new ArgumentException("The operation is not part of the indexed body.", nameof(operation));
        }

        int start = self ? at : at + 1;
        return new ArraySegment<IOperation>(_nodes, start, _ends[at] - start);
    }

    /// <summary>Operations are compared by identity: the tree hands out one object per node.</summary>
    private sealed class ReferenceComparer : IEqualityComparer<IOperation>
    {
        public static readonly ReferenceComparer Instance = new();

        public bool Equals(IOperation? x, IOperation? y) => ReferenceEquals(x, y);

        public int GetHashCode(IOperation obj) => System.Runtime.CompilerServices.RuntimeHelpers.GetHashCode(obj);
    }
}
