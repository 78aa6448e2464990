using System.Globalization;
using System.Runtime.InteropServices;
using FvGen.Fields;
using FvGen.Ledger;
using FvGen.Meshes;

namespace FvGen.Time;

/// <summary>
/// An explicit time integrator of the semi-discrete system dU/dt = L(U, t), where L is a
/// <see cref="ResidualFunction{TState}"/>. Scratch storage is allocated once, so a step allocates nothing.
/// </summary>
/// <remarks>
/// Every scheme here is a convex combination of forward Euler stages. Its <see cref="StageWeights"/>
/// are the effective weights b_s with U(n+1) = U(n) + Δt Σ_s b_s L_s, which is also how the boundary
/// fluxes of the stages enter the conservation ledger.
/// </remarks>
public abstract class TimeIntegrator<TState>
    where TState : unmanaged
{
    private readonly double[] _stageWeights;
    private readonly double[] _stageTimes;
    private readonly TState[] _residual;
    private readonly BoundaryFluxTally _tally;

    /// <summary>Creates an integrator for <paramref name="cellCount"/> cells and <paramref name="patchCount"/> boundary patches.</summary>
    protected TimeIntegrator(int cellCount, int patchCount, double[] stageWeights, double[] stageTimes)
    {
        ArgumentOutOfRangeException.ThrowIfNegativeOrZero(cellCount);
        ArgumentOutOfRangeException.ThrowIfNegative(patchCount);
        ArgumentNullException.ThrowIfNull(stageWeights);
        ArgumentNullException.ThrowIfNull(stageTimes);
        if (stageWeights.Length == 0 || stageWeights.Length != stageTimes.Length)
        {
            throw new ArgumentException("An integrator needs at least one stage, with one weight and one time fraction per stage.");
        }

        double weightSum = 0;
        foreach (double w in stageWeights)
        {
            weightSum += w;
        }

        // Consistency: a step of a constant residual r must change the state by exactly Δt·r.
        if (Math.Abs(weightSum - 1.0) > 1e-14)
        {
            throw new ArgumentException(
                string.Create(CultureInfo.InvariantCulture, $"The effective stage weights must sum to 1; they sum to {weightSum:R}."), nameof(stageWeights));
        }

        foreach (double c in stageTimes)
        {
            if (!(c >= 0 && c <= 1))
            {
                throw new ArgumentException(
                    string.Create(CultureInfo.InvariantCulture, $"Stage time fractions must lie in [0, 1]; got {c:R}."), nameof(stageTimes));
            }
        }

        CellCount = cellCount;
        _stageWeights = stageWeights;
        _stageTimes = stageTimes;
        _residual = new TState[cellCount];
        _tally = new BoundaryFluxTally(patchCount, StateLayout<TState>.ComponentCount);
    }

    /// <summary>A short name, e.g. <c>SSP-RK3</c>.</summary>
    public abstract string Name { get; }

    /// <summary>The formal order of accuracy.</summary>
    public abstract int Order { get; }

    /// <summary>Number of cells the integrator was made for.</summary>
    public int CellCount { get; }

    /// <summary>Number of residual evaluations per step.</summary>
    public int StageCount => _stageWeights.Length;

    /// <summary>The effective weight b_s of each stage: U(n+1) = U(n) + Δt Σ_s b_s L_s. They sum to one.</summary>
    public ReadOnlySpan<double> StageWeights => _stageWeights;

    /// <summary>Where each stage is evaluated within the step, as a fraction of Δt.</summary>
    public ReadOnlySpan<double> StageTimeFractions => _stageTimes;

    /// <summary>
    /// Advances <paramref name="state"/> in place from <paramref name="time"/> to <paramref name="time"/> + <paramref name="dt"/>,
    /// reporting each stage's boundary flux tally to <paramref name="observer"/> when given.
    /// </summary>
    public void Step(Span<TState> state, double time, double dt, ResidualFunction<TState> residual, IStageFluxObserver? observer = null)
    {
        ArgumentNullException.ThrowIfNull(residual);
        if (state.Length != CellCount)
        {
            throw new ArgumentException(
                $"{Name} was made for {CellCount} cells but was given a state of {state.Length} cells.", nameof(state));
        }

        if (!(dt > 0 && double.IsFinite(dt)))
        {
            throw new ArgumentOutOfRangeException(
                nameof(dt), dt, string.Create(CultureInfo.InvariantCulture, $"{Name}: the time step must be positive and finite (t = {time:R})."));
        }

        StepCore(state, time, dt, residual, observer);
    }

    /// <summary>Creates the integrator called <paramref name="name"/> (<c>Euler</c>, <c>SSP-RK2</c>, <c>SSP-RK3</c>, case-insensitive) for <paramref name="mesh"/>.</summary>
    public static TimeIntegrator<TState> Create(string name, IMesh mesh)
    {
        ArgumentNullException.ThrowIfNull(name);
        ArgumentNullException.ThrowIfNull(mesh);
        return name.ToUpperInvariant() switch
        {
            "EULER" or "FORWARD-EULER" => new ForwardEuler<TState>(mesh),
            "SSP-RK2" or "RK2" => new SspRungeKutta2<TState>(mesh),
            "SSP-RK3" or "RK3" => new SspRungeKutta3<TState>(mesh),
            _ => throw new ArgumentException($"Unknown time integrator '{name}'; known: Euler, SSP-RK2, SSP-RK3.", nameof(name)),
        };
    }

    /// <summary>The scheme itself: the stages, each through <see cref="EvaluateStage"/>.</summary>
    protected abstract void StepCore(Span<TState> state, double time, double dt, ResidualFunction<TState> residual, IStageFluxObserver? observer);

    /// <summary>
    /// Evaluates the residual of stage <paramref name="stage"/> on <paramref name="state"/> at
    /// t + c_s Δt, reports its tally, and returns the residual seen as doubles.
    /// </summary>
    protected Span<double> EvaluateStage(
        int stage,
        ReadOnlySpan<TState> state,
        double time,
        double dt,
        ResidualFunction<TState> residual,
        IStageFluxObserver? observer)
    {
        _tally.Clear();
        residual(state, _residual, time + _stageTimes[stage] * dt, _tally);
        observer?.RecordStage(stage, _stageWeights[stage], _tally);
        return MemoryMarshal.Cast<TState, double>(_residual.AsSpan());
    }

    /// <summary>A forward-Euler stage in place: u ← u + Δt r.</summary>
    protected static void EulerStage(Span<double> u, ReadOnlySpan<double> r, double dt)
    {
        for (int i = 0; i < u.Length; i++)
        {
            u[i] += dt * r[i];
        }
    }

    /// <summary>A Shu–Osher stage in place: u ← a·u0 + b·(u + Δt r), with both weights given exactly.</summary>
    protected static void ShuOsherStage(Span<double> u, ReadOnlySpan<double> u0, ReadOnlySpan<double> r, double a, double b, double dt)
    {
        for (int i = 0; i < u.Length; i++)
        {
            u[i] = a * u0[i] + b * (u[i] + dt * r[i]);
        }
    }

    /// <summary>The state seen as a flat span of doubles.</summary>
    protected static Span<double> Components(Span<TState> state) => MemoryMarshal.Cast<TState, double>(state);
}
