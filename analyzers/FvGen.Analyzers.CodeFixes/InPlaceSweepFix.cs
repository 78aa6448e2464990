using System.Collections.Immutable;
using System.Composition;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Editing;
using Microsoft.CodeAnalysis.Formatting;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// FVC0005: keeps the target and makes the loop read only old values — copies the old state into a
/// separate array before the loop (<c>(double[])u.Clone()</c>, or <c>ToArray()</c> of a span) and
/// reads every element from the copy.
/// </summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(InPlaceSweepFix))]
[Shared]
public sealed class InPlaceSweepFix : CodeFixProvider
{
    public override ImmutableArray<string> FixableDiagnosticIds => ImmutableArray.Create(DiagnosticIds.InPlaceSweep);

    public override FixAllProvider GetFixAllProvider() => WellKnownFixAllProviders.BatchFixer;

    public override async Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        var root = await context.Document.GetSyntaxRootAsync(context.CancellationToken).ConfigureAwait(false);
        var model = await context.Document.GetSemanticModelAsync(context.CancellationToken).ConfigureAwait(false);
        if (root is null || model is null)
        {
            return;
        }

        foreach (var diagnostic in context.Diagnostics)
        {
            var plan = Plan(root, model, diagnostic, context.CancellationToken);
            if (plan is null)
            {
                continue;
            }

            context.RegisterCodeFix(
                CodeAction.Create(
                    "Read the old state from a copy `" + plan.Value.CopyName + "` made before the loop",
                    ct => ApplyAsync(context.Document, plan.Value, ct),
                    EquivalenceKeys.ReadOldStateFromCopy),
                diagnostic);
        }
    }

    private readonly record struct FixPlan(StatementSyntax Loop, string ArrayText, string CopyName, string CopyExpression, ImmutableArray<ElementAccessExpressionSyntax> Reads);

    private static async Task<Document> ApplyAsync(Document document, FixPlan plan, CancellationToken cancellationToken)
    {
        var editor = await DocumentEditor.CreateAsync(document, cancellationToken).ConfigureAwait(false);
        foreach (var read in plan.Reads)
        {
            editor.ReplaceNode(read.Expression, SyntaxFactory.IdentifierName(plan.CopyName).WithTriviaFrom(read.Expression));
        }

        var root = await document.GetSyntaxRootAsync(cancellationToken).ConfigureAwait(false);
        var endOfLine = root?.DescendantTrivia().FirstOrDefault(t => t.IsKind(SyntaxKind.EndOfLineTrivia)) ?? SyntaxFactory.LineFeed;
        var copy = SyntaxFactory.ParseStatement("var " + plan.CopyName + " = " + plan.CopyExpression + ";")
            .WithLeadingTrivia(plan.Loop.GetLeadingTrivia())
            .WithTrailingTrivia(endOfLine)
            .WithAdditionalAnnotations(Formatter.Annotation);
        editor.InsertBefore(plan.Loop, copy);
        return editor.GetChangedDocument();
    }

    private static FixPlan? Plan(SyntaxNode root, SemanticModel model, Diagnostic diagnostic, CancellationToken cancellationToken)
    {
        if (FixLocations.Write(root, diagnostic) is not { } write)
        {
            return null;
        }

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

        string name = array.Identifier.ValueText + "Old";
        var methodText = loop.Ancestors().OfType<MemberDeclarationSyntax>().FirstOrDefault()?.ToString() ?? string.Empty;
        for (int k = 2; methodText.Contains(name); k++)
        {
            name = array.Identifier.ValueText + "Old" + k.ToString(System.Globalization.CultureInfo.InvariantCulture);
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

        return new FixPlan(loop, array.Identifier.ValueText, name, copyExpression, reads);
    }
}
