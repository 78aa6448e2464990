using System.Collections.Generic;
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
using Microsoft.CodeAnalysis.Formatting;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// FVC0001: appends the missing counterpart to the write — the offending term moved one cell along
/// the loop variable, with the opposite weight. Fix-all adds every counterpart of a document at once
/// (several may belong to one write, which a text-merging batch fixer would drop).
/// </summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(DroppedFaceTermFix))]
[Shared]
public sealed class DroppedFaceTermFix : CodeFixProvider
{
    public override ImmutableArray<string> FixableDiagnosticIds => ImmutableArray.Create(DiagnosticIds.DroppedFaceTerm);

    public override FixAllProvider GetFixAllProvider() =>
        FixAllProvider.Create(async (context, document, diagnostics) => await ApplyAsync(document, diagnostics, context.CancellationToken).ConfigureAwait(false));

    public override async Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        var root = await context.Document.GetSyntaxRootAsync(context.CancellationToken).ConfigureAwait(false);
        if (root is null)
        {
            return;
        }

        foreach (var diagnostic in context.Diagnostics)
        {
            var plan = Plan(root, diagnostic);
            if (plan is null)
            {
                continue;
            }

            context.RegisterCodeFix(
                CodeAction.Create(
                    "Add the missing counterpart `" + plan.Value.Addend + "`",
                    ct => ApplyAsync(context.Document, ImmutableArray.Create(diagnostic), ct),
                    EquivalenceKeys.AddCounterpart),
                diagnostic);
        }
    }

    private static async Task<Document> ApplyAsync(Document document, ImmutableArray<Diagnostic> diagnostics, CancellationToken cancellationToken)
    {
        var root = await document.GetSyntaxRootAsync(cancellationToken).ConfigureAwait(false);
        if (root is null)
        {
            return document;
        }

        var byWrite = new Dictionary<AssignmentExpressionSyntax, List<string>>();
        foreach (var diagnostic in diagnostics)
        {
            var plan = Plan(root, diagnostic);
            if (plan is null)
            {
                continue;
            }

            if (!byWrite.TryGetValue(plan.Value.Write, out var addends))
            {
                byWrite[plan.Value.Write] = addends = new List<string>();
            }

            addends.Add(plan.Value.Addend);
        }

        var newRoot = root.ReplaceNodes(byWrite.Keys, (original, _) =>
        {
            bool subtract = original.IsKind(SyntaxKind.SubtractAssignmentExpression);
            var right = original.Right;
            string rightText = NeedsParentheses(right) ? "(" + right.WithoutTrivia() + ")" : right.WithoutTrivia().ToString();
            foreach (var addend in byWrite[original])
            {
                rightText += " " + (subtract ? Flip(addend) : addend);
            }

            var newRight = SyntaxFactory.ParseExpression(rightText).WithTriviaFrom(right).WithAdditionalAnnotations(Formatter.Annotation);
            return original.WithRight(newRight);
        });
        return document.WithSyntaxRoot(newRoot);
    }

    /// <summary>The write to extend and the C# addend, or null when the fix cannot be made faithfully.</summary>
    private static (AssignmentExpressionSyntax Write, string Addend)? Plan(SyntaxNode root, Diagnostic diagnostic)
    {
        if (!diagnostic.Properties.ContainsKey(FindingPropertyNames.SingleFactor)
            || !diagnostic.Properties.TryGetValue(FindingPropertyNames.CounterpartTemplate, out var template) || template is null
            || LoopShift.Parse(diagnostic.Properties.TryGetValue(FindingPropertyNames.CounterpartShift, out var s) ? s : null) is not { } shift
            || FixLocations.Write(root, diagnostic) is not { } write
            || !(write.IsKind(SyntaxKind.SimpleAssignmentExpression) || write.IsKind(SyntaxKind.AddAssignmentExpression) || write.IsKind(SyntaxKind.SubtractAssignmentExpression)))
        {
            return null;
        }

        if (root.FindNode(diagnostic.Location.SourceSpan, findInsideTrivia: false, getInnermostNodeForTie: true) is not ExpressionSyntax term
            || !write.Right.Span.Contains(term.Span))
        {
            // The term lives in a local inlined into the write: shifting its text there would not shift the local.
            return null;
        }

        string shifted = LoopShift.Apply(term, shift).ToString();
        return (write, template.Replace("§", shifted));
    }

    private static bool NeedsParentheses(ExpressionSyntax e) =>
        e is ConditionalExpressionSyntax or AssignmentExpressionSyntax or LambdaExpressionSyntax or SwitchExpressionSyntax
        || e is BinaryExpressionSyntax b && (b.IsKind(SyntaxKind.CoalesceExpression) || b.IsKind(SyntaxKind.LogicalOrExpression) || b.IsKind(SyntaxKind.LogicalAndExpression));

    private static string Flip(string addend) =>
        addend.StartsWith("+ ", System.StringComparison.Ordinal) ? "- " + addend.Substring(2)
        : addend.StartsWith("- ", System.StringComparison.Ordinal) ? "+ " + addend.Substring(2)
        : addend;
}
