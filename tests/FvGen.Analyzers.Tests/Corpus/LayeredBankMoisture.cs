// Soil moisture in a layered river bank: spreading along each layer with that layer's conductivity,
// exchange between layers through the conductivity of each interface (a coefficient indexed by one
// loop variable only multiplies a difference along the other).
// mutant: FVC0002 flipped-lower-interface: `- kv[i, j] * (m[i, j] - m[i, j - 1])` -> `+ kv[i, j] * (m[i, j] - m[i, j - 1])`
// mutant: FVC0001 layer-coefficient-across-layers: `kv[i, j + 1] * (m[i, j + 1] - m[i, j])` -> `kh[j] * (m[i, j + 1] - m[i, j])`
// mutant: FVC0001 layer-index-slip: `kh[j] * (m[i + 1, j] - 2 * m[i, j] + m[i - 1, j])` -> `kh[i] * (m[i + 1, j] - 2 * m[i, j] + m[i - 1, j])`
using System;
using FvGen;

public static class LayeredBank
{
    [ConservativeUpdate]
    public static void Rate(double[,] m, double[] kh, double[,] kv, double[,] rate, double dx, double dz)
    {
        for (int i = 1; i < m.GetLength(0) - 1; i++)
        {
            for (int j = 1; j < m.GetLength(1) - 1; j++)
            {
                double along = kh[j] * (m[i + 1, j] - 2 * m[i, j] + m[i - 1, j]) / (dx * dx);
                double across = (kv[i, j + 1] * (m[i, j + 1] - m[i, j]) - kv[i, j] * (m[i, j] - m[i, j - 1])) / (dz * dz);
                rate[i, j] = along + across;
            }
        }
    }
}
