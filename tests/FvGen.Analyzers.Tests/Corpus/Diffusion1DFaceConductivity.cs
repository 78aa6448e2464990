// Steady heat conduction residual with conductivity stored at faces (k[i] between cells i-1 and i).
// mutant: FVC0001 dropped-flux: ` - k[i] * (u[i] - u[i - 1])` -> ``
// mutant: FVC0001 copy-paste-coefficient: `- k[i] * (u[i] - u[i - 1])` -> `- k[i + 1] * (u[i] - u[i - 1])`
// mutant: FVC0002 precedence-slip: `(k[i + 1] * (u[i + 1] - u[i]) - k[i] * (u[i] - u[i - 1])) / (dx * dx)` -> `k[i + 1] * (u[i + 1] - u[i]) - k[i] * (u[i] - u[i - 1]) / (dx * dx)`
using System;
using FvGen;

public static class FaceConductivity
{
    [ConservativeUpdate]
    public static void Residual(double[] u, [FaceData] double[] k, double[] r, double dx)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            r[i] = (k[i + 1] * (u[i + 1] - u[i]) - k[i] * (u[i] - u[i - 1])) / (dx * dx);
        }
    }
}
