using System.Collections.Immutable;
using System.Composition;
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

/// <summary>FVC0004: adds the missing opposite update for the other cell of the face, right after the write.</summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(OneSidedScatterFix))]
[Shared]
public sealed class OneSidedScatterFix : CodeFixProvider
{
    public override ImmutableArray<string> FixableDiagnosticIds => ImmutableArray.Create(DiagnosticIds.OneSidedScatter);

    public override FixAllProvider GetFixAllProvider() => WellKnownFixAllProviders.BatchFixer;

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
                    "Add the opposite update `" + plan.Value.Added + "`",
                    ct => ApplyAsync(context.Document, plan.Value.Statement, plan.Value.Added, ct),
                    EquivalenceKeys.AddOppositeUpdate),
                diagnostic);
        }
    }

    private static async Task<Document> ApplyAsync(Document document, StatementSyntax after, string added, CancellationToken cancellationToken)
    {
        var editor = await DocumentEditor.CreateAsync(document, cancellationToken).ConfigureAwait(false);
        var statement = SyntaxFactory.ParseStatement(added)
            .WithLeadingTrivia(after.GetLeadingTrivia())
            .WithTrailingTrivia(after.GetTrailingTrivia())
            .WithAdditionalAnnotations(Formatter.Annotation);
        editor.InsertAfter(after, statement);
        return editor.GetChangedDocument();
    }

    private static (StatementSyntax Statement, string Added)? Plan(SyntaxNode root, Diagnostic diagnostic)
    {
        if (!diagnostic.Properties.TryGetValue(FindingPropertyNames.OppositeTarget, out var target) || string.IsNullOrEmpty(target)
            || FixLocations.Write(root, diagnostic) is not { } write
            || write.Parent is not ExpressionStatementSyntax statement
            || statement.Parent is not BlockSyntax)
        {
            return null;
        }

        string op = write.Kind() switch
        {
            SyntaxKind.SubtractAssignmentExpression => "+=",
            SyntaxKind.AddAssignmentExpression => "-=",
            _ => string.Empty,
        };
        if (op.Length == 0)
        {
            return null;
        }

        return (statement, target + " " + op + " " + write.Right.WithoutTrivia() + ";");
    }
}
