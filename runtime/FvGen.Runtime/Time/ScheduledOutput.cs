using FvGen.Fields;

namespace FvGen.Time;

/// <summary>Writes output for the state reached at <paramref name="time"/> after step <paramref name="step"/>.</summary>
public delegate void ScheduledOutput<TState>(int step, double time, CellField<TState> state)
    where TState : unmanaged;
