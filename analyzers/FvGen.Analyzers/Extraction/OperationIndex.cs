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
/// <remarks>
/// The order is that of <see cref="OperationExtensions.Descendants(IOperation)"/>: a node, then its
/// children in order. Statements, loops and bodies are found by key; a node below them by a scan of
/// the whole walk, so code that walks a small expression (the gather's per-face sums) keeps using
/// Roslyn's own <c>Descendants()</c>.
/// </remarks>
internal sealed class OperationIndex
{
    private readonly IOperation[] _nodes;
    private readonly int[] _ends;
    private readonly int _count;
    private readonly Dictionary<IOperation, int> _positions;

    private OperationIndex(IOperation[] nodes, int[] ends, int count, Dictionary<IOperation, int> positions)
    {
        _nodes = nodes;
        _ends = ends;
        _count = count;
        _positions = positions;
    }

    /// <summary>Walks <paramref name="root"/> once (with a stack of its own: expression trees can be deep).</summary>
    public static OperationIndex Of(IOperation root)
    {
        // Grown by doubling and kept as they are: slices never reach past the count.
        var nodes = new IOperation[256];
        var ends = new int[256];
        int count = 0;
        var open = new List<(int Position, IOperation.OperationList.Enumerator Children)>();
        Add(root);
        while (open.Count > 0)
        {
            int top = open.Count - 1;
            var (position, children) = open[top];
            if (children.MoveNext())
            {
                // The enumerator is a struct: store it back with its new position.
                open[top] = (position, children);
                Add(children.Current);
            }
            else
            {
                open.RemoveAt(top);
                ends[position] = count;
            }
        }

        void Add(IOperation node)
        {
            if (count == nodes.Length)
            {
                Array.Resize(ref nodes, count * 2);
                Array.Resize(ref ends, count * 2);
            }

            nodes[count] = node;
            open.Add((count, node.ChildOperations.GetEnumerator()));
            count++;
        }

        // Questions are asked about statements, loops and bodies: only those are keyed (a fifth of
        // the nodes); any other node is found by a scan.
        var positions = new Dictionary<IOperation, int>(ReferenceComparer.Instance);
        for (int k = 0; k < count; k++)
        {
            if (IsAskedAbout(nodes[k]))
            {
                positions[nodes[k]] = k;
            }
        }

        return new OperationIndex(nodes, ends, count, positions);
    }

    /// <summary>Every operation under <paramref name="operation"/>, in pre-order, itself excluded.</summary>
    public ArraySegment<IOperation> Descendants(IOperation operation) => Slice(operation, self: false);

    /// <summary><paramref name="operation"/> and every operation under it, in pre-order.</summary>
    public ArraySegment<IOperation> DescendantsAndSelf(IOperation operation) => Slice(operation, self: true);

    /// <summary>
    /// Blocks, loops, switches, statements, declarations, functions, bodies, conditionals and calls,
    /// and what a statement holds: read by kind (one call per node) rather than by ten interface tests.
    /// </summary>
    private static bool IsAskedAbout(IOperation node) => node.Kind switch
    {
        OperationKind.Block or OperationKind.Loop or OperationKind.Switch or OperationKind.ExpressionStatement or OperationKind.VariableDeclarationGroup
            or OperationKind.LocalFunction or OperationKind.AnonymousFunction or OperationKind.MethodBody or OperationKind.ConstructorBody
            or OperationKind.Conditional or OperationKind.Invocation => true,
        _ => node.Parent?.Kind == OperationKind.ExpressionStatement,
    };

    private ArraySegment<IOperation> Slice(IOperation operation, bool self)
    {
        if (!_positions.TryGetValue(operation, out int at) && (at = Array.IndexOf(_nodes, operation, 0, _count)) < 0)
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
