namespace FvGen.Geometry;

/// <summary>The gradient of a cell state: one state of derivatives per direction.</summary>
/// <typeparam name="TState">The conserved-state struct.</typeparam>
public struct Gradient<TState>
    where TState : unmanaged
{
    /// <summary>∂/∂x of every component.</summary>
    public TState X;

    /// <summary>∂/∂y of every component.</summary>
    public TState Y;

    /// <summary>∂/∂z of every component.</summary>
    public TState Z;
}
