// expect: FVC0004
// why: the z-face loop takes q from rate[i, j, k - 1] but the line giving it to rate[i, j, k] is missing.
using System;

namespace Corpus.Structured3D;

/// <summary>Moisture migration in a concrete block, one loop per face direction (the generated layout, written by hand).</summary>
public static class ConcreteMoistureFaceLoops
{
    [FvGen.NumericalFlux]
    public static double Permeation(double low, double high, double permeability, double spacing) =>
        -permeability * (1.0 + 0.5 * (low + high)) * (high - low) / spacing;

    [FvGen.ConservativeUpdate]
    public static void Rate(double[,,] w, double[,,] rate, double permeability, double h)
    {
        int nx = w.GetLength(0), ny = w.GetLength(1), nz = w.GetLength(2);
        double inverseH = 1.0 / h;

        for (int i = 1; i < nx; i++)
            for (int j = 0; j < ny; j++)
                for (int k = 0; k < nz; k++)
                {
                    double q = Permeation(w[i - 1, j, k], w[i, j, k], permeability, h) * inverseH;
                    rate[i - 1, j, k] -= q;
                    rate[i, j, k] += q;
                }

        for (int i = 0; i < nx; i++)
            for (int j = 1; j < ny; j++)
                for (int k = 0; k < nz; k++)
                {
                    double q = Permeation(w[i, j - 1, k], w[i, j, k], permeability, h) * inverseH;
                    rate[i, j - 1, k] -= q;
                    rate[i, j, k] += q;
                }

        for (int i = 0; i < nx; i++)
            for (int j = 0; j < ny; j++)
                for (int k = 1; k < nz; k++)
                {
                    double q = Permeation(w[i, j, k - 1], w[i, j, k], permeability, h) * inverseH;
                    rate[i, j, k - 1] -= q;
                }
    }
}
