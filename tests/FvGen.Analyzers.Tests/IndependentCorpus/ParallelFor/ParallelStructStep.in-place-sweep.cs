// expect: FVC0005
// why: the parallel body writes u[i] while neighbouring iterations read u[i] for their own faces, so the two sides of a face can see different states.
using System;
using System.Threading.Tasks;

namespace Corpus.ParallelFor;

public struct PlasmaState
{
    public double Density;
    public double Momentum;
}

/// <summary>Isothermal plasma jet in a thruster channel, explicit step in parallel over cells.</summary>
public static class ThrusterChannelStep
{
    private const double SoundSquared = 4.0e6;

    [FvGen.NumericalFlux]
    public static PlasmaState Flux(in PlasmaState a, in PlasmaState b, double speed) => new()
    {
        Density = 0.5 * (a.Momentum + b.Momentum) - 0.5 * speed * (b.Density - a.Density),
        Momentum = 0.5 * (a.Momentum * a.Momentum / a.Density + SoundSquared * a.Density
                        + b.Momentum * b.Momentum / b.Density + SoundSquared * b.Density)
                   - 0.5 * speed * (b.Momentum - a.Momentum),
    };

    [FvGen.ConservativeUpdate]
    public static void Advance(PlasmaState[] u, PlasmaState[] next, double speed, double dt, double dx)
    {
        double ratio = dt / dx;
        Parallel.For(1, u.Length - 1, i =>
        {
            PlasmaState east = Flux(u[i], u[i + 1], speed);
            PlasmaState west = Flux(u[i - 1], u[i], speed);
            u[i].Density -= ratio * (east.Density - west.Density);
            u[i].Momentum -= ratio * (east.Momentum - west.Momentum);
        });
    }
}
