using System.Collections.Immutable;
using FvGen.Analyzers.Conservation;
using static FvGen.Analyzers.Tests.Conservation.Kernel;

namespace FvGen.Analyzers.Tests.Conservation;

/// <summary>
/// The engine's side of two generated shapes: a cell gathering its faces from the cell-to-face list
/// (rewritten as the face loop it sums to), and a face value read at a subscript chosen by a condition
/// (accepted only when one face gives it to its two cells with opposite weights).
/// </summary>
public sealed class CellGatherAndOpaqueValueTests
{
    private static readonly LoopSpace C = LoopSpace.Lattice("c");
    private static readonly LoopSpace I = LoopSpace.Lattice("i");

    private static SumExpr Flux => Face("flux", At("f"));

    private static SumExpr Gather(SumExpr left, SumExpr right, string leftMap = "faceLeft", string? rightMap = null) =>
        SumExpr.Factor(new CellGatherExpr("c", "start/faces", "f", leftMap, rightMap ?? CellGatherExpr.OtherSide(leftMap), left, right));

    /// <summary><c>u[k &gt;= 0 ? k : i - 1]</c>, with <c>k</c> itself a conditional of <c>i</c>.</summary>
    private static SumExpr FarNeighbour(long offset)
    {
        var index = Call("?:", Call(">=", Read(string.Empty, At("i", offset))), Read(string.Empty, At("i", offset)), Read(string.Empty, At("i", offset + 1)));
        return SumExpr.Factor(new OpaqueReadExpr("u", ImmutableArray.Create(ImmutableArray.Create(index.StripOrigins())), string.Empty, DataRole.Cell, "the index is chosen by a condition"));
    }

    [Fact]
    public void GatherWithOppositeSidesIsTheConservativeFaceLoop()
    {
        // res[c] = Σ_f (c == left[f] ? -flux[f] : flux[f]) / vol[c]
        var value = Div(Gather(-Flux, Flux), Read("vol", At("c")));
        Assert.Empty(Check(C, Assign("res", Cell(At("c")), value)));
    }

    [Fact]
    public void GatherInUpdateFormCarriesTheOldTotal()
    {
        // un[c] = u[c] - dt / vol[c] · Σ_f ±flux[f]
        var value = Read("u", At("c")) - Sym("dt") * Div(Gather(Flux, -Flux), Read("vol", At("c")));
        Assert.Empty(Check(C, Assign("un", Cell(At("c")), value)));
    }

    [Theory]
    [InlineData(-1, -1)]
    [InlineData(1, 1)]
    [InlineData(-1, 0)]
    [InlineData(0, 1)]
    [InlineData(-2, 1)]
    public void GatherWhoseSidesDoNotCancelIsAOneSidedScatter(int left, int right)
    {
        var value = Div(Gather(Flux.Scale(SymPoly.Constant(left)), Flux.Scale(SymPoly.Constant(right))), Read("vol", At("c")));
        var findings = Check(C, Assign("res", Cell(At("c")), value));
        Assert.Contains(findings, f => f.Kind == FindingKind.OneSidedScatter);
    }

    [Fact]
    public void GatherMultipliedByAnotherFunctionOfTheCellIsNotModelled()
    {
        // res[c] = u[c + 1] · Σ_f ±flux[f]: the factor cannot be moved to the face's two cells.
        var value = Read("u", At("c", 1)) * Gather(-Flux, Flux);
        Assert.Throws<ModelLimitException>(() => Check(C, Assign("res", Cell(At("c")), value)));
    }

    [Fact]
    public void GatherWrittenToAnotherCellIsNotModelled()
    {
        Assert.Throws<ModelLimitException>(() => Check(C, Assign("res", Cell(At("c", 1)), Gather(-Flux, Flux))));
    }

    [Fact]
    public void GathersOverTwoDifferentListsAreNotMerged()
    {
        // Two inner loops over different lists are not one face loop, even with equal names inside.
        var other = SumExpr.Factor(new CellGatherExpr("c", "nodeStart/nodes", "f", "faceLeft", CellGatherExpr.OtherSide("faceLeft"), Flux, -Flux));
        Assert.Throws<ModelLimitException>(() => Check(C, Assign("res", Cell(At("c")), Gather(-Flux, Flux) + other)));
    }

    [Fact]
    public void GatherHiddenInACallIsNotModelled()
    {
        Assert.Throws<ModelLimitException>(() => Check(C, Assign("res", Cell(At("c")), Call("Limit", Gather(-Flux, Flux)))));
    }

    [Fact]
    public void FaceValueAtAConditionalSubscriptBalancesWithinTheFace()
    {
        // flux = G(u[far(i - 2)], u[i - 1], u[i], u[far(i + 1)]); r[i - 1] -= flux; r[i] += flux
        var flux = Call("G", FarNeighbour(-2), Read("u", At("i", -1)), Read("u", At("i")), FarNeighbour(1));
        Assert.Empty(Check(I, Increment("r", Cell(At("i", -1)), -flux), Increment("r", Cell(At("i")), flux)));
    }

    [Fact]
    public void FaceValueAtAConditionalSubscriptGivenWithOneSignIsAOneSidedScatter()
    {
        var flux = Call("G", FarNeighbour(-2), Read("u", At("i", -1)), Read("u", At("i")), FarNeighbour(1));
        var findings = Check(I, Increment("r", Cell(At("i", -1)), -flux), Increment("r", Cell(At("i")), -flux));
        Assert.Contains(findings, f => f.Kind == FindingKind.OneSidedScatter);
    }

    [Fact]
    public void FaceValueAtAConditionalSubscriptInACellLoopIsNotModelled()
    {
        // r[i] = -(G(far(i)) - G(far(i - 1))): it may well telescope, but the subscripts are not interpreted.
        var value = -(Call("G", FarNeighbour(0)) - Call("G", FarNeighbour(-1)));
        var e = Assert.Throws<ModelLimitException>(() => Check(I, Assign("r", Cell(At("i")), value)));
        Assert.Contains("chosen by a condition", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void FaceValueReadingTheWrittenArrayAtAConditionalSubscriptIsNotModelled()
    {
        var far = SumExpr.Factor(new OpaqueReadExpr("r", ImmutableArray.Create(ImmutableArray.Create(Call("?:", Sym("p"), Read(string.Empty, At("i")), Read(string.Empty, At("i", -1))).StripOrigins())), string.Empty, DataRole.Cell, "the index is chosen by a condition"));
        var flux = Call("G", far, Read("u", At("i")));
        Assert.Throws<ModelLimitException>(() => Check(I, Increment("r", Cell(At("i", -1)), -flux), Increment("r", Cell(At("i")), flux)));
    }
}
