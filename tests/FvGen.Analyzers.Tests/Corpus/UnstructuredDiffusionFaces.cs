// Unstructured diffusion: two-point normal gradient across each interior face.
// mutant: FVC0004 one-sided: `        res[r] -= q;` -> ``
// mutant: FVC0004 self-cancelling: `res[r] -= q;` -> `res[l] -= q;`
// mutant: FVC0004 area-once: `res[l] += q;` -> `res[l] += q * area[f];`
using System;
using FvGen;
using FvGen.Meshes.Unstructured;

public static class UnstructuredDiffusion
{
    [ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, double[] t, double[] res, double conductivity)
    {
        var left = mesh.FaceLeft;
        var right = mesh.FaceRight;
        var area = mesh.FaceAreas;
        var distance = mesh.FaceCentreDistances;
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            int l = left[f], r = right[f];
            double q = conductivity * (t[r] - t[l]) / distance[f] * area[f];
            res[l] += q;
            res[r] -= q;
        }
    }
}
