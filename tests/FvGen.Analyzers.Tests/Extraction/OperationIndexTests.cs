using FvGen.Analyzers.Extraction;
using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Tests.Extraction;

/// <summary>
/// The kept walk of a method body answers "what is under this operation" exactly as Roslyn's own
/// <c>Descendants()</c> does, for every operation of every method of the analyzers' corpus (keyed
/// nodes and scanned ones alike), and refuses an operation from another body.
/// </summary>
public sealed class OperationIndexTests
{
    public static TheoryData<string> Kernels()
    {
        var data = new TheoryData<string>();
        foreach (var kernel in CorpusKernel.All)
        {
            data.Add(kernel.Name);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Kernels))]
    public void SlicesMatchRoslynsDescendants(string name)
    {
        var (model, bodies) = Bodies(CorpusKernel.All.Single(k => k.Name == name).Source);
        int checkedOperations = 0;
        foreach (var body in bodies)
        {
            var index = OperationIndex.Of(body);
            foreach (var op in body.DescendantsAndSelf())
            {
                Assert.Equal(op.Descendants(), index.Descendants(op));
                Assert.Equal(op.DescendantsAndSelf(), index.DescendantsAndSelf(op));
                checkedOperations++;
            }
        }

        Assert.True(checkedOperations > 20, $"only {checkedOperations} operations in {name}");
        GC.KeepAlive(model);
    }

    [Fact]
    public void RefusesAnOperationOfAnotherBody()
    {
        var (_, bodies) = Bodies(CorpusKernel.All[0].Source);
        var (_, others) = Bodies(CorpusKernel.All[1].Source);
        var index = OperationIndex.Of(bodies[0]);
        Assert.Throws<ArgumentException>(() => index.Descendants(others[0]));
    }

    /// <summary>The bound bodies of every method of <paramref name="source"/> (the model keeps them alive).</summary>
    internal static (SemanticModel Model, List<IOperation> Bodies) Bodies(string source)
    {
        var tree = CSharpSyntaxTree.ParseText(TestReferences.Usings + source, new CSharpParseOptions(LanguageVersion.Latest));
        var compilation = CSharpCompilation.Create("Index", [tree], TestReferences.All, new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, allowUnsafe: true));
        var model = compilation.GetSemanticModel(tree);
        var bodies = tree.GetRoot().DescendantNodes().OfType<BaseMethodDeclarationSyntax>()
            .Select(m => model.GetOperation(m))
            .OfType<IOperation>()
            .ToList();
        return (model, bodies);
    }
}
