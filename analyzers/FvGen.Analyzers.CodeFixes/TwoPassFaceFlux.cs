using System.Collections.Generic;
using System.Globalization;
using System.Linq;
using System.Text;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Formatting;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// FVC0005, second form: the two-pass face-flux update. For a cell loop
/// <c>u[i] = u[i] - c * (F(u[i], u[i + 1]) - F(u[i - 1], u[i]))</c> it first fills a face buffer from
/// the old state, <c>flux[i] = F(u[i - 1], u[i])</c> for every face the cells touch (each face once),
/// then updates in place from the buffer: <c>u[i] = u[i] - c * (flux[i + 1] - flux[i])</c>. On a
/// rectangular array (<c>u[i, j]</c> in a <c>j</c>/<c>i</c> nest) each direction gets its own buffer
/// (<c>fluxX</c>, <c>fluxY</c>), one face longer in its own direction.
/// Offered only for that shape: one write of <c>u[i, …]</c> alone in a nest of counted <c>for</c>
/// loops over its subscripts, exactly one face difference per direction whose two terms are the same
/// expression of two neighbouring cells one cell apart, and no other read of <c>u</c> but the written cell.
/// </summary>
internal sealed class TwoPassFaceFlux
{
    private static readonly string[] Axes = { "X", "Y", "Z" };

    private readonly ForStatementSyntax _outermost;
    private readonly IReadOnlyList<Direction> _directions;
    private readonly IReadOnlyList<string> _subscripts;
    private readonly IReadOnlyList<ForStatementSyntax> _nest;
    private readonly string _elementType;
    private readonly string _array;
    private readonly bool _oneDimensional;

    private TwoPassFaceFlux(ForStatementSyntax outermost, IReadOnlyList<ForStatementSyntax> nest, IReadOnlyList<string> subscripts, IReadOnlyList<Direction> directions, string elementType, string array, bool oneDimensional)
    {
        _outermost = outermost;
        _nest = nest;
        _subscripts = subscripts;
        _directions = directions;
        _elementType = elementType;
        _array = array;
        _oneDimensional = oneDimensional;
    }

    /// <summary>The buffer names, for the action's title.</summary>
    public string BufferNames => string.Join("`, `", _directions.Select(d => d.Buffer));

    /// <summary>One direction's face difference: east and west terms as written, and the west term without parentheses.</summary>
    private sealed record Direction(int Position, ExpressionSyntax East, ExpressionSyntax West, ExpressionSyntax WestCore, string Buffer);

    public static TwoPassFaceFlux? Create(FixSource source, AssignmentExpressionSyntax write, CancellationToken cancellationToken)
    {
        if (write.Left is not ElementAccessExpressionSyntax { Expression: IdentifierNameSyntax array } target
            || target.ArgumentList.Arguments.Count is < 1 or > 3
            || target.ArgumentList.Arguments.Any(a => a.Expression is not IdentifierNameSyntax)
            || write.Parent is not ExpressionStatementSyntax statement)
        {
            return null;
        }

        var subscripts = target.ArgumentList.Arguments.Select(a => ((IdentifierNameSyntax)a.Expression).Identifier.ValueText).ToList();
        if (subscripts.Distinct().Count() != subscripts.Count || Nest(statement, subscripts) is not { } nest || nest[0].Parent is not BlockSyntax)
        {
            return null;
        }

        string u = array.Identifier.ValueText;
        var model = source.Model;
        bool oneDimensional = subscripts.Count == 1;
        var arrayType = model.GetTypeInfo(array, cancellationToken).Type;
        if (!(arrayType is IArrayTypeSymbol rectangular && rectangular.Rank == subscripts.Count
              || oneDimensional && arrayType is INamedTypeSymbol { Name: "Span" or "ReadOnlySpan" }))
        {
            return null;
        }

        var directions = new List<Direction>();
        ITypeSymbol? fluxType = null;
        var taken = new HashSet<string>(System.StringComparer.Ordinal);
        for (int p = 0; p < subscripts.Count; p++)
        {
            var up = new Dictionary<string, long>(System.StringComparer.Ordinal) { [subscripts[p]] = 1 };
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
            var reads = westCore.DescendantNodesAndSelf().OfType<ElementAccessExpressionSyntax>().Where(e => IsRead(e, u)).ToList();
            var along = new HashSet<long?>(reads.Select(e => Offset(e, p, subscripts)));
            if (!along.SetEquals(new long?[] { -1, 0 })
                || reads.Any(e => Enumerable.Range(0, subscripts.Count).Any(q => q != p && Offset(e, q, subscripts) != 0))
                || !ShiftSafety.CanShift(westCore, up, model, cancellationToken)
                || model.GetTypeInfo(westCore, cancellationToken).Type is not { TypeKind: not TypeKind.Error } type
                || (fluxType is not null && !SymbolEqualityComparer.Default.Equals(fluxType, type)))
            {
                return null;
            }

            fluxType = type;
            string buffer = LocalNames.Unique(nest[0], oneDimensional ? "flux" : "flux" + Axes[p], taken);
            directions.Add(new Direction(p, east, west, westCore, buffer));
        }

        // Outside the face differences the update may read only the cell it writes.
        bool InFace(SyntaxNode n) => directions.Any(d => d.East.Span.Contains(n.Span) || d.West.Span.Contains(n.Span));
        if (fluxType is null
            || write.Right.DescendantNodesAndSelf().OfType<ElementAccessExpressionSyntax>()
                .Any(e => IsRead(e, u) && !InFace(e) && Enumerable.Range(0, subscripts.Count).Any(q => Offset(e, q, subscripts) != 0)))
        {
            return null;
        }

        return new TwoPassFaceFlux(nest[0], nest, subscripts, directions, fluxType.ToMinimalDisplayString(model, nest[0].SpanStart), u, oneDimensional);
    }

