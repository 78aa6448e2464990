using System.Collections.Concurrent;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Extraction;

/// <summary>What the checker knows about the effects of a method.</summary>
internal enum PurityKind
{
    /// <summary>Reads its arguments, writes nothing outside itself.</summary>
    Pure,

    /// <summary>Writes state outside itself, or calls code that does.</summary>
    Impure,

    /// <summary>Metadata the checker cannot see into.</summary>
    Unknown,
}

/// <summary>A verdict with the reason (<c>writes the field `calls`</c>) and where.</summary>
/// <remarks>
/// <see cref="WrittenParameters"/>: the <c>ref</c>/<c>out</c> parameters (by ordinal) a pure method
/// writes. Writing them is a result handed to the caller, not an effect: the caller is pure when it
/// passes its own locals there.
/// </remarks>
internal sealed record Purity(PurityKind Kind, string Reason, Location? Location)
{
    public static Purity Pure { get; } = new(PurityKind.Pure, string.Empty, null);

    public ImmutableHashSet<int> WrittenParameters { get; init; } = ImmutableHashSet<int>.Empty;
}

/// <summary>
/// Decides whether a flux or limiter writes state outside itself: assignments to fields, to
/// elements of arrays it did not create, to <c>ref</c>/<c>out</c> parameters, or calls of methods
/// that do. Source methods are read through their operations; metadata is trusted only for the
/// math and span types of the framework and types marked [GeometryValue]. Cached per compilation.
/// </summary>
internal sealed class PurityChecker
{
    private const int MaxDepth = 8;
    private readonly Compilation _compilation;
    private readonly ConcurrentDictionary<IMethodSymbol, Purity> _cache = new(SymbolEqualityComparer.Default);

    private readonly bool _syntaxFirst;

    /// <param name="compilation">The compilation whose methods are classified.</param>
    /// <param name="syntaxFirst">Decide from the syntax and the callees alone where that settles it (the default); false always reads the operations (kept to test that both agree).</param>
    public PurityChecker(Compilation compilation, bool syntaxFirst = true)
    {
        _compilation = compilation;
        _syntaxFirst = syntaxFirst;
        _geometryValue = compilation.GetTypeByMetadataName("FvGen.GeometryValueAttribute");
    }

    /// <summary><c>[GeometryValue]</c>: compiled members of a type marked with it are trusted to write nothing.</summary>
    private readonly INamedTypeSymbol? _geometryValue;

    public Purity Classify(IMethodSymbol method) => Classify(method, 0);

    private Purity Classify(IMethodSymbol method, int depth)
    {
        method = method.ReducedFrom ?? method;
        method = method.OriginalDefinition;
        if (_cache.TryGetValue(method, out var known))
        {
            return known;
        }

        var result = Compute(method, depth);
        _cache.TryAdd(method, result);
        return result;
    }

    private Purity Compute(IMethodSymbol method, int depth)
    {
        if (method.DeclaringSyntaxReferences.IsEmpty)
        {
            return IsTrustedMetadata(method) ? Purity.Pure : new Purity(PurityKind.Unknown, string.Empty, null);
        }

        if (method.IsAbstract || method.IsExtern || method.MethodKind == MethodKind.DelegateInvoke)
        {
            // An interface or abstract member: whichever implementation runs is not known here.
            return new Purity(PurityKind.Unknown, string.Empty, null);
        }

        if (depth > MaxDepth)
        {
            return new Purity(PurityKind.Unknown, string.Empty, null);
        }

        // A partial method without a body yet (the generator writes it) is treated as pure.
        foreach (var reference in method.DeclaringSyntaxReferences)
        {
            var syntax = reference.GetSyntax();
#pragma warning disable RS1030 // The callee lives in another tree; one model per callee, cached for the compilation.
            var model = _compilation.GetSemanticModel(syntax.SyntaxTree);
#pragma warning restore RS1030
            if (_syntaxFirst && IsPureBySyntax(syntax, model, method, depth))
            {
                // The operations would say the same (pure, no ref/out parameter written) at about
                // twice the cost: binding a callee's whole body is most of what a flux costs the checker.
                continue;
            }

            var body = model.GetOperation(syntax);
            if (body is null)
            {
                continue;
            }

            var written = new HashSet<int>();
            foreach (var op in body.Descendants())
            {
                var verdict = Inspect(op, method, depth, written);
                if (verdict.Kind != PurityKind.Pure)
                {
                    return verdict;
                }
            }

            if (written.Count > 0)
            {
                return Purity.Pure with { WrittenParameters = written.ToImmutableHashSet() };
            }
        }

        return Purity.Pure;
    }

