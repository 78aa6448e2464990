// expect: FVC0001
// why: the y-momentum rate lost its south face term, so FluxY(s[•,•], s[•,•+1]).DischargeY leaves through the north face with no cell receiving it.
using System;

namespace Corpus.ShallowWater;

public struct FloodState
{
    public double Depth;
    public double DischargeX;
    public double DischargeY;
}

/// <summary>Two-dimensional flood-plain inundation rate, Rusanov fluxes per direction.</summary>
public static class FloodPlainRate
{
    private const double G = 9.81;

    [FvGen.NumericalFlux]
    public static FloodState FluxX(in FloodState a, in FloodState b)
    {
        double ua = a.DischargeX / a.Depth, ub = b.DischargeX / b.Depth;
        double s = Math.Max(Math.Abs(ua) + Math.Sqrt(G * a.Depth), Math.Abs(ub) + Math.Sqrt(G * b.Depth));
        return new FloodState
        {
            Depth = 0.5 * (a.DischargeX + b.DischargeX) - 0.5 * s * (b.Depth - a.Depth),
            DischargeX = 0.5 * (a.DischargeX * ua + 0.5 * G * a.Depth * a.Depth + b.DischargeX * ub + 0.5 * G * b.Depth * b.Depth) - 0.5 * s * (b.DischargeX - a.DischargeX),
            DischargeY = 0.5 * (a.DischargeY * ua + b.DischargeY * ub) - 0.5 * s * (b.DischargeY - a.DischargeY),
        };
    }

    [FvGen.NumericalFlux]
    public static FloodState FluxY(in FloodState a, in FloodState b)
    {
        double va = a.DischargeY / a.Depth, vb = b.DischargeY / b.Depth;
        double s = Math.Max(Math.Abs(va) + Math.Sqrt(G * a.Depth), Math.Abs(vb) + Math.Sqrt(G * b.Depth));
        return new FloodState
        {
            Depth = 0.5 * (a.DischargeY + b.DischargeY) - 0.5 * s * (b.Depth - a.Depth),
            DischargeX = 0.5 * (a.DischargeX * va + b.DischargeX * vb) - 0.5 * s * (b.DischargeX - a.DischargeX),
            DischargeY = 0.5 * (a.DischargeY * va + 0.5 * G * a.Depth * a.Depth + b.DischargeY * vb + 0.5 * G * b.Depth * b.Depth) - 0.5 * s * (b.DischargeY - a.DischargeY),
        };
    }

    [FvGen.ConservativeUpdate]
    public static void Rate(FloodState[,] s, FloodState[,] rate, double dx, double dy)
    {
        for (int i = 1; i < s.GetLength(0) - 1; i++)
        {
            for (int j = 1; j < s.GetLength(1) - 1; j++)
            {
                FloodState east = FluxX(s[i, j], s[i + 1, j]);
                FloodState west = FluxX(s[i - 1, j], s[i, j]);
                FloodState north = FluxY(s[i, j], s[i, j + 1]);
                FloodState south = FluxY(s[i, j - 1], s[i, j]);
                rate[i, j].Depth = -(east.Depth - west.Depth) / dx - (north.Depth - south.Depth) / dy;
                rate[i, j].DischargeX = -(east.DischargeX - west.DischargeX) / dx - (north.DischargeX - south.DischargeX) / dy;
                rate[i, j].DischargeY = -(east.DischargeY - west.DischargeY) / dx - north.DischargeY / dy;
            }
        }
    }
}
