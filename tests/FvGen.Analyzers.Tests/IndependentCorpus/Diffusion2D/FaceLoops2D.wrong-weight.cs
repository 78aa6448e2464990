// expect: FVC0004
// why: in the y-face loop the flux leaving rate[i, j - 1] is multiplied by dy/dx (pasted from the x loop), so the two cells of a y face get unequal weights.
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
                rate[i - 1, j] -= qx;
                rate[i, j] += qx;
            }
        }

        // y faces between (i, j-1) and (i, j).
        for (int i = 0; i < nx; i++)
        {
            for (int j = 1; j < ny; j++)
            {
                double qy = -conductivity * (T[i, j] - T[i, j - 1]) / (dy * dy);
                rate[i, j - 1] -= qy * dy / dx;
                rate[i, j] += qy;
            }
        }
    }
}
