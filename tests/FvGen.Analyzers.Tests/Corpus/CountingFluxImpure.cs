// A flux helper that must stay pure; the mutant adds an evaluation counter (a static field).
// mutant: FVC0006 counter: `private static double Central(double a, double b, double c) => 0.5 * c * (a + b);` -> `private static double Central(double a, double b, double c) { Evaluations++; return 0.5 * c * (a + b); }`
// mutant: FVC0006 cache: `private static double Central(double a, double b, double c) => 0.5 * c * (a + b);` -> `private static double Central(double a, double b, double c) { Last = a; return 0.5 * c * (a + b); }`
// mutant: FVC0001 dropped: ` - Central(u[i - 1], u[i], c)` -> ``
using System;
using FvGen;

public static class CountingFlux
{
    public static int Evaluations;
    public static double Last;

    private static double Central(double a, double b, double c) => 0.5 * c * (a + b);

    [ConservativeUpdate]
    public static void Rate(double[] u, double[] r, double c, double dx)
    {
        for (int i = 1; i < u.Length - 1; i++)
        {
            r[i] = -(Central(u[i], u[i + 1], c) - Central(u[i - 1], u[i], c)) / dx;
        }
    }
}
