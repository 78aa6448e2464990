// Explicit step of a logistic reaction in every cell (a source), plus a conservative exchange with the neighbours.
// mutant: FVC0002 exchange-sign: `+ d * (u[i + 1] - 2 * u[i] + u[i - 1])` -> `+ d * (u[i + 1] - 2 * u[i] - u[i - 1])`
// mutant: FVC0001 reaction-reads-neighbour: `k * u[i] * (1 - u[i])` -> `k * u[i] * (1 - u[i + 1])`
// mutant: FVC0005 in-place: `un[i] = u[i]` -> `u[i] = u[i]`
using System;
using FvGen;

public static class LogisticReaction
{
    [ConservativeUpdate]
    public static void Step(double[] u, double[] un, double k, double d, double dt)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            un[i] = u[i] + dt * (k * u[i] * (1 - u[i]) + d * (u[i + 1] - 2 * u[i] + u[i - 1]));
        }
    }
}
