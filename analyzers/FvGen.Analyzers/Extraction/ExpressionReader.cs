using System;
using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;
using FvGen.Analyzers.Conservation;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Operations;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// Turns expressions of a loop body into engine terms: arithmetic is expanded, locals are inlined,
/// array and span reads become <see cref="ReadExpr"/>s with affine or mapped subscripts, calls stay
/// uninterpreted. Anything else raises <see cref="NotModelledException"/> with the reason.
/// </summary>
internal sealed class ExpressionReader
{
    private readonly MethodContext _method;

    public ExpressionReader(MethodContext method, Dictionary<ISymbol, Binding> bindings)
    {
        _method = method;
        Bindings = bindings;
    }

    /// <summary>Locals (and lambda parameters) in scope: loop variables, inlined values, array aliases.</summary>
    public Dictionary<ISymbol, Binding> Bindings { get; }

    /// <summary>Loop variables that run over an index list (<c>foreach (int c in active)</c>), not a range.</summary>
    public HashSet<string> ListVariables { get; } = new(System.StringComparer.Ordinal);

    public KnownSymbols Known => _method.Known;

    /// <summary>Set while the loop over one cell's faces is read for one side of the face (a gather).</summary>
    public GatherSide? Gather { get; set; }

    private static readonly string TrueKey = SumExpr.Invariant(SymPoly.Symbol("true")).Key;
    private static readonly string FalseKey = SumExpr.Invariant(SymPoly.Symbol("false")).Key;

    /// <summary>True or false when the condition is a constant (a literal, or the side test of a gather); null otherwise.</summary>
    public static bool? ConstantCondition(SumExpr condition) =>
        condition.Key == TrueKey ? true : condition.Key == FalseKey ? false : null;

    private static SumExpr Bool(bool value) => SumExpr.Invariant(SymPoly.Symbol(value ? "true" : "false"));

    public SumExpr Read(IOperation operation)
    {
        switch (operation)
        {
            case IBinaryOperation { OperatorKind: BinaryOperatorKind.Add or BinaryOperatorKind.Subtract or BinaryOperatorKind.Multiply or BinaryOperatorKind.Divide } folded
                when folded.ConstantValue.HasValue && folded.Type?.SpecialType is SpecialType.System_Double or SpecialType.System_Single:
                // The compiler folds `1.0 / 3.0` into the nearest double; read exactly, 1/3 + 2/3 is 1.
                return ReadBinary(folded);
            case { ConstantValue.HasValue: true } when operation.ConstantValue.Value is not null && IsNumeric(operation.ConstantValue.Value):
                return Constant(operation.ConstantValue.Value!, operation.Syntax);
            case { ConstantValue.HasValue: true } when operation.ConstantValue.Value is bool b:
                return SumExpr.Invariant(SymPoly.Symbol(b ? "true" : "false"));
            case IConversionOperation conversion when conversion.OperatorMethod is null:
                return Read(conversion.Operand);
            case IParenthesizedOperation parenthesized:
                return Read(parenthesized.Operand);
            case IBinaryOperation binary:
                return ReadBinary(binary);
            case IUnaryOperation unary when unary.OperatorKind == UnaryOperatorKind.Minus:
                return -Read(unary.Operand);
            case IUnaryOperation unary when unary.OperatorKind == UnaryOperatorKind.Plus:
                return Read(unary.Operand);
            case IUnaryOperation { OperatorKind: UnaryOperatorKind.Not } not when Gather is not null && ConstantCondition(Read(not.Operand)) is bool operand:
                return Bool(!operand);
            case IUnaryOperation unary:
                return Opaque(unary.OperatorKind.ToString(), unary.Syntax, Read(unary.Operand));
            case ILocalReferenceOperation local:
                return ReadSymbol(local.Local, local);
            case IParameterReferenceOperation parameter when Bindings.ContainsKey(parameter.Parameter):
                return ReadSymbol(parameter.Parameter, parameter);
            case IParameterReferenceOperation parameter:
                return SumExpr.Invariant(SymPoly.Symbol(parameter.Parameter.Name));
            case IArrayElementReferenceOperation or IPropertyReferenceOperation { Property.IsIndexer: true }:
                return ReadElement(operation);
            case IFieldReferenceOperation or IPropertyReferenceOperation when IsElementLike(operation):
                return ReadElement(operation);
            case IFieldReferenceOperation or IPropertyReferenceOperation:
                return ReadMember(operation);
            case IInvocationOperation invocation:
                return ReadCall(invocation);
            case IConditionalOperation { WhenFalse: not null } conditional when Gather is not null:
                return ConstantCondition(Read(conditional.Condition)) is bool taken
                    ? Read(taken ? conditional.WhenTrue : conditional.WhenFalse)
                    : throw new NotModelledException($"the term gathered from the face depends on `{Short(conditional.Condition.Syntax)}`, a condition other than the side of the face the cell is on", conditional.Syntax);
            case IConditionalOperation { WhenFalse: not null } conditional:
                return Opaque("?:", conditional.Syntax, Read(conditional.Condition), Read(conditional.WhenTrue), Read(conditional.WhenFalse));
            case IDefaultValueOperation:
                return SumExpr.Zero;
            case IObjectCreationOperation { Initializer: null } creation when creation.Type is not null:
                return Opaque("new " + creation.Type.Name, creation.Syntax, creation.Arguments.Select(a => Read(a.Value)).ToArray());
            default:
                throw new NotModelledException($"the expression `{Short(operation.Syntax)}` ({operation.Kind}) is outside what the checker models", operation.Syntax);
        }
    }

