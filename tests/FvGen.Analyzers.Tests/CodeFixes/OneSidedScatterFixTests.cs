using Microsoft.CodeAnalysis.Testing;
using VerifyCS = FvGen.Analyzers.Tests.Verifiers.CodeFixVerifier<FvGen.Analyzers.CodeFixes.OneSidedScatterFix>;

namespace FvGen.Analyzers.Tests.CodeFixes;

public sealed class OneSidedScatterFixTests
{
    [Fact]
    public Task AddsTheNeighbourUpdate() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Scatter
            {
                static double H(double a, double b) => 0.5 * (a + b);

                [ConservativeUpdate]
                public static void Residual(int[] left, int[] right, double[] u, double[] res)
                {
                    for (int f = 0; f < left.Length; f++)
                    {
                        double flux = {|#0:H(u[left[f]], u[right[f]])|};
                        res[left[f]] -= flux;
                    }
                }
            }
            """,
            [VerifyCS.Diagnostic(DiagnosticIds.OneSidedScatter).WithLocation(0).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations).WithMessage(null)],
            """
            static class Scatter
            {
                static double H(double a, double b) => 0.5 * (a + b);

                [ConservativeUpdate]
                public static void Residual(int[] left, int[] right, double[] u, double[] res)
                {
                    for (int f = 0; f < left.Length; f++)
                    {
                        double flux = H(u[left[f]], u[right[f]]);
                        res[left[f]] -= flux;
                        res[right[f]] += flux;
                    }
                }
            }
            """);

    [Fact]
    public Task StructuredFaceLoopGetsTheRightCell() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class FaceLoop
            {
                static double Roe(double a, double b) => 0.5 * (a + b);

                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, double dx)
                {
                    for (int i = 1; i < u.Length; i++)
                    {
                        double f = {|#0:Roe(u[i - 1], u[i])|};
                        r[i - 1] -= f / dx;
                    }
                }
            }
            """,
            [VerifyCS.Diagnostic(DiagnosticIds.OneSidedScatter).WithLocation(0).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations).WithMessage(null)],
            """
            static class FaceLoop
            {
                static double Roe(double a, double b) => 0.5 * (a + b);

                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, double dx)
                {
                    for (int i = 1; i < u.Length; i++)
                    {
                        double f = Roe(u[i - 1], u[i]);
                        r[i - 1] -= f / dx;
                        r[i] += f / dx;
                    }
                }
            }
            """);
}
