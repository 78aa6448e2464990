// Single-phase Darcy pressure residual with harmonic-mean face transmissibilities computed inline.
// mutant: FVC0001 stale-permeability: `2 * k[i - 1] * k[i] / (k[i - 1] + k[i])` -> `2 * k[i - 1] * k[i] / (k[i] + k[i])`
// mutant: FVC0002 flipped-sign: `- tWest * (p[i] - p[i - 1])` -> `+ tWest * (p[i] - p[i - 1])`
// mutant: FVC0001 dropped-west: `(tEast * (p[i + 1] - p[i]) - tWest * (p[i] - p[i - 1]))` -> `tEast * (p[i + 1] - p[i])`
using System;
using FvGen;

public static class Darcy
{
    [ConservativeUpdate]
    public static void Residual(double[] p, double[] k, double[] r, double mu, double dx)
    {
        for (int i = 1; i < p.Length - 1; i++)
        {
            double tEast = 2 * k[i] * k[i + 1] / (k[i] + k[i + 1]);
            double tWest = 2 * k[i - 1] * k[i] / (k[i - 1] + k[i]);
            r[i] = (tEast * (p[i + 1] - p[i]) - tWest * (p[i] - p[i - 1])) / (mu * dx * dx);
        }
    }
}
