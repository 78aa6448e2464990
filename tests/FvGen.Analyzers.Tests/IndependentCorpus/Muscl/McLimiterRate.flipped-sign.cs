// expect: FVC0002
// why: the west face subtracts its slope correction, so the MC slope class collects -velocity/(2dx) twice instead of cancelling.
using System;

namespace Corpus.Muscl;

/// <summary>Linear advection of a temperature step in a heat-tracing line, monotonised-central limiter inline.</summary>
public static class HeatTracingMc
{
    [FvGen.ConservativeUpdate]
    public static void Rate(double[] u, double[] rate, double velocity, double dx)
    {
        for (int i = 2; i < u.Length - 1; i++)
        {
            double back = u[i] - u[i - 1];
            double fwd = u[i + 1] - u[i];
            double backWest = u[i - 1] - u[i - 2];

            // MC limiter: minmod(2a, (a + b)/2, 2b), written with Max/Min so both signs are handled.
            double sigmaHere = Math.Max(0.0, Math.Min(Math.Min(2.0 * back, 2.0 * fwd), 0.5 * (back + fwd)))
                + Math.Min(0.0, Math.Max(Math.Max(2.0 * back, 2.0 * fwd), 0.5 * (back + fwd)));
            double sigmaWest = Math.Max(0.0, Math.Min(Math.Min(2.0 * backWest, 2.0 * back), 0.5 * (backWest + back)))
                + Math.Min(0.0, Math.Max(Math.Max(2.0 * backWest, 2.0 * back), 0.5 * (backWest + back)));

            double east = velocity * (u[i] + 0.5 * sigmaHere);
            double west = velocity * (u[i - 1] - 0.5 * sigmaWest);
            rate[i] = -(east - west) / dx;
        }
    }
}
