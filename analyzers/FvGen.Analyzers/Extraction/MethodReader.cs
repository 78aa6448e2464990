using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using FvGen.Analyzers.Conservation;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// Reads one method: walks its statements in order (binding locals declared outside loops), finds
/// the loop nests, tells definitions (loops filling arrays that later loops read: face data) from
/// updates, reads each update and runs the balance. Returns every issue with its location.
/// </summary>
internal static class MethodReader
{
    // Records, not tuples: see DEVELOPERS.md, "Precompiled analyzer".
    private sealed record PendingBody(IOperation Body, MethodContext Context);

    /// <summary>A loop nest of a body, with the bindings of the code before it.</summary>
    private sealed record Nest(IOperation Loop, Dictionary<ISymbol, Binding> Outer);

    /// <summary>The arrays a nest writes, reads and differences, and whether it only assigns its elements.</summary>
    private sealed record NestAccesses(HashSet<string> Written, HashSet<string> Read, HashSet<string> Differenced, bool OnlyAssigned);

    public static IReadOnlyList<ConservationIssue> Analyze(IOperation body, MethodContext method)
    {
        var pending = new Queue<PendingBody>();
        pending.Enqueue(new PendingBody(body, method));
        while (pending.Count > 0)
        {
            var (next, context) = pending.Dequeue();
            var localFunctions = new List<ILocalFunctionOperation>();
            AnalyzeBody(next, context, localFunctions);
            foreach (var localFunction in localFunctions)
            {
                if (localFunction.Body is { } localBody)
                {
                    // Its own face arrays and bindings; the issues go to the same list.
                    pending.Enqueue(new PendingBody(localBody, context.ForLocalFunction(FaceParametersOf(localFunction.Symbol, next, context))));
                }
            }
        }

        return method.Issues;
    }

    /// <summary>The parameters of a local function to which every call in <paramref name="body"/> passes face data.</summary>
    private static IEnumerable<IParameterSymbol> FaceParametersOf(IMethodSymbol localFunction, IOperation body, MethodContext context)
    {
        var calls = context.Operations.Descendants(body).OfType<IInvocationOperation>()
            .Where(i => SymbolEqualityComparer.Default.Equals(i.TargetMethod.OriginalDefinition, localFunction.OriginalDefinition))
            .ToList();
        if (calls.Count == 0)
        {
            yield break;
        }

        var reader = new ExpressionReader(context, new Dictionary<ISymbol, Binding>(SymbolEqualityComparer.Default));
        foreach (var parameter in localFunction.Parameters)
        {
            bool face = calls.All(call =>
            {
                var argument = call.Arguments.FirstOrDefault(a => SymbolEqualityComparer.Default.Equals(a.Parameter, parameter));
                if (argument is null)
                {
                    return false;
                }

                try
                {
                    return reader.ArrayRoot(argument.Value).Role != DataRole.Cell;
                }
                catch (NotModelledException)
                {
                    return false;
                }
            });
            if (face)
            {
                yield return parameter;
            }
        }
    }

    private static void AnalyzeBody(IOperation body, MethodContext method, List<ILocalFunctionOperation> localFunctions)
    {
        var nests = new List<Nest>();
        var outer = new Dictionary<ISymbol, Binding>(SymbolEqualityComparer.Default);
        foreach (var (name, values) in ConstantTables.Find(body, method.Operations))
        {
            method.ConstantTables[name] = values;
        }

        Walk(body, outer, nests, method, localFunctions);

        // What each nest writes and reads is needed twice (to mark definitions, then to skip them): read once.
        var accesses = nests.Select(n => Accesses(n.Loop, n.Outer, method)).ToList();
        MarkDefinitions(nests, accesses, method);
        for (int k = 0; k < nests.Count; k++)
        {
            var (loop, bindings) = nests[k];
            if (IsDefinition(accesses[k], method) || !WritesElements(loop, method.Operations))
            {
                // A definition fills face data; a loop writing no array element (a reduction such as
                // the largest wave speed) updates nothing that could be conservative or not.
                continue;
            }

            try
            {
                var update = new LoopNestReader(method, bindings).Read(loop);
                foreach (var finding in BalanceChecker.Check(update))
                {
                    method.Issues.Add(ToIssue(finding, method.Origins, loop.Syntax));
                }
            }
            catch (NotModelledException e)
            {
                method.ReportNotAnalyzed(e.Message, e.Where ?? loop.Syntax);
            }
            catch (ModelLimitException e)
            {
                method.ReportNotAnalyzed(e.Message, method.Origins[e.Origin] ?? loop.Syntax.GetLocation());
            }
        }
    }

