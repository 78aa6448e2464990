// expect: FVC0100
// why: the face contributions are accumulated by a helper that writes rate[i, j] through a ref parameter, a side-effecting call the checker does not model, so it must report the update as not analysed.
using System;

namespace Corpus.Diffusion2D;

/// <summary>Heat conduction rate in a rectangular aluminium plate with a uniform conductivity.</summary>
public static class PlateConduction
{
    /// <summary>Adds the conductive gain of a cell from one neighbour.</summary>
    private static void AddFace(ref double target, double neighbour, double here, double weight) =>
        target += weight * (neighbour - here);

    [FvGen.ConservativeUpdate]
    public static void Rate(double[,] T, double[,] rate, double diffusivity, double dx, double dy)
    {
        int nx = T.GetLength(0), ny = T.GetLength(1);
        for (int i = 1; i < nx - 1; i++)
        {
            for (int j = 1; j < ny - 1; j++)
            {
                rate[i, j] = 0.0;
                AddFace(ref rate[i, j], T[i + 1, j], T[i, j], diffusivity / (dx * dx));
                AddFace(ref rate[i, j], T[i - 1, j], T[i, j], diffusivity / (dx * dx));
                AddFace(ref rate[i, j], T[i, j + 1], T[i, j], diffusivity / (dy * dy));
                AddFace(ref rate[i, j], T[i, j - 1], T[i, j], diffusivity / (dy * dy));
            }
        }
    }
}
