using FvGen.Meshes;

namespace FvGen.Time;

/// <summary>
/// The two-stage, second-order strong-stability-preserving Runge–Kutta scheme in Shu–Osher form
/// (Shu &amp; Osher 1988; Gottlieb &amp; Shu 1998), SSP coefficient 1:
/// U1 = Un + Δt L(Un, t);  U(n+1) = ½ Un + ½ (U1 + Δt L(U1, t + Δt)).
/// Effective stage weights ½, ½.
/// </summary>
public sealed class SspRungeKutta2<TState> : TimeIntegrator<TState>
    where TState : unmanaged
{
    private readonly TState[] _start;

    /// <summary>Creates the integrator for the cells and patches of <paramref name="mesh"/>.</summary>
    public SspRungeKutta2(IMesh mesh)
        : this(CheckMesh(mesh).CellCount, mesh.PatchNames.Count)
    {
    }

    /// <summary>Creates the integrator for <paramref name="cellCount"/> cells and <paramref name="patchCount"/> patches.</summary>
    public SspRungeKutta2(int cellCount, int patchCount)
        : base(cellCount, patchCount, [0.5, 0.5], [0.0, 1.0])
    {
        _start = new TState[cellCount];
    }

    /// <inheritdoc />
    public override string Name => "SSP-RK2";

    /// <inheritdoc />
    public override int Order => 2;

    /// <inheritdoc />
    protected override void StepCore(Span<TState> state, double time, double dt, ResidualFunction<TState> residual, IStageFluxObserver? observer)
    {
        state.CopyTo(_start);
        Span<double> u0 = Components(_start);
        Span<double> u = Components(state);

        Span<double> r = EvaluateStage(0, state, time, dt, residual, observer);
        EulerStage(u, r, dt);

        r = EvaluateStage(1, state, time, dt, residual, observer);
        ShuOsherStage(u, u0, r, 0.5, 0.5, dt);
    }

    private static IMesh CheckMesh(IMesh mesh)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        return mesh;
    }
}