    /// <summary>A subscript: affine in the loop variables, or an index map read at affine subscripts.</summary>
    public IndexTerm ReadIndex(IOperation operation)
    {
        var value = Read(operation);
        var affine = AffineIndex.FromConstant(SymPoly.Zero);
        MappedSubscript? mapped = null;
        foreach (var t in value.Terms)
        {
            if (t.IsInvariant)
            {
                affine += AffineIndex.FromConstant(t.Coefficient);
                continue;
            }

            if (t.Factors.Length == 1 && t.Factors[0] is ReadExpr r)
            {
                if (r.IsLoopIndex && r.Subscripts[0][0] is AffineSubscript loopIndex)
                {
                    affine += loopIndex.Index.Scale(t.Coefficient);
                    continue;
                }

                if (t.Coefficient.IsOne && mapped is null && r.Path.Length == 0 && r.AllSubscripts.All(s => s is AffineSubscript))
                {
                    mapped = new MappedSubscript(r.Array, r.AllSubscripts.Cast<AffineSubscript>().Select(s => s.Index).ToImmutableArray());
                    continue;
                }

                if (t.Coefficient.IsOne && mapped is null && r.Path.Length == 0 && r.AllSubscripts.Count() == 1 && r.AllSubscripts.First() is MappedSubscript inner)
                {
                    // A map of a map (`faceLeft[colourFaces[n]]`): one composed map of the affine subscripts.
                    mapped = new MappedSubscript(r.Array + "∘" + inner.Map, inner.Arguments);
                    continue;
                }
            }

            if (t.Factors.Length == 1 && t.Factors[0] is CallExpr { Function: "?:" })
            {
                throw new NotModelledException(
                    $"the index `{Short(operation.Syntax)}` is chosen by a condition, which the checker accepts only inside a face value given to the two cells of the face with opposite weights",
                    operation.Syntax,
                    conditionalIndex: true);
            }

            throw new NotModelledException($"the index `{Short(operation.Syntax)}` depends on data, not only on the loop variables and index maps", operation.Syntax);
        }

        if (mapped is not null)
        {
            if (!affine.IsConstant || !affine.Constant.IsZero)
            {
                throw new NotModelledException($"the index `{Short(operation.Syntax)}` adds an offset to an index map", operation.Syntax);
            }

            return mapped;
        }

        foreach (var variable in ListVariables)
        {
            var coefficient = affine.CoefficientOf(variable);
            if (!coefficient.IsZero && !(coefficient.IsOne && affine.Linear.Length == 1 && affine.Constant.IsZero))
            {
                // `q[i + 1]` for i taken from a list: the list need not hold i + 1, so a shift by one is
                // no step of the iteration and the faces at the edges of the listed cells cannot be balanced.
                throw new NotModelledException($"the index `{Short(operation.Syntax)}` steps away from a loop variable taken from an index list, which need not hold that neighbour", operation.Syntax);
            }
        }

        return new AffineSubscript(affine);
    }

