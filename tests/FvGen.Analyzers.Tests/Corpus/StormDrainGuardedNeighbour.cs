// Storm-drain network on one face list: interior faces join two manholes, outfall faces have no
// neighbour (nei[f] == -1) and the write to the neighbour is guarded; the outfall flux leaves the mesh.
// mutant: FVC0004 flipped-guarded-write: `if (n >= 0) res[n] += flux;` -> `if (n >= 0) res[n] -= flux;`
using System;
using FvGen;

public static class StormDrainGuarded
{
    [ConservativeUpdate]
    public static void Residual(double[] c, double[] res, int[] own, int[] nei, [FaceData] double[] discharge)
    {
        for (int f = 0; f < own.Length; f++)
        {
            int o = own[f], n = nei[f];
            double flux = discharge[f] * c[o];
            res[o] -= flux;
            if (n >= 0) res[n] += flux;
        }
    }
}
