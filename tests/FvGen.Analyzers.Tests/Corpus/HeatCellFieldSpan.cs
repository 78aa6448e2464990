// Explicit heat equation step on a runtime cell field, read through spans.
// mutant: FVC0002 wrong-weight: `- 2 * t[i]` -> `- 3 * t[i]`
// mutant: FVC0002 dropped-neighbour: ` + t[i - 1]` -> ``
// mutant: FVC0005 in-place: `Span<double> next = tNew.Span;` -> `Span<double> next = temperature.Span;`
using System;
using FvGen;
using FvGen.Fields;

public static class HeatStep
{
    [ConservativeUpdate]
    public static void Step(CellField<double> temperature, CellField<double> tNew, double alpha, double dt, double dx)
    {
        ReadOnlySpan<double> t = temperature.Span;
        Span<double> next = tNew.Span;
        double c = alpha * dt / (dx * dx);
        for (int i = 1; i < t.Length - 1; i++)
        {
            next[i] = t[i] + c * (t[i + 1] - 2 * t[i] + t[i - 1]);
        }
    }
}