    /// <summary>The element an operation reads or writes (array, span, field indexer, component, ref local).</summary>
    public ElementTarget ResolveElement(IOperation operation)
    {
        switch (operation)
        {
            case IArrayElementReferenceOperation element when element.ArrayReference is IArrayElementReferenceOperation inner:
            {
                var outer = ResolveElement(inner);
                return outer with { Subscripts = outer.Subscripts.Add(element.Indices.Select(ReadIndex).ToImmutableArray()) };
            }

            case IArrayElementReferenceOperation element:
            {
                var (root, role) = ArrayRoot(element.ArrayReference);
                return new ElementTarget(root, ImmutableArray.Create(element.Indices.Select(ReadIndex).ToImmutableArray()), string.Empty, role);
            }

            case IPropertyReferenceOperation { Property.IsIndexer: true } indexer when indexer.Instance is not null:
            {
                if (indexer.Arguments.Length == 0 || indexer.Arguments.Any(a => !IsIntegral(a.Value.Type)))
                {
                    throw new NotModelledException($"the indexer `{Short(indexer.Syntax)}` does not take integer subscripts", indexer.Syntax);
                }

                var (root, role) = ArrayRoot(indexer.Instance);
                return new ElementTarget(root, ImmutableArray.Create(indexer.Arguments.Select(a => ReadIndex(a.Value)).ToImmutableArray()), string.Empty, role);
            }

            case IFieldReferenceOperation field when field.Instance is not null && IsElementLike(field.Instance):
                return ResolveElement(field.Instance).WithPath(field.Field.Name);
            case IPropertyReferenceOperation property when property.Instance is not null && IsElementLike(property.Instance):
                return ResolveElement(property.Instance).WithPath(property.Property.Name);
            case ILocalReferenceOperation local when Bindings.TryGetValue(local.Local, out var binding) && binding is RefBinding reference:
                return reference.Target;
            case IConversionOperation { OperatorMethod: null } conversion:
                return ResolveElement(conversion.Operand);
            default:
                throw new NotModelledException($"`{Short(operation.Syntax)}` is not an array element the checker can follow", operation.Syntax);
        }
    }

    public bool IsElementLike(IOperation operation) => operation switch
    {
        IArrayElementReferenceOperation => true,
        IPropertyReferenceOperation { Property.IsIndexer: true } => true,
        IFieldReferenceOperation { Instance: { } instance } => IsElementLike(instance),
        IPropertyReferenceOperation { Instance: { } instance } => IsElementLike(instance),
        ILocalReferenceOperation local => Bindings.TryGetValue(local.Local, out var b) && b is RefBinding,
        IConversionOperation { OperatorMethod: null } conversion => IsElementLike(conversion.Operand),
        _ => false,
    };

    /// <summary>The canonical name of the array behind a receiver, following aliases; its role (cell or face data).</summary>
    public (string Root, DataRole Role) ArrayRoot(IOperation receiver)
    {
        switch (receiver)
        {
            case IConversionOperation { OperatorMethod: null } conversion:
                return ArrayRoot(conversion.Operand);
            case IConversionOperation { OperatorMethod: { Name: "op_Implicit" } } conversion:
                return ArrayRoot(conversion.Operand);
            case ILocalReferenceOperation local:
                if (Bindings.TryGetValue(local.Local, out var binding))
                {
                    return binding switch
                    {
                        ArrayBinding array => (array.Root, WithDefinitions(array.Root, array.Role)),
                        UnknownBinding unknown => throw new NotModelledException(unknown.Reason, receiver.Syntax),
                        _ => throw new NotModelledException($"`{local.Local.Name}` is used as an array but holds a value", receiver.Syntax),
                    };
                }

                return (local.Local.Name, WithDefinitions(local.Local.Name, RoleOfType(local.Local.Type)));
            case IParameterReferenceOperation parameter:
                return (parameter.Parameter.Name, WithDefinitions(parameter.Parameter.Name, Known.HasAttribute(parameter.Parameter, Known.FaceData) || _method.FaceParameters.Contains(parameter.Parameter) ? DataRole.Face : RoleOfType(parameter.Parameter.Type)));
            case IFieldReferenceOperation field:
            {
                string name = Name(field);
                var role = Known.HasAttribute(field.Field, Known.FaceData) ? DataRole.Face : RoleOfType(field.Field.Type);
                return (name, WithDefinitions(name, role));
            }

            case IPropertyReferenceOperation { Property.IsIndexer: false } property:
            {
                // field.Span / field.ReadOnlySpan are the field's own storage.
                if (property.Instance is not null && (Known.IsCellField(property.Instance.Type) || Known.IsFaceField(property.Instance.Type))
                    && property.Property.Name is "Span" or "ReadOnlySpan")
                {
                    return ArrayRoot(property.Instance);
                }

                string name = Name(property);
                var role = Known.HasAttribute(property.Property, Known.FaceData) ? DataRole.Face : RoleOfType(property.Property.Type);
                if (property.Property.Name == "Span" && property.Instance is { Type: INamedTypeSymbol { Name: "Memory" or "ReadOnlyMemory", ContainingNamespace.Name: "System" } })
                {
                    // memory.Span is the memory's own storage: face data when the memory is.
                    role = ArrayRoot(property.Instance).Role;
                }

                if (property.Instance?.Type is { } owner && SymbolEqualityComparer.Default.Equals(owner, Known.UnstructuredMesh)
                    && property.Property.Name.StartsWith("Face", StringComparison.Ordinal)
                    && property.Property.Name is not ("FaceLeft" or "FaceRight" or "FaceNodes" or "FaceNodeOffsets"))
                {
                    role = DataRole.Face;
                }

                return (name, WithDefinitions(name, role));
            }

            case IInvocationOperation { TargetMethod.Name: "AsSpan" } invocation when invocation.Arguments.Length <= 1:
                return ArrayRoot(invocation.Instance ?? invocation.Arguments[0].Value);
            default:
                throw new NotModelledException($"the array `{Short(receiver.Syntax)}` comes from an expression the checker cannot follow (aliasing cannot be ruled out)", receiver.Syntax);
        }
    }

