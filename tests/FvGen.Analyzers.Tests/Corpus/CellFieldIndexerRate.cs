// Rate written directly through the runtime fields' indexers (no spans).
// mutant: FVC0003 swapped-argument: `Upwind(q[i - 1], q[i], a)` -> `Upwind(q[i], q[i - 1], a)`
// mutant: FVC0001 dropped-term: `-(Upwind(q[i], q[i + 1], a) - Upwind(q[i - 1], q[i], a)) / dx` -> `-Upwind(q[i], q[i + 1], a) / dx`
// mutant: FVC0005 in-place: `rate[i] = ` -> `q[i] = `
using System;
using FvGen;
using FvGen.Fields;

public static class FieldIndexer
{
    private static double Upwind(double l, double r, double a) => a >= 0 ? a * l : a * r;

    [ConservativeUpdate]
    public static void Rate(CellField<double> q, CellField<double> rate, double a, double dx)
    {
        for (int i = 1; i < q.Count - 1; i++)
        {
            rate[i] = -(Upwind(q[i], q[i + 1], a) - Upwind(q[i - 1], q[i], a)) / dx;
        }
    }
}
