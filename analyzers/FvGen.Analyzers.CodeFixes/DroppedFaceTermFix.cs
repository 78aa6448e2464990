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
using Microsoft.CodeAnalysis.Editing;
using Microsoft.CodeAnalysis.Formatting;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// FVC0001: appends the missing counterpart to the write — the offending term moved one cell along
/// the loop variable, with the opposite weight. A term that reaches the write through a local face
/// flux (<c>double fe = F(u[i], u[i + 1]);</c>) gets a second local for the other face, declared
/// right after the first (<c>double fw = F(u[i - 1], u[i]);</c>), and the write uses it. Fix-all adds
/// every counterpart of a document at once (several may belong to one write, which a text-merging
/// batch fixer would drop).
/// </summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(DroppedFaceTermFix))]
[Shared]
public sealed class DroppedFaceTermFix : FindingFix
{
    public DroppedFaceTermFix()
        : base(DiagnosticIds.DroppedFaceTerm)
    {
    }

    public override FixAllProvider GetFixAllProvider() =>
        FixAllProvider.Create(async (context, document, diagnostics) =>
            await FixSource.ReadAsync(document, context.CancellationToken).ConfigureAwait(false) is { } source
                ? await ApplyAsync(source, diagnostics, context.CancellationToken).ConfigureAwait(false)
                : document);

    private protected override IEnumerable<CodeAction> Offer(FixSource source, Diagnostic diagnostic, CancellationToken cancellationToken)
    {
        if (CounterpartPlan.Create(source, diagnostic, cancellationToken) is not { } plan)
        {
            return Enumerable.Empty<CodeAction>();
        }

        string title = plan.NewLocal is { } local && LocalNames.Unique(local.Statement, local.PreferredName) is var name
            ? "Add the other face `" + name + " = " + local.Initializer + "` and its term `" + plan.Addend(name) + "`"
            : "Add the missing counterpart `" + plan.Addend(string.Empty) + "`";
        return new[]
        {
            CodeAction.Create(title, ct => ApplyAsync(source, ImmutableArray.Create(diagnostic), ct), EquivalenceKeys.AddCounterpart),
        };
    }

    private static async Task<Document> ApplyAsync(FixSource source, ImmutableArray<Diagnostic> diagnostics, CancellationToken cancellationToken)
    {
        var plans = diagnostics.Select(d => CounterpartPlan.Create(source, d, cancellationToken)).Where(p => p is not null).Cast<CounterpartPlan>().ToList();
        if (plans.Count == 0)
        {
            return source.Document;
        }

        // One new local per (local, shift), however many writes use it; names unique across the batch.
        var taken = new HashSet<string>(System.StringComparer.Ordinal);
        var localNames = new Dictionary<(VariableDeclaratorSyntax, string), string>();
        var inserted = new Dictionary<LocalDeclarationStatementSyntax, List<StatementSyntax>>();
        var addendsByWrite = new Dictionary<AssignmentExpressionSyntax, List<string>>();
        foreach (var plan in plans)
        {
            string name = string.Empty;
            if (plan.NewLocal is { } local)
            {
                if (!localNames.TryGetValue((local.Declarator, local.ShiftKey), out name!))
                {
                    name = LocalNames.Unique(local.Statement, local.PreferredName, taken);
                    localNames[(local.Declarator, local.ShiftKey)] = name;
                    if (!inserted.TryGetValue(local.Statement, out var list))
                    {
                        inserted[local.Statement] = list = new List<StatementSyntax>();
                    }

                    list.Add(SyntaxFactory.ParseStatement(local.TypeText + " " + name + " = " + local.Initializer + ";")
                        .WithLeadingTrivia(local.Statement.GetLeadingTrivia())
                        .WithTrailingTrivia(local.Statement.GetTrailingTrivia())
                        .WithAdditionalAnnotations(Formatter.Annotation));
                }
            }

            if (!addendsByWrite.TryGetValue(plan.Write, out var addends))
            {
                addendsByWrite[plan.Write] = addends = new List<string>();
            }

            // A whole-state write gets one diagnostic per component, all with the same counterpart: add it once.
            string addend = plan.Addend(name);
            if (!addends.Contains(addend))
            {
                addends.Add(addend);
            }
        }

        var editor = await DocumentEditor.CreateAsync(source.Document, cancellationToken).ConfigureAwait(false);
        foreach (var pair in addendsByWrite)
        {
            editor.ReplaceNode(pair.Key, Extended(pair.Key, pair.Value));
        }

        foreach (var pair in inserted)
        {
            editor.InsertAfter(pair.Key, pair.Value);
        }

        return editor.GetChangedDocument();
    }

    private static AssignmentExpressionSyntax Extended(AssignmentExpressionSyntax write, IEnumerable<string> addends)
    {
        bool subtract = write.IsKind(SyntaxKind.SubtractAssignmentExpression);
        var right = write.Right;
        string rightText = NeedsParentheses(right) ? "(" + right.WithoutTrivia() + ")" : right.WithoutTrivia().ToString();
        foreach (var addend in addends)
        {
            rightText += " " + (subtract ? Flip(addend) : addend);
        }

        var newRight = SyntaxFactory.ParseExpression(rightText).WithTriviaFrom(right).WithAdditionalAnnotations(Formatter.Annotation);
        return write.WithRight(newRight);
    }

    private static bool NeedsParentheses(ExpressionSyntax e) =>
        e is ConditionalExpressionSyntax or AssignmentExpressionSyntax or LambdaExpressionSyntax or SwitchExpressionSyntax
        || e is BinaryExpressionSyntax b && (b.IsKind(SyntaxKind.CoalesceExpression) || b.IsKind(SyntaxKind.LogicalOrExpression) || b.IsKind(SyntaxKind.LogicalAndExpression));

    private static string Flip(string addend) =>
        addend.StartsWith("+ ", System.StringComparison.Ordinal) ? "- " + addend.Substring(2)
        : addend.StartsWith("- ", System.StringComparison.Ordinal) ? "+ " + addend.Substring(2)
        : addend;
}
