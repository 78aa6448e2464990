using FvGen.Fields;
using FvGen.Ledger;
using FvGen.Meshes.Structured;
using FvGen.Time;

namespace FvGen.Runtime.Tests.Ledger;

/// <summary>
/// The discrete statement of the divergence theorem for a fixed control volume (REFERENCES.md,
/// "Geometry"): the change of every conserved total equals the net inflow through the boundary.
/// With the stage fluxes weighted by the integrator's effective weights (Shu &amp; Osher 1988;
/// Gottlieb &amp; Shu 1998: RK3 1/6, 1/6, 2/3) it must hold to rounding at every step.
/// </summary>
public sealed class LedgerClosureTests
{
    private const double RoundingTolerance = 1e-12;

    public static TheoryData<string> Integrators => new() { "Euler", "SSP-RK2", "SSP-RK3" };

    [Theory]
    [MemberData(nameof(Integrators))]
    public void ClosesToRoundingOverTenThousandStepsWithInflowAndOutflow1D(string integratorName)
    {
        var grid = new StructuredGrid1D(GridAxis.Geometric(48, 0.0, 1.0, 1.04), SideBoundary.Patch("inflow"), SideBoundary.Patch("outflow"));
        var field = new CellField<Tracers>(grid);
        field.Fill(p => new Tracers { Mass = 1 + 0.2 * Math.Sin(7 * p.X), Charge = 0.1 * Math.Cos(4 * p.X) });
        var march = new TimeMarch<Tracers>(
            field,
            ManufacturedFlux.OneDimensional(grid),
            TimeIntegrator<Tracers>.Create(integratorName, grid),
            TimeStepRule<Tracers>.Fixed(1e-3),
            new LedgerOptions { StepTolerance = RoundingTolerance, CumulativeTolerance = RoundingTolerance });

        var result = march.Run(0.0, 10.0);

        Assert.Equal(10_000, result.Steps);
        Assert.Equal(10.0, result.FinalTime);
        foreach (var c in result.Ledger.Components)
        {
            Assert.True(c.RelativeImbalance <= RoundingTolerance, $"{c.Component}: cumulative relative imbalance {c.RelativeImbalance:E2}");
            Assert.True(c.WorstStepRelativeImbalance <= RoundingTolerance, $"{c.Component}: worst step {c.WorstStepRelativeImbalance:E2}");
        }

        // Not a vacuous balance: material really flowed in and out, more than the domain holds.
        var mass = result.Ledger.Components[0];
        Assert.True(mass.Inflow > 5 && mass.Outflow > 5, $"inflow {mass.Inflow}, outflow {mass.Outflow}");
        Assert.True(mass.PatchOutflow[0] < 0 && mass.PatchOutflow[1] > 0);
    }

    [Theory]
    [MemberData(nameof(Integrators))]
    public void ClosesToRoundingOnAStretched2DGridWithFourPatchSides(string integratorName)
    {
        var walls = SideBoundary.Patch("walls");
        var grid = new StructuredGrid2D(
            GridAxis.Geometric(16, 0.0, 2.0, 1.1),
            GridAxis.Uniform(10, 0.0, 1.0),
            SideBoundary.Patch("inlet"),
            SideBoundary.Patch("outlet"),
            walls,
            walls);
        var field = new CellField<Tracers>(grid);
        field.Fill(p => new Tracers { Mass = 1 + 0.1 * p.X * p.Y, Charge = Math.Sin(p.X - p.Y) });
        var integrator = TimeIntegrator<Tracers>.Create(integratorName, grid);
        var march = new TimeMarch<Tracers>(
            field,
            ManufacturedFlux.TwoDimensional(grid),
            integrator,
            TimeStepRule<Tracers>.FromCfl(0.5, (in Tracers _, int _) => ManufacturedFlux.Speed),
            new LedgerOptions { StepTolerance = RoundingTolerance, CumulativeTolerance = RoundingTolerance });

        var result = march.Run(0.0, 3.0);

        Assert.True(result.Steps > 100);
        Assert.Equal(["inlet", "outlet", "walls"], result.Ledger.PatchNames);
        foreach (var c in result.Ledger.Components)
        {
            Assert.True(c.RelativeImbalance <= RoundingTolerance, $"{c.Component}: {c.RelativeImbalance:E2}");
            Assert.True(c.WorstStepRelativeImbalance <= RoundingTolerance, $"{c.Component}: {c.WorstStepRelativeImbalance:E2}");
            Assert.All(c.PatchOutflow, flow => Assert.NotEqual(0.0, flow));
        }
    }

    [Fact]
    public void DroppedFaceTermStopsTheRunNamingStepTimeComponentAndImbalance()
    {
        // Face 20 adds its flux to the cell in front of it but never takes it from the cell behind:
        // with forward Euler the first step creates exactly dt · F(face 20, t = 0) of every component.
        var grid = new StructuredGrid1D(GridAxis.Uniform(40, 0.0, 1.0), SideBoundary.Patch("inflow"), SideBoundary.Patch("outflow"));
        var field = new CellField<Tracers>(grid);
        field.Fill(_ => new Tracers { Mass = 1.0, Charge = 0.5 });
        var march = new TimeMarch<Tracers>(
            field,
            ManufacturedFlux.OneDimensional(grid, droppedFace: 20),
            new ForwardEuler<Tracers>(grid),
            TimeStepRule<Tracers>.Fixed(0.01));

        var ex = Assert.Throws<ConservationImbalanceException>(() => march.Run(0.0, 1.0));

        Assert.Equal(1, ex.Step);
        Assert.Equal(0.01, ex.Time);
        Assert.Equal("Mass", ex.Component);
        Assert.False(ex.IsCumulative);
        Assert.StartsWith("Conservation ledger: step 1, t = 0.01: component 'Mass' is out of balance in this step by 0.0249", ex.Message);
        Assert.Contains("tolerance 1E-10", ex.Message);
        Assert.Contains("a face term applied to one cell only", ex.Message);

        double droppedFlux = ManufacturedFlux.Background(0.5, 0.0, 0) + ManufacturedFlux.Speed * 1.0;
        Assert.Equal(0.01 * droppedFlux, ex.Imbalance, 12);
        Assert.True(ex.RelativeImbalance > 1e-3);
    }

