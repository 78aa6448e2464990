using Microsoft.CodeAnalysis.Testing;
using VerifyCS = FvGen.Analyzers.Tests.Verifiers.CodeFixVerifier<FvGen.Analyzers.CodeFixes.DroppedFaceTermFix>;

namespace FvGen.Analyzers.Tests.CodeFixes;

public sealed class DroppedFaceTermFixTests
{
    [Fact]
    public Task AddsTheLowYFace() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Advection2D
            {
                [ConservativeUpdate]
                public static void Rate(double[,] fx, double[,] fy, double[,] r, int nx, int ny, double dx, double dy)
                {
                    for (int j = 0; j < ny; j++)
                        for (int i = 0; i < nx; i++)
                            r[i, j] = -(fx[i + 1, j] - fx[i, j]) / dx - {|#0:fy[i, j + 1]|} / dy;
                }
            }
            """,
            [VerifyCS.Diagnostic(DiagnosticIds.DroppedFaceTerm).WithLocation(0).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations)
                .WithArguments("fy[i, j + 1]", "leaves", "(i, j)", "-1/dy", "receives", "j", "+ fy[i, j] / dy")],
            """
            static class Advection2D
            {
                [ConservativeUpdate]
                public static void Rate(double[,] fx, double[,] fy, double[,] r, int nx, int ny, double dx, double dy)
                {
                    for (int j = 0; j < ny; j++)
                        for (int i = 0; i < nx; i++)
                            r[i, j] = -(fx[i + 1, j] - fx[i, j]) / dx - fy[i, j + 1] / dy + fy[i, j] / dy;
                }
            }
            """);

    [Fact]
    public Task CompoundSubtractionGetsTheFlippedSign() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Burgers
            {
                static double G(double a, double b) => 0.5 * (a + b);

                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, double dt, double dx)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                        r[i] -= dt / dx * {|#0:G(u[i], u[i + 1])|};
                }
            }
            """,
            [VerifyCS.Diagnostic(DiagnosticIds.DroppedFaceTerm).WithLocation(0).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations)
                .WithArguments("G(u[i], u[i + 1])", "leaves", "i", "-dt/dx", "receives", "i", "+ dt * G(u[i - 1], u[i]) / dx")],
            """
            static class Burgers
            {
                static double G(double a, double b) => 0.5 * (a + b);

                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, double dt, double dx)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                        r[i] -= dt / dx * G(u[i], u[i + 1]) - dt * G(u[i - 1], u[i]) / dx;
                }
            }
            """);

    [Fact]
    public Task FixAllAddsEveryCounterpartOfOneWrite() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Lattice
            {
                [ConservativeUpdate]
                public static void Rate(double[] f, double[] r)
                {
                    for (int i = 0; i < r.Length; i++)
                        r[i] = {|#0:f[2 * i + 1]|} - {|#1:f[2 * i]|};
                }
            }
            """,
            [
                VerifyCS.Diagnostic(DiagnosticIds.DroppedFaceTerm).WithLocation(0).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations)
                    .WithArguments("f[2 * i + 1]", "enters", "i", "1", "gives", "i", "- f[2 * i + 3]"),
                VerifyCS.Diagnostic(DiagnosticIds.DroppedFaceTerm).WithLocation(1).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations)
                    .WithArguments("f[2 * i]", "leaves", "i", "-1", "receives", "i", "+ f[2 * i + 2]"),
            ],
            """
            static class Lattice
            {
                [ConservativeUpdate]
                public static void Rate(double[] f, double[] r)
                {
                    for (int i = 0; i < r.Length; i++)
                        r[i] = f[2 * i + 1] - f[2 * i] - f[2 * (i + 1) + 1] + f[2 * (i + 1)];
                }
            }
            """);

    private static DiagnosticResult Dropped(int location) =>
        VerifyCS.Diagnostic(DiagnosticIds.DroppedFaceTerm).WithLocation(location).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations).WithMessage(null);

    [Fact]
    public Task FaceFluxLocalGetsTheOtherFaceAsASecondLocal() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Heat
            {
                static double Conduct(double left, double right) => right - left;

                [ConservativeUpdate]
                public static void Rate(double[] t, double[] r, double dx)
                {
                    for (int i = 1; i < t.Length - 1; i++)
                    {
                        double fe = {|#0:Conduct(t[i], t[i + 1])|};
                        r[i] = fe / dx;
                    }
                }
            }
            """,
            [Dropped(0)],
            """
            static class Heat
            {
                static double Conduct(double left, double right) => right - left;

                [ConservativeUpdate]
                public static void Rate(double[] t, double[] r, double dx)
                {
                    for (int i = 1; i < t.Length - 1; i++)
                    {
                        double fe = Conduct(t[i], t[i + 1]);
                        double fw = Conduct(t[i - 1], t[i]);
                        r[i] = fe / dx - fw / dx;
                    }
                }
            }
            """);

    [Fact]
    public Task TwoDimensionalLocalPerFaceGetsTheMissingSouthFace() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Plate
            {
                static double Upwind(double a, double b) => a;

                [ConservativeUpdate]
                public static void Rate(double[,] q, double[,] r, double dx, double dy)
                {
                    for (int j = 1; j < q.GetLength(1) - 1; j++)
                        for (int i = 1; i < q.GetLength(0) - 1; i++)
                        {
                            double fe = Upwind(q[i, j], q[i + 1, j]);
                            double fw = Upwind(q[i - 1, j], q[i, j]);
                            double fn = {|#0:Upwind(q[i, j], q[i, j + 1])|};
                            r[i, j] = -(fe - fw) / dx - fn / dy;
                        }
                }
            }
            """,
            [Dropped(0)],
            """
            static class Plate
            {
                static double Upwind(double a, double b) => a;

                [ConservativeUpdate]
                public static void Rate(double[,] q, double[,] r, double dx, double dy)
                {
                    for (int j = 1; j < q.GetLength(1) - 1; j++)
                        for (int i = 1; i < q.GetLength(0) - 1; i++)
                        {
                            double fe = Upwind(q[i, j], q[i + 1, j]);
                            double fw = Upwind(q[i - 1, j], q[i, j]);
                            double fn = Upwind(q[i, j], q[i, j + 1]);
                            double fs = Upwind(q[i, j - 1], q[i, j]);
                            r[i, j] = -(fe - fw) / dx - fn / dy + fs / dy;
                        }
                }
            }
            """);

    [Fact]
    public Task FixAllAddsBothMissingFacesOfATwoDimensionalCell() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Plate
            {
                static double Upwind(double a, double b) => a;

                [ConservativeUpdate]
                public static void Rate(double[,] q, double[,] r, double dx, double dy)
                {
                    for (int j = 1; j < q.GetLength(1) - 1; j++)
                        for (int i = 1; i < q.GetLength(0) - 1; i++)
                        {
                            double fluxEast = {|#0:Upwind(q[i, j], q[i + 1, j])|};
                            double fluxNorth = {|#1:Upwind(q[i, j], q[i, j + 1])|};
                            r[i, j] = -fluxEast / dx - fluxNorth / dy;
                        }
                }
            }
            """,
            [Dropped(0), Dropped(1)],
            """
            static class Plate
            {
                static double Upwind(double a, double b) => a;

                [ConservativeUpdate]
                public static void Rate(double[,] q, double[,] r, double dx, double dy)
                {
                    for (int j = 1; j < q.GetLength(1) - 1; j++)
                        for (int i = 1; i < q.GetLength(0) - 1; i++)
                        {
                            double fluxEast = Upwind(q[i, j], q[i + 1, j]);
                            double fluxWest = Upwind(q[i - 1, j], q[i, j]);
                            double fluxNorth = Upwind(q[i, j], q[i, j + 1]);
                            double fluxSouth = Upwind(q[i, j - 1], q[i, j]);
                            r[i, j] = -fluxEast / dx - fluxNorth / dy + fluxWest / dx + fluxSouth / dy;
                        }
                }
            }
            """);

    [Fact]
    public Task SpanKernelWithCompoundSubtractionNamesTheLocalByItsOffset() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Transport
            {
                static double Donor(double a, double b) => a;

                [ConservativeUpdate]
                public static void Rate(ReadOnlySpan<double> c, Span<double> r, double dx)
                {
                    for (int i = 1; i < c.Length - 1; i++)
                    {
                        var flux = {|#0:Donor(c[i], c[i + 1])|};
                        r[i] -= flux / dx;
                    }
                }
            }
            """,
            [Dropped(0)],
            """
            static class Transport
            {
                static double Donor(double a, double b) => a;

                [ConservativeUpdate]
                public static void Rate(ReadOnlySpan<double> c, Span<double> r, double dx)
                {
                    for (int i = 1; i < c.Length - 1; i++)
                    {
                        var flux = Donor(c[i], c[i + 1]);
                        var fluxIm1 = Donor(c[i - 1], c[i]);
                        r[i] -= flux / dx - fluxIm1 / dx;
                    }
                }
            }
            """);

    [Fact]
    public Task ScaledLocalGetsTheShiftedTermWrittenIntoTheWrite() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Transport
            {
                static double Donor(double a, double b) => a;

                [ConservativeUpdate]
                public static void Rate(double[] c, double[] r, double dx)
                {
                    for (int i = 1; i < c.Length - 1; i++)
                    {
                        double half = 0.5 * {|#0:Donor(c[i], c[i + 1])|};
                        r[i] = -half / dx;
                    }
                }
            }
            """,
            [Dropped(0)],
            """
            static class Transport
            {
                static double Donor(double a, double b) => a;

                [ConservativeUpdate]
                public static void Rate(double[] c, double[] r, double dx)
                {
                    for (int i = 1; i < c.Length - 1; i++)
                    {
                        double half = 0.5 * Donor(c[i], c[i + 1]);
                        r[i] = -half / dx + Donor(c[i - 1], c[i]) / 2.0 / dx;
                    }
                }
            }
            """);

    [Fact]
    public Task StateStructLocalGetsOneOtherFaceForAllComponents() =>
        VerifyCS.VerifyCodeFixAsync(
            StructKernel("""
                        Gas fe = {|#0:Flux(q[i], q[i + 1])|};
                        r[i].Rho = -fe.Rho / dx;
                        r[i].Mx = -fe.Mx / dx;
            """),
            [Dropped(0), Dropped(0)],
            StructKernel("""
                        Gas fe = Flux(q[i], q[i + 1]);
                        Gas fw = Flux(q[i - 1], q[i]);
                        r[i].Rho = -fe.Rho / dx + fw.Rho / dx;
                        r[i].Mx = -fe.Mx / dx + fw.Mx / dx;
            """));

    [Fact]
    public Task ReassignedLocalGetsNoFix()
    {
        const string source = """
            static class Heat
            {
                static double Conduct(double left, double right) => right - left;

                [ConservativeUpdate]
                public static void Rate(double[] t, double[] r, double dx)
                {
                    for (int i = 1; i < t.Length - 1; i++)
                    {
                        double fe = {|#0:Conduct(t[i], t[i + 1])|};
                        fe = 2 * fe;
                        r[i] = fe / dx;
                    }
                }
            }
            """;
        return VerifyCS.VerifyCodeFixAsync(source, [Dropped(0)], source, remaining: [Dropped(0)]);
    }

    [Fact]
    public Task LocalReadingAnotherLoopLocalGetsNoFix()
    {
        // Shifting `Conduct(left, t[i + 1])` would not shift `left`: no fix rather than a wrong one.
        const string source = """
            static class Heat
            {
                static double Conduct(double left, double right) => right - left;

                [ConservativeUpdate]
                public static void Rate(double[] t, double[] r, double dx)
                {
                    for (int i = 1; i < t.Length - 1; i++)
                    {
                        double left = t[i];
                        double fe = {|#0:Conduct(left, t[i + 1])|};
                        r[i] = fe / dx;
                    }
                }
            }
            """;
        return VerifyCS.VerifyCodeFixAsync(source, [Dropped(0)], source, remaining: [Dropped(0)]);
    }

    [Fact]
    public Task ComponentOfAWholeStateCallGetsNoInlineFix()
    {
        // The term is `.Rho` of the call; the call's shifted text alone would add a whole state to one component.
        string source = StructKernel("""
                        Gas fe = Flux(q[i], q[i + 1]);
                        Gas copy = fe;
                        r[i].Rho = -copy.Rho / dx;
            """).Replace("Gas fe = Flux(q[i], q[i + 1]);", "Gas fe = {|#0:Flux(q[i], q[i + 1])|};");
        return VerifyCS.VerifyCodeFixAsync(source, [Dropped(0)], source, remaining: [Dropped(0)]);
    }

    private static string StructKernel(string body) => $$"""
        public struct Gas
        {
            public double Rho, Mx;

            public Gas(double rho, double mx) { Rho = rho; Mx = mx; }
        }

        static class Isothermal
        {
            static Gas Flux(Gas a, Gas b) => new Gas(0.5 * (a.Mx + b.Mx), 0.5 * (a.Rho + b.Rho));

            [ConservativeUpdate]
            public static void Rate(Gas[] q, Gas[] r, double dx)
            {
                for (int i = 1; i < q.Length - 1; i++)
                {
        {{body}}
                }
            }
        }
        """;
}
