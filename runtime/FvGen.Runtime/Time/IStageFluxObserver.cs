using FvGen.Ledger;

namespace FvGen.Time;

/// <summary>
/// Receives the boundary flux tally of every stage of a time step, with the stage's effective
/// weight in the step's update; the conservation ledger is one.
/// </summary>
public interface IStageFluxObserver
{
    /// <summary>
    /// Called once per stage, right after the residual of stage <paramref name="stage"/> was
    /// evaluated. The tally is reused by the next stage: read it now, do not keep it.
    /// </summary>
    void RecordStage(int stage, double weight, BoundaryFluxTally tally);
}
