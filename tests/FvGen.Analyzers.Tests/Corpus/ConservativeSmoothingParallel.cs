// A conservative smoothing filter applied in parallel: the old total is carried with weight 1.
// mutant: FVC0002 unbalanced-filter: `u[i + 1] - 2 * u[i] + u[i - 1]` -> `u[i + 1] - 2 * u[i] + 0.5 * u[i - 1]`
// mutant: FVC0005 in-place: `filtered[i] = u[i]` -> `u[i] = u[i]`
// mutant: FVC0002 sign-slip: `u[i + 1] - 2 * u[i] + u[i - 1]` -> `u[i + 1] + 2 * u[i] + u[i - 1]`
using System;
using System.Threading.Tasks;
using FvGen;

public static class Smoothing
{
    [ConservativeUpdate]
    public static void Filter(double[] u, double[] filtered, double epsilon)
    {
        Parallel.For(1, u.Length - 1, i =>
        {
            filtered[i] = u[i] + epsilon * (u[i + 1] - 2 * u[i] + u[i - 1]);
        });
    }
}