    private DataRole WithDefinitions(string root, DataRole role) =>
        _method.InteriorFaceArrays.Contains(root) ? DataRole.InteriorFace : _method.FaceArrays.Contains(root) ? DataRole.Face : role;

    private DataRole RoleOfType(ITypeSymbol? type) => Known.IsFaceField(type) ? DataRole.Face : DataRole.Cell;

    private SumExpr ReadSymbol(ISymbol symbol, IOperation reference)
    {
        if (Bindings.TryGetValue(symbol, out var binding))
        {
            return binding switch
            {
                ValueBinding value => value.Value,
                RefBinding reference2 => SumExpr.Factor(reference2.Target.ToRead(), _method.Origins.Add(reference.Syntax)),
                UnknownBinding unknown => throw new NotModelledException(unknown.Reason, reference.Syntax),
                _ => throw new NotModelledException($"`{symbol.Name}` is an array used as a value", reference.Syntax),
            };
        }

        throw new NotModelledException($"the local `{symbol.Name}` has no value the checker can see at this point", reference.Syntax);
    }

    private SumExpr ReadElement(IOperation operation)
    {
        if (Gather is { Position: { } position, FacesRoot: { } facesRoot } gather && IsListElement(operation, position, facesRoot))
        {
            return gather.Face;
        }

        ElementTarget target;
        try
        {
            target = ResolveElement(operation);
        }
        catch (NotModelledException e) when (e.ConditionalIndex)
        {
            return SumExpr.Factor(OpaqueElement(operation, e.Message), _method.Origins.Add(operation.Syntax));
        }

        var read = target.ToRead();
        if (read.AllSubscripts.All(s => s is AffineSubscript a && a.Index.IsConstant))
        {
            if (read.Subscripts.Length == 1 && read.Subscripts[0].Length == 1 && read.Path.Length == 0
                && _method.ConstantTables.TryGetValue(read.Array, out var table)
                && ((AffineSubscript)read.Subscripts[0][0]).Index.Constant is { IsConstant: true } k
                && k.ConstantValue.IsInteger && k.ConstantValue.Numerator >= 0 && k.ConstantValue.Numerator < table.Length)
            {
                // An entry of a table of constants nothing changes is that constant.
                return SumExpr.Invariant(SymPoly.Constant(table[(int)k.ConstantValue.Numerator]));
            }

            // A fixed element (a ghost value, a coefficient table entry) is loop-invariant.
            return SumExpr.Invariant(SymPoly.Symbol(read.Render()));
        }

        return SumExpr.Factor(read, _method.Origins.Add(operation.Syntax));
    }