    [Fact]
    public void MisreportedStageWeightsDoNotBalance()
    {
        // The same RK3 update, but claiming equal weights: the ledger must notice, which shows that
        // the balance really depends on the effective weights and is not closed by construction.
        var grid = new StructuredGrid1D(GridAxis.Uniform(30, 0.0, 1.0), SideBoundary.Patch("inflow"), SideBoundary.Patch("outflow"));
        var field = new CellField<Tracers>(grid);
        field.Fill(p => new Tracers { Mass = 1 + p.X, Charge = 0 });
        var march = new TimeMarch<Tracers>(
            field,
            ManufacturedFlux.OneDimensional(grid),
            new EquallyWeightedRk3(grid.CellCount, grid.PatchNames.Count),
            TimeStepRule<Tracers>.Fixed(0.01));

        var ex = Assert.Throws<ConservationImbalanceException>(() => march.Run(0.0, 1.0));
        Assert.Equal(1, ex.Step);
    }

    [Fact]
    public void ExemptComponentIsReportedButDoesNotStopTheRun()
    {
        var grid = new StructuredGrid1D(GridAxis.Uniform(10, 0.0, 1.0), SideBoundary.Patch("a"), SideBoundary.Patch("b"));
        var field = new CellField<Tracers>(grid);
        field.Fill(_ => new Tracers { Mass = 1, Charge = 1 });
        // A genuine volume source of Charge (decay at rate 1), no fluxes at all.
        ResidualFunction<Tracers> decay = (state, residual, _, _) =>
        {
            for (int i = 0; i < state.Length; i++)
            {
                residual[i] = new Tracers { Mass = 0, Charge = -state[i].Charge };
            }
        };
        var march = new TimeMarch<Tracers>(field, decay, new ForwardEuler<Tracers>(grid), TimeStepRule<Tracers>.Fixed(0.1), new LedgerOptions { ExemptComponents = ["Charge"] });

        var result = march.Run(0.0, 1.0);

        var charge = result.Ledger.Components[1];
        Assert.True(charge.IsExempt);
        // Forward Euler on y' = -y: y = 0.9^10 after ten steps; the total is that times the length 1.
        Assert.Equal(Math.Pow(0.9, 10), charge.FinalTotal, 12);
        Assert.Equal(Math.Pow(0.9, 10) - 1, charge.Imbalance, 12);
        Assert.Equal(0.0, result.Ledger.Components[0].Imbalance);
    }

    [Fact]
    public void UnknownExemptComponentIsRejectedWithTheKnownNames()
    {
        var grid = new StructuredGrid1D(GridAxis.Uniform(4, 0.0, 1.0), SideBoundary.Patch("a"), SideBoundary.Patch("b"));
        var ex = Assert.Throws<ArgumentException>(() => new ConservationLedger<Tracers>(grid, new LedgerOptions { ExemptComponents = ["Energy"] }));
        Assert.Contains("no component 'Energy'", ex.Message);
        Assert.Contains("Mass, Charge", ex.Message);
    }

    [Fact]
    public void SummaryTableNamesEveryComponentAndPatch()
    {
        var grid = new StructuredGrid1D(GridAxis.Uniform(20, 0.0, 1.0), SideBoundary.Patch("inflow"), SideBoundary.Patch("outflow"));
        var field = new CellField<Tracers>(grid);
        field.Fill(_ => new Tracers { Mass = 1, Charge = 0 });
        var march = new TimeMarch<Tracers>(field, ManufacturedFlux.OneDimensional(grid), new SspRungeKutta2<Tracers>(grid), TimeStepRule<Tracers>.Fixed(0.01));
        var summary = march.Run(0, 0.5).Ledger;

        var text = new StringWriter();
        summary.WriteTo(text);
        string table = text.ToString();
        Assert.Contains("after 50 steps, t = 0.5", table);
        Assert.Contains("  Mass\n", table);
        Assert.Contains("  Charge\n", table);
        Assert.Contains("net outflow through 'inflow': -", table);
        Assert.Contains("net outflow through 'outflow': ", table);
    }

    private sealed class EquallyWeightedRk3 : TimeIntegrator<Tracers>
    {
        private readonly SspRungeKutta3<Tracers> _inner;

        public EquallyWeightedRk3(int cells, int patches)
            : base(cells, patches, [1.0 / 3, 1.0 / 3, 1.0 / 3], [0.0, 1.0, 0.5])
        {
            _inner = new SspRungeKutta3<Tracers>(cells, patches);
        }

        public override string Name => "RK3 with wrong weights";

        public override int Order => 3;

        protected override void StepCore(Span<Tracers> state, double time, double dt, ResidualFunction<Tracers> residual, IStageFluxObserver? observer) =>
            _inner.Step(state, time, dt, residual, new Reweigh(observer!, this));

        private sealed class Reweigh(IStageFluxObserver target, EquallyWeightedRk3 owner) : IStageFluxObserver
        {
            public void RecordStage(int stage, double weight, BoundaryFluxTally tally) => target.RecordStage(stage, owner.StageWeights[stage], tally);
        }
    }
}
