using System.Collections.Generic;
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

/// <summary>FVC0004: adds the missing opposite update for the other cell of the face, right after the write.</summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(OneSidedScatterFix))]
[Shared]
public sealed class OneSidedScatterFix : FindingFix
{
    public OneSidedScatterFix()
        : base(DiagnosticIds.OneSidedScatter)
    {
    }

    public override FixAllProvider GetFixAllProvider() => WellKnownFixAllProviders.BatchFixer;

    private protected override IEnumerable<CodeAction> Offer(FixSource source, Diagnostic diagnostic, CancellationToken cancellationToken)
    {
        if (Plan(source, diagnostic) is not { } plan)
        {
            return Enumerable.Empty<CodeAction>();
        }

        return new[]
        {
            CodeAction.Create(
                "Add the opposite update `" + plan.Added + "`",
                ct => ApplyAsync(source.Document, plan.Statement, plan.Added, ct),
                EquivalenceKeys.AddOppositeUpdate),
        };
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

    private static (StatementSyntax Statement, string Added)? Plan(FixSource source, Diagnostic diagnostic)
    {
        if (!diagnostic.Properties.TryGetValue(FindingPropertyNames.OppositeTarget, out var target) || string.IsNullOrEmpty(target)
            || source.WriteOf(diagnostic) is not { } write
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
