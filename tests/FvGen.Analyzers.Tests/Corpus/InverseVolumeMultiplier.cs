// Finite-volume update with a precomputed inverse cell volume (a multiplier, not a divisor).
// mutant: FVC0003 volume-on-one-face: `dt * invVol[i] * (Flux(u[i], u[i + 1]) - Flux(u[i - 1], u[i]))` -> `dt * (invVol[i] * Flux(u[i], u[i + 1]) - Flux(u[i - 1], u[i]))`
// mutant: FVC0003 swapped-argument: `Flux(u[i - 1], u[i])` -> `Flux(u[i], u[i - 1])`
// mutant: FVC0005 in-place: `un[i] = u[i]` -> `u[i] = u[i]`
using System;
using FvGen;

public static class InverseVolume
{
    private static double Flux(double l, double r) => 0.5 * (l * l + r * r) / 2 - 0.5 * Math.Max(Math.Abs(l), Math.Abs(r)) * (r - l);

    [ConservativeUpdate]
    public static void Step(double[] u, double[] un, double[] invVol, double dt)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            un[i] = u[i] - dt * invVol[i] * (Flux(u[i], u[i + 1]) - Flux(u[i - 1], u[i]));
        }
    }
}
