// Buckley-Leverett saturation step with upwind fractional flow; porosity times width is the cell measure.
// mutant: FVC0003 wrong-measure: `dt / (phi[i] * dx)` -> `dt / (phi[i - 1] * dx)`
// mutant: FVC0001 other-mobility: `- Fractional(s[i - 1], m)` -> `- Fractional(s[i - 1], 1 / m)`
// mutant: FVC0005 in-place: `sn[i] = s[i]` -> `s[i] = s[i]`
using System;
using FvGen;

public static class BuckleyLeverett
{
    private static double Fractional(double s, double m) => s * s / (s * s + m * (1 - s) * (1 - s));

    [ConservativeUpdate]
    public static void Step(double[] s, double[] sn, double[] phi, double m, double dt, double dx)
    {
        for (int i = 1; i < s.Length; i++)
        {
            sn[i] = s[i] - dt / (phi[i] * dx) * (Fractional(s[i], m) - Fractional(s[i - 1], m));
        }
    }
}