    /// <summary>
    /// A member of a loop-invariant receiver is a symbol (<c>mesh.Dx</c>); a member of a value
    /// computed in the loop (<c>flux.Mass</c> of a returned state) is a projection of that value,
    /// distributed over its terms.
    /// </summary>
    private SumExpr ReadMember(IOperation member)
    {
        var (instance, name) = member switch
        {
            IFieldReferenceOperation f => (f.Instance, f.Field.Name),
            IPropertyReferenceOperation p => (p.Instance, p.Property.Name),
            _ => (null, string.Empty),
        };
        if (instance is null || instance is IInstanceReferenceOperation || IsInvariantReceiver(instance))
        {
            return SumExpr.Invariant(SymPoly.Symbol(Name(member)));
        }

        var value = Read(instance);
        if (value.IsInvariant)
        {
            return SumExpr.Invariant(SymPoly.Symbol(Name(member)));
        }

        var terms = new List<Term>();
        foreach (var t in value.Terms)
        {
            if (t.IsInvariant || t.Factors.Length != 1)
            {
                return Opaque("." + name, member.Syntax, value);
            }

            var projected = t.Factors[0] switch
            {
                ReadExpr r when !r.IsLoopIndex => new ReadExpr(r.Array, r.Subscripts, r.Path + "." + name, r.Role),

                // A component of an antisymmetric flux is antisymmetric in the same arguments.
                CallExpr { Symmetry: CallSymmetry.Antisymmetric } c => new CallExpr(c.Function + "." + name, c.Arguments, CallSymmetry.Antisymmetric, c.IsBoundaryFlux),
                var other => (Expr)new CallExpr("." + name, ImmutableArray.Create(SumExpr.Factor(other)), CallSymmetry.None),
            };
            terms.Add(new Term(t.Coefficient, new[] { projected }, t.Origins));
        }

        return SumExpr.Of(terms);
    }

    private bool IsInvariantReceiver(IOperation instance) => instance switch
    {
        IParameterReferenceOperation p => !Bindings.ContainsKey(p.Parameter),
        ILocalReferenceOperation l => !Bindings.TryGetValue(l.Local, out var b) || b is ArrayBinding || (b is ValueBinding v && v.Value.IsInvariant),
        IFieldReferenceOperation { Instance: var i } => i is null || i is IInstanceReferenceOperation || IsInvariantReceiver(i),
        IPropertyReferenceOperation { Property.IsIndexer: false, Instance: var i } => i is null || i is IInstanceReferenceOperation || IsInvariantReceiver(i),
        IConversionOperation c => IsInvariantReceiver(c.Operand),
        _ => false,
    };

    /// <summary>
    /// An element read at a subscript chosen by a condition (<c>u[k &gt;= 0 ? k : left]</c>): the array,
    /// the subscripts as values and the component, kept uninterpreted.
    /// </summary>
    private OpaqueReadExpr OpaqueElement(IOperation operation, string reason)
    {
        string path = string.Empty;
        while (true)
        {
            switch (operation)
            {
                case IFieldReferenceOperation { Instance: { } instance } field when IsElementLike(instance):
                    path = "." + field.Field.Name + path;
                    operation = instance;
                    continue;
                case IPropertyReferenceOperation { Property.IsIndexer: false, Instance: { } instance } property when IsElementLike(instance):
                    path = "." + property.Property.Name + path;
                    operation = instance;
                    continue;
                case IConversionOperation { OperatorMethod: null } conversion:
                    operation = conversion.Operand;
                    continue;
            }

            break;
        }

        var groups = new List<ImmutableArray<SumExpr>>();
        IOperation receiver;
        switch (operation)
        {
            case IArrayElementReferenceOperation element:
                var current = element;
                while (true)
                {
                    groups.Insert(0, current.Indices.Select(i => Read(i).StripOrigins()).ToImmutableArray());
                    if (current.ArrayReference is IArrayElementReferenceOperation inner)
                    {
                        current = inner;
                        continue;
                    }

                    break;
                }

                receiver = current.ArrayReference;
                break;
            case IPropertyReferenceOperation { Property.IsIndexer: true, Instance: { } instance } indexer:
                groups.Add(indexer.Arguments.Select(a => Read(a.Value).StripOrigins()).ToImmutableArray());
                receiver = instance;
                break;
            default:
                throw new NotModelledException(reason, operation.Syntax);
        }

        var (root, role) = ArrayRoot(receiver);
        return new OpaqueReadExpr(root, groups.ToImmutableArray(), path, role, reason);
    }

