// Interior scatter followed by an outflow patch (a contiguous face range) that gives its flux to the owner only.
// mutant: FVC0004 patch-reads-neighbour: `Outflow(u[c], vn[f])` -> `0.5 * vn[f] * (u[c] + u[right[f]])`
// mutant: FVC0004 one-sided-interior: `            res[right[f]] += flux;` -> ``
// mutant: FVC0004 self-cancelling: `res[right[f]] += flux;` -> `res[left[f]] += flux;`
using System;
using FvGen;
using FvGen.Meshes.Unstructured;

public static class OutflowPatch
{
    private static double Upwind(double a, double b, double vn) => vn >= 0 ? vn * a : vn * b;

    private static double Outflow(double inside, double vn) => vn * inside;

    [ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, double[] u, [FaceData] double[] vn, double[] res, int patchStart, int patchEnd)
    {
        var left = mesh.FaceLeft;
        var right = mesh.FaceRight;
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            double flux = Upwind(u[left[f]], u[right[f]], vn[f]);
            res[left[f]] -= flux;
            res[right[f]] += flux;
        }

        for (int f = patchStart; f < patchEnd; f++)
        {
            int c = left[f];
            res[c] -= Outflow(u[c], vn[f]);
        }
    }
}
