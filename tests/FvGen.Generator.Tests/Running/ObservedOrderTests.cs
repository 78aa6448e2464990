using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Ledger;
using FvGen.Meshes.Structured;
using Xunit.Abstractions;

namespace FvGen.Generator.Tests.Running;

/// <summary>
/// Observed orders of accuracy of generated first-order and MUSCL schemes on smooth periodic data,
/// on uniform and on smoothly stretched grids.
/// </summary>
/// <remarks>
/// Expected: about 1 for the first-order (upwind/Godunov) schemes and about 2 for MUSCL with a TVD
/// limiter in smooth regions; TVD limiters clip to first order at extrema (Harten &amp; Osher 1987;
/// LeVeque 2002, ch. 6 and 8), which lowers the L1 order a little, so the bands below are
/// [0.85, 1.15] and [1.7, 2.3]. Time is integrated with the three-stage SSP Runge–Kutta scheme of
/// Shu &amp; Osher (1988) at CFL 0.4, whose error is third order and negligible here.
/// </remarks>
public sealed class ObservedOrderTests(ITestOutputHelper output)
{
    private delegate void Kernel(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Advection.Boundary> b, BoundaryFluxTally? t);

    private delegate void Kernel1D<TBoundary>(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<TBoundary> b, BoundaryFluxTally? t)
        where TBoundary : struct, Enum;

    private delegate void BurgersKernel(StructuredGrid1D grid, ReadOnlySpan<Scalar> u, Span<Scalar> dudt, BoundaryBinding<Burgers.Boundary> b, BoundaryFluxTally? t);

    /// <summary>The periodic advection kernels by scheme name; an unknown name is a test bug, not a default.</summary>
    private static Kernel AdvectionKernel(string scheme) => scheme switch
    {
        "FirstOrder" => Advection.Residual1D,
        "Minmod" => Advection.MusclMinmod1D,
        "VanLeer" => Advection.MusclVanLeer1D,
        "MonotonizedCentral" => Advection.MusclMC1D,
        "Superbee" => Advection.MusclSuperbee1D,
        "UserFromm" => Advection.Fromm1D,
        "UserWidthAwareVanLeer" => Advection.WidthAwareVanLeer1D,
        _ => throw new ArgumentOutOfRangeException(nameof(scheme), scheme, "no such scheme"),
    };

    public static TheoryData<string, double> AdvectionSchemes => new()
    {
        { "FirstOrder", 1.0 },
        { "Minmod", 2.0 },
        { "VanLeer", 2.0 },
        { "MonotonizedCentral", 2.0 },
        { "Superbee", 2.0 },
        { "UserFromm", 2.0 },
    };

    [Theory]
    [MemberData(nameof(AdvectionSchemes))]
    public void LinearAdvectionOfASineWave(string scheme, double expected)
    {
        Kernel kernel = AdvectionKernel(scheme);

        // u_t + u_x = 0 on [0, 1], periodic (Advection.Velocity.X = 1): the exact solution is u0(x - t).
        const double time = 0.5;
        var errors = new List<double>();
        var binding = new BoundaryBinding<Advection.Boundary>();
        foreach (int n in new[] { 50, 100, 200, 400 })
        {
            var grid = new StructuredGrid1D(GridAxis.Uniform(n, 0, 1), SideBoundary.Periodic, SideBoundary.Periodic);
            var u = CellAverages(grid, x => Math.Sin(2 * Math.PI * x));
            Integrate(grid, u, time, cfl: 0.4, maxSpeed: 1.0, (s, r) => kernel(grid, s, r, binding, null));
            var exact = CellAverages(grid, x => Math.Sin(2 * Math.PI * (x - time)));
            errors.Add(L1(grid, u, exact));
        }

        AssertOrder(scheme + " advection", errors, expected);
    }