    /// <summary><c>faces[n]</c>: the element of the face list at the position variable.</summary>
    public bool IsListElement(IOperation operation, ISymbol position, string root)
    {
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

        var index = indices[0];
        while (index is IConversionOperation c)
        {
            index = c.Operand;
        }

        return index is ILocalReferenceOperation local && SymbolEqualityComparer.Default.Equals(local.Local, position) && ArrayRoot(receiver).Root == root;
    }

    /// <summary>
    /// <c>faceLeft[f] == c</c> (either order, or <c>!=</c>) while a gather is read for one side: a constant.
    /// Null when the comparison is not of the cell with a compared map at the face.
    /// </summary>
    private bool? SideTest(IBinaryOperation binary)
    {
        if (Gather is not { } gather || binary.OperatorKind is not (BinaryOperatorKind.Equals or BinaryOperatorKind.NotEquals))
        {
            return null;
        }

        var cell = AffineIndex.Variable(gather.CellVariable).Key;
        var face = AffineIndex.Variable(gather.FaceVariable).Key;
        bool? Test(IOperation a, IOperation b)
        {
            var x = Read(a);
            if (x.Terms.Length != 1 || !x.Terms[0].Coefficient.IsOne || x.Terms[0].Factors.Length != 1
                || x.Terms[0].Factors[0] is not ReadExpr { IsLoopIndex: true } index || index.Subscripts[0][0].Key != cell)
            {
                return null;
            }

            var y = Read(b);
            if (y.Terms.Length != 1 || !y.Terms[0].Coefficient.IsOne || y.Terms[0].Factors.Length != 1
                || y.Terms[0].Factors[0] is not ReadExpr { IsLoopIndex: false, Path.Length: 0 } map
                || map.Subscripts.Length != 1 || map.Subscripts[0].Length != 1 || map.Subscripts[0][0].Key != face)
            {
                return null;
            }

            return gather.IsOnSide(map.Array);
        }

        var onSide = Test(binary.LeftOperand, binary.RightOperand) ?? Test(binary.RightOperand, binary.LeftOperand);
        return onSide is bool b ? b == (binary.OperatorKind == BinaryOperatorKind.Equals) : null;
    }

    private SumExpr ReadBinary(IBinaryOperation binary)
    {
        if (SideTest(binary) is bool side)
        {
            return Bool(side);
        }

        if (binary.OperatorMethod is { } op)
        {
            return ReadUserOperator(binary, op);
        }

        switch (binary.OperatorKind)
        {
            case BinaryOperatorKind.Add:
                return Read(binary.LeftOperand) + Read(binary.RightOperand);
            case BinaryOperatorKind.Subtract:
                return Read(binary.LeftOperand) - Read(binary.RightOperand);
            case BinaryOperatorKind.Multiply:
                return Read(binary.LeftOperand) * Read(binary.RightOperand);
            case BinaryOperatorKind.Divide when !IsIntegral(binary.Type):
                return Read(binary.LeftOperand) * Reciprocal(Read(binary.RightOperand));
            default:
                return Opaque(OperatorText(binary.OperatorKind), binary.Syntax, Read(binary.LeftOperand), Read(binary.RightOperand));
        }
    }

    /// <summary>
    /// User-defined operators of state structs: <c>+</c>, <c>-</c> and scaling by a number are taken as
    /// component-wise and linear (the contract of generated conserved states); anything else is a call.
    /// </summary>
    private SumExpr ReadUserOperator(IBinaryOperation binary, IMethodSymbol op)
    {
        if (IsTrustedGeometryOperator(op))
        {
            // Vec3 arithmetic of the runtime: a value of geometry, never a term of a conserved state, so
            // an uninterpreted function of its operands (the same operands give the same value).
            return Opaque(op.ContainingType.Name + "." + op.Name, binary.Syntax, Read(binary.LeftOperand), Read(binary.RightOperand));
        }

        RequireComponentWise(op, binary.Syntax);
        bool leftScalar = IsScalar(binary.LeftOperand.Type);
        bool rightScalar = IsScalar(binary.RightOperand.Type);
        switch (binary.OperatorKind)
        {
            case BinaryOperatorKind.Add when !leftScalar && !rightScalar:
                return Read(binary.LeftOperand) + Read(binary.RightOperand);
            case BinaryOperatorKind.Subtract when !leftScalar && !rightScalar:
                return Read(binary.LeftOperand) - Read(binary.RightOperand);
            case BinaryOperatorKind.Multiply when leftScalar != rightScalar:
                return Read(binary.LeftOperand) * Read(binary.RightOperand);
            case BinaryOperatorKind.Divide when rightScalar && !leftScalar:
                return Read(binary.LeftOperand) * Reciprocal(Read(binary.RightOperand));
            default:
                return Opaque(op.ContainingType.Name + "." + op.Name, binary.Syntax, Read(binary.LeftOperand), Read(binary.RightOperand));
        }
    }

