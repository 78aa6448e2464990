using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using FvGen.Analyzers.Conservation;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// Reads one loop nest (<c>for</c> with one or several variables, <c>foreach</c> over indices,
/// <c>Parallel.For</c>/<c>ForEach</c> lambdas, nested up to three levels) into a
/// <see cref="LoopUpdate"/>: the iteration space and the writes of its body in program order.
/// </summary>
internal sealed partial class LoopNestReader
{
    /// <summary>Three spatial levels plus one enclosing loop (a time or stage loop) are read; deeper is not modelled.</summary>
    public const int MaxDepth = 4;

    private readonly MethodContext _method;
    private readonly ExpressionReader _reader;
    private readonly List<LoopVariable> _variables = new();
    private readonly List<UpdateWrite> _writes = new();
    private bool _parallel;
    private int _depth;

    // Records, not tuples, here and elsewhere in the analyzer: see DEVELOPERS.md, "Precompiled analyzer".
    private sealed record LoopStep(ILocalSymbol Local, long Step);

    private sealed record LoopCopy(ILocalSymbol Copy, ILocalSymbol Of, int Order);

    private sealed record LocalWrite(IOperation Operation, ILocalSymbol Local);

    public LoopNestReader(MethodContext method, Dictionary<ISymbol, Binding> outer)
    {
        _method = method;
        _reader = new ExpressionReader(method, new Dictionary<ISymbol, Binding>(outer, SymbolEqualityComparer.Default));
    }

    public LoopUpdate Read(IOperation loop)
    {
        foreach (var carried in AssignedOuterLocals(loop))
        {
            _reader.Bindings[carried] = new UnknownBinding($"the local `{carried.Name}` is assigned inside the loop and carried across iterations");
        }

        ReadLoop(loop);
        return new LoopUpdate(new LoopSpace(_variables.ToImmutableArray()), _writes.ToImmutableArray(), _parallel);
    }

    public static bool IsLoop(IOperation operation, KnownSymbols known) =>
        operation is IForLoopOperation or IForEachLoopOperation || ParallelLambda(operation, known, out _, out _);

    private void ReadLoop(IOperation loop)
    {
        if (++_depth > MaxDepth)
        {
            throw new NotModelledException($"loops are nested deeper than {MaxDepth} levels", loop.Syntax);
        }

        if (_depth > 1)
        {
            var accumulated = AssignedOuterLocals(loop).ToList();
            if (accumulated.Count > 0 && TryReadGather(loop, accumulated))
            {
                // A cell summing its faces from the cell-to-face list: read as the face loop it is.
                _depth--;
                return;
            }

            // Any other local of the outer level accumulated by an inner loop is a reduction over that
            // loop, not one value per iteration.
            foreach (var carried in accumulated)
            {
                _reader.Bindings[carried] = new UnknownBinding($"the local `{carried.Name}` is accumulated over the inner loop (a reduction the checker does not model)");
            }
        }

        switch (loop)
        {
            case IForLoopOperation f:
                BindFor(f);
                ReadStatement(f.Body);
                break;
            case IForEachLoopOperation fe:
                BindForEach(fe);
                ReadStatement(fe.Body);
                break;
            default:
                if (!ParallelLambda(loop, _method.Known, out var lambda, out bool isForEach) || lambda is null)
                {
                    throw new NotModelledException("the loop form is not one the checker reads", loop.Syntax);
                }

                _parallel = true;
                var index = lambda.Symbol.Parameters.FirstOrDefault() ?? throw new NotModelledException("the parallel body takes no index", loop.Syntax);
                if (isForEach)
                {
                    BindCollectionVariable(index, ((IInvocationOperation)Unwrap(loop)).Arguments[0].Value, loop.Syntax);
                }
                else
                {
                    AddVariable(index, 1, LoopVariableKind.Lattice);
                }

                ReadStatement(lambda.Body);
                break;
        }

        _depth--;
    }