    private static void Walk(IOperation? operation, Dictionary<ISymbol, Binding> outer, List<Nest> nests, MethodContext method, List<ILocalFunctionOperation> localFunctions)
    {
        switch (operation)
        {
            case null:
                return;
            case IMethodBodyOperation methodBody:
                Walk(methodBody.BlockBody ?? methodBody.ExpressionBody, outer, nests, method, localFunctions);
                return;
            case IBlockOperation block:
                foreach (var s in block.Operations)
                {
                    Walk(s, outer, nests, method, localFunctions);
                }

                return;
            case IVariableDeclarationGroupOperation group:
                foreach (var declarator in group.Declarations.SelectMany(d => d.Declarators))
                {
                    var initializer = declarator.GetVariableInitializer();
                    outer[declarator.Symbol] = initializer is null
                        ? new UnknownBinding($"the local `{declarator.Symbol.Name}` has no value before the loop")
                        : BindOuter(declarator.Symbol, initializer.Value, outer, method);
                }

                return;
            case IExpressionStatementOperation { Operation: ISimpleAssignmentOperation { Target: ILocalReferenceOperation local } assignment }:
                outer[local.Local] = BindOuter(local.Local, assignment.Value, outer, method);
                return;
            case IExpressionStatementOperation expression when LoopNestReader.IsLoop(expression.Operation, method.Known):
                AddNest(expression.Operation, outer, nests, method.Operations);
                return;
            case IForLoopOperation or IForEachLoopOperation when SwitchesAmongLoops(operation, method) || RunsOverDescriptors(operation, method):
                // A loop over boundary patches (by index with a `switch` picking each patch's face loop,
                // or over the patch descriptors themselves): each inner face loop is checked on its own,
                // for any value of the patch (a symbol here).
                foreach (var local in LoopLocals(operation).Concat(AssignedLocals(operation, method.Operations)))
                {
                    outer[local] = new ValueBinding(SumExpr.Invariant(SymPoly.Symbol(local.Name)));
                }

                Walk(operation is IForLoopOperation f ? f.Body : ((IForEachLoopOperation)operation).Body, outer, nests, method, localFunctions);
                return;
            case IForLoopOperation or IForEachLoopOperation:
                AddNest(operation, outer, nests, method.Operations);
                return;
            case ISwitchOperation switchOperation:
                foreach (var section in switchOperation.Cases)
                {
                    foreach (var statement in section.Body)
                    {
                        Walk(statement, outer, nests, method, localFunctions);
                    }
                }

                return;
            case IWhileLoopOperation loop:
                // A time or iteration loop around the kernels: its body is read like the method's.
                foreach (var local in AssignedLocals(loop, method.Operations))
                {
                    outer[local] = local.Type is IArrayTypeSymbol || method.Known.IsSpan(local.Type)
                        ? new ArrayBinding(local.Name, DataRole.Cell)
                        : new ValueBinding(SumExpr.Invariant(SymPoly.Symbol(local.Name)));
                }

                Walk(loop.Body, outer, nests, method, localFunctions);
                return;
            case IConditionalOperation conditional:
                Walk(conditional.WhenTrue, outer, nests, method, localFunctions);
                Walk(conditional.WhenFalse, outer, nests, method, localFunctions);
                return;
            case IUsingOperation usingOperation:
                Walk(usingOperation.Body, outer, nests, method, localFunctions);
                return;
            case ITryOperation tryOperation:
                Walk(tryOperation.Body, outer, nests, method, localFunctions);
                return;
            case ILocalFunctionOperation localFunction:
                // Loops inside a local function (the generator puts its face loops in one) are checked
                // like the method's own; its parameters are unbound, like a method's.
                localFunctions.Add(localFunction);
                return;
        }
    }

    private static void AddNest(IOperation loop, Dictionary<ISymbol, Binding> outer, List<Nest> nests, OperationIndex operations)
    {
        nests.Add(new Nest(loop, new Dictionary<ISymbol, Binding>(outer, SymbolEqualityComparer.Default)));

        // A local the loop assigns (a reduction such as the largest wave speed) is, after it, a symbol.
        foreach (var local in AssignedLocals(loop, operations))
        {
            if (outer.ContainsKey(local))
            {
                outer[local] = new ValueBinding(SumExpr.Invariant(SymPoly.Symbol(local.Name)));
            }
        }
    }

