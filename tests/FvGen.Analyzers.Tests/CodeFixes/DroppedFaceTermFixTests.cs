using Microsoft.CodeAnalysis.Testing;
using VerifyCS = FvGen.Analyzers.Tests.Verifiers.CodeFixVerifier<FvGen.Analyzers.Rules.DroppedFaceTermAnalyzer, FvGen.Analyzers.CodeFixes.DroppedFaceTermFix>;

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
            """,
            batchFixedSource: """
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
}
