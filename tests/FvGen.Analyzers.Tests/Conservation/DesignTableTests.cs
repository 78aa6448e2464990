using FvGen.Analyzers.Conservation;
using static FvGen.Analyzers.Tests.Conservation.Kernel;

namespace FvGen.Analyzers.Tests.Conservation;

/// <summary>
/// The examples table of DESIGN.md ("The conservation criterion"), checked on engine terms. Each
/// expected class sum is worked by hand in the comment beside it.
/// </summary>
public sealed class DesignTableTests
{
    private static readonly LoopSpace I = LoopSpace.Lattice("i");
    private static readonly LoopSpace IJ = LoopSpace.Lattice("i", "j");

    [Fact]
    public void FluxDifferenceIsConservative()
    {
        // R[i] = -(F[i+1] - F[i]) / dx ; class F[•]: -1/dx + 1/dx = 0
        var value = -Div(Read("F", At("i", 1)) - Read("F", At("i")), Sym("dx"));
        Assert.Empty(Check(I, Assign("R", Cell(At("i")), value)));
    }

    [Fact]
    public void SignSlipIsUnbalanced()
    {
        // R[i] = -(F[i+1] + F[i]) / dx ; class F[•]: -1/dx - 1/dx = -2/dx
        var value = -Div(Read("F", At("i", 1)) + Read("F", At("i")), Sym("dx"));
        var finding = Assert.Single(Check(I, Assign("R", Cell(At("i")), value)));
        Assert.Equal(FindingKind.UnbalancedFaceTerm, finding.Kind);
        Assert.Equal("-2/dx", finding.Arguments[2]);
        Assert.Contains("needs weight 1/dx", finding.Arguments[4]);
    }

    [Fact]
    public void DroppedYFaceTermNamesTheMissingCounterpart()
    {
        // R[i,j] = -(Fx[i+1,j] - Fx[i,j])/dx - Fy[i,j+1]/dy ; Fx[•]: 0 ; Fy[•]: -1/dy
        var value = -Div(Read("Fx", At("i", 1), At("j")) - Read("Fx", At("i"), At("j")), Sym("dx"))
            - Div(Read("Fy", At("i"), At("j", 1)), Sym("dy"));
        var finding = Assert.Single(Check(IJ, Assign("R", Cell(At("i"), At("j")), value)));
        Assert.Equal(FindingKind.DroppedFaceTerm, finding.Kind);
        Assert.Equal("Fy[i, j + 1]", finding.Arguments[0]);
        Assert.Equal("leaves", finding.Arguments[1]);
        Assert.Equal("(i, j)", finding.Arguments[2]);
        Assert.Equal("-1/dy", finding.Arguments[3]);
        Assert.Equal("j", finding.Arguments[5]);
        Assert.Equal("+ Fy[i, j] / dy", finding.Arguments[6]);
    }

    [Fact]
    public void CounterpartShiftIsWrittenWithInvariantDigits()
    {
        // The FVC0001 fix parses the shift with the invariant culture; Swedish formats −1 with U+2212.
        var culture = System.Globalization.CultureInfo.CurrentCulture;
        try
        {
            System.Globalization.CultureInfo.CurrentCulture = new System.Globalization.CultureInfo("sv-SE");
            var value = -Div(Read("Fx", At("i", 1), At("j")) - Read("Fx", At("i"), At("j")), Sym("dx"))
                - Div(Read("Fy", At("i"), At("j", 1)), Sym("dy"));
            var finding = Assert.Single(Check(IJ, Assign("R", Cell(At("i"), At("j")), value)));
            Assert.Equal("j=-1", finding.Properties[FindingProperties.CounterpartShift]);
        }
        finally
        {
            System.Globalization.CultureInfo.CurrentCulture = culture;
        }
    }

    [Fact]
    public void MismatchedFluxEvaluationsArePaired()
    {
        // R[i] = -(G(U[i],U[i+1]) - G(U[i],U[i-1])) / dx
        // G(U[•],U[•+1]): -1/dx ; G(U[•+1],U[•]): +1/dx  (G not declared antisymmetric)
        var value = -Div(Call("G", Read("U", At("i")), Read("U", At("i", 1))) - Call("G", Read("U", At("i")), Read("U", At("i", -1))), Sym("dx"));
        var finding = Assert.Single(Check(I, Assign("R", Cell(At("i")), value)));
        Assert.Equal(FindingKind.MismatchedFluxEvaluations, finding.Kind);
        Assert.Equal("G(U[i], U[i - 1])", finding.Arguments[0]);
        Assert.Equal("G(U[i - 1], U[i])", finding.Arguments[4]);
    }

    [Fact]
    public void AntisymmetricFluxMayBeFlippedWithItsSign()
    {
        // Same update with G declared antisymmetric: G(U[i],U[i-1]) = -G(U[i-1],U[i]) closes the class.
        var value = -Div(
            Call("G", CallSymmetry.Antisymmetric, Read("U", At("i")), Read("U", At("i", 1)))
            + Call("G", CallSymmetry.Antisymmetric, Read("U", At("i")), Read("U", At("i", -1))),
            Sym("dx"));
        Assert.Empty(Check(I, Assign("R", Cell(At("i")), value)));
    }

    [Fact]
    public void AdvectiveFormIsNotInConservationForm()
    {
        // R[i] = -U[i] * (U[i] - U[i-1]) / dx ; U[•]²: -1/dx (reads only cell i) ; U[•]U[•+1]: +1/dx, with no
        // counterpart: reported as the face term U[i]·U[i-1] that no neighbour gives up.
        var value = -Div(Read("U", At("i")) * (Read("U", At("i")) - Read("U", At("i", -1))), Sym("dx"));
        var finding = Assert.Single(Check(I, Assign("R", Cell(At("i")), value)));
        Assert.Equal(FindingKind.DroppedFaceTerm, finding.Kind);
        Assert.Equal("U[i - 1] * U[i]", finding.Arguments[0]);
        Assert.Equal("1/dx", finding.Arguments[3]);
    }

    [Fact]
    public void LaxFriedrichsUpdateCarriesTheOldTotalWithWeightOne()
    {
        // Un[i] = (U[i-1] + U[i+1]) / 2 - c * (f(U[i+1]) - f(U[i-1])) ; U[•]: 1/2 + 1/2 = 1 ; f(U[•]): 0
        var value = Div(Read("U", At("i", -1)) + Read("U", At("i", 1)), Num(2))
            - (Sym("c") * (Call("f", Read("U", At("i", 1))) - Call("f", Read("U", At("i", -1)))));
        Assert.Empty(Check(I, Assign("Un", Cell(At("i")), value)));
    }

    [Fact]
    public void OldTotalWithTheWrongWeightIsReported()
    {
        // Un[i] = (U[i-1] + U[i+1]) / 4 - ... : U[•] sums to 1/2, not 1.
        var value = Div(Read("U", At("i", -1)) + Read("U", At("i", 1)), Num(4))
            - (Sym("c") * (Call("f", Read("U", At("i", 1))) - Call("f", Read("U", At("i", -1)))));
        var finding = Assert.Single(Check(I, Assign("Un", Cell(At("i")), value)));
        Assert.Equal(FindingKind.UnbalancedFaceTerm, finding.Kind);
        Assert.Equal("1/2", finding.Arguments[2]);
        Assert.Equal("1", finding.Arguments[3]);
    }
}