    private static Binding BindOuter(ILocalSymbol local, IOperation value, Dictionary<ISymbol, Binding> outer, MethodContext method)
    {
        var reader = new ExpressionReader(method, new Dictionary<ISymbol, Binding>(outer, SymbolEqualityComparer.Default));
        try
        {
            if (IsIndexedTable(local.Type))
            {
                // A list of descriptors read by index (the mesh's boundary patches): data, not a value.
                return new ArrayBinding(local.Name, DataRole.Cell);
            }

            if (local.Type is IArrayTypeSymbol || method.Known.IsSpan(local.Type) || method.Known.IsCellField(local.Type) || method.Known.IsFaceField(local.Type))
            {
                var created = value;
                while (created is IConversionOperation conversion)
                {
                    // `Span<double> flux = new double[n + 1];` converts a fresh array.
                    created = conversion.Operand;
                }

                // `stackalloc double[n]` has no operation kind of its own; its syntax says it is a fresh buffer.
                if (created is IArrayCreationOperation or IObjectCreationOperation || created is IInvocationOperation { TargetMethod.Name: not "AsSpan" }
                    || created.Syntax is StackAllocArrayCreationExpressionSyntax or ImplicitStackAllocArrayCreationExpressionSyntax)
                {
                    return new ArrayBinding(local.Name, method.Known.IsFaceField(local.Type) ? DataRole.Face : DataRole.Cell);
                }

                var (root, role) = reader.ArrayRoot(value);
                return new ArrayBinding(root, role);
            }

            var result = reader.Read(value);
            return result.IsInvariant ? new ValueBinding(result) : new ValueBinding(SumExpr.Invariant(SymPoly.Symbol(local.Name)));
        }
        catch (NotModelledException)
        {
            // Not needed unless a loop reads it; then the loop says why it could not.
            return new ValueBinding(SumExpr.Invariant(SymPoly.Symbol(local.Name)));
        }
        catch (ModelLimitException)
        {
            return new ValueBinding(SumExpr.Invariant(SymPoly.Symbol(local.Name)));
        }
    }

    /// <summary>True when the loop's body holds a <c>switch</c> whose sections hold loops.</summary>
    private static bool SwitchesAmongLoops(IOperation loop, MethodContext method) =>
        method.Operations.Descendants(loop).OfType<ISwitchOperation>().Any(s => method.Operations.Descendants(s).Any(d => LoopNestReader.IsLoop(d, method.Known)));

    /// <summary>True for a <c>foreach</c> over non-index elements (<c>BoundaryPatch</c>) whose body holds loops.</summary>
    private static bool RunsOverDescriptors(IOperation loop, MethodContext method) =>
        loop is IForEachLoopOperation { Locals.Length: > 0 } each
        && !ExpressionReader.IsIntegral(each.Locals[0].Type)
        && method.Operations.DescendantsAndSelf(each.Body).Any(d => LoopNestReader.IsLoop(d, method.Known));

    private static IEnumerable<ILocalSymbol> LoopLocals(IOperation loop) => loop switch
    {
        IForLoopOperation f => f.Locals,
        IForEachLoopOperation fe => fe.Locals,
        _ => Enumerable.Empty<ILocalSymbol>(),
    };

    /// <summary>A read-only list type with an integer indexer (<c>IReadOnlyList&lt;BoundaryPatch&gt;</c>), not an array or span.</summary>
    private static bool IsIndexedTable(ITypeSymbol type) =>
        type is INamedTypeSymbol { TypeKind: TypeKind.Interface or TypeKind.Class } named
        && named.Arity == 1
        && (named.Name is "IReadOnlyList" or "IList" or "List" && SymbolNames.IsType(named, "System.Collections.Generic", named.Name, 1)
            || SymbolNames.IsType(named, "System.Collections.ObjectModel", "ReadOnlyCollection", 1));

