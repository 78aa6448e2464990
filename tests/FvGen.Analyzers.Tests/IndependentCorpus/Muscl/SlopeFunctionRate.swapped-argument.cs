// expect: FVC0003
// why: the west face calls Upwind(rightOfWest, leftOfWest, …), so face i-1/2 gets its states in the opposite order from cell i-1.
using System;

namespace Corpus.Muscl;

/// <summary>Second-order rate of a polymer concentration in a mixing tube, van Albada slope from a helper.</summary>
public static class MixingTubeRate
{
    /// <summary>Van Albada slope of the middle cell from its two neighbours.</summary>
    public static double LimitedSlope(double west, double here, double east)
    {
        double a = here - west, b = east - here;
        const double epsilon = 1e-12;
        return (a * b + Math.Abs(a * b)) * (a + b) / (a * a + b * b + epsilon) * 0.5;
    }

    [FvGen.NumericalFlux]
    public static double Upwind(double left, double right, double velocity) =>
        Math.Max(velocity, 0.0) * left + Math.Min(velocity, 0.0) * right;

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] u, double[] rate, double velocity, double dx)
    {
        for (int i = 2; i < u.Length - 2; i++)
        {
            double leftOfEast = u[i] + 0.5 * LimitedSlope(u[i - 1], u[i], u[i + 1]);
            double rightOfEast = u[i + 1] - 0.5 * LimitedSlope(u[i], u[i + 1], u[i + 2]);
            double leftOfWest = u[i - 1] + 0.5 * LimitedSlope(u[i - 2], u[i - 1], u[i]);
            double rightOfWest = u[i] - 0.5 * LimitedSlope(u[i - 1], u[i], u[i + 1]);

            rate[i] = (Upwind(rightOfWest, leftOfWest, velocity) - Upwind(leftOfEast, rightOfEast, velocity)) / dx;
        }
    }
}
