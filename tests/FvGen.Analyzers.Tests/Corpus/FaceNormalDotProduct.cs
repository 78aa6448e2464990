// Unstructured scalar advection: the normal velocity of each face from a Vec3 dot product.
// mutant: FVC0004 one-sided: `            res[right[f]] += flux;` -> ``
// mutant: FVC0004 unequal: `res[left[f]] -= flux;` -> `res[left[f]] -= flux * 0.5;`
// mutant: FVC0004 self-cancelling: `res[right[f]] += flux;` -> `res[left[f]] += flux;`
using System;
using FvGen;
using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

public static class DotProductAdvection
{
    [ConservativeUpdate]
    public static void Residual(UnstructuredMesh mesh, double[] c, Vec3 velocity, double[] res)
    {
        var left = mesh.FaceLeft;
        var right = mesh.FaceRight;
        var normals = mesh.FaceAreaVectors;
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            double vn = Vec3.Dot(velocity, normals[f]);
            double flux = vn >= 0 ? vn * c[left[f]] : vn * c[right[f]];
            res[left[f]] -= flux;
            res[right[f]] += flux;
        }
    }
}
