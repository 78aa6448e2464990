// Lax-Wendroff step for linear advection, Courant number c: the old total is carried with weight 1.
// mutant: FVC0002 wrong-weight: `- 2 * u[i] + u[i - 1])` -> `- u[i] + u[i - 1])`
// mutant: FVC0005 in-place: `un[i] = u[i]` -> `u[i] = u[i]`
// mutant: FVC0002 sign-slip: `- 2 * u[i] + u[i - 1])` -> `- 2 * u[i] - u[i - 1])`
using System;
using FvGen;

public static class LaxWendroff
{
    [ConservativeUpdate]
    public static void Step(double[] u, double[] un, double c)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            un[i] = u[i] - 0.5 * c * (u[i + 1] - u[i - 1]) + 0.5 * c * c * (u[i + 1] - 2 * u[i] + u[i - 1]);
        }
    }
}
