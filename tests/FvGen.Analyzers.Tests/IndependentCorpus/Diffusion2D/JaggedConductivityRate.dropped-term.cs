// expect: FVC0001
// why: the south face flux qSouth was dropped, so the north-face terms kNorth*T[i][j+1] and kNorth*T[i][j] leave each cell with no cell receiving them.
using System;

namespace Corpus.Diffusion2D;

/// <summary>Conduction through a composite wall of bricks and mortar with cell-wise conductivity, jagged arrays.</summary>
public static class CompositeWallRate
{
    [FvGen.ConservativeUpdate]
    public static void Rate(double[][] T, double[][] k, double[][] rate, double dx, double dy)
    {
        for (int i = 1; i < T.Length - 1; i++)
        {
            for (int j = 1; j < T[i].Length - 1; j++)
            {
                // Harmonic means keep the flux continuous across a brick/mortar interface.
                double kEast = 2.0 * k[i][j] * k[i + 1][j] / (k[i][j] + k[i + 1][j]);
                double kWest = 2.0 * k[i - 1][j] * k[i][j] / (k[i - 1][j] + k[i][j]);
                double kNorth = 2.0 * k[i][j] * k[i][j + 1] / (k[i][j] + k[i][j + 1]);
                double kSouth = 2.0 * k[i][j - 1] * k[i][j] / (k[i][j - 1] + k[i][j]);

                double qEast = kEast * (T[i + 1][j] - T[i][j]) / dx;
                double qWest = kWest * (T[i][j] - T[i - 1][j]) / dx;
                double qNorth = kNorth * (T[i][j + 1] - T[i][j]) / dy;
                double qSouth = kSouth * (T[i][j] - T[i][j - 1]) / dy;

                rate[i][j] = (qEast - qWest) / dx + qNorth / dy;
            }
        }
    }
}
