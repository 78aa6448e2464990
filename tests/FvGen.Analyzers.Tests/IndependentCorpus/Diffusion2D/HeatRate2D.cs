// expect: none
// why: all reads of T share one class T[•,•] whose weights are k/dx²·(1 - 2 + 1) + k/dy²·(1 - 2 + 1) = 0: the five-point Laplacian moves heat between neighbours only.
using System;

namespace Corpus.Diffusion2D;

/// <summary>Heat conduction rate in a rectangular aluminium plate with a uniform conductivity.</summary>
public static class PlateConduction
{
    [FvGen.ConservativeUpdate]
    public static void Rate(double[,] T, double[,] rate, double diffusivity, double dx, double dy)
    {
        int nx = T.GetLength(0), ny = T.GetLength(1);
        for (int i = 1; i < nx - 1; i++)
        {
            for (int j = 1; j < ny - 1; j++)
            {
                double xPart = ((T[i + 1, j] - T[i, j]) - (T[i, j] - T[i - 1, j])) / (dx * dx);
                double yPart = ((T[i, j + 1] - T[i, j]) - (T[i, j] - T[i, j - 1])) / (dy * dy);
                rate[i, j] = diffusivity * (xPart + yPart);
            }
        }
    }
}
