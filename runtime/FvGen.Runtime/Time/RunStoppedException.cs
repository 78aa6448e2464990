namespace FvGen.Time;

/// <summary>A run was stopped by one of its checks (conservation ledger, health checks) at a known step and time.</summary>
public abstract class RunStoppedException : Exception
{
    /// <summary>Creates the exception for step <paramref name="step"/> at time <paramref name="time"/>.</summary>
    protected RunStoppedException(string message, int step, double time)
        : base(message)
    {
        Step = step;
        Time = time;
    }

    /// <summary>The step after which the check failed (0 = the initial state).</summary>
    public int Step { get; }

    /// <summary>The time of the state that failed the check.</summary>
    public double Time { get; }
}
