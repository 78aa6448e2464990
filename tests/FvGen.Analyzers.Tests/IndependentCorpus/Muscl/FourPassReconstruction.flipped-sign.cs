// expect: FVC0002
// why: both faces of cell i are added, so the face data flux[•] collects +2/dx instead of cancelling.
using System;

namespace Corpus.Muscl;

/// <summary>MUSCL in four passes (slopes, face states, face fluxes, cell rates) for a sediment concentration in a settling channel.</summary>
public static class SettlingChannelMuscl
{
    [FvGen.NumericalFlux]
    public static double Rusanov(double left, double right, double velocity) =>
        0.5 * velocity * (left + right) - 0.5 * Math.Abs(velocity) * (right - left);

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] c, double[] rate, double velocity, double dx)
    {
        int n = c.Length;
        var slope = new double[n];
        var faceLeft = new double[n + 1];
        var faceRight = new double[n + 1];
        var flux = new double[n + 1];

        for (int i = 1; i < n - 1; i++)
        {
            double a = c[i] - c[i - 1], b = c[i + 1] - c[i];
            slope[i] = Math.Max(0.0, Math.Min(a, b)) + Math.Min(0.0, Math.Max(a, b));
        }

        // Face f lies between cells f-1 and f.
        for (int f = 1; f < n; f++)
        {
            faceLeft[f] = c[f - 1] + 0.5 * slope[f - 1];
            faceRight[f] = c[f] - 0.5 * slope[f];
        }

        for (int f = 1; f < n; f++)
        {
            flux[f] = Rusanov(faceLeft[f], faceRight[f], velocity);
        }

        for (int i = 1; i < n - 1; i++)
        {
            rate[i] = (flux[i] + flux[i + 1]) / dx;
        }
    }
}
