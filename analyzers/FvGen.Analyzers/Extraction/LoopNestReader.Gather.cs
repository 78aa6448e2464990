using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using FvGen.Analyzers.Conservation;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// A cell summing its faces from the cell-to-face list (the parallel gather): the inner loop runs over
/// the faces of the cell (<c>for (n = offsets[c]; n &lt; offsets[c + 1]; n++)</c> with <c>f = faces[n]</c>,
/// or <c>foreach (int f in cellFaces[c])</c>) and accumulates locals. The body is read twice, once
/// with the cell on each side of the face, so a side test (<c>faceLeft[f] == c</c>) is a constant;
/// each accumulated local becomes a <see cref="CellGatherExpr"/> that the balance rewrites as the
/// equivalent face loop.
/// </summary>
internal sealed partial class LoopNestReader
{
    /// <summary>False when the inner loop is not a loop over one cell's faces; throws for such a loop of a shape not modelled.</summary>
    private bool TryReadGather(IOperation loop, List<ILocalSymbol> accumulated)
    {
        ISymbol? position = null;
        ILocalSymbol? faceLocal = null;
        IOperation body;
        ISymbol? cell;
        string? cellVariable;
        string? list;
        switch (loop)
        {
            case IForLoopOperation f when CompressedRowHeader(f, out cell, out cellVariable, out position, out list):
                body = f.Body;
                break;
            case IForEachLoopOperation fe when fe.Locals.Length == 1 && ExpressionReader.IsIntegral(fe.Locals[0].Type)
                && CellElement(StripConversions(fe.Collection), 0, out cell, out cellVariable, out list):
                faceLocal = fe.Locals[0];
                body = fe.Body;
                break;
            default:
                return false;
        }

        string? facesRoot = null;
        if (position is not null)
        {
            facesRoot = FacesRoot(body, position);
            if (facesRoot is null)
            {
                return false;
            }

            list += "/" + facesRoot;
        }

        if (_variables.FirstOrDefault(v => v.Name == cellVariable) is not { Kind: LoopVariableKind.Lattice })
        {
            throw new NotModelledException($"the cell `{cellVariable}` gathering its faces comes from an index list, so the faces between listed and unlisted cells have one side only", loop.Syntax);
        }

        RequireAccumulations(body, accumulated);
        var maps = ComparedMaps(body, cell!);
        string faceVariable = faceLocal?.Name ?? FaceLocalName(body, position!, facesRoot!) ?? "f";
        if (_variables.Any(v => v.Name == faceVariable))
        {
            faceVariable += "Face";
        }

        string leftMap = maps.Count > 0 ? maps[0] : "cellOf";
        string rightMap = maps.Count > 1 ? maps[1] : CellGatherExpr.OtherSide(leftMap);
        var before = new Dictionary<ISymbol, Binding>(_reader.Bindings, SymbolEqualityComparer.Default);
        var gathered = accumulated.Where(a => before.TryGetValue(a, out var b) && b is ValueBinding).ToList();
        var sides = new List<Dictionary<ISymbol, SumExpr>>();
        foreach (var side in new[] { leftMap, rightMap })
        {
            Restore(before);
            foreach (var a in gathered)
            {
                _reader.Bindings[a] = new ValueBinding(SumExpr.Zero);
            }

            if (position is not null)
            {
                _reader.Bindings[position] = new UnknownBinding($"the position `{position.Name}` in the face list is used other than to read the face");
            }
            else
            {
                _reader.Bindings[faceLocal!] = new ValueBinding(SumExpr.Factor(ReadExpr.LoopIndex(faceVariable)));
            }

            int writes = _writes.Count;
            _reader.Gather = new GatherSide(cellVariable!, faceVariable, maps, side, position, facesRoot);
            try
            {
                ReadStatement(body);
            }
            finally
            {
                _reader.Gather = null;
            }

            if (_writes.Count != writes)
            {
                throw new NotModelledException("an array element is written inside the loop over the cell's faces", loop.Syntax);
            }

            sides.Add(gathered.ToDictionary(a => (ISymbol)a, a => ((ValueBinding)_reader.Bindings[a]).Value, SymbolEqualityComparer.Default));
        }

        Restore(before);
        foreach (var a in gathered)
        {
            var left = sides[0][a];
            var right = sides[1][a];
            RequireFaceOnly(left.Terms.Concat(right.Terms), cellVariable!, loop.Syntax);
            var value = ((ValueBinding)before[a]).Value;
            if (!left.IsZero || !right.IsZero)
            {
                value += SumExpr.Factor(new CellGatherExpr(cellVariable!, list!, faceVariable, leftMap, rightMap, left, right), _method.Origins.Add(loop.Syntax));
            }

            _reader.Bindings[a] = new ValueBinding(value);
        }

        foreach (var a in accumulated.Except(gathered, SymbolEqualityComparer.Default).Cast<ILocalSymbol>())
        {
            _reader.Bindings[a] = new UnknownBinding($"the local `{a.Name}` is accumulated over the inner loop (a reduction the checker does not model)");
        }

        return true;
    }

