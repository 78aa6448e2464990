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
        // The open nodes, a stack in two arrays: a list of (position, enumerator) tuples would be framework
        // code the JIT compiles for that value type in every fresh compiler process.
        var openPositions = new int[64];
        var openChildren = new IOperation.OperationList.Enumerator[64];
        int depth = 0;
        Add(root);
        while (depth > 0)
        {
            int top = depth - 1;
            // The enumerator is a struct: it advances in place, in its array element.
            if (openChildren[top].MoveNext())
            {
                Add(openChildren[top].Current);
            }
            else
            {
                depth--;
                ends[openPositions[top]] = count;
                openChildren[top] = default;
            }
        }

        void Add(IOperation node)
        {
            if (count == nodes.Length)
            {
                Array.Resize(ref nodes, count * 2);
                Array.Resize(ref ends, count * 2);
            }

            if (depth == openPositions.Length)
            {
                var positions = new int[depth * 2];
                var children = new IOperation.OperationList.Enumerator[depth * 2];
                Array.Copy(openPositions, positions, depth);
                Array.Copy(openChildren, children, depth);
                openPositions = positions;
                openChildren = children;
            }

            nodes[count] = node;
            openPositions[depth] = count;
            openChildren[depth] = node.ChildOperations.GetEnumerator();
            depth++;
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
