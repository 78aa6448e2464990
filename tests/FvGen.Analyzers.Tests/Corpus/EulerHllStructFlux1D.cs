// 1-D Euler rate with an HLL flux returning a conserved-state struct with component-wise operators.
// mutant: FVC0003 swapped-argument: `Hll(q[i - 1], q[i], gamma)` -> `Hll(q[i], q[i - 1], gamma)`
// mutant: FVC0001 dropped-term: `(Hll(q[i - 1], q[i], gamma) - ` -> `(new Gas() - `
// mutant: FVC0003 wrong-stencil: `Hll(q[i], q[i + 1], gamma)` -> `Hll(q[i - 1], q[i + 1], gamma)`
using System;
using FvGen;

public struct Gas
{
    public double Rho, Mx, E;

    public Gas(double rho, double mx, double e) { Rho = rho; Mx = mx; E = e; }

    public static Gas operator +(Gas a, Gas b) => new(a.Rho + b.Rho, a.Mx + b.Mx, a.E + b.E);
    public static Gas operator -(Gas a, Gas b) => new(a.Rho - b.Rho, a.Mx - b.Mx, a.E - b.E);
    public static Gas operator *(double s, Gas a) => new(s * a.Rho, s * a.Mx, s * a.E);
    public static Gas operator /(Gas a, double s) => new(a.Rho / s, a.Mx / s, a.E / s);
}

public static class EulerHll
{
    private static Gas Physical(Gas q, double gamma)
    {
        double u = q.Mx / q.Rho;
        double p = (gamma - 1) * (q.E - 0.5 * q.Rho * u * u);
        return new Gas(q.Mx, q.Mx * u + p, (q.E + p) * u);
    }

    private static double SoundSpeed(Gas q, double gamma)
    {
        double u = q.Mx / q.Rho;
        double p = (gamma - 1) * (q.E - 0.5 * q.Rho * u * u);
        return Math.Sqrt(gamma * p / q.Rho);
    }

    public static Gas Hll(Gas l, Gas r, double gamma)
    {
        double ul = l.Mx / l.Rho, ur = r.Mx / r.Rho;
        double sl = Math.Min(ul - SoundSpeed(l, gamma), ur - SoundSpeed(r, gamma));
        double sr = Math.Max(ul + SoundSpeed(l, gamma), ur + SoundSpeed(r, gamma));
        if (sl >= 0) return Physical(l, gamma);
        if (sr <= 0) return Physical(r, gamma);
        return (sr * Physical(l, gamma) - sl * Physical(r, gamma) + (sl * sr) * (r - l)) / (sr - sl);
    }

    [ConservativeUpdate]
    public static void Rate(Gas[] q, Gas[] rate, double gamma, double dx)
    {
        for (int i = 1; i < q.Length - 1; i++)
        {
            rate[i] = (Hll(q[i - 1], q[i], gamma) - Hll(q[i], q[i + 1], gamma)) / dx;
        }
    }
}
