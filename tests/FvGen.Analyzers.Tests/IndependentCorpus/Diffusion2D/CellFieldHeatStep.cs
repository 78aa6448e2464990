// expect: none
// why: the step reads the old temperature span and writes a separate span; the old-state class carries 1 + r·(4 - 4) = 1.
using System;
using FvGen.Fields;

namespace Corpus.Diffusion2D;

/// <summary>Explicit heat step for a square heated floor slab using the runtime's cell fields.</summary>
public static class FloorSlabStep
{
    [FvGen.ConservativeUpdate]
    public static void Advance(CellField<double> temperature, CellField<double> result, int n, double r)
    {
        ReadOnlySpan<double> t = temperature.ReadOnlySpan;
        Span<double> next = result.Span;
        for (int j = 1; j < n - 1; j++)
        {
            for (int i = 1; i < n - 1; i++)
            {
                int c = j * n + i;
                double neighbours = t[c - 1] + t[c + 1] + t[c - n] + t[c + n];
                next[c] = t[c] + r * (neighbours - 4.0 * t[c]);
            }
        }
    }
}
