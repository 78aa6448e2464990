using FvGen.Analyzers.Tests.Verifiers;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace FvGen.Analyzers.Tests.Harness;

/// <summary>What the corpus rewriters share: parsing a source as the corpus is compiled, a semantic model for those that need types, and the rewritten text.</summary>
internal abstract class SourceRewriter : CSharpSyntaxRewriter
{
    protected static SyntaxTree Parse(string source) => CSharpSyntaxTree.ParseText(source, new CSharpParseOptions(LanguageVersion.Latest));

    protected static SemanticModel ModelOf(SyntaxTree tree) =>
        CSharpCompilation.Create("Rewritten", [tree], TestReferences.All, new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, allowUnsafe: true))
            .GetSemanticModel(tree);

    protected string Rewrite(SyntaxTree tree) => Visit(tree.GetRoot()).ToFullString();
}
