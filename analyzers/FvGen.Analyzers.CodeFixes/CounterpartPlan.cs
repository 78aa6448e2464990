using System.Collections.Generic;
using System.Linq;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>The local for the other face that an FVC0001 fix declares right after the user's own face-flux local.</summary>
internal sealed record FaceLocal(
    LocalDeclarationStatementSyntax Statement,
    VariableDeclaratorSyntax Declarator,
    string TypeText,
    string Initializer,
    string ShiftKey,
    string PreferredName);

/// <summary>
/// How one FVC0001 diagnostic is fixed: the write that gets the counterpart, the addend, and the new
/// face local when the term reaches the write through a local. Null (no fix) whenever the shifted
/// text would not mean the term one cell along.
/// </summary>
internal sealed class CounterpartPlan
{
    private const string NameHole = "\u00a4";

    private readonly string _template;
    private readonly string _counterpart;

    private CounterpartPlan(AssignmentExpressionSyntax write, string template, string counterpart, FaceLocal? newLocal)
    {
        Write = write;
        _template = template;
        _counterpart = counterpart;
        NewLocal = newLocal;
    }

    public AssignmentExpressionSyntax Write { get; }

    public FaceLocal? NewLocal { get; }

    /// <summary>The C# addend for the write, naming the new face local <paramref name="localName"/> when there is one.</summary>
    public string Addend(string localName) => _template.Replace("§", _counterpart.Replace(NameHole, localName));

    public static CounterpartPlan? Create(FixSource source, Diagnostic diagnostic, CancellationToken cancellationToken)
    {
        var properties = diagnostic.Properties;
        string? shiftText = properties.TryGetValue(FindingPropertyNames.CounterpartShift, out var s) ? s : null;
        if (!properties.ContainsKey(FindingPropertyNames.SingleFactor)
            || !properties.TryGetValue(FindingPropertyNames.CounterpartTemplate, out var template) || template is null
            || LoopShift.Parse(shiftText) is not { } shift
            || source.WriteOf(diagnostic) is not { } write
            || !(write.IsKind(SyntaxKind.SimpleAssignmentExpression) || write.IsKind(SyntaxKind.AddAssignmentExpression) || write.IsKind(SyntaxKind.SubtractAssignmentExpression))
            || source.Root.FindNode(diagnostic.Location.SourceSpan, findInsideTrivia: false, getInnermostNodeForTie: true) is not ExpressionSyntax term
            || !ShiftSafety.CanShift(term, shift, source.Model, cancellationToken))
        {
            return null;
        }

        var model = source.Model;
        var targetType = model.GetTypeInfo(write.Left, cancellationToken).Type;
        if (write.Right.Span.Contains(term.Span))
        {
            return FitsTarget(model.GetTypeInfo(term, cancellationToken).Type, targetType)
                ? new CounterpartPlan(write, template, LoopShift.Apply(term, shift).ToString(), null)
                : null;
        }

        // The term lives in a local's initializer; the write reads it through the local.
        if (term.Ancestors().OfType<VariableDeclaratorSyntax>().FirstOrDefault() is not { Initializer: { } initializer } declarator
            || declarator.Parent is not VariableDeclarationSyntax { Type: not RefTypeSyntax } declaration
            || declaration.Parent is not LocalDeclarationStatementSyntax statement
            || statement.Parent is not BlockSyntax block
            || statement.IsConst || statement.UsingKeyword != default
            || write.SpanStart < statement.Span.End
            || model.GetDeclaredSymbol(declarator, cancellationToken) is not ILocalSymbol local
            || ShiftSafety.IsWrittenIn(block, local, model, cancellationToken))
        {
            return null;
        }

        if (Unparenthesized(initializer.Value) != term)
        {
            // Only part of the initializer is the face term: write its shifted text into the write itself.
            return FitsTarget(model.GetTypeInfo(term, cancellationToken).Type, targetType)
                ? new CounterpartPlan(write, template, LoopShift.Apply(term, shift).ToString(), null)
                : null;
        }

        var uses = write.Right.DescendantNodes().OfType<IdentifierNameSyntax>()
            .Where(n => n.Identifier.ValueText == local.Name && SymbolEqualityComparer.Default.Equals(model.GetSymbolInfo(n, cancellationToken).Symbol, local))
            .ToList();
        if (uses.Count != 1)
        {
            return null;
        }

        // The use keeps its member path: `fe.Mass` becomes `fw.Mass`.
        ExpressionSyntax use = uses[0];
        while (use.Parent is MemberAccessExpressionSyntax member && member.Expression == use && member.IsKind(SyntaxKind.SimpleMemberAccessExpression))
        {
            use = member;
        }

        if (!FitsTarget(model.GetTypeInfo(use, cancellationToken).Type, targetType))
        {
            return null;
        }

        string useText = NameHole + use.WithoutTrivia().ToString().Substring(local.Name.Length);
        string shifted = LoopShift.Apply(term, shift).ToString();
        if (ExistingFace(block, write, shifted, model, cancellationToken) is { } existing)
        {
            // The other face is already a local (written by the user, or by this fix for another component): use it.
            return new CounterpartPlan(write, template, useText.Replace(NameHole, existing), null);
        }

        var newLocal = new FaceLocal(
            statement,
            declarator,
            declaration.Type.WithoutTrivia().ToString(),
            shifted,
            shiftText ?? string.Empty,
            FaceNames.Opposite(local.Name, shift));
        return new CounterpartPlan(write, template, useText, newLocal);
    }

    /// <summary>A local of <paramref name="block"/>, declared before the write and never reassigned, whose initializer is <paramref name="initializer"/>.</summary>
    private static string? ExistingFace(BlockSyntax block, AssignmentExpressionSyntax write, string initializer, SemanticModel model, CancellationToken cancellationToken)
    {
        string wanted = SyntaxFactory.ParseExpression(initializer).NormalizeWhitespace().ToFullString();
        foreach (var declarator in block.Statements.TakeWhile(st => st.Span.End <= write.SpanStart).OfType<LocalDeclarationStatementSyntax>().SelectMany(st => st.Declaration.Variables))
        {
            if (declarator.Initializer is { } init
                && Unparenthesized(init.Value).NormalizeWhitespace().ToFullString() == wanted
                && model.GetDeclaredSymbol(declarator, cancellationToken) is ILocalSymbol candidate
                && !ShiftSafety.IsWrittenIn(block, candidate, model, cancellationToken))
            {
                return candidate.Name;
            }
        }

        return null;
    }

    /// <summary>A scalar, or the written state type itself: anything else is one component of a state, which shifted text would not name.</summary>
    private static bool FitsTarget(ITypeSymbol? termType, ITypeSymbol? targetType) =>
        termType is not null && termType.TypeKind != TypeKind.Error
        && (termType.SpecialType is SpecialType.System_Double or SpecialType.System_Single or SpecialType.System_Decimal or SpecialType.System_Int32 or SpecialType.System_Int64
            || SymbolEqualityComparer.Default.Equals(termType, targetType));

    private static ExpressionSyntax Unparenthesized(ExpressionSyntax e) => e is ParenthesizedExpressionSyntax p ? Unparenthesized(p.Expression) : e;
}