    /// <summary>
    /// A compiled operator of a type marked <c>[GeometryValue]</c> whose result is such a value too
    /// (the runtime's <c>Vec3</c>): never a conserved state, so read as a call, whatever its body does
    /// with the components. The purity checker trusts those members as the attribute declares.
    /// (<c>[Pure]</c> of System.Diagnostics.Contracts cannot declare this: it is conditional on
    /// CONTRACTS_FULL and absent from metadata.)
    /// </summary>
    private bool IsTrustedGeometryOperator(IMethodSymbol op) =>
        op.DeclaringSyntaxReferences.IsEmpty
        && Known.IsGeometryValue(op.ContainingType)
        && Known.IsGeometryValue(op.ReturnType)
        && _method.Purity.Classify(op) is { Kind: PurityKind.Pure, WrittenParameters.Count: 0 };

    /// <summary>A user-defined operator is read as arithmetic only when it is component-wise (<see cref="ComponentWiseOperators"/>).</summary>
    public static void RequireComponentWise(IMethodSymbol op, SyntaxNode where)
    {
        if (op.MethodKind == MethodKind.UserDefinedOperator && op.Name is "op_Addition" or "op_Subtraction" or "op_Multiply" or "op_Division"
            && !ComponentWiseOperators.IsComponentWise(op))
        {
            throw new NotModelledException(
                $"the operator `{op.ToDisplayString(SymbolDisplayFormat.CSharpShortErrorMessageFormat)}` is not visibly component-wise (each field of the result the same field of the operands, combined by that operator)",
                where);
        }
    }

    private SumExpr ReadCall(IInvocationOperation invocation)
    {
        var method = invocation.TargetMethod;
        var symmetry = CallSymmetry.None;
        string function;
        if (IsType(method.ContainingType, Known.Math) || IsType(method.ContainingType, Known.MathF))
        {
            function = "Math." + method.Name;
            if (method.Name is "Max" or "Min")
            {
                symmetry = CallSymmetry.Symmetric;
            }
        }
        else
        {
            var purity = _method.Purity.Classify(method);
            if (purity.Kind == PurityKind.Unknown)
            {
                throw new NotModelledException($"it calls `{method.ToDisplayString(SymbolDisplayFormat.CSharpShortErrorMessageFormat)}`, whose body the checker cannot see", invocation.Syntax);
            }

            if (purity.Kind == PurityKind.Impure && !Known.HasAttribute(method, Known.NumericalFlux))
            {
                _method.ReportImpureCall(invocation, method, purity);
            }

            function = method.MethodKind == MethodKind.LocalFunction || SymbolEqualityComparer.Default.Equals(method.ContainingType, _method.ContainingType)
                ? method.Name
                : method.ContainingType.Name + "." + method.Name;
            if (Known.IsAntisymmetricFlux(method))
            {
                symmetry = CallSymmetry.Antisymmetric;
            }
        }

        var arguments = new List<SumExpr>();
        if (!method.IsStatic && invocation.Instance is { } instance)
        {
            if (IsElementLike(instance) || instance is ILocalReferenceOperation)
            {
                arguments.Add(Read(instance));
            }
            else
            {
                function = Name(instance) + "." + method.Name;
            }
        }

        foreach (var argument in invocation.Arguments.OrderBy(a => a.Parameter?.Ordinal ?? 0))
        {
            if (argument.Parameter?.RefKind is RefKind.Out or RefKind.Ref)
            {
                throw new NotModelledException($"the call `{Short(invocation.Syntax)}` passes an argument by reference, so it may write state", argument.Syntax);
            }

            if (argument.ArgumentKind == ArgumentKind.ParamArray)
            {
                throw new NotModelledException($"the call `{Short(invocation.Syntax)}` takes a params array", argument.Syntax);
            }

            arguments.Add(Read(argument.Value));
        }

        return Call(function, symmetry, invocation.Syntax, arguments, Known.HasAttribute(method, Known.BoundaryFlux));
    }

    private SumExpr Opaque(string function, SyntaxNode syntax, params SumExpr[] arguments) =>
        Call(function, CallSymmetry.None, syntax, arguments);

