using System.Diagnostics;
using System.Globalization;
using FvGen.Fields;
using FvGen.Health;
using FvGen.Ledger;
using FvGen.Meshes;

namespace FvGen.Time;

/// <summary>
/// Marches a cell field in time: per step Δt from the <see cref="TimeStepRule{TState}"/> (shortened to
/// land exactly on the next output time or the end time), one integrator step, the health checks,
/// the conservation ledger, any outputs that fall due, and a progress line when one is due.
/// </summary>
/// <remarks>
/// A step whose end lies within 1e-9·Δt of an output or end time is stretched onto it, so no sliver
/// steps appear from rounding. A failed check throws a <see cref="RunStoppedException"/>
/// (<see cref="ConservationImbalanceException"/> or <see cref="UnhealthyStateException"/>) and leaves
/// the field at the failing state.
/// </remarks>
public sealed class TimeMarch<TState>
    where TState : unmanaged
{
    private const double LandingSlack = 1e-9;

    private readonly List<(double Time, ScheduledOutput<TState> Write)> _outputs = [];
    private readonly ResidualFunction<TState> _residual;

    /// <summary>Creates a march of <paramref name="state"/> with the given residual, integrator and time-step rule.</summary>
    public TimeMarch(
        CellField<TState> state,
        ResidualFunction<TState> residual,
        TimeIntegrator<TState> integrator,
        TimeStepRule<TState> timeStep,
        LedgerOptions? ledgerOptions = null)
    {
        ArgumentNullException.ThrowIfNull(state);
        ArgumentNullException.ThrowIfNull(residual);
        ArgumentNullException.ThrowIfNull(integrator);
        ArgumentNullException.ThrowIfNull(timeStep);
        if (integrator.CellCount != state.Count)
        {
            throw new ArgumentException($"The integrator was made for {integrator.CellCount} cells but the field has {state.Count}.", nameof(integrator));
        }

        State = state;
        _residual = residual;
        Integrator = integrator;
        TimeStep = timeStep;
        Ledger = new ConservationLedger<TState>(state.Mesh, ledgerOptions);
    }

    /// <summary>The mesh of the field.</summary>
    public IMesh Mesh => State.Mesh;

    /// <summary>The field being marched, updated in place.</summary>
    public CellField<TState> State { get; }

    /// <summary>The time integrator.</summary>
    public TimeIntegrator<TState> Integrator { get; }

    /// <summary>How Δt is chosen.</summary>
    public TimeStepRule<TState> TimeStep { get; }

    /// <summary>The conservation ledger, balanced after every step.</summary>
    public ConservationLedger<TState> Ledger { get; }

    /// <summary>The per-cell checks made after every step (and on the initial state).</summary>
    public HealthChecks<TState> Health { get; } = new();

    /// <summary>The progress reporter; <see langword="null"/> (the default) prints nothing.</summary>
    public ProgressReporter? Progress { get; set; }

    /// <summary>The most steps a run may take; it returns with <see cref="TimeMarchResult.ReachedEndTime"/> false when it runs out.</summary>
    public int MaxSteps { get; set; } = int.MaxValue;

    /// <summary>Schedules <paramref name="write"/> at <paramref name="time"/>; the march lands a step exactly on it.</summary>
    public TimeMarch<TState> OutputAt(double time, ScheduledOutput<TState> write)
    {
        ArgumentNullException.ThrowIfNull(write);
        if (!double.IsFinite(time))
        {
            throw new ArgumentOutOfRangeException(nameof(time), time, "An output time must be finite.");
        }

        _outputs.Add((time, write));
        return this;
    }

    /// <summary>Schedules <paramref name="write"/> at each of <paramref name="times"/>.</summary>
    public TimeMarch<TState> OutputAt(IEnumerable<double> times, ScheduledOutput<TState> write)
    {
        ArgumentNullException.ThrowIfNull(times);
        foreach (double time in times)
        {
            OutputAt(time, write);
        }

        return this;
    }

    /// <summary>Marches from <paramref name="startTime"/> to <paramref name="endTime"/>.</summary>
    public TimeMarchResult Run(double startTime, double endTime)
    {
        if (!(double.IsFinite(startTime) && double.IsFinite(endTime) && endTime > startTime))
        {
            throw new ArgumentException(
                string.Create(CultureInfo.InvariantCulture, $"A run needs finite times with end > start; got start {startTime:R}, end {endTime:R}."));
        }

        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(MaxSteps);
        var schedule = _outputs.OrderBy(o => o.Time).ToArray();
        foreach (var (time, _) in schedule)
        {
            if (time < startTime || time > endTime)
            {
                throw new InvalidOperationException(
                    string.Create(CultureInfo.InvariantCulture, $"Output time {time:R} lies outside the run [{startTime:R}, {endTime:R}]."));
            }
        }

        var clock = Stopwatch.StartNew();
        var mesh = Mesh;
        double t = startTime;
        int step = 0;
        int nextOutput = 0;
        double dt = double.NaN;
        double smallest = double.PositiveInfinity;
        double largest = 0;

        Health.Check(mesh, State.ReadOnlySpan, step, t);
        Ledger.Start(State.ReadOnlySpan, t);
        Progress?.Begin(step, t);
        nextOutput = WriteDue(schedule, nextOutput, step, t);

        while (t < endTime && step < MaxSteps)
        {
            double target = nextOutput < schedule.Length ? schedule[nextOutput].Time : endTime;
            dt = TimeStep.Compute(mesh, State.ReadOnlySpan);
            if (!(dt > 0))
            {
                throw new InvalidOperationException(
                    string.Create(CultureInfo.InvariantCulture, $"The time step rule ({TimeStep}) gave dt = {dt:R} at step {step + 1}, t = {t:G10}."));
            }

            bool lands = t + dt * (1 + LandingSlack) >= target;
            if (lands)
            {
                dt = target - t;
            }

            Ledger.BeginStep(dt);
            Integrator.Step(State.Span, t, dt, _residual, Ledger);
            step++;
            t = lands ? target : t + dt;
            smallest = Math.Min(smallest, dt);
            largest = Math.Max(largest, dt);

            Health.Check(mesh, State.ReadOnlySpan, step, t);
            Ledger.EndStep(State.ReadOnlySpan, step, t);
            nextOutput = WriteDue(schedule, nextOutput, step, t);
            Progress?.AfterStep(step, t, dt, Ledger.StepRelativeImbalance, Ledger.CumulativeRelativeImbalance);
        }

        Progress?.End(step, t, dt, Ledger.StepRelativeImbalance, Ledger.CumulativeRelativeImbalance);
        bool reachedEnd = t >= endTime;
        if (!reachedEnd)
        {
            Progress?.Writer.WriteLine(
                string.Create(CultureInfo.InvariantCulture, $"Stopped at the step limit ({MaxSteps}) at t = {t:G10}, before the end time {endTime:G10}."));
        }

        return new TimeMarchResult(step, startTime, t, reachedEnd, step > 0 ? smallest : double.NaN, step > 0 ? largest : double.NaN, Ledger.Summarize(), clock.Elapsed);
    }

    private int WriteDue((double Time, ScheduledOutput<TState> Write)[] schedule, int next, int step, double t)
    {
        while (next < schedule.Length && schedule[next].Time <= t)
        {
            schedule[next].Write(step, t, State);
            next++;
        }

        return next;
    }
}
