using FvGen.Meshes;

namespace FvGen.Time;

/// <summary>
/// The three-stage, third-order strong-stability-preserving Runge–Kutta scheme in Shu–Osher form
/// (Shu &amp; Osher 1988; Gottlieb &amp; Shu 1998), SSP coefficient 1:
/// U1 = Un + Δt L(Un, t);  U2 = ¾ Un + ¼ (U1 + Δt L(U1, t + Δt));
/// U(n+1) = ⅓ Un + ⅔ (U2 + Δt L(U2, t + ½Δt)).
/// Effective stage weights 1/6, 1/6, 2/3.
/// </summary>
public sealed class SspRungeKutta3<TState> : TimeIntegrator<TState>
    where TState : unmanaged
{
    private readonly TState[] _start;

    /// <summary>Creates the integrator for the cells and patches of <paramref name="mesh"/>.</summary>
    public SspRungeKutta3(IMesh mesh)
        : this(CheckMesh(mesh).CellCount, mesh.PatchNames.Count)
    {
    }

    /// <summary>Creates the integrator for <paramref name="cellCount"/> cells and <paramref name="patchCount"/> patches.</summary>
    public SspRungeKutta3(int cellCount, int patchCount)
        : base(cellCount, patchCount, [1.0 / 6.0, 1.0 / 6.0, 2.0 / 3.0], [0.0, 1.0, 0.5])
    {
        _start = new TState[cellCount];
    }

    /// <inheritdoc />
    public override string Name => "SSP-RK3";

    /// <inheritdoc />
    public override int Order => 3;

    /// <inheritdoc />
    protected override void StepCore(Span<TState> state, double time, double dt, ResidualFunction<TState> residual, IStageFluxObserver? observer)
    {
        state.CopyTo(_start);
        Span<double> u0 = Components(_start);
        Span<double> u = Components(state);

        Span<double> r = EvaluateStage(0, state, time, dt, residual, observer);
        EulerStage(u, r, dt);

        r = EvaluateStage(1, state, time, dt, residual, observer);
        ShuOsherStage(u, u0, r, 0.75, 0.25, dt);

        r = EvaluateStage(2, state, time, dt, residual, observer);
        const double oneThird = 1.0 / 3.0;
        const double twoThirds = 2.0 / 3.0;
        ShuOsherStage(u, u0, r, oneThird, twoThirds, dt);
    }

    private static IMesh CheckMesh(IMesh mesh)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        return mesh;
    }
}