    /// <summary>Recognises <c>Parallel.For(from, to, i =&gt; …)</c> and <c>Parallel.ForEach(items, f =&gt; …)</c>.</summary>
    private static bool ParallelLambda(IOperation operation, KnownSymbols known, out IAnonymousFunctionOperation? lambda, out bool isForEach)
    {
        lambda = null;
        isForEach = false;
        if (Unwrap(operation) is not IInvocationOperation invocation
            || known.Parallel is null
            || !SymbolEqualityComparer.Default.Equals(invocation.TargetMethod.ContainingType, known.Parallel)
            || invocation.TargetMethod.Name is not ("For" or "ForEach"))
        {
            return false;
        }

        isForEach = invocation.TargetMethod.Name == "ForEach";
        var body = invocation.Arguments.LastOrDefault()?.Value;
        while (body is IDelegateCreationOperation creation)
        {
            body = creation.Target;
        }

        lambda = body as IAnonymousFunctionOperation;
        return true;
    }

    private static IOperation Unwrap(IOperation operation) => operation is IExpressionStatementOperation s ? s.Operation : operation;

    private void BindFor(IForLoopOperation loop)
    {
        var initial = new Dictionary<ILocalSymbol, IOperation>(SymbolEqualityComparer.Default);
        foreach (var before in loop.Before)
        {
            switch (before)
            {
                case IVariableDeclarationGroupOperation group:
                    foreach (var declarator in group.Declarations.SelectMany(d => d.Declarators))
                    {
                        if (declarator.GetVariableInitializer()?.Value is { } value)
                        {
                            initial[declarator.Symbol] = value;
                        }
                    }

                    break;
                case IExpressionStatementOperation { Operation: ISimpleAssignmentOperation { Target: ILocalReferenceOperation local } assignment }:
                    initial[local.Local] = assignment.Value;
                    break;
            }
        }

        var steps = new List<LoopStep>();
        var copies = new List<LoopCopy>();
        int order = 0;
        foreach (var bottom in loop.AtLoopBottom)
        {
            var op = Unwrap(bottom);
            switch (op)
            {
                case IIncrementOrDecrementOperation { Target: ILocalReferenceOperation local } step:
                    steps.Add(new LoopStep(local.Local, step.Kind == OperationKind.Increment ? 1 : -1));
                    break;
                case ICompoundAssignmentOperation { Target: ILocalReferenceOperation local, Value.ConstantValue: { HasValue: true, Value: int c } } compound
                    when compound.OperatorKind is BinaryOperatorKind.Add or BinaryOperatorKind.Subtract:
                    steps.Add(new LoopStep(local.Local, compound.OperatorKind == BinaryOperatorKind.Add ? c : -c));
                    break;
                case ISimpleAssignmentOperation
                {
                    Target: ILocalReferenceOperation self,
                    Value: IBinaryOperation { OperatorKind: BinaryOperatorKind.Add or BinaryOperatorKind.Subtract, LeftOperand: ILocalReferenceOperation again, RightOperand.ConstantValue: { HasValue: true, Value: int c } } step,
                } when SymbolEqualityComparer.Default.Equals(self.Local, again.Local):
                    steps.Add(new LoopStep(self.Local, step.OperatorKind == BinaryOperatorKind.Add ? c : -c));
                    break;
                case ISimpleAssignmentOperation { Target: ILocalReferenceOperation copy, Value: ILocalReferenceOperation of }:
                    copies.Add(new LoopCopy(copy.Local, of.Local, order));
                    break;
                default:
                    throw new NotModelledException($"the loop advances with `{ExpressionReader.Short(op.Syntax)}`, not by a constant step", op.Syntax);
            }

            order++;
        }

        if (steps.Count == 0 || steps.Any(s => s.Step == 0))
        {
            throw new NotModelledException("no loop variable advances by a constant step", loop.Syntax);
        }

        var (primary, primaryStep) = steps[0];
        var index = AddVariable(primary, Math.Abs(primaryStep), LoopVariableKind.Lattice);
        // Where the loop starts matters only to variables stepped in lockstep with the first: a start
        // the checker cannot read (`u.GetLength(0) - 2` of a descending loop) is no reason to give up.
        var primaryStart = steps.Count > 1 && initial.TryGetValue(primary, out var p0) ? _reader.Read(p0) : null;
        foreach (var (local, step) in steps.Skip(1))
        {
            // Variables stepped in lockstep are affine in the first: v = v0 + (s_v / s_i)(i − i0).
            if (primaryStart is null || !primaryStart.IsInvariant || !initial.TryGetValue(local, out var v0) || _reader.Read(v0) is not { IsInvariant: true } start)
            {
                throw new NotModelledException($"the loop variable `{local.Name}` does not start at a loop-invariant value", loop.Syntax);
            }

            var ratio = SymPoly.Constant(Rational.Create(step, primaryStep));
            _reader.Bindings[local] = new ValueBinding(start + (index - primaryStart).Scale(ratio));
        }

        foreach (var (copy, of, copyOrder) in copies)
        {
            // `im = i, i++`: after the first iteration im trails i by one step.
            int stepOrder = loop.AtLoopBottom.ToList().FindIndex(b => Unwrap(b) is IIncrementOrDecrementOperation { Target: ILocalReferenceOperation l } && SymbolEqualityComparer.Default.Equals(l.Local, of));
            if (!_reader.Bindings.TryGetValue(of, out var ofBinding) || ofBinding is not ValueBinding ofValue)
            {
                throw new NotModelledException($"the loop variable `{copy.Name}` copies `{of.Name}`, which is not a loop variable", loop.Syntax);
            }

            var lag = stepOrder > copyOrder ? steps.First(s => SymbolEqualityComparer.Default.Equals(s.Local, of)).Step : 0;
            _reader.Bindings[copy] = new ValueBinding(ofValue.Value - SumExpr.Invariant(SymPoly.Constant(lag)));
        }

        foreach (var pair in initial)
        {
            if (!_reader.Bindings.ContainsKey(pair.Key) || _reader.Bindings[pair.Key] is UnknownBinding)
            {
                if (steps.Any(s => SymbolEqualityComparer.Default.Equals(s.Local, pair.Key)) || copies.Any(c => SymbolEqualityComparer.Default.Equals(c.Copy, pair.Key)))
                {
                    continue;
                }

                BindLocal(pair.Key, pair.Value);
            }
        }
    }

