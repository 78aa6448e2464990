// Unstructured finite-volume scatter over interior faces with the mesh's owner/neighbour maps.
// mutant: FVC0004 one-sided: `residual[r] += flux;` -> ``
// mutant: FVC0004 self-cancelling: `residual[r] += flux;` -> `residual[l] += flux;`
// mutant: FVC0004 unequal-weights: `residual[r] += flux;` -> `residual[r] += 0.5 * flux;`
using System;
using FvGen;
using FvGen.Meshes.Unstructured;

public static class UnstructuredUpwind
{
    private static double Upwind(double ul, double ur, double vn) => vn > 0 ? vn * ul : vn * ur;

    [ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, double[] u, double[] residual, double[] normalVelocity)
    {
        ReadOnlySpan<int> left = mesh.FaceLeft;
        ReadOnlySpan<int> right = mesh.FaceRight;
        ReadOnlySpan<double> area = mesh.FaceAreas;
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            int l = left[f];
            int r = right[f];
            double flux = Upwind(u[l], u[r], normalVelocity[f]) * area[f];
            residual[l] -= flux;
            residual[r] += flux;
        }
    }
}
