using System.Collections.Immutable;
using FvGen.Analyzers.Conservation;

namespace FvGen.Analyzers.Tests.Conservation;

/// <summary>A small algebra for writing updates as engine terms in tests, the way a kernel reads.</summary>
internal static class Kernel
{
    private static int _origin;

    public static AffineIndex At(string variable, long offset = 0) =>
        AffineIndex.Variable(variable) + AffineIndex.FromConstant(SymPoly.Constant(offset));

    public static AffineIndex Lin(long constant, params (string Variable, SymPoly Coefficient)[] parts) =>
        new(SymPoly.Constant(constant), parts.Select(p => new SparseEntry<string, SymPoly>(p.Variable, p.Coefficient)));

    public static SumExpr Read(string array, params AffineIndex[] index) => Read(array, DataRole.Cell, index);

    public static SumExpr Face(string array, params AffineIndex[] index) => Read(array, DataRole.Face, index);

    public static SumExpr Read(string array, DataRole role, params AffineIndex[] index) =>
        SumExpr.Factor(
            new ReadExpr(array, ImmutableArray.Create(index.Select(i => (IndexTerm)new AffineSubscript(i)).ToImmutableArray()), string.Empty, role),
            _origin++);

    public static SumExpr ReadMapped(string array, string map, AffineIndex argument) =>
        SumExpr.Factor(
            new ReadExpr(array, ImmutableArray.Create(ImmutableArray.Create<IndexTerm>(new MappedSubscript(map, ImmutableArray.Create(argument)))), string.Empty, DataRole.Cell),
            _origin++);

    public static ImmutableArray<ImmutableArray<IndexTerm>> Cell(params AffineIndex[] index) =>
        ImmutableArray.Create(index.Select(i => (IndexTerm)new AffineSubscript(i)).ToImmutableArray());

    public static ImmutableArray<ImmutableArray<IndexTerm>> MappedCell(string map, string variable) =>
        ImmutableArray.Create(ImmutableArray.Create<IndexTerm>(new MappedSubscript(map, ImmutableArray.Create(At(variable)))));

    public static SumExpr Sym(string name) => SumExpr.Invariant(SymPoly.Symbol(name));

    public static SumExpr Num(long numerator, long denominator = 1) => SumExpr.Invariant(SymPoly.Constant(Rational.Create(numerator, denominator)));

    public static SumExpr Call(string function, params SumExpr[] arguments) => Call(function, CallSymmetry.None, arguments);

    public static SumExpr Call(string function, CallSymmetry symmetry, params SumExpr[] arguments) =>
        SumExpr.Factor(new CallExpr(function, arguments.Select(a => a.StripOrigins()).ToImmutableArray(), symmetry), _origin++);

    public static SumExpr Div(SumExpr a, SumExpr b) => a * b.Reciprocal(SumExpr.OpaqueInvariant);

    public static UpdateWrite Increment(string array, ImmutableArray<ImmutableArray<IndexTerm>> cell, SumExpr value) =>
        new(array, string.Empty, cell, value, false, _origin++);

    public static UpdateWrite Assign(string array, ImmutableArray<ImmutableArray<IndexTerm>> cell, SumExpr value) =>
        new(array, string.Empty, cell, value, true, _origin++);

    public static ImmutableArray<Finding> Check(LoopSpace space, params UpdateWrite[] writes) =>
        BalanceChecker.Check(new LoopUpdate(space, writes.ToImmutableArray(), false));
}