    /// <summary>The local or parameter <paramref name="operation"/> reads, or null.</summary>
    private static ISymbol? NamedValue(IOperation operation) => StripConversions(operation) switch
    {
        ILocalReferenceOperation l => l.Local,
        IParameterReferenceOperation p => p.Parameter,
        _ => null,
    };

    /// <summary><c>for (int n = offsets[c]; n &lt; offsets[c + 1]; n++)</c>: the faces of cell <c>c</c> in a compressed-row list.</summary>
    private bool CompressedRowHeader(IForLoopOperation loop, out ISymbol? cell, out string? cellVariable, out ISymbol? position, out string? offsets)
    {
        cell = null;
        cellVariable = null;
        position = null;
        offsets = null;
        if (loop.Before.Length != 1 || loop.AtLoopBottom.Length != 1 || loop.Condition is not IBinaryOperation { OperatorKind: BinaryOperatorKind.LessThan } condition)
        {
            return false;
        }

        (ILocalSymbol Local, IOperation Value)? start = loop.Before[0] switch
        {
            IVariableDeclarationGroupOperation g when g.Declarations.SelectMany(d => d.Declarators).ToList() is { Count: 1 } ds && ds[0].GetVariableInitializer() is { } init
                => (ds[0].Symbol, init.Value),
            _ => null,
        };
        if (start is not { } s
            || !CellElement(StripConversions(s.Value), 0, out cell, out cellVariable, out offsets)
            || StripConversions(condition.LeftOperand) is not ILocalReferenceOperation bound || !SymbolEqualityComparer.Default.Equals(bound.Local, s.Local)
            || !CellElement(StripConversions(condition.RightOperand), 1, out var endCell, out _, out var endOffsets)
            || !SymbolEqualityComparer.Default.Equals(cell, endCell) || offsets != endOffsets
            || Unwrap(loop.AtLoopBottom[0]) is not IIncrementOrDecrementOperation { Kind: OperationKind.Increment, Target: ILocalReferenceOperation stepped }
            || !SymbolEqualityComparer.Default.Equals(stepped.Local, s.Local))
        {
            return false;
        }

        position = s.Local;
        return true;
    }

