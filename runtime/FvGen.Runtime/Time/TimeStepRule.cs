using System.Globalization;
using FvGen.Meshes;

namespace FvGen.Time;

/// <summary>How the time-march driver chooses Δt: a fixed value, or from a CFL number and a wave speed.</summary>
public sealed class TimeStepRule<TState>
    where TState : unmanaged
{
    private readonly double _fixed;
    private readonly WaveSpeed<TState>? _waveSpeed;

    private TimeStepRule(double fixedStep, double cfl, WaveSpeed<TState>? waveSpeed)
    {
        _fixed = fixedStep;
        Cfl = cfl;
        _waveSpeed = waveSpeed;
    }

    /// <summary>The CFL number, or NaN for a fixed step.</summary>
    public double Cfl { get; }

    /// <summary>A fixed time step <paramref name="dt"/>.</summary>
    public static TimeStepRule<TState> Fixed(double dt)
    {
        if (!(dt > 0 && double.IsFinite(dt)))
        {
            throw new ArgumentOutOfRangeException(nameof(dt), dt, "A fixed time step must be positive and finite.");
        }

        return new TimeStepRule<TState>(dt, double.NaN, null);
    }

    /// <summary>
    /// Δt = <paramref name="cfl"/> · min over cells of V / (½ λ S), with λ from <paramref name="waveSpeed"/>;
    /// see <see cref="CflTimeStep.Compute{TState}"/>.
    /// </summary>
    public static TimeStepRule<TState> FromCfl(double cfl, WaveSpeed<TState> waveSpeed)
    {
        ArgumentNullException.ThrowIfNull(waveSpeed);
        if (!(cfl > 0 && double.IsFinite(cfl)))
        {
            throw new ArgumentOutOfRangeException(nameof(cfl), cfl, "The CFL number must be positive and finite.");
        }

        return new TimeStepRule<TState>(double.NaN, cfl, waveSpeed);
    }

    /// <summary>The time step for <paramref name="state"/> on <paramref name="mesh"/>; may be +∞ when every wave speed is zero.</summary>
    public double Compute(IMesh mesh, ReadOnlySpan<TState> state) =>
        _waveSpeed is null ? _fixed : CflTimeStep.Compute(mesh, state, Cfl, _waveSpeed);

    /// <inheritdoc />
    public override string ToString() =>
        _waveSpeed is null
            ? string.Create(CultureInfo.InvariantCulture, $"fixed dt = {_fixed:G6}")
            : string.Create(CultureInfo.InvariantCulture, $"CFL = {Cfl:G6}");
}
