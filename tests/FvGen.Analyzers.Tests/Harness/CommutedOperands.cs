using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.Tests.Harness;

/// <summary>
/// Writes every sum and product of two numbers the other way round: <c>a + b</c> becomes
/// <c>(b) + (a)</c> and <c>a * b</c> becomes <c>(b) * (a)</c>, subscripts included (<c>u[(1) + (i)]</c>).
/// Both operations commute, and the checker works in exact arithmetic, so every verdict must stay
/// the same; a reading that depended on which operand comes first would show. Operators of user
/// types (state structs, vectors) are left as written: they need not commute.
/// </summary>
internal sealed class CommutedOperands : SourceRewriter
{
    private readonly SemanticModel _model;

    private CommutedOperands(SemanticModel model) => _model = model;

    public static string Apply(string source)
    {
        var tree = Parse(source);
        return new CommutedOperands(ModelOf(tree)).Rewrite(tree);
    }

    public override SyntaxNode? VisitBinaryExpression(BinaryExpressionSyntax node)
    {
        bool commutes = node.Kind() is SyntaxKind.AddExpression or SyntaxKind.MultiplyExpression
            && IsNumber(node.Left) && IsNumber(node.Right)
            && _model.GetSymbolInfo(node).Symbol is IMethodSymbol { MethodKind: MethodKind.BuiltinOperator };

        // Operands are rewritten first (on the original tree, where the model can answer).
        var left = (ExpressionSyntax)Visit(node.Left);
        var right = (ExpressionSyntax)Visit(node.Right);
        if (!commutes)
        {
            return node.WithLeft(left).WithRight(right);
        }

        return SyntaxFactory.BinaryExpression(
                node.Kind(),
                SyntaxFactory.ParenthesizedExpression(right.WithoutTrivia()).WithTrailingTrivia(SyntaxFactory.Space),
                node.OperatorToken,
                SyntaxFactory.ParenthesizedExpression(left.WithoutTrivia()))
            .WithTriviaFrom(node);
    }

    private bool IsNumber(ExpressionSyntax operand) =>
        _model.GetTypeInfo(operand).Type?.SpecialType is SpecialType.System_Double or SpecialType.System_Single
            or SpecialType.System_Int32 or SpecialType.System_Int64;
}
