using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Geometry;
using FvGen.Meshes.Unstructured;
using Xunit.Abstractions;

namespace FvGen.Generator.Tests.Running;

/// <summary>
/// Observed orders of the generated unstructured schemes for a smooth plane wave: first order, and
/// limited linear reconstruction (Green–Gauss gradients, Barth–Jespersen).
/// </summary>
/// <remarks>
/// Expected about 1 and about 2 on smooth data (LeVeque 2002 for the first-order upwind scheme;
/// the limited linear reconstruction is second order where the limiter is inactive, and
/// Barth–Jespersen, like every limiter, clips at extrema — Harten &amp; Osher 1987 for the
/// structured analogue). Values are compared at cell centroids, which represent the cell average to
/// second order. SSP RK3 (Shu &amp; Osher 1988) at CFL 0.3. The bands are wide where the
/// clipping at extrema is known to cost accuracy: [0.8, 1.2] and [1.5, 2.3].
/// </remarks>
[Collection(nameof(PlaneWave))]
public sealed class UnstructuredOrderTests(ITestOutputHelper output)
{
    [Theory]
    [InlineData(RectangleCellKind.Quadrilaterals, false, 1.0)]
    [InlineData(RectangleCellKind.Quadrilaterals, true, 2.0)]
    [InlineData(RectangleCellKind.Triangles, false, 1.0)]
    [InlineData(RectangleCellKind.Triangles, true, 2.0)]
    public void PlaneWaveConverges(RectangleCellKind kind, bool linear, double expected)
    {
        const double time = 0.2;
        var errors = new List<double>();
        foreach (int n in new[] { 16, 32, 64 })
        {
            var mesh = RectangleMesh.Create(n, n, 0, 1, 0, 1, kind);
            var binding = new BoundaryBinding<PlaneWave.Boundary>();
            foreach (string name in mesh.PatchNames)
            {
                binding.Bind(name, PlaneWave.Boundary.Prescribed);
            }

            var u = new Scalar[mesh.CellCount];
            for (int c = 0; c < u.Length; c++)
            {
                u[c] = new Scalar(PlaneWave.Exact(mesh.CellCentroids[c], 0));
            }

            var gradients = new Gradient<Scalar>[mesh.CellCount];
            void Rate(ReadOnlySpan<Scalar> s, Span<Scalar> r, double t)
            {
                PlaneWave.Time = t;
                if (linear)
                {
                    PlaneWave.Linear(mesh, s, r, gradients, binding, null);
                }
                else
                {
                    PlaneWave.FirstOrder(mesh, s, r, binding, null);
                }
            }

            Integrate(u, time, dt: 0.3 / n / 1.5, Rate);
            double error = 0, area = 0;
            for (int c = 0; c < u.Length; c++)
            {
                error += Math.Abs(u[c].Value - PlaneWave.Exact(mesh.CellCentroids[c], time)) * mesh.CellVolumes[c];
                area += mesh.CellVolumes[c];
            }

            errors.Add(error / area);
        }

        double order = Math.Log2(errors[^2] / errors[^1]);
        output.WriteLine($"{kind}, {(linear ? "linear + Barth-Jespersen" : "first order")}: L1 errors {string.Join(", ", errors.Select(e => e.ToString("E3")))}; order {order:F2}");
        double low = expected == 1.0 ? 0.8 : 1.5, high = expected == 1.0 ? 1.2 : 2.3;
        Assert.InRange(order, low, high);
    }

    private delegate void RateFunction(ReadOnlySpan<Scalar> state, Span<Scalar> rate, double time);

    private static void Integrate(Scalar[] u, double time, double dt, RateFunction rate)
    {
        int steps = (int)Math.Ceiling(time / dt);
        dt = time / steps;
        var r = new Scalar[u.Length];
        var u1 = new Scalar[u.Length];
        var u2 = new Scalar[u.Length];
        for (int step = 0; step < steps; step++)
        {
            double t = step * dt;
            rate(u, r, t);
            for (int c = 0; c < u.Length; c++)
            {
                u1[c] = u[c] + dt * r[c];
            }

            rate(u1, r, t + dt);
            for (int c = 0; c < u.Length; c++)
            {
                u2[c] = 0.75 * u[c] + 0.25 * u1[c] + 0.25 * dt * r[c];
            }

            rate(u2, r, t + 0.5 * dt);
            for (int c = 0; c < u.Length; c++)
            {
                u[c] = (1.0 / 3.0) * u[c] + (2.0 / 3.0) * u2[c] + (2.0 / 3.0) * dt * r[c];
            }
        }
    }
}
