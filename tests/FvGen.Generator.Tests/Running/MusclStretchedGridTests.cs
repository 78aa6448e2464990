using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Support;
using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Running;

/// <summary>
/// MUSCL with real cell widths: slopes over centre distances, extrapolation by half a width (the
/// stretched-grid form of LeVeque 2002, ch. 6, is common practice). Checked against closed forms:
/// a linear profile is reconstructed exactly on any spacing, and on a uniform grid the result is
/// LeVeque's index-space MUSCL.
/// </summary>
public sealed class MusclStretchedGridTests
{
    private delegate void Kernel(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Advection.Boundary> b, BoundaryFluxTally? t);

    public static TheoryData<string> Limiters => new() { "Minmod", "VanLeer", "MonotonizedCentral", "Superbee" };

    [Theory]
    [MemberData(nameof(Limiters))]
    public void LinearProfileOnAStretchedGridGivesTheExactRate(string limiter)
    {
        Kernel kernel = Pick(limiter);
        var random = new Random(61);
        // Widths drawn from [0.5, 1.5]: neighbouring cells differ by up to a factor 3, not smoothly.
        var grid = new StructuredGrid1D(RandomGrids.Axis(random, 30), SideBoundary.Patch("west"), SideBoundary.Patch("east"));
        var binding = new BoundaryBinding<Advection.Boundary>().Bind("west", Advection.Boundary.Open).Bind("east", Advection.Boundary.Open);
        // u = x: the cell average is the value at the centre; θ = 1 and φ(1) = 1 for every limiter, so each
        // face sees the exact value at its node and u_t = -a u_x = -1 (a = Advection.Velocity.X = 1).
        var u = new Scalar[grid.CellCount];
        for (int i = 0; i < u.Length; i++)
        {
            u[i] = new Scalar(grid.X.Centres[i]);
        }

        var rate = new Scalar[grid.CellCount];
        kernel(grid, u, rate, binding, null);
        // Cell 0 alone differs: its west face carries the fixed inflow value 0.75, not u = 0. The ghosts
        // beyond the patches continue the line, so cell 1 and the outflow face are exact too.
        for (int i = 1; i < grid.CellCount; i++)
        {
            Assert.True(Math.Abs(rate[i].Value + 1.0) <= 1e-12, $"cell {i}: rate {rate[i].Value:R}, exact -1");
        }
    }

    [Fact]
    public void LinearProfileOnAStretched3DGridGivesTheExactRate()
    {
        var random = new Random(62);
        var (xl, xh) = RandomGrids.Sides(false, "x");
        var (yl, yh) = RandomGrids.Sides(false, "y");
        var (zl, zh) = RandomGrids.Sides(false, "z");
        var grid = new StructuredGrid3D(RandomGrids.Axis(random, 7), RandomGrids.Axis(random, 6), RandomGrids.Axis(random, 6), xl, xh, yl, yh, zl, zh);
        var binding = new BoundaryBinding<Advection.Boundary>();
        foreach (string name in grid.PatchNames)
        {
            binding.Bind(name, Advection.Boundary.Open);
        }

        // u = x + 2y + 3z with a = (1, 0.5, 0.25): u_t = -a·∇u = -(1 + 1 + 0.75) = -2.75.
        var u = new Scalar[grid.CellCount];
        for (int c = 0; c < u.Length; c++)
        {
            var centre = grid.CellCentroids[c];
            u[c] = new Scalar(centre.X + 2 * centre.Y + 3 * centre.Z);
        }

        var rate = new Scalar[grid.CellCount];
        Advection.MusclVanLeer3D(grid, u, rate, binding, null);
        // Only cells with a low-side inflow face (fixed value 0.75) differ.
        for (int k = 1; k < grid.Nz; k++)
        {
            for (int j = 1; j < grid.Ny; j++)
            {
                for (int i = 1; i < grid.Nx; i++)
                {
                    double value = rate[grid.CellIndex(i, j, k)].Value;
                    Assert.True(Math.Abs(value + 2.75) <= 1e-12, $"cell ({i}, {j}, {k}): rate {value:R}, exact -2.75");
                }
            }
        }
    }

