using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Samples.Demo;

/// <summary>
/// One-dimensional advection–dispersion, ∂c/∂t + ∂(u c − D ∂c/∂x)/∂x = 0, for each tracer: a
/// first-order upwind advective flux plus a central dispersive flux at every face, applied in
/// telescoping form. Inflow: the pump station's water enters with total flux u·c_in (flux
/// continuity at the head gate). Outflow: open, advective flux only.
/// </summary>
internal sealed class ChannelTransport
{
    private readonly int _cells;
    private readonly double[] _widths;
    private readonly double[] _centreGaps;
    private readonly ChannelWater[] _faceFlux;
    private readonly int _inflowPatch;
    private readonly int _outflowPatch;

    public ChannelTransport(StructuredGrid1D grid)
    {
        _cells = grid.Nx;
        _widths = grid.X.Widths.ToArray();
        _centreGaps = new double[_cells + 1];
        for (int f = 1; f < _cells; f++)
        {
            _centreGaps[f] = grid.X.Centres[f] - grid.X.Centres[f - 1];
        }

        _faceFlux = new ChannelWater[_cells + 1];
        _inflowPatch = grid.PatchIndex(GridSide.XLow);
        _outflowPatch = grid.PatchIndex(GridSide.XHigh);
    }

    /// <summary>
    /// The wave speed that, with Δt = CFL·Δx/λ, keeps u Δt/Δx + 2 D Δt/Δx² ≤ CFL: the usual
    /// stability bound of explicit upwind advection with central diffusion (common practice).
    /// </summary>
    public double WaveSpeed(in ChannelWater state, int cell) =>
        Math.Abs(ChannelScenario.Velocity) + 2.0 * ChannelScenario.Dispersion / _widths[cell];

    /// <summary>dc/dt of every cell; the boundary outflow of each tracer goes to <paramref name="tally"/>.</summary>
    [ConservativeUpdate]
    public void Residual(ReadOnlySpan<ChannelWater> state, Span<ChannelWater> residual, double time, BoundaryFluxTally tally)
    {
        const double u = ChannelScenario.Velocity;
        const double d = ChannelScenario.Dispersion;
        ChannelWater[] flux = _faceFlux;
        int n = _cells;

        // Face f lies between cells f − 1 and f; each flux is computed once.
        flux[0].Dye = 0.0;
        flux[0].Salt = u * ChannelScenario.InflowSalt;
        for (int f = 1; f < n; f++)
        {
            double gap = _centreGaps[f];
            flux[f].Dye = u * state[f - 1].Dye - d * (state[f].Dye - state[f - 1].Dye) / gap;
            flux[f].Salt = u * state[f - 1].Salt - d * (state[f].Salt - state[f - 1].Salt) / gap;
        }

        flux[n].Dye = u * state[n - 1].Dye;
        flux[n].Salt = u * state[n - 1].Salt;

        // Telescoping update: what leaves a cell through its right face enters the next one.
        for (int i = 0; i < n; i++)
        {
            residual[i].Dye = -(flux[i + 1].Dye - flux[i].Dye) / _widths[i];
            residual[i].Salt = -(flux[i + 1].Salt - flux[i].Salt) / _widths[i];
        }

        // Outflow is positive: the head-gate flux points into the domain.
        tally.Add(_inflowPatch, 0, -flux[0].Dye);
        tally.Add(_inflowPatch, 1, -flux[0].Salt);
        tally.Add(_outflowPatch, 0, flux[n].Dye);
        tally.Add(_outflowPatch, 1, flux[n].Salt);
    }
}
