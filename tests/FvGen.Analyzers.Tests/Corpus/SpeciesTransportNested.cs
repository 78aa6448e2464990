// Multi-species transport: cells outer, species inner, face fluxes per species.
// mutant: FVC0001 dropped-term: `-(flux[i + 1, s] - flux[i, s]) / dx` -> `-flux[i + 1, s] / dx`
// mutant: FVC0001 wrong-species: `- flux[i, s]) / dx` -> `- flux[i, 0]) / dx`
// mutant: FVC0001 wrong-weight: `-(flux[i + 1, s] - flux[i, s]) / dx` -> `-(flux[i + 1, s] - flux[i, s] * mw[s]) / dx`
using System;
using FvGen;

public static class Species
{
    [ConservativeUpdate]
    public static void Rate([FaceData] double[,] flux, double[,] rate, double[] mw, double dx)
    {
        int cells = rate.GetLength(0), species = rate.GetLength(1);
        for (int i = 0; i < cells; i++)
        {
            for (int s = 0; s < species; s++)
            {
                rate[i, s] = -(flux[i + 1, s] - flux[i, s]) / dx;
            }
        }
    }
}