    private void BindForEach(IForEachLoopOperation loop)
    {
        var local = loop.Locals.FirstOrDefault() ?? throw new NotModelledException("the foreach loop declares no variable", loop.Syntax);
        BindCollectionVariable(local, loop.Collection, loop.Syntax);
    }

    private void BindCollectionVariable(ISymbol variable, IOperation collection, SyntaxNode where)
    {
        while (collection is IConversionOperation conversion)
        {
            collection = conversion.Operand;
        }

        var type = variable is ILocalSymbol l ? l.Type : variable is IParameterSymbol p ? p.Type : null;
        if (collection is IInvocationOperation { TargetMethod.Name: "Range" } range
            && SymbolEqualityComparer.Default.Equals(range.TargetMethod.ContainingType, _method.Known.Enumerable))
        {
            AddVariable(variable, 1, LoopVariableKind.Lattice);
            return;
        }

        if (!ExpressionReader.IsIntegral(type))
        {
            throw new NotModelledException($"the loop runs over `{type?.Name}` elements, not over cell or face indices", where);
        }

        AddVariable(variable, 1, LoopVariableKind.Set);
        _reader.ListVariables.Add(variable.Name);
    }

    private SumExpr AddVariable(ISymbol symbol, long step, LoopVariableKind kind)
    {
        string name = symbol.Name;
        if (!_variables.Any(v => v.Name == name))
        {
            // A sibling loop reusing the name ranges over the same lattice.
            _variables.Add(new LoopVariable(name, step, kind));
        }

        var value = SumExpr.Factor(ReadExpr.LoopIndex(name));
        _reader.Bindings[symbol] = new ValueBinding(value);
        return value;
    }

