using FvGen.Ledger;

namespace FvGen.Time;

/// <summary>What a time march did.</summary>
/// <param name="Steps">Steps taken.</param>
/// <param name="StartTime">Time of the initial state.</param>
/// <param name="FinalTime">Time reached.</param>
/// <param name="ReachedEndTime">False when the run stopped at its step limit before the end time.</param>
/// <param name="SmallestStep">Smallest Δt taken (including steps shortened to land on an output time).</param>
/// <param name="LargestStep">Largest Δt taken.</param>
/// <param name="Ledger">The conservation balance at the end.</param>
/// <param name="WallTime">Elapsed wall-clock time.</param>
public sealed record TimeMarchResult(
    int Steps,
    double StartTime,
    double FinalTime,
    bool ReachedEndTime,
    double SmallestStep,
    double LargestStep,
    LedgerSummary Ledger,
    TimeSpan WallTime);
