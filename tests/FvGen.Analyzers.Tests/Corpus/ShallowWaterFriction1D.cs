// Shallow water on a flat bed with Manning-type friction: Rusanov fluxes per component, friction as a cell source.
// mutant: FVC0003 copy-paste-component: `-(fR.Hu - fL.Hu) / dx` -> `-(fR.Hu - fL.H) / dx`
// mutant: FVC0003 stale-state: `Rusanov(h[i - 1], hu[i - 1], h[i], hu[i], g)` -> `Rusanov(h[i - 1], hu[i], h[i], hu[i], g)`
// mutant: FVC0002 flipped-sign: `-(fR.H - fL.H) / dx` -> `-(fR.H + fL.H) / dx`
using System;
using FvGen;

public struct WaterFlux
{
    public double H;
    public double Hu;
}

public static class ShallowWater
{
    public static WaterFlux Rusanov(double hl, double hul, double hr, double hur, double g)
    {
        double ul = hul / hl, ur = hur / hr;
        double s = Math.Max(Math.Abs(ul) + Math.Sqrt(g * hl), Math.Abs(ur) + Math.Sqrt(g * hr));
        WaterFlux f;
        f.H = 0.5 * (hul + hur) - 0.5 * s * (hr - hl);
        f.Hu = 0.5 * (hul * ul + 0.5 * g * hl * hl + hur * ur + 0.5 * g * hr * hr) - 0.5 * s * (hur - hul);
        return f;
    }

    [ConservativeUpdate]
    public static void Rate(double[] h, double[] hu, double[] rh, double[] rhu, double g, double manning, double dx)
    {
        for (int i = 1; i < h.Length - 1; i++)
        {
            WaterFlux fL = Rusanov(h[i - 1], hu[i - 1], h[i], hu[i], g);
            WaterFlux fR = Rusanov(h[i], hu[i], h[i + 1], hu[i + 1], g);
            double friction = -g * manning * manning * hu[i] * Math.Abs(hu[i]) / Math.Pow(h[i], 7.0 / 3.0);
            rh[i] = -(fR.H - fL.H) / dx;
            rhu[i] = -(fR.Hu - fL.Hu) / dx + friction;
        }
    }
}