    private void ReadStatement(IOperation? statement)
    {
        switch (statement)
        {
            case null:
            case IEmptyOperation:
            case ILocalFunctionOperation:
                return;
            case IBlockOperation block:
                foreach (var s in block.Operations)
                {
                    ReadStatement(s);
                }

                return;
            case IVariableDeclarationGroupOperation group:
                foreach (var declarator in group.Declarations.SelectMany(d => d.Declarators))
                {
                    var initializer = declarator.GetVariableInitializer();
                    if (initializer is null)
                    {
                        _reader.Bindings[declarator.Symbol] = new UnknownBinding($"the local `{declarator.Symbol.Name}` is read before it is given a value");
                    }
                    else if (declarator.Symbol.IsRef)
                    {
                        _reader.Bindings[declarator.Symbol] = new RefBinding(_reader.ResolveElement(initializer.Value));
                    }
                    else
                    {
                        BindLocal(declarator.Symbol, initializer.Value);
                    }
                }

                return;
            case IForLoopOperation or IForEachLoopOperation:
                ReadLoop(statement);
                return;
            case IExpressionStatementOperation expression when ParallelLambda(expression.Operation, _method.Known, out _, out _):
                ReadLoop(expression.Operation);
                return;
            case IExpressionStatementOperation expression:
                ReadEffect(expression.Operation);
                return;
            case IConditionalOperation conditional:
                ReadIf(conditional);
                return;
            case IBranchOperation branch:
                throw new NotModelledException($"`{ExpressionReader.Short(branch.Syntax)}` skips part of the iteration space", branch.Syntax);
            case IReturnOperation { IsImplicit: true, ReturnedValue: null }:
                return;
            case IReturnOperation ret:
                throw new NotModelledException("the loop body returns early", ret.Syntax);
            default:
                throw new NotModelledException($"the statement `{ExpressionReader.Short(statement.Syntax)}` ({statement.Kind}) is outside what the checker models", statement.Syntax);
        }
    }

    private void ReadEffect(IOperation operation)
    {
        switch (operation)
        {
            case ISimpleAssignmentOperation { Target: ILocalReferenceOperation local } assignment when !local.Local.IsRef || assignment.IsRef:
                if (assignment.IsRef)
                {
                    _reader.Bindings[local.Local] = new RefBinding(_reader.ResolveElement(assignment.Value));
                }
                else
                {
                    BindLocal(local.Local, assignment.Value);
                }

                return;
            case ISimpleAssignmentOperation assignment when _reader.IsElementLike(assignment.Target):
                AddWrite(assignment.Target, _reader.Read(assignment.Value), isAssignment: true, assignment.Syntax);
                return;
            case ICompoundAssignmentOperation { Target: ILocalReferenceOperation { Local.IsRef: false } local }
                when _reader.Bindings.TryGetValue(local.Local, out var carried) && carried is UnknownBinding:
                // A reduction carried across iterations (a boundary-flux tally): it stays unknown, and a
                // write that reads it is reported with the reason it is unknown.
                return;
            case ICompoundAssignmentOperation { Target: ILocalReferenceOperation { Local.IsRef: false } local } compound:
            {
                if (compound.OperatorMethod is { } localOperator)
                {
                    ExpressionReader.RequireComponentWise(localOperator, compound.Syntax);
                }

                var current = _reader.Read(local);
                _reader.Bindings[local.Local] = new ValueBinding(Combine(current, compound.OperatorKind, _reader.Read(compound.Value), compound.Syntax));
                return;
            }

            case ICompoundAssignmentOperation compound when _reader.IsElementLike(compound.Target):
                if (compound.OperatorMethod is { } userOperator)
                {
                    // `residual[left] -= flux` on a state struct: its operator must be the arithmetic it looks like.
                    ExpressionReader.RequireComponentWise(userOperator, compound.Syntax);
                }

                switch (compound.OperatorKind)
                {
                    case BinaryOperatorKind.Add:
                        AddWrite(compound.Target, _reader.Read(compound.Value), isAssignment: false, compound.Syntax);
                        return;
                    case BinaryOperatorKind.Subtract:
                        AddWrite(compound.Target, -_reader.Read(compound.Value), isAssignment: false, compound.Syntax);
                        return;
                    case BinaryOperatorKind.Multiply or BinaryOperatorKind.Divide:
                        ScaleWrites(compound);
                        return;
                }

                break;
            case IInvocationOperation invocation when SymbolNames.IsType(invocation.TargetMethod.ContainingType, "System.Diagnostics", "Debug"):
                return;
            case IInvocationOperation invocation when invocation.Arguments.Any(a => a.Parameter?.RefKind == RefKind.Out):
                ReadOutCall(invocation);
                return;
        }

        throw new NotModelledException($"`{ExpressionReader.Short(operation.Syntax)}` has an effect the checker does not model", operation.Syntax);
    }

