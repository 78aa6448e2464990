using System.Collections.Generic;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// Decides whether a user-defined <c>+</c>, <c>-</c>, <c>*</c> or <c>/</c> of a state struct is the
/// component-wise arithmetic the checker takes it for: every instance field of the result is the
/// same field of the operands combined by that operator (<c>a.Mass + b.Mass</c>; <c>s * a.Mass</c>;
/// <c>a.Mass / s</c>), written as constructor arguments, an object initializer, or assignments to a
/// local that is returned (the generator's form). Anything else is not modelled.
/// </summary>
internal static class ComponentWiseOperators
{
    public static bool IsComponentWise(IMethodSymbol op)
    {
        if (op.ContainingType is not { TypeKind: TypeKind.Struct } state || op.Parameters.Length != 2)
        {
            return false;
        }

        var fields = state.GetMembers().OfType<IFieldSymbol>().Where(f => !f.IsStatic && !f.IsConst).Select(f => f.Name).ToList();
        if (fields.Count == 0 || op.DeclaringSyntaxReferences.Length != 1
            || op.DeclaringSyntaxReferences[0].GetSyntax() is not OperatorDeclarationSyntax declaration)
        {
            return false;
        }

        var components = Components(declaration);
        if (components is null || components.Count != fields.Count)
        {
            return false;
        }

        var seen = new HashSet<string>(System.StringComparer.Ordinal);
        foreach (var (field, expression) in components)
        {
            string? combined = CombinedField(Unparenthesize(expression), declaration.OperatorToken.Kind(), op.Parameters[0].Name, op.Parameters[1].Name);
            if (combined is null || (field is not null && field != combined) || !seen.Add(combined))
            {
                return false;
            }
        }

        return seen.SetEquals(fields);
    }

    /// <summary>A field of the operator's result and the expression it is given; field null for a constructor argument.</summary>
    private sealed record Component(string? Field, ExpressionSyntax Value);

    /// <summary>The (field, value) pairs the operator builds its result from; field null for a constructor argument.</summary>
    private static List<Component>? Components(OperatorDeclarationSyntax declaration)
    {
        if (declaration.ExpressionBody is { } arrow)
        {
            return FromCreation(arrow.Expression);
        }

        if (declaration.Body is not { } body)
        {
            return null;
        }

        var statements = body.Statements;
        if (statements.Count == 1 && statements[0] is ReturnStatementSyntax { Expression: { } returned })
        {
            return FromCreation(returned);
        }

        // `T r; r.A = …; r.B = …; return r;`
        if (statements.Count < 2 || statements[0] is not LocalDeclarationStatementSyntax { Declaration.Variables: { Count: 1 } variables }
            || variables[0] is not { Initializer: null } local
            || statements[statements.Count - 1] is not ReturnStatementSyntax { Expression: IdentifierNameSyntax result }
            || result.Identifier.Text != local.Identifier.Text)
        {
            return null;
        }

        var components = new List<Component>();
        for (int k = 1; k < statements.Count - 1; k++)
        {
            if (statements[k] is not ExpressionStatementSyntax
                {
                    Expression: AssignmentExpressionSyntax
                    {
                        RawKind: (int)SyntaxKind.SimpleAssignmentExpression,
                        Left: MemberAccessExpressionSyntax { Expression: IdentifierNameSyntax target, Name: var name },
                        Right: var value,
                    },
                } || target.Identifier.Text != local.Identifier.Text)
            {
                return null;
            }

            components.Add(new Component(name.Identifier.Text, value));
        }

        return components;
    }

    private static List<Component>? FromCreation(ExpressionSyntax expression)
    {
        switch (Unparenthesize(expression))
        {
            case BaseObjectCreationExpressionSyntax { Initializer: null, ArgumentList: { } arguments }:
                return arguments.Arguments.Select(a => new Component(null, a.Expression)).ToList();
            case BaseObjectCreationExpressionSyntax { Initializer: { } initializer, ArgumentList: null or { Arguments.Count: 0 } }:
                var components = new List<Component>();
                foreach (var e in initializer.Expressions)
                {
                    if (e is not AssignmentExpressionSyntax { Left: IdentifierNameSyntax field, Right: var value })
                    {
                        return null;
                    }

                    components.Add(new Component(field.Identifier.Text, value));
                }

                return components;
            default:
                return null;
        }
    }

    /// <summary>The field a component expression combines (<c>a.F + b.F</c> → F), or null when it is not of the operator's form.</summary>
    private static string? CombinedField(ExpressionSyntax value, SyntaxKind op, string first, string second)
    {
        if (value is not BinaryExpressionSyntax binary)
        {
            return null;
        }

        var left = Unparenthesize(binary.Left);
        var right = Unparenthesize(binary.Right);
        switch (op)
        {
            case SyntaxKind.PlusToken when binary.IsKind(SyntaxKind.AddExpression):
                // A sum commutes: `a.F + b.F` or `b.F + a.F`.
                return FieldOf(left, first) is { } a && FieldOf(right, second) == a ? a
                    : FieldOf(left, second) is { } b && FieldOf(right, first) == b ? b : null;
            case SyntaxKind.MinusToken when binary.IsKind(SyntaxKind.SubtractExpression):
                return FieldOf(left, first) is { } d && FieldOf(right, second) == d ? d : null;
            case SyntaxKind.AsteriskToken when binary.IsKind(SyntaxKind.MultiplyExpression):
                // A scalar times a state (`operator *(double s, T a)` or `(T a, double s)`), in either order.
                return ScaledField(left, right, first, second) ?? ScaledField(right, left, first, second);
            case SyntaxKind.SlashToken when binary.IsKind(SyntaxKind.DivideExpression):
                return FieldOf(left, first) is { } f && IsName(right, second) ? f : null;
            default:
                return null;
        }
    }

    /// <summary>The field <paramref name="state"/> reads when <paramref name="scalar"/> names the other parameter (<c>s * a.F</c>), or null.</summary>
    private static string? ScaledField(ExpressionSyntax scalar, ExpressionSyntax state, string first, string second) =>
        IsName(scalar, first) ? FieldOf(state, second) : IsName(scalar, second) ? FieldOf(state, first) : null;

    private static string? FieldOf(ExpressionSyntax e, string parameter) =>
        e is MemberAccessExpressionSyntax { Expression: IdentifierNameSyntax owner, Name: var name } && owner.Identifier.Text == parameter
            ? name.Identifier.Text
            : null;

    private static bool IsName(ExpressionSyntax e, string parameter) => e is IdentifierNameSyntax n && n.Identifier.Text == parameter;

    private static ExpressionSyntax Unparenthesize(ExpressionSyntax e)
    {
        while (e is ParenthesizedExpressionSyntax p)
        {
            e = p.Expression;
        }

        return e;
    }
}
