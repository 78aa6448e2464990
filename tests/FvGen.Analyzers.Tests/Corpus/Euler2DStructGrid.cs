// 2-D residual of a three-component state on a [,] grid of structs, fluxes as face structs.
// mutant: FVC0001 copy-paste-component: `- g[i, j].Mx) / dy` -> `- g[i, j].My) / dy`
// mutant: FVC0001 dropped-y: `- (g[i, j + 1].Rho - g[i, j].Rho) / dy` -> `- g[i, j + 1].Rho / dy`
// mutant: FVC0002 wrong-spacing: `- f[i, j].Mx) / dx` -> `) / dx + f[i, j].Mx / dy`
using System;
using FvGen;

public struct Q2
{
    public double Rho;
    public double Mx;
    public double My;
}

public static class Euler2DGrid
{
    [ConservativeUpdate]
    public static void Residual([FaceData] Q2[,] f, [FaceData] Q2[,] g, Q2[,] r, double dx, double dy)
    {
        for (int i = 0; i < r.GetLength(0); i++)
        {
            for (int j = 0; j < r.GetLength(1); j++)
            {
                r[i, j].Rho = -(f[i + 1, j].Rho - f[i, j].Rho) / dx - (g[i, j + 1].Rho - g[i, j].Rho) / dy;
                r[i, j].Mx = -(f[i + 1, j].Mx - f[i, j].Mx) / dx - (g[i, j + 1].Mx - g[i, j].Mx) / dy;
                r[i, j].My = -(f[i + 1, j].My - f[i, j].My) / dx - (g[i, j + 1].My - g[i, j].My) / dy;
            }
        }
    }
}
