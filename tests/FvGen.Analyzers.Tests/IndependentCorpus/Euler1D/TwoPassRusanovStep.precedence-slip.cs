// expect: FVC0002
// why: the parentheses around the energy difference are gone, so faceFlux[•].Energy collects -dt/dx at face i+1 but -1 at face i.
using System;

namespace Corpus.Euler1D;

public struct TubeGas
{
    public double Density;
    public double Momentum;
    public double Energy;
}

/// <summary>Explicit Euler step of a blast-in-a-pipe problem: face fluxes first, then the cell update.</summary>
public static class PipeBlastStep
{
    private const double Gamma = 1.4;

    private static double Pressure(in TubeGas s) => (Gamma - 1.0) * (s.Energy - 0.5 * s.Momentum * s.Momentum / s.Density);

    [FvGen.NumericalFlux]
    public static TubeGas Rusanov(in TubeGas a, in TubeGas b)
    {
        double ua = a.Momentum / a.Density, ub = b.Momentum / b.Density;
        double pa = Pressure(a), pb = Pressure(b);
        double speed = Math.Max(Math.Abs(ua) + Math.Sqrt(Gamma * pa / a.Density), Math.Abs(ub) + Math.Sqrt(Gamma * pb / b.Density));
        return new TubeGas
        {
            Density = 0.5 * (a.Momentum + b.Momentum) - 0.5 * speed * (b.Density - a.Density),
            Momentum = 0.5 * (a.Momentum * ua + pa + b.Momentum * ub + pb) - 0.5 * speed * (b.Momentum - a.Momentum),
            Energy = 0.5 * ((a.Energy + pa) * ua + (b.Energy + pb) * ub) - 0.5 * speed * (b.Energy - a.Energy),
        };
    }

    [FvGen.ConservativeUpdate]
    public static void Advance(TubeGas[] u, TubeGas[] next, double dt, double dx)
    {
        int cells = u.Length;
        var faceFlux = new TubeGas[cells + 1];

        // Pass 1: face f lies between cells f-1 and f (faces 0 and cells are ghost-bounded by the caller).
        for (int f = 1; f < cells; f++)
        {
            faceFlux[f] = Rusanov(u[f - 1], u[f]);
        }

        // Pass 2: interior cells.
        double ratio = dt / dx;
        for (int i = 1; i < cells - 1; i++)
        {
            next[i].Density = u[i].Density - ratio * (faceFlux[i + 1].Density - faceFlux[i].Density);
            next[i].Momentum = u[i].Momentum - ratio * (faceFlux[i + 1].Momentum - faceFlux[i].Momentum);
            next[i].Energy = u[i].Energy - ratio * faceFlux[i + 1].Energy - faceFlux[i].Energy;
        }
    }
}
