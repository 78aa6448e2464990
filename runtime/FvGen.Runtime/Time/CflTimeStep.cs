using System.Globalization;
using FvGen.Meshes;

namespace FvGen.Time;

/// <summary>The CFL time step of an explicit scheme on any mesh.</summary>
/// <remarks>
/// Δt = CFL · min_c V_c / (½ λ_c S_c), with V_c the cell volume, S_c the sum of its face areas
/// (<see cref="IMesh.CellSurfaceAreas"/>) and λ_c its largest wave speed. This is common practice
/// for unstructured finite volumes: on a 1-D grid it is Δx/λ, on a 2-D Cartesian grid
/// 1/(λ (1/Δx + 1/Δy)), on a 3-D one 1/(λ (1/Δx + 1/Δy + 1/Δz)); V/(½S) is the cell's
/// effective width.
/// </remarks>
public static class CflTimeStep
{
    /// <summary>The CFL time step; +∞ when every wave speed is zero.</summary>
    public static double Compute<TState>(IMesh mesh, ReadOnlySpan<TState> state, double cfl, WaveSpeed<TState> waveSpeed)
        where TState : unmanaged
    {
        ArgumentNullException.ThrowIfNull(mesh);
        ArgumentNullException.ThrowIfNull(waveSpeed);
        if (!(cfl > 0 && double.IsFinite(cfl)))
        {
            throw new ArgumentOutOfRangeException(nameof(cfl), cfl, "The CFL number must be positive and finite.");
        }

        if (state.Length != mesh.CellCount)
        {
            throw new ArgumentException($"The state has {state.Length} cells but the mesh has {mesh.CellCount}.", nameof(state));
        }

        ReadOnlySpan<double> volumes = mesh.CellVolumes;
        ReadOnlySpan<double> surfaces = mesh.CellSurfaceAreas;
        double smallest = double.PositiveInfinity;
        for (int c = 0; c < state.Length; c++)
        {
            double speed = waveSpeed(in state[c], c);
            if (!(speed >= 0 && double.IsFinite(speed)))
            {
                throw new InvalidOperationException(
                    string.Create(
                        CultureInfo.InvariantCulture,
                        $"The wave speed of cell {mesh.DescribeCell(c)} at {mesh.CellCentroids[c]} is {speed:R}; a wave speed must be non-negative and finite."));
            }

            // Compare λS/V rather than dividing by λ, so that a zero speed needs no special case.
            double rate = 0.5 * speed * surfaces[c] / volumes[c];
            double step = rate > 0 ? 1.0 / rate : double.PositiveInfinity;
            if (step < smallest)
            {
                smallest = step;
            }
        }

        return cfl * smallest;
    }
}
