// expect: none
// why: relabelled from FVC0004: with rate[i - 1, j] -= qx gone the x loop writes one cell, rate[i, j] += k·(T[i - 1, j] − T[i, j])/dx², whose T[•] class sums to 0 — a one-sided but telescoping stencil (wrong physics, conserved total), so by the criterion it conserves.
using System;

namespace Corpus.Diffusion2D;

/// <summary>Heat spreading in a solar-panel backsheet, assembled with one loop per face direction.</summary>
public static class BacksheetFaceLoops
{
    [FvGen.ConservativeUpdate]
    public static void Rate(double[,] T, double[,] rate, double conductivity, double dx, double dy)
    {
        int nx = T.GetLength(0), ny = T.GetLength(1);
        // The caller zeroes rate; the loops only accumulate face contributions.

        // x faces between (i-1, j) and (i, j).
        for (int i = 1; i < nx; i++)
        {
            for (int j = 0; j < ny; j++)
            {
                double qx = -conductivity * (T[i, j] - T[i - 1, j]) / (dx * dx);
                rate[i, j] += qx;
            }
        }

        // y faces between (i, j-1) and (i, j).
        for (int i = 0; i < nx; i++)
        {
            for (int j = 1; j < ny; j++)
            {
                double qy = -conductivity * (T[i, j] - T[i, j - 1]) / (dy * dy);
                rate[i, j - 1] -= qy;
                rate[i, j] += qy;
            }
        }
    }
}
