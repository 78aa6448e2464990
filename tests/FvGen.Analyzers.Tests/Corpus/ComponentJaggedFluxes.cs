// One jagged array per conserved component: rate[s][i] from face fluxes flux[s][i].
// mutant: FVC0001 wrong-component: `- flux[s][i]) / dx` -> `- flux[0][i]) / dx`
// mutant: FVC0001 dropped-term: `(flux[s][i + 1] - flux[s][i])` -> `flux[s][i + 1]`
// mutant: FVC0002 flipped-sign: `(flux[s][i + 1] - flux[s][i])` -> `(flux[s][i + 1] + flux[s][i])`
using System;
using FvGen;

public static class JaggedComponents
{
    [ConservativeUpdate]
    public static void Rate([FaceData] double[][] flux, double[][] rate, double dx)
    {
        for (int s = 0; s < rate.Length; s++)
        {
            for (int i = 0; i < rate[s].Length; i++)
            {
                rate[s][i] = -(flux[s][i + 1] - flux[s][i]) / dx;
            }
        }
    }
}
