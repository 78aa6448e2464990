// expect: none
// why: fx and fy are filled per face by DiffusiveFlux in the first loops; the cell loop reads fx at i and i+1 and fy at j and j+1 with opposite signs.
using System;

namespace Corpus.TwoPass;

/// <summary>Two-dimensional diffusion of humidity in a grain silo cross-section, face fluxes stored per direction.</summary>
public static class SiloHumidityRate
{
    /// <summary>Diffusive flux from the low-index cell to the high-index cell, with a humidity-dependent diffusivity.</summary>
    [FvGen.NumericalFlux]
    public static double DiffusiveFlux(double low, double high, double diffusivity, double spacing)
    {
        double mean = 0.5 * (low + high);
        return -diffusivity * (1.0 + 2.0 * mean) * (high - low) / spacing;
    }

    [FvGen.ConservativeUpdate]
    public static void Rate(double[,] h, double[,] rate, double diffusivity, double dx, double dy)
    {
        int nx = h.GetLength(0), ny = h.GetLength(1);
        var fx = new double[nx + 1, ny];
        var fy = new double[nx, ny + 1];

        for (int i = 1; i < nx; i++)
        {
            for (int j = 0; j < ny; j++)
            {
                fx[i, j] = DiffusiveFlux(h[i - 1, j], h[i, j], diffusivity, dx);
            }
        }

        for (int i = 0; i < nx; i++)
        {
            for (int j = 1; j < ny; j++)
            {
                fy[i, j] = DiffusiveFlux(h[i, j - 1], h[i, j], diffusivity, dy);
            }
        }

        for (int i = 0; i < nx; i++)
        {
            for (int j = 0; j < ny; j++)
            {
                rate[i, j] = (fx[i, j] - fx[i + 1, j]) / dx + (fy[i, j] - fy[i, j + 1]) / dy;
            }
        }
    }
}
