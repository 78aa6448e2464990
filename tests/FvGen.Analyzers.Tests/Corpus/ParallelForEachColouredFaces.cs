// Parallel scatter over one colour of faces (no two faces of a colour share a cell).
// mutant: FVC0004 one-sided: `            res[r] += flux;` -> ``
// mutant: FVC0004 self-cancelling: `res[r] += flux;` -> `res[l] += flux;`
// mutant: FVC0004 unequal-weights: `res[l] -= flux;` -> `res[l] -= 0.5 * flux;`
using System;
using System.Threading.Tasks;
using FvGen;

public static class ColouredScatter
{
    private static double Flux(double a, double b, double vn) => vn >= 0 ? vn * a : vn * b;

    [ConservativeUpdate]
    public static void Scatter(int[] colourFaces, int[] owner, int[] neighbour, double[] q, [FaceData] double[] vn, double[] res)
    {
        Parallel.ForEach(colourFaces, f =>
        {
            int l = owner[f];
            int r = neighbour[f];
            double flux = Flux(q[l], q[r], vn[f]);
            res[l] -= flux;
            res[r] += flux;
        });
    }
}
