using System.Diagnostics;
using System.Globalization;

namespace FvGen.Time;

/// <summary>
/// Writes one progress line (step, time, Δt, ledger imbalance) to a <see cref="TextWriter"/> every
/// <see cref="EverySteps"/> steps or every <see cref="EveryWallClock"/> of wall-clock time, whichever
/// comes first, plus a first and a last line. A run without a reporter prints nothing.
/// </summary>
public sealed class ProgressReporter
{
    private readonly Stopwatch _clock = new();
    private TimeSpan _lastLine;
    private int _lastStep = -1;

    /// <summary>Reports to <paramref name="writer"/>; <paramref name="everySteps"/> 0 means by wall-clock time only.</summary>
    public ProgressReporter(TextWriter writer, int everySteps = 100, TimeSpan? everyWallClock = null)
    {
        ArgumentNullException.ThrowIfNull(writer);
        ArgumentOutOfRangeException.ThrowIfNegative(everySteps);
        if (everyWallClock is { } span && span <= TimeSpan.Zero)
        {
            throw new ArgumentOutOfRangeException(nameof(everyWallClock), span, "The wall-clock interval must be positive.");
        }

        if (everySteps == 0 && everyWallClock is null)
        {
            throw new ArgumentException("Give a step interval, a wall-clock interval, or both; to turn progress off, pass no reporter.");
        }

        Writer = writer;
        EverySteps = everySteps;
        EveryWallClock = everyWallClock;
    }

    /// <summary>Where the lines go.</summary>
    public TextWriter Writer { get; }

    /// <summary>A line every this many steps (0: none by step count).</summary>
    public int EverySteps { get; }

    /// <summary>A line at least this often in wall-clock time, when set.</summary>
    public TimeSpan? EveryWallClock { get; }

    /// <summary>Writes the line of the initial state and starts the wall clock.</summary>
    public void Begin(int step, double time)
    {
        _clock.Restart();
        _lastLine = TimeSpan.Zero;
        _lastStep = step;
        Writer.WriteLine(string.Create(CultureInfo.InvariantCulture, $"step {step,8}  t = {time,-14:G8}  (initial state)"));
    }

    /// <summary>Called after every step; writes a line when one is due.</summary>
    public void AfterStep(int step, double time, double dt, double stepImbalance, double cumulativeImbalance)
    {
        bool due = EverySteps > 0 && step % EverySteps == 0;
        if (!due && EveryWallClock is { } every)
        {
            due = _clock.Elapsed - _lastLine >= every;
        }

        if (due)
        {
            WriteLine(step, time, dt, stepImbalance, cumulativeImbalance);
        }
    }

    /// <summary>Writes the last line, unless the last step was just reported.</summary>
    public void End(int step, double time, double dt, double stepImbalance, double cumulativeImbalance)
    {
        if (step != _lastStep)
        {
            WriteLine(step, time, dt, stepImbalance, cumulativeImbalance);
        }
    }

    private void WriteLine(int step, double time, double dt, double stepImbalance, double cumulativeImbalance)
    {
        _lastLine = _clock.Elapsed;
        _lastStep = step;
        Writer.WriteLine(string.Create(
            CultureInfo.InvariantCulture,
            $"step {step,8}  t = {time,-14:G8}  dt = {dt:0.000E+00}  ledger imbalance (relative): step {stepImbalance:0.0E+00}, cumulative {cumulativeImbalance:0.0E+00}"));
    }
}
