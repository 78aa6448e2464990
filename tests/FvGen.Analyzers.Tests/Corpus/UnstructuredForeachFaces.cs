// Face loop over an explicit list of interior faces with owner/neighbour arrays.
// mutant: FVC0004 one-sided: `    res[neighbour[f]] += flux;` -> ``
// mutant: FVC0004 self-cancelling: `res[neighbour[f]] += flux;` -> `res[owner[f]] += flux;`
// mutant: FVC0004 area-on-one-side: `res[owner[f]] -= flux;` -> `res[owner[f]] -= flux * area[f];`
using System;
using FvGen;

public static class ForeachFaces
{
    private static double Upwind(double a, double b, double un) => un >= 0 ? un * a : un * b;

    [ConservativeUpdate]
    public static void Residual(int[] interiorFaces, int[] owner, int[] neighbour, double[] q, [FaceData] double[] un, [FaceData] double[] area, double[] res)
    {
        foreach (int f in interiorFaces)
        {
            double flux = Upwind(q[owner[f]], q[neighbour[f]], un[f]) * area[f];
            res[owner[f]] -= flux;
            res[neighbour[f]] += flux;
        }
    }
}
