using System.Collections.Immutable;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Editing;
using Microsoft.CodeAnalysis.Formatting;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// FVC0005, first form: keep the target and make the loop read only old values — copy the old state
/// into a separate array before the loop (<c>(double[])u.Clone()</c>, or <c>ToArray()</c> of a span)
/// and read every element from the copy.
/// </summary>
internal sealed class OldStateCopy
{
    private readonly StatementSyntax _loop;
    private readonly string _copyExpression;
    private readonly ImmutableArray<ElementAccessExpressionSyntax> _reads;

    private OldStateCopy(StatementSyntax loop, string copyName, string copyExpression, ImmutableArray<ElementAccessExpressionSyntax> reads)
    {
        _loop = loop;
        CopyName = copyName;
        _copyExpression = copyExpression;
        _reads = reads;
    }

    public string CopyName { get; }

    public static OldStateCopy? Create(FixSource source, AssignmentExpressionSyntax write, CancellationToken cancellationToken)
    {
        var element = write.Left.DescendantNodesAndSelf().OfType<ElementAccessExpressionSyntax>().LastOrDefault();
        if (element?.Expression is not IdentifierNameSyntax array)
        {
            return null;
        }

        var loop = write.Ancestors().OfType<StatementSyntax>()
            .Where(s => s is ForStatementSyntax or ForEachStatementSyntax || (s is ExpressionStatementSyntax e && e.Expression.ToString().StartsWith("Parallel.", System.StringComparison.Ordinal)))
            .LastOrDefault();
        if (loop?.Parent is not BlockSyntax)
        {
            return null;
        }

        var model = source.Model;
        var type = model.GetTypeInfo(array, cancellationToken).Type;
        string copyExpression = type switch
        {
            IArrayTypeSymbol arrayType => "(" + arrayType.ToMinimalDisplayString(model, loop.SpanStart) + ")" + array.Identifier.ValueText + ".Clone()",
            INamedTypeSymbol { Name: "Span" or "ReadOnlySpan" } => array.Identifier.ValueText + ".ToArray()",
            _ => string.Empty,
        };
        if (copyExpression.Length == 0)
        {
            return null;
        }

        var targets = loop.DescendantNodes().OfType<AssignmentExpressionSyntax>()
            .SelectMany(a => a.Left.DescendantNodesAndSelf().OfType<ElementAccessExpressionSyntax>())
            .ToImmutableHashSet();
        var reads = loop.DescendantNodes().OfType<ElementAccessExpressionSyntax>()
            .Where(e => e.Expression is IdentifierNameSyntax id && id.Identifier.ValueText == array.Identifier.ValueText && !targets.Contains(e))
            .ToImmutableArray();
        if (reads.IsEmpty)
        {
            return null;
        }

        return new OldStateCopy(loop, LocalNames.Unique(loop, array.Identifier.ValueText + "Old"), copyExpression, reads);
    }

    public async Task<Document> ApplyAsync(Document document, CancellationToken cancellationToken)
    {
        var editor = await DocumentEditor.CreateAsync(document, cancellationToken).ConfigureAwait(false);
        foreach (var read in _reads)
        {
            editor.ReplaceNode(read.Expression, SyntaxFactory.IdentifierName(CopyName).WithTriviaFrom(read.Expression));
        }

        var root = await document.GetSyntaxRootAsync(cancellationToken).ConfigureAwait(false);
        var endOfLine = root?.DescendantTrivia().FirstOrDefault(t => t.IsKind(SyntaxKind.EndOfLineTrivia)) ?? SyntaxFactory.LineFeed;
        var copy = SyntaxFactory.ParseStatement("var " + CopyName + " = " + _copyExpression + ";")
            .WithLeadingTrivia(_loop.GetLeadingTrivia())
            .WithTrailingTrivia(endOfLine)
            .WithAdditionalAnnotations(Formatter.Annotation);
        editor.InsertBefore(_loop, copy);

        // The copy takes the loop's leading trivia (a blank line or comment above it); the loop keeps only its indentation.
        var indent = SyntaxFactory.TriviaList(_loop.GetLeadingTrivia().Reverse().TakeWhile(t => !t.IsKind(SyntaxKind.EndOfLineTrivia)).Reverse());
        editor.ReplaceNode(_loop, (current, _) => current.WithLeadingTrivia(indent));
        return editor.GetChangedDocument();
    }
}
