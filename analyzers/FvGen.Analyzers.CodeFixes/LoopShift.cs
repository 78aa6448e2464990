using System.Collections.Generic;
using System.Globalization;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// Moves an expression by a lattice shift, in the user's own spelling: <c>fy[i, j + 1]</c> shifted by
/// <c>j = −1</c> is <c>fy[i, j]</c>. Subscripts of the form <c>v</c>, <c>v ± k</c> are folded; anything
/// else gets <c>(v − 1)</c> in place of <c>v</c>.
/// </summary>
internal sealed class LoopShift : CSharpSyntaxRewriter
{
    private readonly IReadOnlyDictionary<string, long> _shift;

    private LoopShift(IReadOnlyDictionary<string, long> shift) => _shift = shift;

    public static Dictionary<string, long>? Parse(string? text)
    {
        var result = new Dictionary<string, long>(System.StringComparer.Ordinal);
        if (string.IsNullOrEmpty(text))
        {
            return result;
        }

        foreach (var part in text!.Split(';'))
        {
            var kv = part.Split('=');
            if (kv.Length != 2 || !long.TryParse(kv[1], NumberStyles.Integer, CultureInfo.InvariantCulture, out long n))
            {
                return null;
            }

            result[kv[0]] = n;
        }

        return result;
    }

    public static ExpressionSyntax Apply(ExpressionSyntax expression, IReadOnlyDictionary<string, long> shift) =>
        (ExpressionSyntax)new LoopShift(shift).Visit(expression.WithoutTrivia());

    public override SyntaxNode? VisitArgument(ArgumentSyntax node)
    {
        if (node.Parent is BracketedArgumentListSyntax && TryFold(node.Expression, out var folded))
        {
            return node.WithExpression(folded);
        }

        return base.VisitArgument(node);
    }

    public override SyntaxNode? VisitIdentifierName(IdentifierNameSyntax node)
    {
        bool isMemberName = node.Parent is MemberAccessExpressionSyntax member && member.Name == node;
        if (!isMemberName && _shift.TryGetValue(node.Identifier.ValueText, out long n) && n != 0)
        {
            return SyntaxFactory.ParseExpression("(" + Affine(node.Identifier.ValueText, n) + ")").WithTriviaFrom(node);
        }

        return node;
    }

    private bool TryFold(ExpressionSyntax expression, out ExpressionSyntax folded)
    {
        folded = expression;
        string? variable = null;
        long offset = 0;
        switch (expression)
        {
            case IdentifierNameSyntax id:
                variable = id.Identifier.ValueText;
                break;
            case BinaryExpressionSyntax { Left: IdentifierNameSyntax id, Right: LiteralExpressionSyntax { Token.Value: int k } } b
                when b.IsKind(SyntaxKind.AddExpression) || b.IsKind(SyntaxKind.SubtractExpression):
                variable = id.Identifier.ValueText;
                offset = b.IsKind(SyntaxKind.AddExpression) ? k : -k;
                break;
        }

        if (variable is null || !_shift.TryGetValue(variable, out long n))
        {
            return false;
        }

        folded = SyntaxFactory.ParseExpression(Affine(variable, offset + n)).WithTriviaFrom(expression);
        return true;
    }

    private static string Affine(string variable, long offset) =>
        offset == 0 ? variable : offset > 0 ? variable + " + " + offset.ToString(CultureInfo.InvariantCulture) : variable + " - " + (-offset).ToString(CultureInfo.InvariantCulture);
}
