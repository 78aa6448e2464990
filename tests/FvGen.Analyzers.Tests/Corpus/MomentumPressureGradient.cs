// Momentum rate: convective face fluxes plus a central pressure difference (p[i+1] - p[i-1]) / 2dx.
// mutant: FVC0002 pressure-slip: `(p[i + 1] - p[i - 1])` -> `(p[i + 1] - 2 * p[i - 1])`
// mutant: FVC0001 dropped-flux: `-(f[i + 1].Momentum - f[i].Momentum) / dx` -> `-f[i + 1].Momentum / dx`
// mutant: FVC0001 one-sided-pressure: `(p[i + 1] - p[i - 1]) / (2 * dx)` -> `p[i + 1] / (2 * dx)`
using System;
using FvGen;

public struct FaceFlux2
{
    public double Mass;
    public double Momentum;
}

public static class MomentumRate
{
    [ConservativeUpdate]
    public static void Rate([FaceData] FaceFlux2[] f, double[] p, double[] rMass, double[] rMom, double dx)
    {
        for (int i = 1; i < p.Length - 1; i++)
        {
            rMass[i] = -(f[i + 1].Mass - f[i].Mass) / dx;
            rMom[i] = -(f[i + 1].Momentum - f[i].Momentum) / dx - (p[i + 1] - p[i - 1]) / (2 * dx);
        }
    }
}