    /// <summary><c>array[c + offset]</c> for a loop variable <c>c</c> read by a plain local or parameter.</summary>
    private bool CellElement(IOperation operation, long offset, out ISymbol? cell, out string? cellVariable, out string? root)
    {
        cell = null;
        cellVariable = null;
        root = null;
        var (receiver, indices) = operation switch
        {
            IArrayElementReferenceOperation e => (e.ArrayReference, e.Indices),
            IPropertyReferenceOperation { Property.IsIndexer: true, Instance: { } instance } p => (instance, p.Arguments.Select(a => a.Value).ToImmutableArray()),
            _ => (null, ImmutableArray<IOperation>.Empty),
        };
        if (receiver is null || indices.Length != 1)
        {
            return false;
        }

        var index = StripConversions(indices[0]);
        var symbol = index switch
        {
            // `c + 1` or `1 + c`: the constant is checked against the offset below.
            IBinaryOperation { OperatorKind: BinaryOperatorKind.Add, RightOperand.ConstantValue: { HasValue: true, Value: int } } b => NamedValue(b.LeftOperand),
            IBinaryOperation { OperatorKind: BinaryOperatorKind.Add, LeftOperand.ConstantValue: { HasValue: true, Value: int } } b => NamedValue(b.RightOperand),
            _ => NamedValue(index),
        };
        if (symbol is null || !_reader.Bindings.TryGetValue(symbol, out var binding) || binding is not ValueBinding { Value: var value }
            || value.Terms.Length != 1 || value.Terms[0].Factors.Length != 1 || value.Terms[0].Factors[0] is not ReadExpr { IsLoopIndex: true } loopIndex)
        {
            return false;
        }

        try
        {
            var subscript = _reader.ReadIndex(indices[0]);
            string variable = ((AffineSubscript)loopIndex.Subscripts[0][0]).Index.Linear[0].Key;
            var expected = AffineIndex.Variable(variable) + AffineIndex.FromConstant(SymPoly.Constant(offset));
            if (subscript is not AffineSubscript a || a.Index.Key != expected.Key)
            {
                return false;
            }

            root = _reader.ArrayRoot(receiver).Root;
            cell = symbol;
            cellVariable = variable;
            return true;
        }
        catch (NotModelledException)
        {
            return false;
        }
    }

    /// <summary>
    /// The list the position variable reads (<c>faces</c> in <c>faces[n]</c>): the one whose element is
    /// used as a face (held in a local, or used as a subscript). Every use of the position must read it.
    /// </summary>
    private string? FacesRoot(IOperation body, ISymbol position)
    {
        var uses = new List<PositionUse>();
        foreach (var use in body.Descendants().OfType<ILocalReferenceOperation>().Where(l => SymbolEqualityComparer.Default.Equals(l.Local, position)))
        {
            var element = use.Parent is IConversionOperation c ? c.Parent : use.Parent;
            if (element is IArgumentOperation argument)
            {
                element = argument.Parent;
            }

            var receiver = element switch
            {
                IArrayElementReferenceOperation e when e.Indices.Length == 1 => e.ArrayReference,
                IPropertyReferenceOperation { Property.IsIndexer: true, Arguments.Length: 1, Instance: { } instance } => instance,
                _ => null,
            };
            string? root = null;
            try
            {
                root = receiver is null ? null : _reader.ArrayRoot(receiver).Root;
            }
            catch (NotModelledException)
            {
            }

            var parent = element?.Parent is IConversionOperation up ? up.Parent : element?.Parent;
            bool asFace = parent is IVariableInitializerOperation or IArrayElementReferenceOperation || parent is IArgumentOperation { Parent: IPropertyReferenceOperation { Property.IsIndexer: true } };
            uses.Add(new PositionUse(element ?? use, root, asFace));
        }

        if (uses.Count == 0)
        {
            return null;
        }

        var faceRoots = uses.Where(u => u.AsFace && u.Root is not null).Select(u => u.Root).Distinct().ToList();
        string? faces = faceRoots.Count == 1 ? faceRoots[0] : uses.Select(u => u.Root).Distinct().Count() == 1 ? uses[0].Root : null;
        var stray = uses.FirstOrDefault(u => u.Root is null || u.Root != faces);
        if (faces is null || stray is not null)
        {
            var at = (stray ?? uses[0]).Element.Syntax;
            throw new NotModelledException(
                $"the position `{position.Name}` in the face list is read as `{ExpressionReader.Short(at)}`, not only to take the face from the list; the side of a face is read only from a comparison of the cell with a face-to-cell map",
                at);
        }

        return faces;
    }

    /// <summary>The name of the local holding the face (<c>int f = faces[n];</c>), if there is one.</summary>
    private string? FaceLocalName(IOperation body, ISymbol position, string facesRoot) =>
        body.Descendants().OfType<IVariableDeclaratorOperation>()
            .FirstOrDefault(d => d.GetVariableInitializer() is { } init && _reader.IsListElement(StripConversions(init.Value), position, facesRoot))
            ?.Symbol.Name;

