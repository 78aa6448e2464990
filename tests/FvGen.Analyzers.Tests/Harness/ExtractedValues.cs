using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.Tests.Harness;

/// <summary>
/// Moves the value of every write of an array element into a local first:
/// <c>r[i] = -(a - b) / dx;</c> becomes <c>{ var extracted1 = -(a - b) / dx; r[i] = extracted1; }</c>
/// (compound writes too). The checker inlines locals, so every verdict must stay the same.
/// </summary>
internal sealed class ExtractedValues : SourceRewriter
{
    private int _count;

    public static string Apply(string source)
    {
        var tree = Parse(source);
        return new ExtractedValues().Rewrite(tree);
    }

    public override SyntaxNode? VisitExpressionStatement(ExpressionStatementSyntax node)
    {
        if (node.Expression is not AssignmentExpressionSyntax assignment || !WritesElement(assignment.Left))
        {
            return base.VisitExpressionStatement(node);
        }

        string name = "extracted" + ++_count;
        var declaration = SyntaxFactory.ParseStatement("var " + name + " = " + assignment.Right.WithoutTrivia().ToFullString() + ";");
        var write = node.WithExpression(assignment.WithRight(SyntaxFactory.IdentifierName(name)));
        return SyntaxFactory.Block(declaration, write.WithoutTrivia()).NormalizeWhitespace().WithTriviaFrom(node);
    }

    /// <summary><c>r[i]</c>, <c>r[i].Energy</c>, <c>q[j][i]</c>.</summary>
    private static bool WritesElement(ExpressionSyntax target) => target switch
    {
        ElementAccessExpressionSyntax => true,
        MemberAccessExpressionSyntax member => WritesElement(member.Expression),
        _ => false,
    };
}