    /// <summary>
    /// A loop is a definition (it fills face data) when every array it writes is assigned, not
    /// incremented, and a later loop of the method reads it at a subscript that loop does not write
    /// (<c>flux[i + 1] - flux[i]</c> into <c>r[i]</c>, or <c>faceFlux[f]</c> scattered to
    /// <c>res[left[f]]</c>); those arrays are face data from then on. An array a later loop reads only
    /// at the cell it writes (a residual used by an update) stays cell data, and the loop that fills
    /// it is checked as an update.
    /// </summary>
    private static void MarkDefinitions(List<Nest> nests, List<NestAccesses> accesses, MethodContext method)
    {

        // From the last loop back: arrays read by a later definition (face states feeding a flux pass)
        // are intermediate face data too, whatever subscript that definition reads them at.
        var readByDefinitions = new HashSet<string>(System.StringComparer.Ordinal);
        for (int k = nests.Count - 1; k >= 0; k--)
        {
            var (written, read, _, onlyAssigned) = accesses[k];
            if (written.Count == 0 || !onlyAssigned)
            {
                continue;
            }

            // A later loop that writes the array it differences sweeps it in place: it does not read face data.
            var readLater = new HashSet<string>(accesses.Skip(k + 1).SelectMany(a => a.Differenced.Where(d => !a.Written.Contains(d))), System.StringComparer.Ordinal);
            readLater.UnionWith(readByDefinitions);
            if (written.All(readLater.Contains) && !written.Any(read.Contains))
            {
                readByDefinitions.UnionWith(read);
                bool twoSided = MapsUsed(nests[k].Loop, method.Operations) > 1;
                foreach (var w in written)
                {
                    method.FaceArrays.Add(w);
                    if (twoSided)
                    {
                        method.InteriorFaceArrays.Add(w);
                    }
                }
            }
        }
    }

    private static bool IsDefinition(NestAccesses access, MethodContext method)
    {
        var (written, _, _, onlyAssigned) = access;
        return written.Count > 0 && onlyAssigned && written.All(method.FaceArrays.Contains);
    }

    private static NestAccesses Accesses(IOperation loop, Dictionary<ISymbol, Binding> outer, MethodContext method)
    {
        var reader = new ExpressionReader(method, outer);
        var written = new HashSet<string>(System.StringComparer.Ordinal);
        var read = new HashSet<string>(System.StringComparer.Ordinal);
        bool onlyAssigned = true;
        var assignedElements = new List<SyntaxNode>();
        var targets = new HashSet<IOperation>();
        foreach (var op in method.Operations.Descendants(loop))
        {
            var target = WrittenTarget.Of(op);
            if (target is null)
            {
                continue;
            }

            var root = RootOf(target, reader);
            if (root is not null)
            {
                written.Add(root);
                targets.Add(target);

                // A compound write to an element this loop assigned before it (`s[i] = a; s[i] += b;`)
                // still only fills the element with a value of this iteration.
                // (Compared as syntax, and only when a compound write comes: most loops have none.)
                if (op is ISimpleAssignmentOperation)
                {
                    assignedElements.Add(target.Syntax);
                }
                else if (onlyAssigned)
                {
                    onlyAssigned = assignedElements.Exists(e => Microsoft.CodeAnalysis.CSharp.SyntaxFactory.AreEquivalent(e, target.Syntax));
                }

                // `flux[f].Density = …` writes the element `flux[f]`; it does not read it.
                for (var t = target; t is IFieldReferenceOperation { Instance: { } instance }; t = instance)
                {
                    targets.Add(instance);
                }
            }
        }

        var subscripts = new Dictionary<string, HashSet<string>>(System.StringComparer.Ordinal);
        foreach (var op in method.Operations.Descendants(loop))
        {
            if (op is IArrayElementReferenceOperation or IPropertyReferenceOperation { Property.IsIndexer: true } && !targets.Contains(op) && RootOf(op, reader) is { } root)
            {
                read.Add(root);
                string index = SubscriptText(op);
                if (!subscripts.TryGetValue(root, out var set))
                {
                    subscripts[root] = set = new HashSet<string>(System.StringComparer.Ordinal);
                }

                set.Add(index);
            }
        }

        var writtenAt = new HashSet<string>(targets.Select(SubscriptText), System.StringComparer.Ordinal);
        // Read at a subscript the loop does not write, or (a face loop writing two cells) at two of the
        // cells it writes: each of those cells then reads the array at its neighbour (`g[left]` and
        // `g[right]` feeding the flux given to `r[left]` and `r[right]`).
        var differenced = new HashSet<string>(
            subscripts.Where(s => s.Value.Any(i => !writtenAt.Contains(i)) || (writtenAt.Count > 1 && s.Value.Count > 1)).Select(s => s.Key),
            System.StringComparer.Ordinal);
        return new NestAccesses(written, read, differenced, onlyAssigned);
    }

    private static bool WritesElements(IOperation loop, OperationIndex operations) =>
        operations.Descendants(loop).Any(op => WrittenTarget.Of(op) is { } target && IsElementTarget(target));

    private static bool IsElementTarget(IOperation target)
    {
        while (target is IFieldReferenceOperation { Instance: { } instance })
        {
            target = instance;
        }

        return target is IArrayElementReferenceOperation or IPropertyReferenceOperation { Property.IsIndexer: true }
            || (target is ILocalReferenceOperation local && local.Local.IsRef);
    }