    public static TheoryData<string, double> StretchedSchemes => new()
    {
        { "FirstOrder", 1.0 },
        { "Minmod", 2.0 },
        { "VanLeer", 2.0 },
        { "MonotonizedCentral", 2.0 },
        { "Superbee", 2.0 },
        { "UserWidthAwareVanLeer", 2.0 },
    };

    [Theory]
    [MemberData(nameof(StretchedSchemes))]
    public void LinearAdvectionOfASineWaveOnASmoothlyStretchedGrid(string scheme, double expected)
    {
        Kernel kernel = AdvectionKernel(scheme);

        // Nodes x(ξ) = ξ + 0.4 sin(2πξ)/(2π) at uniform ξ: widths vary smoothly by a factor 1.4/0.6 ≈ 2.3,
        // periodically, so the grid is smooth across the wrap too. Same problem as on the uniform grid.
        const double time = 0.5;
        var errors = new List<double>();
        var binding = new BoundaryBinding<Advection.Boundary>();
        foreach (int n in new[] { 50, 100, 200, 400 })
        {
            var nodes = new double[n + 1];
            for (int i = 0; i <= n; i++)
            {
                double xi = (double)i / n;
                nodes[i] = xi + 0.4 * Math.Sin(2 * Math.PI * xi) / (2 * Math.PI);
            }

            var grid = new StructuredGrid1D(GridAxis.FromNodes(nodes), SideBoundary.Periodic, SideBoundary.Periodic);
            var u = CellAverages(grid, x => Math.Sin(2 * Math.PI * x));
            Integrate(grid, u, time, cfl: 0.4, maxSpeed: 1.0, (s, r) => kernel(grid, s, r, binding, null));
            var exact = CellAverages(grid, x => Math.Sin(2 * Math.PI * (x - time)));
            errors.Add(L1(grid, u, exact));
        }

        AssertOrder(scheme + " advection, stretched grid", errors, expected);
    }

    public static TheoryData<string, double, bool> PatchSchemes => new()
    {
        { "FirstOrder", 1.0, false },
        { "Minmod", 2.0, false },
        { "VanLeer", 2.0, false },
        { "MonotonizedCentral", 2.0, false },
        { "UserWidthAwareVanLeer", 2.0, false },
        { "UserFromm", 2.0, false },
        { "FirstOrder", 1.0, true },
        { "VanLeer", 2.0, true },
        { "MonotonizedCentral", 2.0, true },
        { "UserWidthAwareVanLeer", 2.0, true },
    };

    [Theory]
    [MemberData(nameof(PatchSchemes))]
    public void LinearAdvectionThroughAnInflowAndAnOutflowPatch(string scheme, double expected, bool stretched)
    {
        Kernel1D<Transport.Boundary> kernel = scheme switch
        {
            "FirstOrder" => Transport.FirstOrder,
            "Minmod" => Transport.Minmod,
            "VanLeer" => Transport.VanLeer,
            "MonotonizedCentral" => Transport.MonotonizedCentral,
            "UserWidthAwareVanLeer" => Transport.UserVanLeer,
            "UserFromm" => Transport.UserFromm,
            _ => throw new ArgumentOutOfRangeException(nameof(scheme), scheme, "no such scheme"),
        };

        // u_t + u_x = 0 on [0, 1], not periodic: the west patch lets in the exact solution u0(x - t) at the
        // stage time, the east patch lets out the inside face state. A cell that is first order toward a
        // patch has an O(h) error that stays local, which costs only O(h²) in L1: so the largest error
        // over the two cells next to each patch is checked too (at t = 0.25 the profile's extrema are
        // 0.074 from both ends, so a limiter does not clip there on these grids).
        const double time = 0.25;
        var errors = new List<double>();
        var nearPatches = new List<double>();
        var binding = new BoundaryBinding<Transport.Boundary>().Bind("west", Transport.Boundary.Open).Bind("east", Transport.Boundary.Open);
        foreach (int n in new[] { 50, 100, 200, 400 })
        {
            var axis = stretched ? SmoothlyStretched(n) : GridAxis.Uniform(n, 0, 1);
            var grid = new StructuredGrid1D(axis, SideBoundary.Patch("west"), SideBoundary.Patch("east"));
            var u = CellAverages(grid, Transport.Profile);
            Integrate(grid, u, time, cfl: 0.4, maxSpeed: 1.0, (s, r, t) =>
            {
                Transport.InflowTime = t;
                kernel(grid, s, r, binding, null);
            });
            var exact = CellAverages(grid, x => Transport.Profile(x - time));
            errors.Add(L1(grid, u, exact));
            nearPatches.Add(new[] { 0, 1, n - 2, n - 1 }.Max(c => Math.Abs(u[c].Value - exact[c].Value)));
        }

        string what = scheme + " advection through patches" + (stretched ? ", stretched grid" : "");
        AssertOrder(what, errors, expected);
        AssertOrder(what + ", largest error next to the patches", nearPatches, expected);
    }