    /// <summary>`R[i] /= vol[i]` after accumulating: scales what the loop wrote to that element so far.</summary>
    private void ScaleWrites(ICompoundAssignmentOperation compound)
    {
        var target = _reader.ResolveElement(compound.Target);
        var factor = _reader.Read(compound.Value);
        if (compound.OperatorKind == BinaryOperatorKind.Divide)
        {
            factor = factor.Reciprocal(ExpressionReader.OpaqueInvariant);
        }

        var key = new UpdateWrite(target.Array, target.Path, target.Subscripts, SumExpr.Zero, false, -1).TargetKey;
        for (int k = 0; k < _writes.Count; k++)
        {
            if (_writes[k].TargetKey == key)
            {
                _writes[k] = _writes[k] with { Value = _writes[k].Value * factor };
            }
        }
    }

    private static SumExpr Combine(SumExpr current, BinaryOperatorKind kind, SumExpr value, SyntaxNode where) => kind switch
    {
        BinaryOperatorKind.Add => current + value,
        BinaryOperatorKind.Subtract => current - value,
        BinaryOperatorKind.Multiply => current * value,
        BinaryOperatorKind.Divide => current * value.Reciprocal(ExpressionReader.OpaqueInvariant),
        _ => throw new NotModelledException($"`{ExpressionReader.Short(where)}` updates a local with an operator the checker does not model", where),
    };

    private void AddWrite(IOperation targetOperation, SumExpr value, bool isAssignment, SyntaxNode syntax)
    {
        var target = _reader.ResolveElement(targetOperation);
        if (target.Role != DataRole.Cell)
        {
            // Filling face data (a flux buffer) is a definition, not an update.
            return;
        }

        // R[x] = R[x] + … is an increment of R[x].
        var self = target.ToRead();
        var selfTerm = value.Terms.FirstOrDefault(t => t.Factors.Length == 1 && t.Factors[0].Key == self.Key && t.Coefficient.IsOne);
        if (isAssignment && selfTerm is not null)
        {
            value = SumExpr.Of(value.Terms.Where(t => !ReferenceEquals(t, selfTerm)));
            isAssignment = false;
        }

        _writes.Add(new UpdateWrite(target.Array, target.Path, target.Subscripts, value, isAssignment, _method.Origins.Add(syntax)));
    }

    private void BindLocal(ILocalSymbol local, IOperation value)
    {
        if (local.Type is IArrayTypeSymbol || _method.Known.IsSpan(local.Type) || _method.Known.IsCellField(local.Type) || _method.Known.IsFaceField(local.Type))
        {
            var (root, role) = _reader.ArrayRoot(value);
            _reader.Bindings[local] = new ArrayBinding(root, role);
            return;
        }

        _reader.Bindings[local] = new ValueBinding(_reader.Read(value));
    }