    private SumExpr Call(string function, CallSymmetry symmetry, SyntaxNode syntax, IReadOnlyList<SumExpr> arguments, bool isBoundaryFlux = false)
    {
        var call = new CallExpr(function, arguments.Select(a => a.StripOrigins()).ToImmutableArray(), symmetry, isBoundaryFlux);
        if (arguments.All(a => a.IsInvariant))
        {
            return SumExpr.Invariant(SymPoly.Symbol(call.Render()));
        }

        return SumExpr.Factor(call, _method.Origins.Add(syntax));
    }

    private static SumExpr Reciprocal(SumExpr value) => value.Reciprocal(OpaqueInvariant);

    public static SymPoly OpaqueInvariant(SymPoly value) => SumExpr.OpaqueInvariant(value);

    private static SumExpr Constant(object value, SyntaxNode syntax)
    {
        double number = Convert.ToDouble(value, System.Globalization.CultureInfo.InvariantCulture);
        if (!Rational.TryFromDouble(number, out var rational))
        {
            throw new NotModelledException($"the constant `{Short(syntax)}` is not a finite number", syntax);
        }

        return SumExpr.Invariant(SymPoly.Constant(rational));
    }

    /// <summary>Canonical text of a loop-invariant member chain: <c>mesh.Dx</c>, <c>Grid.Count</c>.</summary>
    public string Name(IOperation operation) => operation switch
    {
        IParameterReferenceOperation p => p.Parameter.Name,
        ILocalReferenceOperation l when Bindings.TryGetValue(l.Local, out var b) && b is ArrayBinding a => a.Root,
        ILocalReferenceOperation l => l.Local.Name,
        IInstanceReferenceOperation => "this",
        IFieldReferenceOperation { Instance: null } f => f.Field.ContainingType.Name + "." + f.Field.Name,
        IFieldReferenceOperation { Instance: IInstanceReferenceOperation } f => f.Field.Name,
        IFieldReferenceOperation f => Name(f.Instance!) + "." + f.Field.Name,
        IPropertyReferenceOperation { Instance: null } p => p.Property.ContainingType.Name + "." + p.Property.Name,
        IPropertyReferenceOperation { Instance: IInstanceReferenceOperation } p => p.Property.Name,
        IPropertyReferenceOperation p when !p.Property.IsIndexer => Name(p.Instance!) + "." + p.Property.Name,
        IConversionOperation c => Name(c.Operand),
        _ => throw new NotModelledException($"`{Short(operation.Syntax)}` is not a name the checker can treat as loop-invariant", operation.Syntax),
    };

    private static bool IsType(INamedTypeSymbol? type, INamedTypeSymbol? known) =>
        known is not null && SymbolEqualityComparer.Default.Equals(type, known);

    private static bool IsNumeric(object value) =>
        value is double or float or int or long or short or byte or sbyte or uint or ulong or ushort or decimal;

    public static bool IsIntegral(ITypeSymbol? type) => type?.SpecialType is SpecialType.System_Int32 or SpecialType.System_Int64
        or SpecialType.System_Int16 or SpecialType.System_UInt32 or SpecialType.System_UInt64 or SpecialType.System_UInt16
        or SpecialType.System_Byte or SpecialType.System_SByte;

    private static bool IsScalar(ITypeSymbol? type) =>
        IsIntegral(type) || type?.SpecialType is SpecialType.System_Double or SpecialType.System_Single or SpecialType.System_Decimal;

    private static string OperatorText(BinaryOperatorKind kind) => kind switch
    {
        BinaryOperatorKind.LessThan => "<",
        BinaryOperatorKind.LessThanOrEqual => "<=",
        BinaryOperatorKind.GreaterThan => ">",
        BinaryOperatorKind.GreaterThanOrEqual => ">=",
        BinaryOperatorKind.Equals => "==",
        BinaryOperatorKind.NotEquals => "!=",
        BinaryOperatorKind.ConditionalAnd => "&&",
        BinaryOperatorKind.ConditionalOr => "||",
        BinaryOperatorKind.Divide => "div",
        BinaryOperatorKind.Remainder => "mod",
        _ => kind.ToString(),
    };

    public static string Short(SyntaxNode syntax)
    {
        string text = syntax.ToString().Replace("\r", " ").Replace("\n", " ");
        return text.Length <= 60 ? text : text.Substring(0, 57) + "...";
    }
}
