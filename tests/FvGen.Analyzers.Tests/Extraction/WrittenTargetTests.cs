using FvGen.Analyzers.Extraction;
using FvGen.Analyzers.Tests.Harness;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Tests.Extraction;

/// <summary>
/// The written target read by kind is the one the assignment and increment interfaces give, for
/// every operation of every method of the analyzers' corpus.
/// </summary>
public sealed class WrittenTargetTests
{
    [Fact]
    public void AgreesWithTheInterfacesOnTheCorpus()
    {
        var kinds = new HashSet<OperationKind>();
        foreach (var kernel in CorpusKernel.All)
        {
            var (model, bodies) = OperationIndexTests.Bodies(kernel.Source);
            foreach (var op in bodies.SelectMany(b => b.DescendantsAndSelf()))
            {
                var expected = op switch
                {
                    IAssignmentOperation a => a.Target,
                    IIncrementOrDecrementOperation i => i.Target,
                    _ => null,
                };
                Assert.Same(expected, WrittenTarget.Of(op));
                if (expected is not null)
                {
                    kinds.Add(op.Kind);
                }
            }

            GC.KeepAlive(model);
        }

        // The corpus writes by plain and compound assignment and by increments (of loop variables).
        Assert.Superset(new HashSet<OperationKind> { OperationKind.SimpleAssignment, OperationKind.CompoundAssignment, OperationKind.Increment }, kinds);
    }
}
