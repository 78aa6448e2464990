// expect: none
// why: for every component the face term Hll(u[•], u[•+1], gamma) leaves cell i through face i+1/2 with -1/dx and enters it through face i-1/2 with +1/dx.
using System;

namespace Corpus.Euler1D;

/// <summary>Conserved state of a calorically perfect gas in a shock tube.</summary>
public struct GasState
{
    public double Density;
    public double Momentum;
    public double Energy;
}

/// <summary>Euler rate for a shock tube, HLL flux with Davis wave-speed estimates.</summary>
public static class ShockTubeHll
{
    private static double Pressure(in GasState s, double gamma) =>
        (gamma - 1.0) * (s.Energy - 0.5 * s.Momentum * s.Momentum / s.Density);

    private static GasState PhysicalFlux(in GasState s, double gamma)
    {
        double velocity = s.Momentum / s.Density;
        double pressure = Pressure(s, gamma);
        return new GasState
        {
            Density = s.Momentum,
            Momentum = s.Momentum * velocity + pressure,
            Energy = (s.Energy + pressure) * velocity,
        };
    }

    [FvGen.NumericalFlux]
    public static GasState Hll(in GasState left, in GasState right, double gamma)
    {
        double velocityLeft = left.Momentum / left.Density;
        double velocityRight = right.Momentum / right.Density;
        double soundLeft = Math.Sqrt(gamma * Pressure(left, gamma) / left.Density);
        double soundRight = Math.Sqrt(gamma * Pressure(right, gamma) / right.Density);
        double slowest = Math.Min(velocityLeft - soundLeft, velocityRight - soundRight);
        double fastest = Math.Max(velocityLeft + soundLeft, velocityRight + soundRight);

        var fluxLeft = PhysicalFlux(left, gamma);
        if (slowest >= 0) return fluxLeft;
        var fluxRight = PhysicalFlux(right, gamma);
        if (fastest <= 0) return fluxRight;

        double span = fastest - slowest;
        return new GasState
        {
            Density = (fastest * fluxLeft.Density - slowest * fluxRight.Density + slowest * fastest * (right.Density - left.Density)) / span,
            Momentum = (fastest * fluxLeft.Momentum - slowest * fluxRight.Momentum + slowest * fastest * (right.Momentum - left.Momentum)) / span,
            Energy = (fastest * fluxLeft.Energy - slowest * fluxRight.Energy + slowest * fastest * (right.Energy - left.Energy)) / span,
        };
    }

    [FvGen.ConservativeUpdate]
    public static void Rate(GasState[] u, GasState[] rate, double gamma, double dx)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            GasState east = Hll(u[i], u[i + 1], gamma);
            GasState west = Hll(u[i - 1], u[i], gamma);
            rate[i].Density = -(east.Density - west.Density) / dx;
            rate[i].Momentum = -(east.Momentum - west.Momentum) / dx;
            rate[i].Energy = -(east.Energy - west.Energy) / dx;
        }
    }
}
