// LWR traffic flow: Godunov supply-demand flux at each face, scattered to both cells.
// mutant: FVC0004 one-sided: `        rate[i] += q / dx;` -> ``
// mutant: FVC0004 self-cancelling: `rate[i] += q / dx;` -> `rate[i - 1] += q / dx;`
// mutant: FVC0004 wrong-weight: `rate[i - 1] -= q / dx;` -> `rate[i - 1] -= q / dx / 2;`
using System;
using FvGen;

public static class TrafficLwr
{
    private static double Demand(double rho, double critical) => rho < critical ? rho * (1 - rho) : critical * (1 - critical);

    private static double Supply(double rho, double critical) => rho > critical ? rho * (1 - rho) : critical * (1 - critical);

    [ConservativeUpdate]
    public static void Rate(double[] rho, double[] rate, double critical, double dx)
    {
        for (int i = 1; i < rho.Length; i++)
        {
            double q = Math.Min(Demand(rho[i - 1], critical), Supply(rho[i], critical));
            rate[i - 1] -= q / dx;
            rate[i] += q / dx;
        }
    }
}
