// Thin-film equation: face fluxes h^3 times the curvature difference into a buffer, then the difference.
// mutant: FVC0001 dropped-term: `-(q[i + 1] - q[i]) / dx` -> `-q[i + 1] / dx`
// mutant: FVC0002 flipped-sign: `(q[i + 1] - q[i])` -> `(q[i + 1] + q[i])`
// mutant: FVC0002 wrong-weight: `-(q[i + 1] - q[i]) / dx` -> `-(q[i + 1] - q[i] / 3) / dx`
using System;
using FvGen;

public static class ThinFilm
{
    [ConservativeUpdate]
    public static void Rate(double[] h, double[] r, double dx)
    {
        int n = h.Length;
        var q = new double[n + 1];
        for (int i = 2; i < n - 1; i++)
        {
            double hf = 0.5 * (h[i - 1] + h[i]);
            double curvatureJump = (h[i + 1] - 3 * h[i] + 3 * h[i - 1] - h[i - 2]) / (dx * dx * dx);
            q[i] = hf * hf * hf * curvatureJump;
        }

        for (int i = 2; i < n - 2; i++)
        {
            r[i] = -(q[i + 1] - q[i]) / dx;
        }
    }
}
