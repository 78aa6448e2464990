namespace FvGen.Time;

/// <summary>
/// The largest signal speed in cell <paramref name="cell"/> (for the Euler equations |u| + c),
/// non-negative and finite; what a CFL time step is computed from.
/// </summary>
public delegate double WaveSpeed<TState>(in TState state, int cell)
    where TState : unmanaged;
