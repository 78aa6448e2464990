// A pure source update (heat release depending on position): nothing leaves a cell through a face.
// mutant: FVC0001 neighbour-read: `Release(u[i], x)` -> `Release(u[i + 1], x)`
// mutant: FVC0001 neighbour-temperature: `- cooling * u[i]` -> `- cooling * u[i - 1]`
// mutant: FVC0005 in-place-neighbour: `r[i] = Release` -> `u[i] = Release(u[i - 1], x) + 0 * Release`
using System;
using FvGen;

public static class CellSources
{
    private static double Release(double t, double x) => Math.Exp(-t) * (1 + x * x);

    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double x0, double dx, double cooling)
    {
        for (int i = 0; i < u.Length; i++)
        {
            double x = x0 + (i + 0.5) * dx;
            r[i] = Release(u[i], x) - cooling * u[i];
        }
    }
}
