using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Extraction;

/// <summary>What an assignment or an increment writes.</summary>
internal static class WrittenTarget
{
    /// <summary>
    /// The target <paramref name="operation"/> writes (any assignment, <c>++</c>, <c>--</c>), or null.
    /// Every walk over a loop asks this of every operation, so it reads the operation's kind (one call)
    /// before any interface test, instead of two interface tests per operation.
    /// </summary>
    public static IOperation? Of(IOperation operation) => operation.Kind switch
    {
        OperationKind.SimpleAssignment or OperationKind.CompoundAssignment or OperationKind.CoalesceAssignment or OperationKind.DeconstructionAssignment
            => (operation as IAssignmentOperation)?.Target,
        OperationKind.Increment or OperationKind.Decrement => (operation as IIncrementOrDecrementOperation)?.Target,
        _ => null,
    };
}
