// Interior faces scatter to both cells; wall faces of one patch give a boundary flux to their owner only.
// mutant: FVC0004 wall-reads-ghost: `WallFlux(u[c], area[b])` -> `Upwind(u[c], u[neighbour[b]], vn[b]) * area[b]`
// mutant: FVC0004 one-sided-interior: `        res[neighbour[f]] += flux;` -> ``
// mutant: FVC0004 unequal: `res[owner[f]] -= flux;` -> `res[owner[f]] -= 2 * flux;`
using System;
using FvGen;

public static class WallPatch
{
    private static double Upwind(double a, double b, double vn) => vn >= 0 ? vn * a : vn * b;

    private static double WallFlux(double inside, double area) => 0.0 * inside * area;

    [ConservativeUpdate]
    public static void Residual(int interiorCount, int[] wallFaces, int[] owner, int[] neighbour, double[] u, [FaceData] double[] vn, [FaceData] double[] area, double[] res)
    {
        for (int f = 0; f < interiorCount; f++)
        {
            double flux = Upwind(u[owner[f]], u[neighbour[f]], vn[f]) * area[f];
            res[owner[f]] -= flux;
            res[neighbour[f]] += flux;
        }

        foreach (int b in wallFaces)
        {
            int c = owner[b];
            res[c] -= WallFlux(u[c], area[b]);
        }
    }
}