    [Theory]
    [MemberData(nameof(Limiters))]
    public void UniformGridGivesLeVequesIndexSpaceMuscl(string limiter)
    {
        Kernel kernel = Pick(limiter);
        var random = new Random(63);
        const int n = 40;
        const double h = 0.125;
        var nodes = new double[n + 1];
        for (int i = 0; i <= n; i++)
        {
            nodes[i] = i * h; // exact binary fractions: every width is exactly h
        }

        var grid = new StructuredGrid1D(GridAxis.FromNodes(nodes), SideBoundary.Patch("west"), SideBoundary.Patch("east"));
        var binding = new BoundaryBinding<Advection.Boundary>().Bind("west", Advection.Boundary.Open).Bind("east", Advection.Boundary.Open);
        var u = new Scalar[n];
        for (int i = 0; i < n; i++)
        {
            u[i] = new Scalar(Math.Sin(0.4 * i) + 0.3 * random.NextDouble());
        }

        var rate = new Scalar[n];
        kernel(grid, u, rate, binding, null);

        // Reference (LeVeque 2002, ch. 6), upwind with a = 1: the face between cells i - 1 and i sees
        // u_{i-1} + φ(θ) Δ⁻ / 2, θ = Δ⁺/Δ⁻ (zero slope when Δ⁻Δ⁺ ≤ 0). Beyond each patch a ghost cell
        // continues the next inner difference (u_{-1} = u_0 − (u_2 − u_1), u_n = u_{n−1} + (u_{n−2} − u_{n−3}),
        // common practice), so the end cells' Δ⁻ or Δ⁺ is that difference. Boundary: inflow value 0.75
        // enters at the west; the east face sees the last cell reconstructed toward it.
        var faceFlux = new double[n + 1];
        faceFlux[0] = Advection.InflowValue;
        for (int f = 1; f <= n; f++)
        {
            int cell = f - 1;
            double backward = cell >= 1 ? u[cell].Value - u[cell - 1].Value : u[2].Value - u[1].Value;
            double forward = cell <= n - 2 ? u[cell + 1].Value - u[cell].Value : u[n - 2].Value - u[n - 3].Value;
            faceFlux[f] = u[cell].Value + (backward * forward <= 0 ? 0 : 0.5 * Phi(limiter, forward / backward) * backward);
        }

        for (int i = 0; i < n; i++)
        {
            double expected = -(faceFlux[i + 1] - faceFlux[i]) / h;
            Assert.True(Math.Abs(rate[i].Value - expected) <= 1e-13 * (1 + Math.Abs(expected)), $"cell {i}: {rate[i].Value:R}, index-space MUSCL {expected:R}");
        }
    }

    /// <summary>The limiters as functions of θ (LeVeque 2002, ch. 6; REFERENCES.md).</summary>
    private static double Phi(string limiter, double theta) => limiter switch
    {
        "Minmod" => Math.Max(0, Math.Min(1, theta)),
        "VanLeer" => (theta + Math.Abs(theta)) / (1 + Math.Abs(theta)),
        "MonotonizedCentral" => Math.Max(0, Math.Min(Math.Min((1 + theta) / 2, 2), 2 * theta)),
        _ => Math.Max(0, Math.Max(Math.Min(1, 2 * theta), Math.Min(2, theta))),
    };

    private static Kernel Pick(string limiter) => limiter switch
    {
        "Minmod" => Advection.MusclMinmod1D,
        "VanLeer" => Advection.MusclVanLeer1D,
        "MonotonizedCentral" => Advection.MusclMC1D,
        _ => Advection.MusclSuperbee1D,
    };
}
