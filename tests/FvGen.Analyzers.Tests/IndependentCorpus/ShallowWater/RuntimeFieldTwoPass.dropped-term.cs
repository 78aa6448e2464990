// expect: FVC0001
// why: the depth rate lost the outflow face flux[i + 1].Depth, so the depth entering at face i leaves no cell.
using System;
using FvGen.Fields;

namespace Corpus.ShallowWater;

public struct CanalState
{
    public double Depth;
    public double Discharge;
}

/// <summary>Irrigation canal surge, runtime cell and face fields, face fluxes in a first pass.</summary>
public static class CanalSurgeRate
{
    [FvGen.NumericalFlux]
    public static CanalState LaxFriedrichs(in CanalState a, in CanalState b, double speed, double g) => new()
    {
        Depth = 0.5 * (a.Discharge + b.Discharge) - 0.5 * speed * (b.Depth - a.Depth),
        Discharge = 0.5 * (a.Discharge * a.Discharge / a.Depth + 0.5 * g * a.Depth * a.Depth
                         + b.Discharge * b.Discharge / b.Depth + 0.5 * g * b.Depth * b.Depth)
                    - 0.5 * speed * (b.Discharge - a.Discharge),
    };

    [FvGen.ConservativeUpdate]
    public static void Rate(CellField<CanalState> state, FaceField<CanalState> faceFlux, CellField<CanalState> rate, double speed, double g, double dx)
    {
        ReadOnlySpan<CanalState> s = state.ReadOnlySpan;
        Span<CanalState> flux = faceFlux.Span;
        Span<CanalState> r = rate.Span;

        // Face f sits between cells f-1 and f; faces 0 and Count are set by the boundary conditions.
        for (int f = 1; f < s.Length; f++)
        {
            flux[f] = LaxFriedrichs(s[f - 1], s[f], speed, g);
        }

        for (int i = 0; i < s.Length; i++)
        {
            r[i].Depth = flux[i].Depth / dx;
            r[i].Discharge = (flux[i].Discharge - flux[i + 1].Discharge) / dx;
        }
    }
}
