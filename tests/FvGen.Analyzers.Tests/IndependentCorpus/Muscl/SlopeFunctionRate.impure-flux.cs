// expect: FVC0006
// why: the upwind flux remembers the last face velocity in a static field, so it writes state outside itself.
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
    public static double Upwind(double left, double right, double velocity)
    {
        LastFaceVelocity = velocity;
        return Math.Max(velocity, 0.0) * left + Math.Min(velocity, 0.0) * right;
    }

    /// <summary>Velocity of the last face evaluated, kept for a debugging overlay.</summary>
    public static double LastFaceVelocity;

    [FvGen.ConservativeUpdate]
    public static void Rate(double[] u, double[] rate, double velocity, double dx)
    {
        for (int i = 2; i < u.Length - 2; i++)
        {
            double leftOfEast = u[i] + 0.5 * LimitedSlope(u[i - 1], u[i], u[i + 1]);
            double rightOfEast = u[i + 1] - 0.5 * LimitedSlope(u[i], u[i + 1], u[i + 2]);
            double leftOfWest = u[i - 1] + 0.5 * LimitedSlope(u[i - 2], u[i - 1], u[i]);
            double rightOfWest = u[i] - 0.5 * LimitedSlope(u[i - 1], u[i], u[i + 1]);

            rate[i] = (Upwind(leftOfWest, rightOfWest, velocity) - Upwind(leftOfEast, rightOfEast, velocity)) / dx;
        }
    }
}