    /// <summary>How many distinct index maps the loop reads cells through (<c>u[left[f]]</c>, <c>u[right[f]]</c>: two).</summary>
    private static int MapsUsed(IOperation loop, OperationIndex operations)
    {
        var maps = new HashSet<string>(System.StringComparer.Ordinal);
        foreach (var op in operations.Descendants(loop))
        {
            var indices = op switch
            {
                IArrayElementReferenceOperation e => e.Indices.ToList(),
                IPropertyReferenceOperation { Property.IsIndexer: true } p => p.Arguments.Select(a => a.Value).ToList(),
                _ => new List<IOperation>(),
            };
            foreach (var index in indices)
            {
                var inner = index is IConversionOperation c ? c.Operand : index;
                if (inner is IArrayElementReferenceOperation or IPropertyReferenceOperation { Property.IsIndexer: true })
                {
                    maps.Add(SubscriptText(inner) + "@" + inner.Syntax.ToString().Split('[')[0]);
                }
                else if (inner is ILocalReferenceOperation local)
                {
                    maps.Add("local:" + local.Local.Name);
                }
            }
        }

        return maps.Count(m => !m.StartsWith("local:", System.StringComparison.Ordinal)) > 1 ? 2 : maps.Count(m => m.StartsWith("local:", System.StringComparison.Ordinal)) > 1 ? 2 : 1;
    }

    private static string SubscriptText(IOperation element)
    {
        while (element is IFieldReferenceOperation { Instance: { } instance })
        {
            element = instance;
        }

        return element switch
        {
            IArrayElementReferenceOperation e => string.Join(",", e.Indices.Select(i => i.Syntax.ToString().Replace(" ", string.Empty))),
            IPropertyReferenceOperation p => string.Join(",", p.Arguments.Select(a => a.Value.Syntax.ToString().Replace(" ", string.Empty))),
            _ => string.Empty,
        };
    }

    private static string? RootOf(IOperation target, ExpressionReader reader)
    {
        while (target is IFieldReferenceOperation { Instance: { } instance })
        {
            target = instance;
        }

        try
        {
            return target switch
            {
                IArrayElementReferenceOperation e => reader.ArrayRoot(Innermost(e)).Root,
                IPropertyReferenceOperation { Property.IsIndexer: true, Instance: { } instance } => reader.ArrayRoot(instance).Root,
                _ => null,
            };
        }
        catch (NotModelledException)
        {
            return null;
        }
    }

    private static IOperation Innermost(IArrayElementReferenceOperation element) =>
        element.ArrayReference is IArrayElementReferenceOperation inner ? Innermost(inner) : element.ArrayReference;

    private static IEnumerable<ILocalSymbol> AssignedLocals(IOperation loop, OperationIndex operations) =>
        operations.Descendants(loop)
            .Select(WrittenTarget.Of)
            .OfType<ILocalReferenceOperation>()
            .Select(l => l.Local)
            .Distinct(SymbolEqualityComparer.Default)
            .Cast<ILocalSymbol>();

    private static ConservationIssue ToIssue(Finding finding, OriginTable origins, SyntaxNode loop)
    {
        var primary = finding.Primary.Select(o => origins[o]).Where(l => l is not null).Cast<Location>().ToList();
        var additional = finding.Additional.Select(o => origins[o]).Where(l => l is not null).Cast<Location>().ToList();
        var location = primary.FirstOrDefault() ?? loop.GetLocation();
        var rest = primary.Skip(1).Concat(additional).Where(l => l != location).Distinct().ToImmutableArray();
        string id = finding.Kind switch
        {
            FindingKind.DroppedFaceTerm => DiagnosticIds.DroppedFaceTerm,
            FindingKind.UnbalancedFaceTerm => DiagnosticIds.UnbalancedFaceTerm,
            FindingKind.MismatchedFluxEvaluations => DiagnosticIds.MismatchedFluxEvaluations,
            FindingKind.OneSidedScatter => DiagnosticIds.OneSidedScatter,
            _ => DiagnosticIds.InPlaceSweep,
        };
        var properties = finding.Properties;
        if (origins[finding.WriteOrigin] is { } write)
        {
            properties = properties
                .SetItem(FindingProperties.WriteStart, write.SourceSpan.Start.ToString(System.Globalization.CultureInfo.InvariantCulture))
                .SetItem(FindingProperties.WriteLength, write.SourceSpan.Length.ToString(System.Globalization.CultureInfo.InvariantCulture));
        }

        return new ConservationIssue(id, finding.Arguments, location, rest, properties);
    }
}
