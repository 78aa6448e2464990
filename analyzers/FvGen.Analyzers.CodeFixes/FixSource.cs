using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>What a fix reads of the document it edits: its syntax root and semantic model, fetched once per request.</summary>
internal sealed class FixSource
{
    private FixSource(Document document, SyntaxNode root, SemanticModel model)
    {
        Document = document;
        Root = root;
        Model = model;
    }

    public Document Document { get; }

    public SyntaxNode Root { get; }

    public SemanticModel Model { get; }

    /// <summary>The document's source, or null when it has no syntax tree or semantic model.</summary>
    public static async Task<FixSource?> ReadAsync(Document document, CancellationToken cancellationToken)
    {
        var root = await document.GetSyntaxRootAsync(cancellationToken).ConfigureAwait(false);
        var model = await document.GetSemanticModelAsync(cancellationToken).ConfigureAwait(false);
        return root is null || model is null ? null : new FixSource(document, root, model);
    }

    /// <summary>The write statement the diagnostic is about (see <see cref="FixLocations"/>).</summary>
    public AssignmentExpressionSyntax? WriteOf(Diagnostic diagnostic) => FixLocations.Write(Root, diagnostic);
}
