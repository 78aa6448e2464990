// expect: none
// why: each transmissibility-weighted face flux T[•]*(p[•+1] - p[•]) enters the two cells of its face with opposite signs; volume[i,j,k] is the cell measure.
using System;

namespace Corpus.Structured3D;

/// <summary>Pressure rate in a slightly compressible aquifer block with face transmissibilities.</summary>
public static class AquiferPressureRate
{
    /// <summary>tx[i, j, k] is the face between cells (i-1, j, k) and (i, j, k); likewise ty, tz.</summary>
    [FvGen.ConservativeUpdate]
    public static void Rate(
        double[,,] p,
        [FvGen.FaceData] double[,,] tx, [FvGen.FaceData] double[,,] ty, [FvGen.FaceData] double[,,] tz,
        double[,,] volume, double[,,] rate)
    {
        for (int i = 1; i < p.GetLength(0) - 1; i++)
        {
            for (int j = 1; j < p.GetLength(1) - 1; j++)
            {
                for (int k = 1; k < p.GetLength(2) - 1; k++)
                {
                    double net =
                        tx[i + 1, j, k] * (p[i + 1, j, k] - p[i, j, k]) - tx[i, j, k] * (p[i, j, k] - p[i - 1, j, k])
                        + ty[i, j + 1, k] * (p[i, j + 1, k] - p[i, j, k]) - ty[i, j, k] * (p[i, j, k] - p[i, j - 1, k])
                        + tz[i, j, k + 1] * (p[i, j, k + 1] - p[i, j, k]) - tz[i, j, k] * (p[i, j, k] - p[i, j, k - 1]);
                    rate[i, j, k] = net / volume[i, j, k];
                }
            }
        }
    }
}
