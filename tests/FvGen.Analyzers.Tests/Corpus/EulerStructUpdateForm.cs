// Explicit Euler step of a state struct with operators: un = u - dt/dx (F(i+1/2) - F(i-1/2)).
// mutant: FVC0005 in-place: `un[i] = u[i] - lambda` -> `u[i] = u[i] - lambda`
// mutant: FVC0003 swapped-argument: `Flux(u[i - 1], u[i])` -> `Flux(u[i], u[i - 1])`
// mutant: FVC0002 flipped-sign: `(Flux(u[i], u[i + 1]) - Flux(u[i - 1], u[i]))` -> `(Flux(u[i], u[i + 1]) + Flux(u[i - 1], u[i]))`
using System;
using FvGen;

public struct Pair
{
    public double A, B;

    public Pair(double a, double b) { A = a; B = b; }

    public static Pair operator +(Pair x, Pair y) => new(x.A + y.A, x.B + y.B);
    public static Pair operator -(Pair x, Pair y) => new(x.A - y.A, x.B - y.B);
    public static Pair operator *(double s, Pair x) => new(s * x.A, s * x.B);
}

public static class PairStep
{
    private static Pair Flux(Pair l, Pair r) => new(0.5 * (l.B + r.B), 0.5 * (l.A + r.A));

    [ConservativeUpdate]
    public static void Step(Pair[] u, Pair[] un, double dt, double dx)
    {
        double lambda = dt / dx;
        for (int i = 1; i < u.Length - 1; i++)
        {
            un[i] = u[i] - lambda * (Flux(u[i], u[i + 1]) - Flux(u[i - 1], u[i]));
        }
    }
}
