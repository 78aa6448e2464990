using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Runtime.Tests.Ledger;

/// <summary>Two conserved components for the ledger tests; the second takes both signs.</summary>
internal struct Tracers
{
    public double Mass;
    public double Charge;
}

/// <summary>
/// Residuals in telescoping form with a manufactured face flux: F = a(x, t) + b · U(upwind), with a
/// smooth, time-dependent a and an inflow value prescribed on the low side. Each face flux is
/// computed once and applied with opposite signs to its two cells, so Σ R·V equals minus the
/// boundary outflow exactly in real arithmetic; any imbalance the ledger sees is rounding.
/// </summary>
internal static class ManufacturedFlux
{
    public const double Speed = 1.0;

    public static double Background(double x, double t, int component) =>
        component == 0 ? 1.0 + 0.5 * Math.Sin(3 * x - 2 * t) : 0.3 * Math.Cos(5 * x + t) - 0.1;

    public static double InflowValue(double t, int component) => component == 0 ? 1.0 + 0.3 * Math.Cos(t) : -0.2 + 0.1 * Math.Sin(2 * t);

    /// <summary>A 1-D residual on <paramref name="grid"/>; <paramref name="droppedFace"/> ≥ 0 never takes that face's flux from the cell behind it.</summary>
    public static FvGen.Time.ResidualFunction<Tracers> OneDimensional(StructuredGrid1D grid, int droppedFace = -1)
    {
        int nx = grid.Nx;
        double[] nodes = grid.X.Nodes.ToArray();
        double[] widths = grid.X.Widths.ToArray();
        var flux = new Tracers[nx + 1];
        int inflow = grid.PatchIndex(GridSide.XLow);
        int outflow = grid.PatchIndex(GridSide.XHigh);
        return (state, residual, time, tally) =>
        {
            for (int f = 0; f <= nx; f++)
            {
                double x = nodes[f];
                Tracers upwind = f == 0
                    ? new Tracers { Mass = InflowValue(time, 0), Charge = InflowValue(time, 1) }
                    : state[f - 1];
                flux[f].Mass = Background(x, time, 0) + Speed * upwind.Mass;
                flux[f].Charge = Background(x, time, 1) + Speed * upwind.Charge;
            }

            for (int i = 0; i < nx; i++)
            {
                double rightShare = i + 1 == droppedFace ? 0.0 : 1.0;
                residual[i].Mass = -(rightShare * flux[i + 1].Mass - flux[i].Mass) / widths[i];
                residual[i].Charge = -(rightShare * flux[i + 1].Charge - flux[i].Charge) / widths[i];
            }

            // Positive out of the domain: the low face's flux points in, the high face's out.
            tally.Add(inflow, 0, -flux[0].Mass);
            tally.Add(inflow, 1, -flux[0].Charge);
            tally.Add(outflow, 0, flux[nx].Mass);
            tally.Add(outflow, 1, flux[nx].Charge);
        };
    }

    /// <summary>
    /// A 2-D residual: the 1-D flux along x (area Δy), and along y a flux G = c(x, y, t) + ½ U(below),
    /// with a prescribed seepage through the bottom wall; the two walls share one patch.
    /// </summary>
    public static FvGen.Time.ResidualFunction<Tracers> TwoDimensional(StructuredGrid2D grid)
    {
        int nx = grid.Nx;
        int ny = grid.Ny;
        double[] xn = grid.X.Nodes.ToArray();
        double[] yn = grid.Y.Nodes.ToArray();
        double[] dx = grid.X.Widths.ToArray();
        double[] dy = grid.Y.Widths.ToArray();
        double[] xc = grid.X.Centres.ToArray();
        var fx = new Tracers[(nx + 1) * ny];
        var fy = new Tracers[nx * (ny + 1)];
        int inlet = grid.PatchIndex(GridSide.XLow);
        int outlet = grid.PatchIndex(GridSide.XHigh);
        int bottom = grid.PatchIndex(GridSide.YLow);
        int top = grid.PatchIndex(GridSide.YHigh);
        return (state, residual, time, tally) =>
        {
            for (int j = 0; j < ny; j++)
            {
                for (int f = 0; f <= nx; f++)
                {
                    Tracers upwind = f == 0
                        ? new Tracers { Mass = InflowValue(time, 0), Charge = InflowValue(time, 1) }
                        : state[grid.CellIndex(f - 1, j)];
                    ref Tracers F = ref fx[f + (nx + 1) * j];
                    F.Mass = Background(xn[f], time, 0) + Speed * upwind.Mass;
                    F.Charge = Background(xn[f], time, 1) + Speed * upwind.Charge;
                }
            }

            for (int g = 0; g <= ny; g++)
            {
                for (int i = 0; i < nx; i++)
                {
                    double c = 0.2 * Math.Sin(2 * xc[i] + 3 * yn[g] - time);
                    ref Tracers G = ref fy[i + nx * g];
                    if (g == 0)
                    {
                        G.Mass = c;
                        G.Charge = -c;
                    }
                    else
                    {
                        Tracers below = state[grid.CellIndex(i, g - 1)];
                        G.Mass = c + 0.5 * below.Mass;
                        G.Charge = -c + 0.5 * below.Charge;
                    }
                }
            }

            for (int j = 0; j < ny; j++)
            {
                for (int i = 0; i < nx; i++)
                {
                    int cell = grid.CellIndex(i, j);
                    Tracers w = fx[i + (nx + 1) * j], e = fx[i + 1 + (nx + 1) * j];
                    Tracers s = fy[i + nx * j], n = fy[i + nx * (j + 1)];
                    double volume = dx[i] * dy[j];
                    residual[cell].Mass = -((e.Mass - w.Mass) * dy[j] + (n.Mass - s.Mass) * dx[i]) / volume;
                    residual[cell].Charge = -((e.Charge - w.Charge) * dy[j] + (n.Charge - s.Charge) * dx[i]) / volume;
                }
            }

            for (int j = 0; j < ny; j++)
            {
                Tracers w = fx[(nx + 1) * j], e = fx[nx + (nx + 1) * j];
                tally.Add(inlet, 0, -w.Mass * dy[j]);
                tally.Add(inlet, 1, -w.Charge * dy[j]);
                tally.Add(outlet, 0, e.Mass * dy[j]);
                tally.Add(outlet, 1, e.Charge * dy[j]);
            }

            for (int i = 0; i < nx; i++)
            {
                Tracers s = fy[i], n = fy[i + nx * ny];
                tally.Add(bottom, 0, -s.Mass * dx[i]);
                tally.Add(bottom, 1, -s.Charge * dx[i]);
                tally.Add(top, 0, n.Mass * dx[i]);
                tally.Add(top, 1, n.Charge * dx[i]);
            }
        };
    }
}
