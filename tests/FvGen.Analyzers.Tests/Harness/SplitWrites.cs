using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.Tests.Harness;

/// <summary>
/// Splits every element write of a sum or difference into two writes: <c>r[i] = a - b;</c> becomes
/// <c>r[i] = a; r[i] -= b;</c>, when <c>b</c> does not read the array written (it would then see the
/// first half). The element ends with the same value, so every verdict must stay the same.
/// </summary>
internal sealed class SplitWrites : SourceRewriter
{
    public static string Apply(string source)
    {
        var tree = Parse(source);
        return new SplitWrites().Rewrite(tree);
    }

    public override SyntaxNode? VisitExpressionStatement(ExpressionStatementSyntax node)
    {
        if (node.Expression is not AssignmentExpressionSyntax { RawKind: (int)SyntaxKind.SimpleAssignmentExpression } assignment
            || Root(assignment.Left) is not { } array
            || Unparenthesize(assignment.Right) is not BinaryExpressionSyntax { RawKind: (int)SyntaxKind.AddExpression or (int)SyntaxKind.SubtractExpression } sum
            || sum.Right.DescendantNodesAndSelf().OfType<IdentifierNameSyntax>().Any(n => n.Identifier.Text == array))
        {
            return base.VisitExpressionStatement(node);
        }

        string compound = sum.IsKind(SyntaxKind.AddExpression) ? "+=" : "-=";
        string target = assignment.Left.WithoutTrivia().ToFullString();
        var first = SyntaxFactory.ParseStatement(target + " = " + sum.Left.WithoutTrivia().ToFullString() + ";");
        var second = SyntaxFactory.ParseStatement(target + " " + compound + " " + sum.Right.WithoutTrivia().ToFullString() + ";");
        return SyntaxFactory.Block(first, second).NormalizeWhitespace().WithTriviaFrom(node);
    }

    /// <summary>The array an element target writes (<c>r</c> of <c>r[i]</c>, <c>r[i].Energy</c>, <c>q[j][i]</c>), or null.</summary>
    private static string? Root(ExpressionSyntax target) => target switch
    {
        ElementAccessExpressionSyntax { Expression: IdentifierNameSyntax name } => name.Identifier.Text,
        ElementAccessExpressionSyntax element => Root(element.Expression),
        MemberAccessExpressionSyntax member when member.Expression is ElementAccessExpressionSyntax => Root(member.Expression),
        _ => null,
    };

    private static ExpressionSyntax Unparenthesize(ExpressionSyntax e) => e is ParenthesizedExpressionSyntax p ? Unparenthesize(p.Expression) : e;
}
