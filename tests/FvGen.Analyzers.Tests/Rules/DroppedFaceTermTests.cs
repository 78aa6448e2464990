using VerifyCS = FvGen.Analyzers.Tests.Verifiers.AnalyzerVerifier<FvGen.Analyzers.Rules.DroppedFaceTermAnalyzer>;

namespace FvGen.Analyzers.Tests.Rules;

public sealed class DroppedFaceTermTests
{
    [Fact]
    public Task TwoDimensionalRateMissingTheLowYFace() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Advection2D
            {
                [ConservativeUpdate]
                public static void Residual(double[,] fx, double[,] fy, double[,] r, int nx, int ny, double dx, double dy)
                {
                    for (int j = 0; j < ny; j++)
                    {
                        for (int i = 0; i < nx; i++)
                        {
                            r[i, j] = -(fx[i + 1, j] - fx[i, j]) / dx - {|#0:fy[i, j + 1]|} / dy;
                        }
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.DroppedFaceTerm).WithLocation(0)
                .WithArguments("fy[i, j + 1]", "leaves", "(i, j)", "-1/dy", "receives", "j", "+ fy[i, j] / dy"));

    [Fact]
    public Task CompleteDifferenceIsQuiet() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Advection2D
            {
                [ConservativeUpdate]
                public static void Residual(double[,] fx, double[,] fy, double[,] r, int nx, int ny, double dx, double dy)
                {
                    for (int j = 0; j < ny; j++)
                        for (int i = 0; i < nx; i++)
                            r[i, j] = -(fx[i + 1, j] - fx[i, j]) / dx - (fy[i, j + 1] - fy[i, j]) / dy;
                }
            }
            """);

    [Fact]
    public Task UnmarkedMethodIsNotChecked() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Advection1D
            {
                public static void Residual(double[] f, double[] r, int n, double dx)
                {
                    for (int i = 0; i < n; i++)
                        r[i] = -f[i + 1] / dx;
                }
            }
            """);

    [Fact]
    public Task EditorConfigWidensTheScopeToEveryMethod() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Advection1D
            {
                public static void Residual(double[] f, double[] r, int n, double dx)
                {
                    for (int i = 0; i < n; i++)
                        r[i] = -{|#0:f[i + 1]|} / dx;
                }
            }
            """,
            "root = true\n[*.cs]\nfvgen_conservation_scope_all_methods = true\n",
            VerifyCS.Diagnostic(DiagnosticIds.DroppedFaceTerm).WithLocation(0)
                .WithArguments("f[i + 1]", "leaves", "i", "-1/dx", "receives", "i", "+ f[i] / dx"));

    [Fact]
    public Task MarkedTypeChecksEveryMethodAndADroppedDiffusiveFluxIsReportedPerPart() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            [ConservativeUpdate]
            sealed class Heat
            {
                public void Rate(ReadOnlySpan<double> u, ReadOnlySpan<double> k, Span<double> r, double dx)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        double right = {|#0:k[i + 1]|} * (u[i + 1] - u[i]) / dx;
                        r[i] = right / dx;
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.DroppedFaceTerm).WithLocation(0).WithOptions(Microsoft.CodeAnalysis.Testing.DiagnosticOptions.IgnoreAdditionalLocations)
                .WithArguments("k[i + 1] * u[i + 1]", "enters", "i", "1/dx²", "gives", "i", "- k[i] * u[i] / dx / dx"),
            VerifyCS.Diagnostic(DiagnosticIds.DroppedFaceTerm).WithLocation(0).WithOptions(Microsoft.CodeAnalysis.Testing.DiagnosticOptions.IgnoreAdditionalLocations)
                .WithArguments("k[i + 1] * u[i]", "leaves", "i", "-1/dx²", "receives", "i", "+ k[i] * u[i - 1] / dx / dx"));
}
