// expect: FVC0001
// why: the depth update lost massFlux[i], so the mass leaving through face i+1 enters no cell.
using System;

namespace Corpus.ShallowWater;

/// <summary>Explicit step of a river reach over a sloping bed; the bed slope is given per cell.</summary>
public static class RiverReachStep
{
    [FvGen.NumericalFlux]
    public static double MassFlux(double hL, double qL, double hR, double qR, double speed) =>
        0.5 * (qL + qR) - 0.5 * speed * (hR - hL);

    [FvGen.NumericalFlux]
    public static double MomentumFlux(double hL, double qL, double hR, double qR, double speed, double g) =>
        0.5 * (qL * qL / hL + 0.5 * g * hL * hL + qR * qR / hR + 0.5 * g * hR * hR) - 0.5 * speed * (qR - qL);

    [FvGen.ConservativeUpdate]
    public static void Advance(
        double[] depth, double[] discharge, double[] slope,
        double[] nextDepth, double[] nextDischarge,
        double speed, double g, double dt, double dx)
    {
        int n = depth.Length;
        var massFlux = new double[n + 1];
        var momentumFlux = new double[n + 1];
        for (int f = 1; f < n; f++)
        {
            massFlux[f] = MassFlux(depth[f - 1], discharge[f - 1], depth[f], discharge[f], speed);
            momentumFlux[f] = MomentumFlux(depth[f - 1], discharge[f - 1], depth[f], discharge[f], speed, g);
        }

        double ratio = dt / dx;
        for (int i = 1; i < n - 1; i++)
        {
            nextDepth[i] = depth[i] - ratio * massFlux[i + 1];
            nextDischarge[i] = discharge[i] - ratio * (momentumFlux[i + 1] - momentumFlux[i]) - dt * g * depth[i] * slope[i];
        }
    }
}
