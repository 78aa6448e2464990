// 1-D Euler residual per conserved component, face fluxes stored as structs.
// mutant: FVC0001 copy-paste-component: `- f[i].Momentum) / dx;` -> `- f[i].Density) / dx;`
// mutant: FVC0001 dropped-term: `-(f[i + 1].Energy - f[i].Energy) / dx` -> `-f[i + 1].Energy / dx`
// mutant: FVC0002 wrong-weight: `-(f[i + 1].Density - f[i].Density) / dx` -> `-(f[i + 1].Density - f[i].Density / 2) / dx`
using System;
using FvGen;

public struct Conserved
{
    public double Density;
    public double Momentum;
    public double Energy;
}

public static class EulerResidual
{
    [ConservativeUpdate]
    public static void Residual([FaceData] Conserved[] f, Conserved[] r, double dx)
    {
        for (int i = 0; i < r.Length; i++)
        {
            r[i].Density = -(f[i + 1].Density - f[i].Density) / dx;
            r[i].Momentum = -(f[i + 1].Momentum - f[i].Momentum) / dx;
            r[i].Energy = -(f[i + 1].Energy - f[i].Energy) / dx;
        }
    }
}
