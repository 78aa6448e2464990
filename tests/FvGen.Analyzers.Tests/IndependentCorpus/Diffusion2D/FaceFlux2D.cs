// expect: none
// why: qx[•,•] enters cell (i,j) with +1/dx at face i and -1/dx at face i+1, and qy[•,•] with +1/dy at face j and -1/dy at face j+1.
using System;

namespace Corpus.Diffusion2D;

/// <summary>Moisture diffusion in a drying timber board from face fluxes stored per direction.</summary>
public static class TimberMoistureRate
{
    /// <summary>qx is (nx+1) x ny, qy is nx x (ny+1); qx[i, j] is the face on the west of cell (i, j).</summary>
    [FvGen.ConservativeUpdate]
    public static void Rate([FvGen.FaceData] double[,] qx, [FvGen.FaceData] double[,] qy, double[,] rate, double dx, double dy)
    {
        int nx = rate.GetLength(0), ny = rate.GetLength(1);
        for (int i = 0; i < nx; i++)
        {
            for (int j = 0; j < ny; j++)
            {
                rate[i, j] = -(qx[i + 1, j] - qx[i, j]) / dx - (qy[i, j + 1] - qy[i, j]) / dy;
            }
        }
    }
}
