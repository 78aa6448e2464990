// Second stage of SSP-RK2 in Shu-Osher form: u^{n+1} = 1/2 u^n + 1/2 (u^1 + dt L(u^1)).
// mutant: FVC0002 precedence-slip: `0.5 * (u1[i] - dt / dx * (flux[i + 1] - flux[i]))` -> `0.5 * u1[i] - dt / dx * (flux[i + 1] - 0.5 * flux[i])`
// mutant: FVC0001 dropped-term: `(flux[i + 1] - flux[i])` -> `flux[i + 1]`
// mutant: FVC0002 flipped-sign: `(flux[i + 1] - flux[i])` -> `(-flux[i + 1] - flux[i])`
using System;
using FvGen;

public static class SspRk2
{
    [ConservativeUpdate]
    public static void SecondStage(double[] u0, double[] u1, [FaceData] double[] flux, double[] un, double dt, double dx)
    {
        for (int i = 0; i < un.Length; i++)
        {
            un[i] = 0.5 * u0[i] + 0.5 * (u1[i] - dt / dx * (flux[i + 1] - flux[i]));
        }
    }
}