    /// <summary>
    /// True when the body has none of the constructs <see cref="Inspect"/> looks at but calls, and
    /// every call resolves to this method or to one that is not impure and writes no ref/out
    /// parameter: the operations then find nothing either. Any assignment, increment, initializer,
    /// query, interpolation or constructor initializer (each may hide a write or a call), an
    /// unresolved call, or an impure callee leaves the decision to the operations, which also word
    /// the reason.
    /// </summary>
    private bool IsPureBySyntax(SyntaxNode declaration, SemanticModel model, IMethodSymbol owner, int depth)
    {
        if (declaration is not (BaseMethodDeclarationSyntax or LocalFunctionStatementSyntax))
        {
            return false;
        }

        foreach (var node in declaration.DescendantNodes())
        {
            switch (node)
            {
                case AssignmentExpressionSyntax or InitializerExpressionSyntax or QueryExpressionSyntax or InterpolatedStringExpressionSyntax
                    or AnonymousObjectCreationExpressionSyntax or ConstructorInitializerSyntax or ForEachVariableStatementSyntax:
                    return false;
                case PrefixUnaryExpressionSyntax or PostfixUnaryExpressionSyntax when node.IsKind(SyntaxKind.PreIncrementExpression) || node.IsKind(SyntaxKind.PreDecrementExpression)
                    || node.IsKind(SyntaxKind.PostIncrementExpression) || node.IsKind(SyntaxKind.PostDecrementExpression):
                    return false;
                case InvocationExpressionSyntax invocation:
                    if (model.GetSymbolInfo(invocation).Symbol is not IMethodSymbol called)
                    {
                        return false;
                    }

                    if (SymbolEqualityComparer.Default.Equals(called.OriginalDefinition, owner.OriginalDefinition)
                        || SymbolEqualityComparer.Default.Equals((called.ReducedFrom ?? called).OriginalDefinition, owner.OriginalDefinition))
                    {
                        continue;
                    }

                    var verdict = Classify(called, depth + 1);
                    if (verdict.Kind == PurityKind.Impure || !verdict.WrittenParameters.IsEmpty)
                    {
                        return false;
                    }

                    break;
            }
        }

        return true;
    }

    private Purity Inspect(IOperation op, IMethodSymbol owner, int depth, HashSet<int> written)
    {
        switch (op)
        {
            case IAssignmentOperation assignment when WritesOutside(assignment.Target, written, out string what):
                return new Purity(PurityKind.Impure, "writes " + what, assignment.Syntax.GetLocation());
            case IIncrementOrDecrementOperation increment when WritesOutside(increment.Target, written, out string what):
                return new Purity(PurityKind.Impure, "writes " + what, increment.Syntax.GetLocation());
            case IInvocationOperation invocation:
            {
                var callee = invocation.TargetMethod;
                if (SymbolEqualityComparer.Default.Equals(callee.OriginalDefinition, owner.OriginalDefinition))
                {
                    return Purity.Pure;
                }

                var verdict = Classify(callee, depth + 1);
                if (verdict.Kind == PurityKind.Impure)
                {
                    return new Purity(PurityKind.Impure, "calls `" + callee.Name + "`, which " + verdict.Reason, invocation.Syntax.GetLocation());
                }

                // The callee hands results back through ref/out parameters: pure here when what is
                // passed there is this method's own (a local, a discard, or its own out parameter).
                foreach (var argument in invocation.Arguments)
                {
                    if (argument.Parameter is { } parameter && verdict.WrittenParameters.Contains(parameter.Ordinal)
                        && WritesOutside(argument.Value, written, out string what))
                    {
                        return new Purity(PurityKind.Impure, "passes " + what + " to `" + callee.Name + "`, which writes it", argument.Syntax.GetLocation());
                    }
                }

                return Purity.Pure;
            }

            default:
                return Purity.Pure;
        }
    }