    /// <summary>
    /// An <c>if</c> that only assigns locals (a limiter written with branches) gives each of them the
    /// value <c>c ? a : b</c>; a write of an array element under a condition is not modelled.
    /// </summary>
    private void ReadIf(IConditionalOperation conditional)
    {
        var condition = _reader.Read(conditional.Condition);
        if (_reader.Gather is not null)
        {
            // Reading one side of a gather: only the side of the face decides a branch.
            bool taken = ExpressionReader.ConstantCondition(condition)
                ?? throw new NotModelledException($"the term gathered from the face depends on `{ExpressionReader.Short(conditional.Condition.Syntax)}`, a condition other than the side of the face the cell is on", conditional.Condition.Syntax);
            ReadStatement(taken ? conditional.WhenTrue : conditional.WhenFalse);
            return;
        }

        int writesBefore = _writes.Count;
        var before = new Dictionary<ISymbol, Binding>(_reader.Bindings, SymbolEqualityComparer.Default);
        if (conditional.WhenFalse is null && CellGuard(conditional.Condition) is { } guarded)
        {
            ReadGuardedWrites(conditional, guarded, writesBefore, before);
            return;
        }

        ReadStatement(conditional.WhenTrue);
        var afterTrue = new Dictionary<ISymbol, Binding>(_reader.Bindings, SymbolEqualityComparer.Default);
        Restore(before);
        ReadStatement(conditional.WhenFalse);
        var afterFalse = new Dictionary<ISymbol, Binding>(_reader.Bindings, SymbolEqualityComparer.Default);
        if (_writes.Count != writesBefore)
        {
            throw new NotModelledException("an array element is written under a condition", conditional.Syntax);
        }

        Restore(before);
        foreach (var symbol in before.Keys.ToList())
        {
            var t = afterTrue[symbol];
            var f = afterFalse[symbol];
            if (ReferenceEquals(t, before[symbol]) && ReferenceEquals(f, before[symbol]))
            {
                continue;
            }

            if (t is ValueBinding vt && f is ValueBinding vf)
            {
                var call = new CallExpr("?:", ImmutableArray.Create(condition.StripOrigins(), vt.Value.StripOrigins(), vf.Value.StripOrigins()), CallSymmetry.None);
                _reader.Bindings[symbol] = new ValueBinding(
                    condition.IsInvariant && vt.Value.IsInvariant && vf.Value.IsInvariant
                        ? SumExpr.Invariant(SymPoly.Symbol(call.Render()))
                        : SumExpr.Factor(call, _method.Origins.Add(conditional.Syntax)));
            }
            else
            {
                _reader.Bindings[symbol] = new UnknownBinding($"the local `{symbol.Name}` is set differently in the branches of an `if`");
            }
        }
    }

    /// <summary>
    /// The cell a test such as <c>n &gt;= 0</c> asks for, when <c>n</c> is an index map's value
    /// (<c>nei[f]</c>, or a local holding it): the face has that cell, or none on that side (−1 marks a
    /// boundary face in one face list). Other tests (<c>n &gt; 0</c> would skip cell 0) are not guards.
    /// </summary>
    private MappedSubscript? CellGuard(IOperation condition)
    {
        if (condition is not IBinaryOperation binary)
        {
            return null;
        }

        static int? Constant(IOperation o) => o.ConstantValue is { HasValue: true, Value: int v } ? v : null;
        IOperation? map = (binary.OperatorKind, Constant(binary.LeftOperand), Constant(binary.RightOperand)) switch
        {
            (BinaryOperatorKind.GreaterThanOrEqual, null, 0) => binary.LeftOperand,
            (BinaryOperatorKind.GreaterThan, null, -1) => binary.LeftOperand,
            (BinaryOperatorKind.NotEquals, null, -1) => binary.LeftOperand,
            (BinaryOperatorKind.LessThanOrEqual, 0, null) => binary.RightOperand,
            (BinaryOperatorKind.LessThan, -1, null) => binary.RightOperand,
            (BinaryOperatorKind.NotEquals, -1, null) => binary.RightOperand,
            _ => null,
        };
        if (map is null)
        {
            return null;
        }

        try
        {
            return _reader.ReadIndex(map) as MappedSubscript;
        }
        catch (NotModelledException)
        {
            return null;
        }
    }

