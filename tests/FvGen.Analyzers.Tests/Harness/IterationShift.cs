using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.Tests.Harness;

/// <summary>
/// Re-indexes the loops of a source: inside the body of every <c>for</c> loop whose variable starts
/// at a literal, and of every <c>Parallel.For</c> lambda, the loop variable <c>i</c> becomes
/// <c>(i + k)</c>. The update is then the same update over an iteration space moved by <c>k</c> (the
/// checker does not read loop bounds), so it conserves exactly when the original does, and a slip
/// stays the same slip. Loops over index lists and loops starting elsewhere (a cell's range of a
/// face list) are left as written.
/// </summary>
internal sealed class IterationShift : SourceRewriter
{
    private readonly int _k;
    private readonly HashSet<string> _variables = new(StringComparer.Ordinal);

    private IterationShift(int k) => _k = k;

    public static string Apply(string source, int k)
    {
        var tree = Parse(source);
        return new IterationShift(k).Rewrite(tree);
    }

    public override SyntaxNode? VisitForStatement(ForStatementSyntax node)
    {
        var declared = node.Declaration?.Variables
            .Where(v => v.Initializer?.Value is LiteralExpressionSyntax)
            .Select(v => v.Identifier.Text)
            .Where(name => !_variables.Contains(name))
            .ToList() ?? [];

        // The header keeps its own names (bounds stay as written); an enclosing loop's variable in it is moved.
        var header = node.WithStatement(SyntaxFactory.EmptyStatement());
        header = (ForStatementSyntax)base.VisitForStatement(header)!;
        _variables.UnionWith(declared);
        var body = (StatementSyntax)Visit(node.Statement);
        _variables.ExceptWith(declared);
        return header.WithStatement(body);
    }

    public override SyntaxNode? VisitInvocationExpression(InvocationExpressionSyntax node)
    {
        if (node.Expression.ToString() is "Parallel.For" or "System.Threading.Tasks.Parallel.For"
            && node.ArgumentList.Arguments.LastOrDefault()?.Expression is SimpleLambdaExpressionSyntax lambda
            && !_variables.Contains(lambda.Parameter.Identifier.Text))
        {
            string name = lambda.Parameter.Identifier.Text;
            _variables.Add(name);
            var body = (CSharpSyntaxNode)Visit(lambda.Body);
            _variables.Remove(name);

            // The bounds keep their names, like a for loop's header.
            var arguments = node.ArgumentList.Arguments;
            var last = arguments[arguments.Count - 1];
            var moved = arguments.Replace(last, last.WithExpression(lambda.WithBody(body)));
            for (int k = 0; k < moved.Count - 1; k++)
            {
                moved = moved.Replace(moved[k], (ArgumentSyntax)Visit(moved[k]));
            }

            return node.WithArgumentList(node.ArgumentList.WithArguments(moved));
        }

        return base.VisitInvocationExpression(node);
    }

    public override SyntaxNode? VisitIdentifierName(IdentifierNameSyntax node)
    {
        if (!_variables.Contains(node.Identifier.Text)
            || node.Parent is MemberAccessExpressionSyntax member && member.Name == node
            || node.Parent is AssignmentExpressionSyntax assignment && assignment.Left == node
            || node.Parent is PostfixUnaryExpressionSyntax or PrefixUnaryExpressionSyntax { RawKind: (int)SyntaxKind.PreIncrementExpression or (int)SyntaxKind.PreDecrementExpression })
        {
            return node;
        }

        return SyntaxFactory.ParseExpression("(" + node.Identifier.Text + " + " + _k + ")").WithTriviaFrom(node);
    }
}
