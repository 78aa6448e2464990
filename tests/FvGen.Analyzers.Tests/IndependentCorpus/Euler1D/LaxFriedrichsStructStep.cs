// expect: none
// why: per component the averaged neighbours carry weight 1/2 + 1/2 = 1 and the flux class Flux(u[•]).X collects -dt/(2dx) + dt/(2dx) = 0.
using System;

namespace Corpus.Euler1D;

public struct ChamberGas
{
    public double Density;
    public double Momentum;
    public double Energy;
}

/// <summary>Lax-Friedrichs step for gas venting from a pressurised chamber into a duct.</summary>
public static class ChamberVentingLaxFriedrichs
{
    private const double Gamma = 1.4;

    private static ChamberGas Flux(in ChamberGas s)
    {
        double velocity = s.Momentum / s.Density;
        double pressure = (Gamma - 1.0) * (s.Energy - 0.5 * s.Momentum * velocity);
        return new ChamberGas
        {
            Density = s.Momentum,
            Momentum = s.Momentum * velocity + pressure,
            Energy = (s.Energy + pressure) * velocity,
        };
    }

    [FvGen.ConservativeUpdate]
    public static void Advance(ChamberGas[] u, ChamberGas[] next, double dt, double dx)
    {
        double halfRatio = 0.5 * dt / dx;
        for (int i = 1; i < u.Length - 1; i++)
        {
            next[i].Density = 0.5 * (u[i - 1].Density + u[i + 1].Density) - halfRatio * (Flux(u[i + 1]).Density - Flux(u[i - 1]).Density);
            next[i].Momentum = 0.5 * (u[i - 1].Momentum + u[i + 1].Momentum) - halfRatio * (Flux(u[i + 1]).Momentum - Flux(u[i - 1]).Momentum);
            next[i].Energy = 0.5 * (u[i - 1].Energy + u[i + 1].Energy) - halfRatio * (Flux(u[i + 1]).Energy - Flux(u[i - 1]).Energy);
        }
    }
}
