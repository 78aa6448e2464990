namespace FvGen.Health;

/// <summary>True when <paramref name="state"/> is physically admissible (for example a positive pressure derived from it).</summary>
public delegate bool AdmissibilityCheck<TState>(in TState state)
    where TState : unmanaged;
