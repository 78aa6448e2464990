using System.Collections.Immutable;
using System.Linq;
using FvGen.Analyzers.Conservation;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// A pure helper handing its results back through <c>out</c> parameters into locals of the loop (a
/// user reconstruction: <c>Reconstruct(in u[l], in u[r], out var leftFace, out var rightFace)</c>). Each
/// result is a function of the other arguments only, so each out local is bound to an uninterpreted
/// call of its own (<c>Reconstruct:leftFace(u[l], u[r])</c>), compared structurally like any call.
/// </summary>
internal sealed partial class LoopNestReader
{
    private void ReadOutCall(IInvocationOperation invocation)
    {
        var method = invocation.TargetMethod;
        string shown = method.ToDisplayString(SymbolDisplayFormat.CSharpShortErrorMessageFormat);
        var purity = _method.Purity.Classify(method);
        if (purity.Kind == PurityKind.Unknown)
        {
            throw new NotModelledException($"it calls `{shown}`, whose body the checker cannot see", invocation.Syntax);
        }

        if (purity.Kind == PurityKind.Impure)
        {
            throw new NotModelledException($"the call of `{shown}` has an effect beyond its out parameters: it {purity.Reason}", invocation.Syntax);
        }

        if (!method.IsStatic)
        {
            throw new NotModelledException($"the call of `{shown}` hands back results through out parameters from an instance, whose state the checker does not follow", invocation.Syntax);
        }

        string function = method.MethodKind == MethodKind.LocalFunction || SymbolEqualityComparer.Default.Equals(method.ContainingType, _method.ContainingType)
            ? method.Name
            : method.ContainingType.Name + "." + method.Name;
        var ordered = invocation.Arguments.OrderBy(a => a.Parameter?.Ordinal ?? 0).ToList();
        var inputs = ordered
            .Where(a => a.Parameter?.RefKind is not RefKind.Out)
            .Select(a => a.Parameter?.RefKind is RefKind.Ref || a.ArgumentKind == ArgumentKind.ParamArray
                ? throw new NotModelledException($"the call `{ExpressionReader.Short(invocation.Syntax)}` passes an argument by reference or as a params array", a.Syntax)
                : _reader.Read(a.Value).StripOrigins())
            .ToImmutableArray();
        int origin = _method.Origins.Add(invocation.Syntax);
        foreach (var argument in ordered.Where(a => a.Parameter?.RefKind is RefKind.Out))
        {
            var target = argument.Value is IDeclarationExpressionOperation declaration ? declaration.Expression : argument.Value;
            switch (target)
            {
                case IDiscardOperation:
                    continue;
                case ILocalReferenceOperation { Local.IsRef: false } local:
                    var call = new CallExpr(function + ":" + argument.Parameter!.Name, inputs, CallSymmetry.None);
                    _reader.Bindings[local.Local] = new ValueBinding(
                        inputs.All(i => i.IsInvariant) ? SumExpr.Invariant(SymPoly.Symbol(call.Render())) : SumExpr.Factor(call, origin));
                    continue;
                default:
                    throw new NotModelledException($"the call `{ExpressionReader.Short(invocation.Syntax)}` hands a result back into `{ExpressionReader.Short(target.Syntax)}`, not into a local", argument.Syntax);
            }
        }
    }
}
