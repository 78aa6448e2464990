// Face index and cell index advanced together in one for loop (f = i + 1 trails the cell's high face).
// mutant: FVC0001 dropped-term: `-(flux[f] - flux[f - 1]) / dx` -> `-flux[f] / dx`
// mutant: FVC0001 wrong-start: `for (int i = 0, f = 1; i < n; i++, f++)` -> `for (int i = 0, f = 1; i < n; i++, f += 2)`
// mutant: FVC0002 flipped-sign: `(flux[f] - flux[f - 1])` -> `(flux[f] + flux[f - 1])`
using System;
using FvGen;

public static class Lockstep
{
    [ConservativeUpdate]
    public static void Rate([FaceData] double[] flux, double[] r, int n, double dx)
    {
        for (int i = 0, f = 1; i < n; i++, f++)
        {
            r[i] = -(flux[f] - flux[f - 1]) / dx;
        }
    }
}
