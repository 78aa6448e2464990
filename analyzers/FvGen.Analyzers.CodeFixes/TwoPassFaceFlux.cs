using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Formatting;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// FVC0005, second form: the two-pass face-flux update. For a 1-D cell loop
/// <c>u[i] = u[i] - c * (F(u[i], u[i + 1]) - F(u[i - 1], u[i]))</c> it first fills a face buffer from
/// the old state, <c>flux[k] = F(u[k - 1], u[k])</c> for every face the cells touch (each face once),
/// then updates in place from the buffer: <c>u[i] = u[i] - c * (flux[i + 1] - flux[i])</c>.
/// Offered only for that shape: one write of <c>u[i]</c> in a counted <c>for</c>, one face
/// difference whose two terms are the same expression of two neighbouring cells one cell apart, and
/// no other read of <c>u</c> but <c>u[i]</c>.
/// </summary>
internal sealed class TwoPassFaceFlux
{
    private readonly ForStatementSyntax _loop;
    private readonly ExpressionSyntax _east;
    private readonly ExpressionSyntax _west;
    private readonly string _bufferDeclaration;
    private readonly string _bufferLoop;
    private readonly string _index;

    private TwoPassFaceFlux(ForStatementSyntax loop, ExpressionSyntax east, ExpressionSyntax west, string bufferName, string bufferDeclaration, string bufferLoop, string index)
    {
        _loop = loop;
        _east = east;
        _west = west;
        BufferName = bufferName;
        _bufferDeclaration = bufferDeclaration;
        _bufferLoop = bufferLoop;
        _index = index;
    }

    public string BufferName { get; }

    public static TwoPassFaceFlux? Create(FixSource source, AssignmentExpressionSyntax write, CancellationToken cancellationToken)
    {
        if (write.Left is not ElementAccessExpressionSyntax { Expression: IdentifierNameSyntax array, ArgumentList.Arguments: { Count: 1 } arguments }
            || arguments[0].Expression is not IdentifierNameSyntax index
            || write.Parent is not ExpressionStatementSyntax statement
            || (statement.Parent is BlockSyntax { Statements.Count: 1 } body ? body.Parent : statement.Parent) is not ForStatementSyntax loop
            || loop.Parent is not BlockSyntax
            || !IsCountedLoop(loop, index.Identifier.ValueText, out var condition))
        {
            return null;
        }

        string i = index.Identifier.ValueText;
        string u = array.Identifier.ValueText;
        var up = new Dictionary<string, long>(System.StringComparer.Ordinal) { [i] = 1 };
        var faces = write.Right.DescendantNodesAndSelf().OfType<BinaryExpressionSyntax>()
            .Where(b => b.IsKind(SyntaxKind.SubtractExpression))
            .Select(b => FaceDifference(b, up))
            .Where(f => f is not null)
            .Select(f => f!.Value)
            .ToList();
        if (faces.Count != 1)
        {
            return null;
        }

        var (east, west, westCore) = faces[0];
        var model = source.Model;
        if (!Offsets(westCore, u, i).SetEquals(new long?[] { -1, 0 })
            || write.Right.DescendantNodesAndSelf().OfType<ElementAccessExpressionSyntax>()
                .Any(e => IsRead(e, u) && !east.Span.Contains(e.Span) && !west.Span.Contains(e.Span) && Offset(e, i) != 0)
            || !ShiftSafety.CanShift(westCore, up, model, cancellationToken)
            || model.GetTypeInfo(westCore, cancellationToken).Type is not { TypeKind: not TypeKind.Error } fluxType
            || model.GetTypeInfo(array, cancellationToken).Type is not (IArrayTypeSymbol { Rank: 1 } or INamedTypeSymbol { Name: "Span" or "ReadOnlySpan" }))
        {
            return null;
        }

        string buffer = LocalNames.Unique(loop, "flux");
        string declaration = "var " + buffer + " = new " + fluxType.ToMinimalDisplayString(model, loop.SpanStart) + "[" + u + ".Length + 1];";
        string header = "for (" + loop.Declaration!.WithoutTrivia() + "; " + i + " " + condition.OperatorToken.Text + " " + PlusOne(condition.Right) + "; " + loop.Incrementors[0].WithoutTrivia() + ")";
        string fill = header + "\n{\n    " + buffer + "[" + i + "] = " + westCore.WithoutTrivia() + ";\n}";
        return new TwoPassFaceFlux(loop, east, west, buffer, declaration, fill, i);
    }