    /// <summary>
    /// Writes guarded by their own cell's existence (<c>if (n &gt;= 0) res[n] += flux;</c>) are read as
    /// made: on an interior face they are, and on a boundary face the cell they would reach lies outside
    /// the mesh, so the flux the other write takes from its cell leaves through the boundary. The branch
    /// must write only that cell and assign no local declared outside it; anything else stays a write
    /// under a condition.
    /// </summary>
    private void ReadGuardedWrites(IConditionalOperation conditional, MappedSubscript guarded, int writesBefore, Dictionary<ISymbol, Binding> before)
    {
        ReadStatement(conditional.WhenTrue);
        bool onlyThatCell = _writes.Count > writesBefore;
        for (int k = writesBefore; k < _writes.Count && onlyThatCell; k++)
        {
            var subscripts = _writes[k].Subscripts;
            onlyThatCell = subscripts.Length == 1 && subscripts[0].Length == 1 && subscripts[0][0].Key == guarded.Key;
        }

        foreach (var entry in before)
        {
            onlyThatCell &= _reader.Bindings.TryGetValue(entry.Key, out var now) && ReferenceEquals(now, entry.Value);
        }

        if (!onlyThatCell)
        {
            throw new NotModelledException("an array element is written under a condition", conditional.Syntax);
        }

        // Locals declared inside the branch end with it.
        Restore(before);
    }

    private void Restore(Dictionary<ISymbol, Binding> snapshot)
    {
        _reader.Bindings.Clear();
        foreach (var pair in snapshot)
        {
            _reader.Bindings[pair.Key] = pair.Value;
        }
    }

    /// <summary>Locals declared outside the nest and assigned inside it.</summary>
    /// <remarks>One walk of the nest; the loop headers are collected only when an outer local is assigned at all.</remarks>
    private IEnumerable<ILocalSymbol> AssignedOuterLocals(IOperation loop)
    {
        var declaredInside = new HashSet<ILocalSymbol>(SymbolEqualityComparer.Default);
        if (loop is IForLoopOperation f)
        {
            foreach (var l in f.Locals)
            {
                declaredInside.Add(l);
            }
        }

        var assigned = new List<LocalWrite>();
        var operations = _method.Operations;
        foreach (var op in operations.Descendants(loop))
        {
            if (op.Kind == OperationKind.VariableDeclarator && op is IVariableDeclaratorOperation declarator)
            {
                declaredInside.Add(declarator.Symbol);
            }

            if (WrittenTarget.Of(op) is ILocalReferenceOperation local)
            {
                assigned.Add(new LocalWrite(op, local.Local));
            }
        }

        var result = new HashSet<ILocalSymbol>(SymbolEqualityComparer.Default);
        HashSet<IOperation>? headers = null;
        foreach (var (op, local) in assigned)
        {
            if (declaredInside.Contains(local))
            {
                continue;
            }

            headers ??= new HashSet<IOperation>(
                operations.DescendantsAndSelf(loop).OfType<IForLoopOperation>()
                    .SelectMany(h => h.Before.Concat(h.AtLoopBottom))
                    .SelectMany(h => operations.DescendantsAndSelf(h)));
            if (!headers.Contains(op))
            {
                result.Add(local);
            }
        }

        return result;
    }

}
