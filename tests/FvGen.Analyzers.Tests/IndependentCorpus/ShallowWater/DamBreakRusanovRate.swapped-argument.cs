// expect: FVC0003
// why: the upstream face is evaluated as Rusanov(s[i], s[i - 1], g), so face i-1/2 sees its states in the opposite order from cell i-1.
using System;

namespace Corpus.ShallowWater;

public struct WaterColumn
{
    public double Depth;
    public double Discharge;
}

/// <summary>One-dimensional dam-break rate in a flat rectangular channel.</summary>
public static class DamBreakRate
{
    private static WaterColumn Physical(in WaterColumn s, double g)
    {
        double velocity = s.Discharge / s.Depth;
        return new WaterColumn { Depth = s.Discharge, Discharge = s.Discharge * velocity + 0.5 * g * s.Depth * s.Depth };
    }

    [FvGen.NumericalFlux]
    public static WaterColumn Rusanov(in WaterColumn left, in WaterColumn right, double g)
    {
        double speed = Math.Max(
            Math.Abs(left.Discharge / left.Depth) + Math.Sqrt(g * left.Depth),
            Math.Abs(right.Discharge / right.Depth) + Math.Sqrt(g * right.Depth));
        var fl = Physical(left, g);
        var fr = Physical(right, g);
        return new WaterColumn
        {
            Depth = 0.5 * (fl.Depth + fr.Depth) - 0.5 * speed * (right.Depth - left.Depth),
            Discharge = 0.5 * (fl.Discharge + fr.Discharge) - 0.5 * speed * (right.Discharge - left.Discharge),
        };
    }

    [FvGen.ConservativeUpdate]
    public static void Rate(WaterColumn[] s, WaterColumn[] rate, double g, double dx)
    {
        for (int i = 1; i < s.Length - 1; i++)
        {
            WaterColumn downstream = Rusanov(s[i], s[i + 1], g);
            WaterColumn upstream = Rusanov(s[i], s[i - 1], g);
            rate[i].Depth = (upstream.Depth - downstream.Depth) / dx;
            rate[i].Discharge = (upstream.Discharge - downstream.Discharge) / dx;
        }
    }
}