    /// <summary>
    /// True when writing <paramref name="target"/> changes state outside the method. Its own
    /// ref/out parameters are recorded in <paramref name="written"/> instead: results for the caller.
    /// </summary>
    private static bool WritesOutside(IOperation target, HashSet<int> written, out string what)
    {
        what = "`" + target.Syntax + "`";
        switch (target)
        {
            case IDiscardOperation or IDeclarationExpressionOperation:
                return false;
            case ILocalReferenceOperation local:
                return local.Local.IsRef;
            case IParameterReferenceOperation parameter:
                if (parameter.Parameter.RefKind is RefKind.Ref or RefKind.Out)
                {
                    written.Add(parameter.Parameter.Ordinal);
                }

                return false;
            case IFieldReferenceOperation { Instance: IInstanceReferenceOperation { ReferenceKind: InstanceReferenceKind.ImplicitReceiver } }:
                // A member set in an object initializer (`new State { Depth = … }`): the new value's own.
                return false;
            case IPropertyReferenceOperation { Instance: IInstanceReferenceOperation { ReferenceKind: InstanceReferenceKind.ImplicitReceiver }, Property.IsIndexer: false }:
                return false;
            case IFieldReferenceOperation field:
                if (field.Field.IsStatic)
                {
                    what = "the static field `" + field.Field.Name + "`";
                    return true;
                }

                // A field of a struct local being built is the method's own state.
                if (field.Instance is ILocalReferenceOperation { Local.IsRef: false } or IFieldReferenceOperation { Instance: ILocalReferenceOperation { Local.IsRef: false } })
                {
                    return false;
                }

                what = "the field `" + field.Field.Name + "`";
                return true;
            case IArrayElementReferenceOperation element:
                return !(element.ArrayReference is ILocalReferenceOperation { Local.IsRef: false } local2 && CreatedLocally(local2.Local));
            case IPropertyReferenceOperation property:
                return !(property.Instance is ILocalReferenceOperation { Local.IsRef: false } && !property.Property.IsIndexer);
            default:
                return true;
        }
    }

    /// <summary>A local array the method created itself (scratch space) is its own state.</summary>
    private static bool CreatedLocally(ILocalSymbol local) =>
        local.DeclaringSyntaxReferences.Any(r => r.GetSyntax() is Microsoft.CodeAnalysis.CSharp.Syntax.VariableDeclaratorSyntax
        {
            Initializer.Value: Microsoft.CodeAnalysis.CSharp.Syntax.ArrayCreationExpressionSyntax
                or Microsoft.CodeAnalysis.CSharp.Syntax.ImplicitArrayCreationExpressionSyntax
                or Microsoft.CodeAnalysis.CSharp.Syntax.StackAllocArrayCreationExpressionSyntax
                or Microsoft.CodeAnalysis.CSharp.Syntax.ImplicitStackAllocArrayCreationExpressionSyntax,
        });

    private bool IsTrustedMetadata(IMethodSymbol method)
    {
        var type = method.ContainingType;
        if (type is null)
        {
            return false;
        }

        var ns = type.ContainingNamespace;
        if (type.Name is "Math" or "MathF" or "Double" or "Single" or "Int32" or "Int64" or "Span" or "ReadOnlySpan" or "MemoryExtensions"
            && SymbolNames.IsNamespace(ns, "System"))
        {
            return true;
        }

        if (SymbolNames.IsWithinNamespace(ns, "System.Numerics"))
        {
            return true;
        }

        return IsGeometryValue(type) || (method.MethodKind == MethodKind.PropertyGet && SymbolNames.IsNamespace(ns, "FvGen.Fields"));
    }

    private bool IsGeometryValue(INamedTypeSymbol type)
    {
        if (_geometryValue is null)
        {
            return false;
        }

        foreach (var attribute in type.OriginalDefinition.GetAttributes())
        {
            if (SymbolEqualityComparer.Default.Equals(attribute.AttributeClass, _geometryValue))
            {
                return true;
            }
        }

        return false;
    }
}
