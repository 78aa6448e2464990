// expect: FVC0003
// why: the west face reuses the east face's right state Minus(u[i], u[i + 1], u[i + 2]), so face i-1/2 is evaluated from other cells than cell i-1 uses for the same face.
using System;

namespace Corpus.Muscl;

public struct NozzleGas
{
    public double Density;
    public double Momentum;
    public double Energy;
}

/// <summary>Second-order Euler rate in a converging-diverging nozzle start-up, component-wise minmod reconstruction.</summary>
public static class NozzleMusclRate
{
    private const double Gamma = 1.4;

    private static double Minmod(double a, double b) => Math.Max(0.0, Math.Min(a, b)) + Math.Min(0.0, Math.Max(a, b));

    /// <summary>State at the east face of the middle cell.</summary>
    public static NozzleGas Plus(in NozzleGas west, in NozzleGas here, in NozzleGas east) => new()
    {
        Density = here.Density + 0.5 * Minmod(here.Density - west.Density, east.Density - here.Density),
        Momentum = here.Momentum + 0.5 * Minmod(here.Momentum - west.Momentum, east.Momentum - here.Momentum),
        Energy = here.Energy + 0.5 * Minmod(here.Energy - west.Energy, east.Energy - here.Energy),
    };

    /// <summary>State at the west face of the middle cell.</summary>
    public static NozzleGas Minus(in NozzleGas west, in NozzleGas here, in NozzleGas east) => new()
    {
        Density = here.Density - 0.5 * Minmod(here.Density - west.Density, east.Density - here.Density),
        Momentum = here.Momentum - 0.5 * Minmod(here.Momentum - west.Momentum, east.Momentum - here.Momentum),
        Energy = here.Energy - 0.5 * Minmod(here.Energy - west.Energy, east.Energy - here.Energy),
    };

    private static NozzleGas Flux(in NozzleGas s, out double velocity, out double sound)
    {
        velocity = s.Momentum / s.Density;
        double p = (Gamma - 1.0) * (s.Energy - 0.5 * s.Momentum * velocity);
        sound = Math.Sqrt(Gamma * p / s.Density);
        return new NozzleGas { Density = s.Momentum, Momentum = s.Momentum * velocity + p, Energy = (s.Energy + p) * velocity };
    }

    [FvGen.NumericalFlux]
    public static NozzleGas Hll(in NozzleGas l, in NozzleGas r)
    {
        var fl = Flux(l, out double ul, out double al);
        var fr = Flux(r, out double ur, out double ar);
        double sl = Math.Min(ul - al, ur - ar), sr = Math.Max(ul + al, ur + ar);
        if (sl >= 0) return fl;
        if (sr <= 0) return fr;
        double w = 1.0 / (sr - sl);
        return new NozzleGas
        {
            Density = w * (sr * fl.Density - sl * fr.Density + sl * sr * (r.Density - l.Density)),
            Momentum = w * (sr * fl.Momentum - sl * fr.Momentum + sl * sr * (r.Momentum - l.Momentum)),
            Energy = w * (sr * fl.Energy - sl * fr.Energy + sl * sr * (r.Energy - l.Energy)),
        };
    }

    [FvGen.ConservativeUpdate]
    public static void Rate(NozzleGas[] u, NozzleGas[] rate, double dx)
    {
        for (int i = 2; i < u.Length - 2; i++)
        {
            NozzleGas east = Hll(Plus(u[i - 1], u[i], u[i + 1]), Minus(u[i], u[i + 1], u[i + 2]));
            NozzleGas west = Hll(Plus(u[i - 2], u[i - 1], u[i]), Minus(u[i], u[i + 1], u[i + 2]));
            rate[i].Density = (west.Density - east.Density) / dx;
            rate[i].Momentum = (west.Momentum - east.Momentum) / dx;
            rate[i].Energy = (west.Energy - east.Energy) / dx;
        }
    }
}
