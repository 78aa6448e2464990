// expect: none
// why: qx is read at j*(nx+1)+i and j*(nx+1)+i+1, qy at j*nx+i and (j+1)*nx+i; each pair is one lattice class with weights -1 and +1 (per dx or dy).
using System;

namespace Corpus.Diffusion2D;

/// <summary>Rate of a pollutant plume in a shallow lake from linearised face-flux spans.</summary>
public static class LakePlumeRate
{
    /// <summary>
    /// Cells are j*nx + i; x-faces are j*(nx+1) + i (face i is west of cell i); y-faces are j*nx + i (face j is south of row j).
    /// </summary>
    [FvGen.ConservativeUpdate]
    public static void Rate(
        [FvGen.FaceData] ReadOnlySpan<double> qx,
        [FvGen.FaceData] ReadOnlySpan<double> qy,
        Span<double> rate,
        int nx, int ny, double dx, double dy)
    {
        for (int j = 0; j < ny; j++)
        {
            for (int i = 0; i < nx; i++)
            {
                double west = qx[j * (nx + 1) + i];
                double east = qx[j * (nx + 1) + i + 1];
                double south = qy[j * nx + i];
                double north = qy[(j + 1) * nx + i];
                rate[j * nx + i] = (west - east) / dx + (south - north) / dy;
            }
        }
    }
}
