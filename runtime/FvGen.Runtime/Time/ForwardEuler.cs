using FvGen.Meshes;

namespace FvGen.Time;

/// <summary>Forward Euler: U(n+1) = U(n) + Δt L(U(n), t). First order; one stage of weight 1.</summary>
public sealed class ForwardEuler<TState> : TimeIntegrator<TState>
    where TState : unmanaged
{
    /// <summary>Creates the integrator for the cells and patches of <paramref name="mesh"/>.</summary>
    public ForwardEuler(IMesh mesh)
        : this(CheckMesh(mesh).CellCount, mesh.PatchNames.Count)
    {
    }

    /// <summary>Creates the integrator for <paramref name="cellCount"/> cells and <paramref name="patchCount"/> patches.</summary>
    public ForwardEuler(int cellCount, int patchCount)
        : base(cellCount, patchCount, [1.0], [0.0])
    {
    }

    /// <inheritdoc />
    public override string Name => "Euler";

    /// <inheritdoc />
    public override int Order => 1;

    /// <inheritdoc />
    protected override void StepCore(Span<TState> state, double time, double dt, ResidualFunction<TState> residual, IStageFluxObserver? observer)
    {
        Span<double> u = Components(state);
        Span<double> r = EvaluateStage(0, state, time, dt, residual, observer);
        EulerStage(u, r, dt);
    }

    private static IMesh CheckMesh(IMesh mesh)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        return mesh;
    }
}
