// Enthalpy method for melting: temperature is a function of enthalpy, diffused between cells.
// mutant: FVC0002 sign-slip: `- 2 * Temperature(hh[i], latent) + Temperature(hh[i - 1], latent)` -> `- 2 * Temperature(hh[i], latent) - Temperature(hh[i - 1], latent)`
// mutant: FVC0001 other-latent: `Temperature(hh[i - 1], latent)` -> `Temperature(hh[i - 1], 0.0)`
// mutant: FVC0005 in-place: `hn[i] = hh[i]` -> `hh[i] = hh[i]`
using System;
using FvGen;

public static class EnthalpyMethod
{
    private static double Temperature(double h, double latent) => h < 0 ? h : (h > latent ? h - latent : 0.0);

    [ConservativeUpdate]
    public static void Step(double[] hh, double[] hn, double k, double latent, double dt, double dx)
    {
        for (int i = 1; i < hh.Length - 1; i++)
        {
            hn[i] = hh[i] + k * dt / (dx * dx) * (Temperature(hh[i + 1], latent) - 2 * Temperature(hh[i], latent) + Temperature(hh[i - 1], latent));
        }
    }
}