    /// <summary>Each accumulated local is only added to or subtracted from, by values that do not read it.</summary>
    private static void RequireAccumulations(IOperation body, List<ILocalSymbol> accumulated)
    {
        var set = new HashSet<ISymbol>(accumulated, SymbolEqualityComparer.Default);
        foreach (var op in body.DescendantsAndSelf())
        {
            if (IsLoop(op))
            {
                throw new NotModelledException("the loop over the cell's faces holds another loop", op.Syntax);
            }

            if (op is not ILocalReferenceOperation local || !set.Contains(local.Local))
            {
                continue;
            }

            if (local.Parent is ICompoundAssignmentOperation { OperatorKind: BinaryOperatorKind.Add or BinaryOperatorKind.Subtract } compound
                && ReferenceEquals(compound.Target, local)
                && !compound.Value.DescendantsAndSelf().OfType<ILocalReferenceOperation>().Any(l => set.Contains(l.Local)))
            {
                continue;
            }

            throw new NotModelledException(
                $"`{ExpressionReader.Short((local.Parent ?? local).Syntax)}` does more with `{local.Local.Name}` than add to it or subtract from it over the faces",
                (local.Parent ?? local).Syntax);
        }
    }

    private static bool IsLoop(IOperation op) =>
        op is IForLoopOperation or IForEachLoopOperation or IWhileLoopOperation
        || (op is IInvocationOperation { TargetMethod: { Name: "For" or "ForEach", ContainingType.Name: "Parallel" } });

    /// <summary>The face-to-cell maps the cell is compared with (<c>faceLeft</c> in <c>faceLeft[f] == c</c>), in the order met; at most two.</summary>
    private List<string> ComparedMaps(IOperation body, ISymbol cell)
    {
        var maps = new List<string>();
        foreach (var comparison in body.Descendants().OfType<IBinaryOperation>().Where(b => b.OperatorKind is BinaryOperatorKind.Equals or BinaryOperatorKind.NotEquals))
        {
            foreach (var (a, b) in new[] { (comparison.LeftOperand, comparison.RightOperand), (comparison.RightOperand, comparison.LeftOperand) })
            {
                var symbol = StripConversions(a) switch { ILocalReferenceOperation l => (ISymbol)l.Local, IParameterReferenceOperation p => p.Parameter, _ => null };
                var receiver = StripConversions(b) switch
                {
                    IArrayElementReferenceOperation e when e.Indices.Length == 1 => e.ArrayReference,
                    IPropertyReferenceOperation { Property.IsIndexer: true, Arguments.Length: 1, Instance: { } instance } => instance,
                    _ => null,
                };
                if (!SymbolEqualityComparer.Default.Equals(symbol, cell) || receiver is null)
                {
                    continue;
                }

                string root = _reader.ArrayRoot(receiver).Root;
                if (!maps.Contains(root))
                {
                    maps.Add(root);
                }
            }
        }

        if (maps.Count > 2)
        {
            throw new NotModelledException($"the cell is compared with {maps.Count} face maps ({string.Join(", ", maps)}); a face has two cells", body.Syntax);
        }

        return maps;
    }

    /// <summary>What a face gives the cell must not read the cell itself: only the side decides it.</summary>
    private static void RequireFaceOnly(IEnumerable<Term> terms, string cellVariable, SyntaxNode where)
    {
        foreach (var t in terms)
        {
            foreach (var read in ExprTree.All(t).OfType<ReadExpr>())
            {
                if (read.AllSubscripts.SelectMany(s => s.AffineParts).Any(p => !p.CoefficientOf(cellVariable).IsZero))
                {
                    throw new NotModelledException($"the term gathered from the face reads `{Text.Short(read.Render())}`, which depends on the cell itself; only terms of the face (with the side deciding them) are modelled", where);
                }
            }
        }
    }

    private static IOperation StripConversions(IOperation operation)
    {
        while (operation is IConversionOperation c)
        {
            operation = c.Operand;
        }

        return operation;
    }

    /// <summary>A read of a face list's position variable: the element read, the list's root, whether it is used as a face.</summary>
    private sealed record PositionUse(IOperation Element, string? Root, bool AsFace);
}