    /// <summary>Nodes x(ξ) = ξ + 0.4 sin(2πξ)/(2π) at uniform ξ: widths vary smoothly by a factor 1.4/0.6 ≈ 2.3.</summary>
    private static GridAxis SmoothlyStretched(int n)
    {
        var nodes = new double[n + 1];
        for (int i = 0; i <= n; i++)
        {
            double xi = (double)i / n;
            nodes[i] = xi + 0.4 * Math.Sin(2 * Math.PI * xi) / (2 * Math.PI);
        }

        return GridAxis.FromNodes(nodes);
    }

    public static TheoryData<string, double> BurgersSchemes => new() { { "FirstOrder", 1.0 }, { "VanLeer", 2.0 }, { "MonotonizedCentral", 2.0 } };

    [Theory]
    [MemberData(nameof(BurgersSchemes))]
    public void BurgersBeforeTheShockForms(string scheme, double expected)
    {
        BurgersKernel kernel = scheme switch
        {
            "FirstOrder" => Burgers.FirstOrder,
            "VanLeer" => Burgers.MusclVanLeer,
            "MonotonizedCentral" => Burgers.MusclMC,
            _ => throw new ArgumentOutOfRangeException(nameof(scheme), scheme, "no such scheme"),
        };

        // u0 = 1 + sin(2πx)/2 steepens into a shock at t = 1 / max(-u0') = 1/π ≈ 0.318; stop at 0.15.
        // Exact solution by characteristics: u = u0(ξ) with x = ξ + u0(ξ) t (LeVeque 2002, §11.1).
        const double time = 0.15;
        var errors = new List<double>();
        var binding = new BoundaryBinding<Burgers.Boundary>();
        foreach (int n in new[] { 50, 100, 200, 400 })
        {
            var grid = new StructuredGrid1D(GridAxis.Uniform(n, 0, 1), SideBoundary.Periodic, SideBoundary.Periodic);
            var u = CellAverages(grid, x => 1 + 0.5 * Math.Sin(2 * Math.PI * x));
            Integrate(grid, u, time, cfl: 0.4, maxSpeed: 1.5, (s, r) => kernel(grid, s, r, binding, null));
            var exact = CellAverages(grid, x => BurgersExact(x, time));
            errors.Add(L1(grid, u, exact));
        }

        AssertOrder(scheme + " Burgers", errors, expected);
    }

    private void AssertOrder(string what, List<double> errors, double expected)
    {
        var orders = new List<double>();
        for (int k = 1; k < errors.Count; k++)
        {
            orders.Add(Math.Log2(errors[k - 1] / errors[k]));
        }

        output.WriteLine($"{what}: errors {string.Join(", ", errors.Select(e => e.ToString("E3")))}; orders {string.Join(", ", orders.Select(o => o.ToString("F2")))}");
        double finest = orders[^1];
        double low = expected == 1.0 ? 0.85 : 1.7;
        double high = expected == 1.0 ? 1.15 : 2.3;
        Assert.True(finest >= low && finest <= high, $"{what}: observed order {finest:F2} on the finest pair, expected about {expected}");
    }

