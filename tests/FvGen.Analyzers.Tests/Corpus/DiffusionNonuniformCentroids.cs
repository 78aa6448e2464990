// Diffusion on a non-uniform 1-D mesh: face gradients over centroid distances, divided by the cell volume.
// mutant: FVC0001 stale-distance: `(u[i] - u[i - 1]) / (xc[i] - xc[i - 1])` -> `(u[i] - u[i - 1]) / (xc[i + 1] - xc[i])`
// mutant: FVC0001 wrong-measure: `) / vol[i];` -> `) / vol[i + 1];`
// mutant: FVC0002 flipped-gradient: `(u[i] - u[i - 1]) / (xc[i] - xc[i - 1])` -> `(u[i - 1] - u[i]) / (xc[i] - xc[i - 1])`
using System;
using FvGen;

public static class NonuniformDiffusion
{
    [ConservativeUpdate]
    public static void Rate(double[] u, double[] xc, double[] vol, double[] r, double k)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            r[i] = k * ((u[i + 1] - u[i]) / (xc[i + 1] - xc[i]) - (u[i] - u[i - 1]) / (xc[i] - xc[i - 1])) / vol[i];
        }
    }
}