    public async Task<Document> ApplyAsync(Document document, CancellationToken cancellationToken)
    {
        var root = await document.GetSyntaxRootAsync(cancellationToken).ConfigureAwait(false);
        if (root is null || _loop.Parent is not BlockSyntax block)
        {
            return document;
        }

        var endOfLine = root.DescendantTrivia().FirstOrDefault(t => t.IsKind(SyntaxKind.EndOfLineTrivia));
        if (endOfLine == default)
        {
            endOfLine = SyntaxFactory.LineFeed;
        }

        // The user's own trivia (a comment above the loop, say) goes above the whole two-pass form; the cell loop keeps its indentation after a blank line.
        var leading = _loop.GetLeadingTrivia();
        var indent = SyntaxFactory.TriviaList(leading.Reverse().TakeWhile(t => !t.IsKind(SyntaxKind.EndOfLineTrivia)).Reverse());
        string comment = "// " + BufferName + "[" + _index + "]: the face between cells " + _index + " - 1 and " + _index + ", from the old state.";
        var bufferDeclaration = SyntaxFactory.ParseStatement(_bufferDeclaration)
            .WithLeadingTrivia(leading.Add(SyntaxFactory.Comment(comment)).Add(endOfLine).AddRange(indent))
            .WithTrailingTrivia(endOfLine)
            .WithAdditionalAnnotations(Formatter.Annotation);
        var bufferLoop = SyntaxFactory.ParseStatement(_bufferLoop.Replace("\n", endOfLine.ToFullString()))
            .WithLeadingTrivia(indent)
            .WithTrailingTrivia(endOfLine)
            .WithAdditionalAnnotations(Formatter.Annotation);
        var cellLoop = _loop
            .ReplaceNodes(new[] { _east, _west }, (original, _) => SyntaxFactory.ParseExpression(BufferName + "[" + _index + (original == _east ? " + 1]" : "]")).WithTriviaFrom(original))
            .WithLeadingTrivia(SyntaxFactory.TriviaList(endOfLine).AddRange(indent));
        var newBlock = block.ReplaceNode(_loop, new SyntaxNode[] { bufferDeclaration, bufferLoop, cellLoop });
        return document.WithSyntaxRoot(root.ReplaceNode(block, newBlock));
    }

    /// <summary>The two faces of a difference <c>E − W</c> (or <c>W − E</c>) whose east term is the west term one cell up.</summary>
    private static (ExpressionSyntax East, ExpressionSyntax West, ExpressionSyntax WestCore)? FaceDifference(BinaryExpressionSyntax difference, IReadOnlyDictionary<string, long> up)
    {
        var left = Unparenthesized(difference.Left);
        var right = Unparenthesized(difference.Right);
        if (Same(LoopShift.Apply(right, up), left))
        {
            return (difference.Left, difference.Right, right);
        }

        if (Same(LoopShift.Apply(left, up), right))
        {
            return (difference.Right, difference.Left, left);
        }

        return null;
    }