    private delegate void Rate(ReadOnlySpan<Scalar> state, Span<Scalar> rate);

    private delegate void TimedRate(ReadOnlySpan<Scalar> state, Span<Scalar> rate, double time);

    private static void Integrate(StructuredGrid1D grid, Scalar[] u, double time, double cfl, double maxSpeed, Rate rate) =>
        Integrate(grid, u, time, cfl, maxSpeed, (s, r, _) => rate(s, r));

    /// <summary>
    /// Three-stage SSP Runge–Kutta (Shu &amp; Osher 1988), in the Shu–Osher form of REFERENCES.md; the stages
    /// are evaluated at t, t + Δt and t + Δt/2.
    /// </summary>
    private static void Integrate(StructuredGrid1D grid, Scalar[] u, double time, double cfl, double maxSpeed, TimedRate rate)
    {
        double dx = double.MaxValue;
        foreach (double width in grid.X.Widths)
        {
            dx = Math.Min(dx, width);
        }

        int steps = (int)Math.Ceiling(time / (cfl * dx / maxSpeed));
        double dt = time / steps;
        int n = u.Length;
        var r = new Scalar[n];
        var u1 = new Scalar[n];
        var u2 = new Scalar[n];
        for (int step = 0; step < steps; step++)
        {
            double t = step * dt;
            rate(u, r, t);
            for (int c = 0; c < n; c++)
            {
                u1[c] = u[c] + dt * r[c];
            }

            rate(u1, r, t + dt);
            for (int c = 0; c < n; c++)
            {
                u2[c] = 0.75 * u[c] + 0.25 * u1[c] + 0.25 * dt * r[c];
            }

            rate(u2, r, t + 0.5 * dt);
            for (int c = 0; c < n; c++)
            {
                u[c] = (1.0 / 3.0) * u[c] + (2.0 / 3.0) * u2[c] + (2.0 / 3.0) * dt * r[c];
            }
        }
    }

    /// <summary>Cell averages by five-point Gauss–Legendre quadrature (abscissae and weights from the standard tables).</summary>
    private static Scalar[] CellAverages(StructuredGrid1D grid, Func<double, double> f)
    {
        double[] nodes = [-0.9061798459386640, -0.5384693101056831, 0.0, 0.5384693101056831, 0.9061798459386640];
        double[] weights = [0.2369268850561891, 0.4786286704993665, 0.5688888888888889, 0.4786286704993665, 0.2369268850561891];
        var averages = new Scalar[grid.CellCount];
        for (int i = 0; i < averages.Length; i++)
        {
            double centre = grid.X.Centres[i], half = 0.5 * grid.X.Widths[i], sum = 0;
            for (int q = 0; q < nodes.Length; q++)
            {
                sum += weights[q] * f(centre + half * nodes[q]);
            }

            averages[i] = new Scalar(0.5 * sum);
        }

        return averages;
    }

    private static double BurgersExact(double x, double t)
    {
        // Newton on g(ξ) = ξ + u0(ξ) t - x; g' = 1 + u0'(ξ) t > 0 before the shock.
        double xi = x - t;
        for (int k = 0; k < 50; k++)
        {
            double u0 = 1 + 0.5 * Math.Sin(2 * Math.PI * xi);
            double du0 = Math.PI * Math.Cos(2 * Math.PI * xi);
            double step = (xi + u0 * t - x) / (1 + du0 * t);
            xi -= step;
            if (Math.Abs(step) < 1e-15)
            {
                break;
            }
        }

        return 1 + 0.5 * Math.Sin(2 * Math.PI * xi);
    }

    private static double L1(StructuredGrid1D grid, Scalar[] u, Scalar[] exact)
    {
        double sum = 0;
        for (int c = 0; c < u.Length; c++)
        {
            sum += Math.Abs(u[c].Value - exact[c].Value) * grid.CellVolumes[c];
        }

        return sum;
    }
}