    public async Task<Document> ApplyAsync(Document document, CancellationToken cancellationToken)
    {
        var root = await document.GetSyntaxRootAsync(cancellationToken).ConfigureAwait(false);
        if (root is null || _outermost.Parent is not BlockSyntax block)
        {
            return document;
        }

        var endOfLine = root.DescendantTrivia().FirstOrDefault(t => t.IsKind(SyntaxKind.EndOfLineTrivia));
        if (endOfLine == default)
        {
            endOfLine = SyntaxFactory.LineFeed;
        }

        // The user's own trivia (a comment above the loop, say) goes above the whole two-pass form; the cell loop keeps its indentation after a blank line.
        var leading = _outermost.GetLeadingTrivia();
        var indent = SyntaxFactory.TriviaList(leading.Reverse().TakeWhile(t => !t.IsKind(SyntaxKind.EndOfLineTrivia)).Reverse());
        var statements = new List<SyntaxNode>();
        foreach (var direction in _directions)
        {
            var first = statements.Count == 0 ? leading : SyntaxFactory.TriviaList(endOfLine).AddRange(indent);
            var declaration = SyntaxFactory.ParseStatement("var " + direction.Buffer + " = new " + _elementType + "[" + Extents(direction.Position) + "];")
                .WithLeadingTrivia(first.Add(SyntaxFactory.Comment(Comment(direction))).Add(endOfLine).AddRange(indent))
                .WithTrailingTrivia(endOfLine)
                .WithAdditionalAnnotations(Formatter.Annotation);
            var fill = SyntaxFactory.ParseStatement(FillText(direction).Replace("\n", endOfLine.ToFullString()))
                .WithLeadingTrivia(indent)
                .WithTrailingTrivia(endOfLine)
                .WithAdditionalAnnotations(Formatter.Annotation);
            statements.Add(declaration);
            statements.Add(fill);
        }

        var replacements = new Dictionary<SyntaxNode, string>();
        foreach (var d in _directions)
        {
            replacements[d.East] = d.Buffer + "[" + Subscripts(d.Position, 1) + "]";
            replacements[d.West] = d.Buffer + "[" + Subscripts(d.Position, 0) + "]";
        }

        var cellLoop = _outermost
            .ReplaceNodes(replacements.Keys, (original, _) => SyntaxFactory.ParseExpression(replacements[original]).WithTriviaFrom(original))
            .WithLeadingTrivia(SyntaxFactory.TriviaList(endOfLine).AddRange(indent));
        statements.Add(cellLoop);
        return document.WithSyntaxRoot(root.ReplaceNode(block, block.ReplaceNode(_outermost, statements)));
    }

    /// <summary>The nest of counted loops, outermost first, whose variables are exactly the subscripts; null for any other shape.</summary>
    private static List<ForStatementSyntax>? Nest(StatementSyntax statement, IReadOnlyList<string> subscripts)
    {
        var nest = new List<ForStatementSyntax>();
        SyntaxNode inner = statement;
        while (nest.Count < subscripts.Count)
        {
            var parent = inner.Parent is BlockSyntax { Statements.Count: 1 } body ? body.Parent : inner.Parent;
            if (parent is not ForStatementSyntax loop || !IsCountedLoop(loop, out var variable) || !subscripts.Contains(variable) || nest.Any(l => Variable(l) == variable))
            {
                return null;
            }

            nest.Insert(0, loop);
            inner = loop;
        }

        return nest;
    }

    private string Comment(Direction d)
    {
        string cellBehind = _oneDimensional ? _subscripts[0] + " - 1" : "(" + Subscripts(d.Position, -1) + ")";
        string cell = _oneDimensional ? _subscripts[0] : "(" + Subscripts(d.Position, 0) + ")";
        return "// " + d.Buffer + "[" + Subscripts(d.Position, 0) + "]: the face between cells " + cellBehind + " and " + cell + ", from the old state.";
    }

