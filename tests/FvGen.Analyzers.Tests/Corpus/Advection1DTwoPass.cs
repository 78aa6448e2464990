// Linear advection, upwind face fluxes into a buffer, then the flux difference (two-pass form).
// mutant: FVC0001 dropped-term: `-(flux[i + 1] - flux[i]) / dx` -> `-flux[i + 1] / dx`
// mutant: FVC0002 flipped-sign: `(flux[i + 1] - flux[i])` -> `(flux[i + 1] + flux[i])`
// mutant: FVC0002 wrong-weight: `(flux[i + 1] - flux[i]) / dx` -> `flux[i + 1] / dx - flux[i] / (2 * dx)`
using System;
using FvGen;

public static class UpwindTwoPass
{
    [ConservativeUpdate]
    public static void Rate(ReadOnlySpan<double> u, Span<double> r, double a, double dx)
    {
        var flux = new double[u.Length + 1];
        for (int i = 1; i < u.Length; i++)
        {
            flux[i] = a > 0 ? a * u[i - 1] : a * u[i];
        }

        for (int i = 1; i < u.Length - 1; i++)
        {
            r[i] = -(flux[i + 1] - flux[i]) / dx;
        }
    }
}
