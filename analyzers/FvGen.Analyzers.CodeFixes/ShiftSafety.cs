using System.Collections.Generic;
using System.Linq;
using System.Threading;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// Decides whether an expression, moved by a loop shift with <see cref="LoopShift"/>, still means
/// "the same expression one cell along": every name it reads must be a loop variable or keep its
/// value over the shifted loops, and it must change nothing when evaluated once more.
/// </summary>
internal static class ShiftSafety
{
    public static bool CanShift(ExpressionSyntax expression, IReadOnlyDictionary<string, long> shift, SemanticModel model, CancellationToken cancellationToken)
    {
        if (HasSideEffects(expression))
        {
            return false;
        }

        // The outermost loop whose variable moves: whatever is declared or written inside it may differ between the two cells.
        SyntaxNode? outermost = null;
        foreach (var variable in shift.Keys)
        {
            var loop = LoopOf(expression, variable);
            if (loop is null)
            {
                return false;
            }

            if (outermost is null || loop.Span.Contains(outermost.Span))
            {
                outermost = loop;
            }
        }

        if (outermost is null)
        {
            return true;
        }

        foreach (var name in expression.DescendantNodesAndSelf().OfType<IdentifierNameSyntax>())
        {
            if (name.Parent is MemberAccessExpressionSyntax member && member.Name == name)
            {
                continue;
            }

            var symbol = model.GetSymbolInfo(name, cancellationToken).Symbol;
            if (symbol is ILocalSymbol { IsConst: true } or IFieldSymbol { IsConst: true } || symbol is not (ILocalSymbol or IParameterSymbol or IFieldSymbol))
            {
                continue;
            }

            if (LoopOf(expression, name.Identifier.ValueText) is { } ownLoop && IsVariableOf(ownLoop, symbol, cancellationToken, model))
            {
                continue;
            }

            bool declaredInside = symbol.DeclaringSyntaxReferences.Any(r => outermost.Span.Contains(r.Span));
            if (declaredInside || IsWrittenIn(outermost, symbol, model, cancellationToken))
            {
                return false;
            }
        }

        return true;
    }

    /// <summary>True when evaluating the expression can change state (assignments, increments, ref/out arguments, awaits).</summary>
    public static bool HasSideEffects(ExpressionSyntax expression) =>
        expression.DescendantNodesAndSelf().Any(n =>
            n is AssignmentExpressionSyntax or AwaitExpressionSyntax or AnonymousFunctionExpressionSyntax
            || n is PrefixUnaryExpressionSyntax p && (p.IsKind(SyntaxKind.PreIncrementExpression) || p.IsKind(SyntaxKind.PreDecrementExpression))
            || n is PostfixUnaryExpressionSyntax q && (q.IsKind(SyntaxKind.PostIncrementExpression) || q.IsKind(SyntaxKind.PostDecrementExpression))
            || n is ArgumentSyntax a && !a.RefKindKeyword.IsKind(SyntaxKind.None) && !a.RefKindKeyword.IsKind(SyntaxKind.InKeyword));

    /// <summary>True when <paramref name="symbol"/> is assigned, incremented or passed by reference anywhere in <paramref name="region"/>.</summary>
    public static bool IsWrittenIn(SyntaxNode region, ISymbol symbol, SemanticModel model, CancellationToken cancellationToken)
    {
        foreach (var node in region.DescendantNodes())
        {
            ExpressionSyntax? target = node switch
            {
                AssignmentExpressionSyntax a => a.Left,
                PrefixUnaryExpressionSyntax p when p.IsKind(SyntaxKind.PreIncrementExpression) || p.IsKind(SyntaxKind.PreDecrementExpression) => p.Operand,
                PostfixUnaryExpressionSyntax q when q.IsKind(SyntaxKind.PostIncrementExpression) || q.IsKind(SyntaxKind.PostDecrementExpression) => q.Operand,
                ArgumentSyntax arg when !arg.RefKindKeyword.IsKind(SyntaxKind.None) && !arg.RefKindKeyword.IsKind(SyntaxKind.InKeyword) => arg.Expression,
                RefExpressionSyntax r => r.Expression,
                _ => null,
            };
            if (target is not null && SymbolEqualityComparer.Default.Equals(model.GetSymbolInfo(Unwrap(target), cancellationToken).Symbol, symbol))
            {
                return true;
            }
        }

        return false;
    }

    /// <summary>The innermost <c>for</c> loop or <c>Parallel.For</c> lambda around <paramref name="node"/> whose variable is <paramref name="variable"/>.</summary>
    public static SyntaxNode? LoopOf(SyntaxNode node, string variable) =>
        node.Ancestors().FirstOrDefault(a => a switch
        {
            ForStatementSyntax f => f.Declaration?.Variables.Any(v => v.Identifier.ValueText == variable) ?? false,
            SimpleLambdaExpressionSyntax l => l.Parameter.Identifier.ValueText == variable,
            ParenthesizedLambdaExpressionSyntax l => l.ParameterList.Parameters.Any(p => p.Identifier.ValueText == variable),
            _ => false,
        });

    private static bool IsVariableOf(SyntaxNode loop, ISymbol symbol, CancellationToken cancellationToken, SemanticModel model) =>
        loop switch
        {
            ForStatementSyntax f => f.Declaration!.Variables.Any(v => SymbolEqualityComparer.Default.Equals(model.GetDeclaredSymbol(v, cancellationToken), symbol)),
            SimpleLambdaExpressionSyntax l => SymbolEqualityComparer.Default.Equals(model.GetDeclaredSymbol(l.Parameter, cancellationToken), symbol),
            ParenthesizedLambdaExpressionSyntax l => l.ParameterList.Parameters.Any(p => SymbolEqualityComparer.Default.Equals(model.GetDeclaredSymbol(p, cancellationToken), symbol)),
            _ => false,
        };

    private static ExpressionSyntax Unwrap(ExpressionSyntax e) =>
        e switch
        {
            ParenthesizedExpressionSyntax p => Unwrap(p.Expression),
            MemberAccessExpressionSyntax m when m.Expression is IdentifierNameSyntax => m.Expression,
            _ => e,
        };
}