    /// <summary>The buffer's lengths: the cells' own, one more face in the direction's dimension.</summary>
    private string Extents(int position) =>
        _oneDimensional
            ? _array + ".Length + 1"
            : string.Join(", ", _subscripts.Select((_, q) => _array + ".GetLength(" + q.ToString(CultureInfo.InvariantCulture) + ")" + (q == position ? " + 1" : string.Empty)));

    /// <summary>The written subscripts with the direction's one moved by <paramref name="offset"/>.</summary>
    private string Subscripts(int position, int offset) =>
        string.Join(", ", _subscripts.Select((s, q) => q != position || offset == 0 ? s : offset > 0 ? s + " + " + offset.ToString(CultureInfo.InvariantCulture) : s + " - " + (-offset).ToString(CultureInfo.InvariantCulture)));

    /// <summary>The fill nest: the cell loops' headers, the direction's own bound one face further.</summary>
    private string FillText(Direction d)
    {
        var text = new StringBuilder();
        for (int level = 0; level < _nest.Count; level++)
        {
            var loop = _nest[level];
            var condition = (BinaryExpressionSyntax)loop.Condition!;
            string pad = new(' ', 4 * level);
            string bound = Variable(loop) == _subscripts[d.Position] ? PlusOne(condition.Right) : condition.Right.WithoutTrivia().ToString();
            text.Append(pad).Append("for (").Append(loop.Declaration!.WithoutTrivia()).Append("; ")
                .Append(Variable(loop)).Append(' ').Append(condition.OperatorToken.Text).Append(' ').Append(bound).Append("; ")
                .Append(loop.Incrementors[0].WithoutTrivia()).Append(")\n").Append(pad).Append("{\n");
        }

        text.Append(new string(' ', 4 * _nest.Count)).Append(d.Buffer).Append('[').Append(Subscripts(d.Position, 0)).Append("] = ").Append(d.WestCore.WithoutTrivia()).Append(";\n");
        for (int level = _nest.Count - 1; level >= 0; level--)
        {
            text.Append(new string(' ', 4 * level)).Append('}');
            if (level > 0)
            {
                text.Append('\n');
            }
        }

        return text.ToString();
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

    private static string? Variable(ForStatementSyntax loop) =>
        loop.Declaration is { Variables.Count: 1 } declaration ? declaration.Variables[0].Identifier.ValueText : null;

    /// <summary>A <c>for (int i = lo; i &lt; hi; i++)</c>-style loop (also <c>&lt;=</c>, <c>++i</c>, <c>i += 1</c>).</summary>
    private static bool IsCountedLoop(ForStatementSyntax loop, out string variable)
    {
        variable = Variable(loop) ?? string.Empty;
        string i = variable;
        if (variable.Length == 0 || loop.Declaration!.Variables[0].Initializer is null
            || loop.Initializers.Count != 0
            || loop.Condition is not BinaryExpressionSyntax { Left: IdentifierNameSyntax bound } c || bound.Identifier.ValueText != i
            || !(c.IsKind(SyntaxKind.LessThanExpression) || c.IsKind(SyntaxKind.LessThanOrEqualExpression))
            || loop.Incrementors.Count != 1)
        {
            return false;
        }

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

    /// <summary>The offset of subscript <paramref name="position"/> from its loop variable (null for any other subscript form).</summary>
    private static long? Offset(ElementAccessExpressionSyntax e, int position, IReadOnlyList<string> subscripts)
    {
        if (e.ArgumentList.Arguments.Count != subscripts.Count)
        {
            return null;
        }

        string v = subscripts[position];
        return e.ArgumentList.Arguments[position].Expression switch
        {
            IdentifierNameSyntax id when id.Identifier.ValueText == v => 0,
            BinaryExpressionSyntax { Left: IdentifierNameSyntax id, Right: LiteralExpressionSyntax { Token.Value: int k } } b when id.Identifier.ValueText == v && b.IsKind(SyntaxKind.AddExpression) => k,
            BinaryExpressionSyntax { Left: IdentifierNameSyntax id, Right: LiteralExpressionSyntax { Token.Value: int k } } b when id.Identifier.ValueText == v && b.IsKind(SyntaxKind.SubtractExpression) => -k,
            _ => null,
        };
    }

    private static bool Same(SyntaxNode a, SyntaxNode b) =>
        a.NormalizeWhitespace().ToFullString() == b.NormalizeWhitespace().ToFullString();

    private static ExpressionSyntax Unparenthesized(ExpressionSyntax e) => e is ParenthesizedExpressionSyntax p ? Unparenthesized(p.Expression) : e;
}
