// Unstructured rate: each face flux divided by the volume of the cell it enters (cell measure).
// mutant: FVC0004 wrong-volume: `flux / vol[r]` -> `flux / vol[l]`
// mutant: FVC0004 flipped-sign: `rate[r] += flux / vol[r];` -> `rate[r] -= flux / vol[r];`
// mutant: FVC0004 dropped-left: `rate[l] -= flux / vol[l];` -> ``
using System;
using FvGen;
using FvGen.Meshes.Unstructured;

public static class VolumeWeighted
{
    private static double Central(double a, double b, double velocity) => 0.5 * velocity * (a + b);

    [ConservativeUpdate]
    public static void Rate(UnstructuredMesh mesh, double[] u, double[] rate, [FaceData] double[] sn)
    {
        var left = mesh.FaceLeft;
        var right = mesh.FaceRight;
        var vol = mesh.CellVolumes;
        for (int f = 0; f < mesh.InteriorFaceCount; f++)
        {
            int l = left[f], r = right[f];
            double flux = Central(u[l], u[r], sn[f]);
            rate[l] -= flux / vol[l];
            rate[r] += flux / vol[r];
        }
    }
}
