using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.Tests.Harness;

/// <summary>
/// Renames every parameter and local of a source so that their names sort the other way round: the
/// k-th name of n in ordinal order becomes <c>v{n - k}</c> (zero-padded). The engine keys terms,
/// arrays and symbols by name, so this reverses every order those keys give; verdicts must not
/// change. Types, members, methods and the runtime's API keep their names.
/// </summary>
internal sealed class ReversedNames : SourceRewriter
{
    private readonly SemanticModel _model;
    private readonly Dictionary<string, string> _names;

    private ReversedNames(SemanticModel model, Dictionary<string, string> names)
    {
        _model = model;
        _names = names;
    }

    public static string Apply(string source)
    {
        var tree = Parse(source);
        var model = ModelOf(tree);
        var declared = tree.GetRoot().DescendantNodes()
            .Select(n => model.GetDeclaredSymbol(n))
            .Where(s => s is ILocalSymbol or IParameterSymbol)
            .Select(s => s!.Name)
            .Where(n => n.Length > 0 && n != "_")
            .Distinct()
            .OrderBy(n => n, StringComparer.Ordinal)
            .ToList();
        var names = new Dictionary<string, string>(StringComparer.Ordinal);
        for (int k = 0; k < declared.Count; k++)
        {
            names[declared[k]] = "v" + (declared.Count - k).ToString("D3", System.Globalization.CultureInfo.InvariantCulture);
        }

        return new ReversedNames(model, names).Rewrite(tree);
    }

    public override SyntaxNode? VisitIdentifierName(IdentifierNameSyntax node) =>
        _model.GetSymbolInfo(node).Symbol is ILocalSymbol or IParameterSymbol && _names.TryGetValue(node.Identifier.Text, out var name)
            ? node.WithIdentifier(Renamed(node.Identifier, name))
            : base.VisitIdentifierName(node);

    public override SyntaxNode? VisitVariableDeclarator(VariableDeclaratorSyntax node)
    {
        var visited = (VariableDeclaratorSyntax)base.VisitVariableDeclarator(node)!;
        return _names.TryGetValue(node.Identifier.Text, out var name) ? visited.WithIdentifier(Renamed(node.Identifier, name)) : visited;
    }

    public override SyntaxNode? VisitParameter(ParameterSyntax node)
    {
        var visited = (ParameterSyntax)base.VisitParameter(node)!;
        return _names.TryGetValue(node.Identifier.Text, out var name) ? visited.WithIdentifier(Renamed(node.Identifier, name)) : visited;
    }

    public override SyntaxNode? VisitForEachStatement(ForEachStatementSyntax node)
    {
        var visited = (ForEachStatementSyntax)base.VisitForEachStatement(node)!;
        return _names.TryGetValue(node.Identifier.Text, out var name) ? visited.WithIdentifier(Renamed(node.Identifier, name)) : visited;
    }

    public override SyntaxNode? VisitSingleVariableDesignation(SingleVariableDesignationSyntax node) =>
        _names.TryGetValue(node.Identifier.Text, out var name) ? node.WithIdentifier(Renamed(node.Identifier, name)) : base.VisitSingleVariableDesignation(node);

    private static SyntaxToken Renamed(SyntaxToken token, string name) => SyntaxFactory.Identifier(token.LeadingTrivia, name, token.TrailingTrivia);
}
