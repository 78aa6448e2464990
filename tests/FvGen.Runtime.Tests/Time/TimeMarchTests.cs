using FvGen.Fields;
using FvGen.Meshes.Structured;
using FvGen.Runtime.Tests.Ledger;
using FvGen.Time;

namespace FvGen.Runtime.Tests.Time;

public sealed class TimeMarchTests
{
    private static StructuredGrid1D Channel(int cells = 20) =>
        new(GridAxis.Uniform(cells, 0.0, 1.0), SideBoundary.Patch("inflow"), SideBoundary.Patch("outflow"));

    private static TimeMarch<Tracers> March(StructuredGrid1D grid, TimeStepRule<Tracers> rule)
    {
        var field = new CellField<Tracers>(grid);
        field.Fill(_ => new Tracers { Mass = 1, Charge = 0 });
        return new TimeMarch<Tracers>(field, ManufacturedFlux.OneDimensional(grid), new SspRungeKutta2<Tracers>(grid), rule);
    }

    [Fact]
    public void StepsLandExactlyOnOutputTimesAndTheEndTime()
    {
        // CFL 0.9 on dx = 0.05 with λ = 1 gives dt = 0.045, which does not divide 0.1 or 0.25.
        var march = March(Channel(), TimeStepRule<Tracers>.FromCfl(0.9, (in Tracers _, int _) => 1.0));
        var written = new List<(int Step, double Time)>();
        march.OutputAt([0.0, 0.1, 0.25], (step, time, _) => written.Add((step, time)));

        var result = march.Run(0.0, 0.3);

        Assert.Equal([0.0, 0.1, 0.25], written.Select(w => w.Time));
        Assert.Equal(0, written[0].Step);
        Assert.Equal(0.3, result.FinalTime);
        Assert.True(result.ReachedEndTime);
        Assert.Equal(0.045, result.LargestStep, 15);
        // 0.1 = 2·0.045 + 0.01, 0.25 − 0.1 = 3·0.045 + 0.015, 0.3 − 0.25 = 0.045 + 0.005:
        // steps are shortened to land on each output time, the shortest being 0.005.
        Assert.Equal(0.005, result.SmallestStep, 12);
        Assert.Equal(2 + 1 + 3 + 1 + 1 + 1, result.Steps);
    }

    [Fact]
    public void ProgressLinesCarryStepTimeStepSizeAndImbalance()
    {
        var march = March(Channel(), TimeStepRule<Tracers>.Fixed(0.01));
        var text = new StringWriter();
        march.Progress = new ProgressReporter(text, everySteps: 10);

        march.Run(0.0, 0.25);

        string[] lines = text.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries);
        // initial state, steps 10 and 20, and the last step 25
        Assert.Equal(4, lines.Length);
        Assert.StartsWith("step        0  t = 0 ", lines[0]);
        Assert.StartsWith("step       10  t = 0.1 ", lines[1]);
        Assert.Contains("dt = 1.000E-02", lines[1]);
        Assert.Contains("ledger imbalance (relative): step ", lines[1]);
        Assert.StartsWith("step       25  t = 0.25 ", lines[3]);
    }

    [Fact]
    public void WallClockProgressNeedsNoStepInterval()
    {
        var march = March(Channel(), TimeStepRule<Tracers>.Fixed(0.01));
        var text = new StringWriter();
        march.Progress = new ProgressReporter(text, everySteps: 0, everyWallClock: TimeSpan.FromHours(1));

        march.Run(0.0, 0.05);

        // Within an hour only the first and last lines are due.
        Assert.Equal(2, text.ToString().Split('\n', StringSplitOptions.RemoveEmptyEntries).Length);
        Assert.Throws<ArgumentException>(() => new ProgressReporter(text, everySteps: 0));
    }

    [Fact]
    public void StepLimitEndsTheRunEarlyAndSaysSo()
    {
        var march = March(Channel(), TimeStepRule<Tracers>.Fixed(0.01));
        march.MaxSteps = 7;
        var text = new StringWriter();
        march.Progress = new ProgressReporter(text, everySteps: 100);

        var result = march.Run(0.0, 1.0);

        Assert.False(result.ReachedEndTime);
        Assert.Equal(7, result.Steps);
        Assert.Equal(0.07, result.FinalTime, 14);
        Assert.Contains("Stopped at the step limit (7) at t = 0.07", text.ToString());
    }

    [Fact]
    public void OutputOutsideTheRunIsRejected()
    {
        var march = March(Channel(), TimeStepRule<Tracers>.Fixed(0.01));
        march.OutputAt(2.0, (_, _, _) => { });
        var ex = Assert.Throws<InvalidOperationException>(() => march.Run(0.0, 1.0));
        Assert.Contains("Output time 2 lies outside the run [0, 1]", ex.Message);
    }

    [Fact]
    public void FieldAndIntegratorOfDifferentSizesAreRejected()
    {
        var grid = Channel(20);
        var ex = Assert.Throws<ArgumentException>(() => new TimeMarch<Tracers>(
            new CellField<Tracers>(grid),
            ManufacturedFlux.OneDimensional(grid),
            new ForwardEuler<Tracers>(Channel(10)),
            TimeStepRule<Tracers>.Fixed(0.1)));
        Assert.Contains("made for 10 cells but the field has 20", ex.Message);
    }

    [Fact]
    public void MarchingAllocatesNothingPerStepWhenProgressIsOff()
    {
        // Two runs that differ only in their number of steps allocate the same: the setup
        // (schedule, summary) allocates, the steps themselves (CFL step, integrator, ledger,
        // health checks) do not.
        var grid = Channel();
        var march = March(grid, TimeStepRule<Tracers>.FromCfl(0.5, (in Tracers _, int _) => 1.0));
        // A requirement the manufactured state always meets, so that the rule is evaluated every step.
        march.Health.RequireComponent("Mass", static m => m > -1e6, "> -1e6");
        march.Run(0.0, 0.05);

        long before = GC.GetAllocatedBytesForCurrentThread();
        march.Run(0.0, 0.05);
        long shortRun = GC.GetAllocatedBytesForCurrentThread() - before;
        before = GC.GetAllocatedBytesForCurrentThread();
        var result = march.Run(0.0, 2.0);
        long longRun = GC.GetAllocatedBytesForCurrentThread() - before;

        Assert.True(result.Steps > 50);
        Assert.Equal(shortRun, longRun);
    }

    [Fact]
    public void IntegratorWeightsThatDoNotSumToOneAreRejected()
    {
        var ex = Assert.Throws<ArgumentException>(() => new HalfWeightEuler());
        Assert.Contains("must sum to 1; they sum to 0.5", ex.Message);
    }

    private sealed class HalfWeightEuler() : TimeIntegrator<Tracers>(4, 2, [0.5], [0.0])
    {
        public override string Name => "broken";

        public override int Order => 1;

        protected override void StepCore(Span<Tracers> state, double time, double dt, ResidualFunction<Tracers> residual, IStageFluxObserver? observer)
        {
        }
    }
}
