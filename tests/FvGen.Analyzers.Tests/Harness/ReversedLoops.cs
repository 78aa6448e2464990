using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.Tests.Harness;

/// <summary>
/// Runs every loop of the form <c>for (int i = a; i &lt; b; i++)</c> the other way:
/// <c>for (int i = (b) - 1; i &gt;= (a); i--)</c>. The same iterations in the other order: an update
/// that reads only the old state computes the same thing, so every verdict must stay the same (an
/// in-place sweep is one in either direction).
/// </summary>
internal sealed class ReversedLoops : SourceRewriter
{
    public static string Apply(string source)
    {
        var tree = Parse(source);
        return new ReversedLoops().Rewrite(tree);
    }

    public override SyntaxNode? VisitForStatement(ForStatementSyntax node)
    {
        var visited = (ForStatementSyntax)base.VisitForStatement(node)!;
        if (visited.Declaration is not { Variables: [{ Initializer.Value: { } start } variable] } declaration
            || visited.Condition is not BinaryExpressionSyntax { RawKind: (int)SyntaxKind.LessThanExpression, Left: IdentifierNameSyntax bound, Right: { } end }
            || visited.Incrementors is not [PostfixUnaryExpressionSyntax { RawKind: (int)SyntaxKind.PostIncrementExpression, Operand: IdentifierNameSyntax stepped }]
            || bound.Identifier.Text != variable.Identifier.Text || stepped.Identifier.Text != variable.Identifier.Text)
        {
            return visited;
        }

        string name = variable.Identifier.Text;
        var reversed = SyntaxFactory.ParseStatement(
            $"for ({declaration.Type} {name} = ({end}) - 1; {name} >= ({start}); {name}--) {{ }}");
        return ((ForStatementSyntax)reversed).WithStatement(visited.Statement).WithTriviaFrom(visited);
    }
}