    private static bool IsCountedLoop(ForStatementSyntax loop, string i, out BinaryExpressionSyntax condition)
    {
        condition = null!;
        if (loop.Declaration is not { Variables.Count: 1 } declaration || declaration.Variables[0] is not { Initializer: not null } variable || variable.Identifier.ValueText != i
            || loop.Initializers.Count != 0
            || loop.Condition is not BinaryExpressionSyntax { Left: IdentifierNameSyntax bound } c || bound.Identifier.ValueText != i
            || !(c.IsKind(SyntaxKind.LessThanExpression) || c.IsKind(SyntaxKind.LessThanOrEqualExpression))
            || loop.Incrementors.Count != 1)
        {
            return false;
        }

        condition = c;
        return loop.Incrementors[0] switch
        {
            PostfixUnaryExpressionSyntax { Operand: IdentifierNameSyntax v } p => p.IsKind(SyntaxKind.PostIncrementExpression) && v.Identifier.ValueText == i,
            PrefixUnaryExpressionSyntax { Operand: IdentifierNameSyntax v } p => p.IsKind(SyntaxKind.PreIncrementExpression) && v.Identifier.ValueText == i,
            AssignmentExpressionSyntax { Left: IdentifierNameSyntax v, Right: LiteralExpressionSyntax { Token.Value: 1 } } a => a.IsKind(SyntaxKind.AddAssignmentExpression) && v.Identifier.ValueText == i,
            _ => false,
        };
    }

    /// <summary>The bound one face further: <c>n - 1</c> becomes <c>n</c>, <c>n - 2</c> becomes <c>n - 1</c>, anything else gets <c>+ 1</c>.</summary>
    private static string PlusOne(ExpressionSyntax bound)
    {
        switch (bound)
        {
            case LiteralExpressionSyntax { Token.Value: int n }:
                return (n + 1).ToString(CultureInfo.InvariantCulture);
            case BinaryExpressionSyntax { Right: LiteralExpressionSyntax { Token.Value: int k } } b when b.IsKind(SyntaxKind.SubtractExpression) && k >= 1:
                return k == 1 ? b.Left.WithoutTrivia().ToString() : b.Left.WithoutTrivia() + " - " + (k - 1).ToString(CultureInfo.InvariantCulture);
            case IdentifierNameSyntax or MemberAccessExpressionSyntax or InvocationExpressionSyntax or ElementAccessExpressionSyntax:
            case BinaryExpressionSyntax b2 when b2.IsKind(SyntaxKind.AddExpression) || b2.IsKind(SyntaxKind.SubtractExpression) || b2.IsKind(SyntaxKind.MultiplyExpression) || b2.IsKind(SyntaxKind.DivideExpression):
                return bound.WithoutTrivia() + " + 1";
            default:
                return "(" + bound.WithoutTrivia() + ") + 1";
        }
    }

    private static bool IsRead(ElementAccessExpressionSyntax e, string array) => e.Expression is IdentifierNameSyntax id && id.Identifier.ValueText == array;

    /// <summary>The offsets at which <paramref name="expression"/> reads <paramref name="array"/> along <paramref name="i"/> (null for any other subscript).</summary>
    private static HashSet<long?> Offsets(ExpressionSyntax expression, string array, string i) =>
        new(expression.DescendantNodesAndSelf().OfType<ElementAccessExpressionSyntax>().Where(e => IsRead(e, array)).Select(e => Offset(e, i)));

    private static long? Offset(ElementAccessExpressionSyntax e, string i) =>
        e.ArgumentList.Arguments.Count == 1
            ? e.ArgumentList.Arguments[0].Expression switch
            {
                IdentifierNameSyntax id when id.Identifier.ValueText == i => 0,
                BinaryExpressionSyntax { Left: IdentifierNameSyntax id, Right: LiteralExpressionSyntax { Token.Value: int k } } b when id.Identifier.ValueText == i && b.IsKind(SyntaxKind.AddExpression) => k,
                BinaryExpressionSyntax { Left: IdentifierNameSyntax id, Right: LiteralExpressionSyntax { Token.Value: int k } } b when id.Identifier.ValueText == i && b.IsKind(SyntaxKind.SubtractExpression) => -k,
                _ => null,
            }
            : null;

    private static bool Same(SyntaxNode a, SyntaxNode b) =>
        a.NormalizeWhitespace().ToFullString() == b.NormalizeWhitespace().ToFullString();

    private static ExpressionSyntax Unparenthesized(ExpressionSyntax e) => e is ParenthesizedExpressionSyntax p ? Unparenthesized(p.Expression) : e;
}
