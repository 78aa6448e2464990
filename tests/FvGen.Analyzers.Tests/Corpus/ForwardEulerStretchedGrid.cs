// Forward Euler on a stretched 1-D grid: the cell width dx[i] is the cell measure.
// mutant: FVC0001 wrong-measure: `dt / dx[i] * (flux[i + 1] - flux[i])` -> `dt * (flux[i + 1] / dx[i] - flux[i] / dx[i - 1])`
// mutant: FVC0002 wrong-weight: `(flux[i + 1] - flux[i])` -> `(flux[i + 1] - 2 * flux[i])`
// mutant: FVC0001 copy-paste-array: `- flux[i])` -> `- u[i])`
using System;
using FvGen;

public static class StretchedGrid
{
    [ConservativeUpdate]
    public static void Step(double[] u, double[] un, [FaceData] double[] flux, double[] dx, double dt)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            un[i] = u[i] - dt / dx[i] * (flux[i + 1] - flux[i]);
        }
    }
}
