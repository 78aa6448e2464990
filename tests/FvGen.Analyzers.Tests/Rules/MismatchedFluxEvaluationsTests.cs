using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

public sealed class MismatchedFluxEvaluationsTests
{
    private static readonly AnalyzerVerifier VerifyCS = new(DiagnosticIds.MismatchedFluxEvaluations);

    private const string Flux = """
        static double G(double a, double b) => 0.25 * (a * a + b * b) - 0.5 * Math.Max(Math.Abs(a), Math.Abs(b)) * (b - a);
        """;

    [Fact]
    public Task ArgumentsSwappedOnTheLowFace() =>
        VerifyCS.VerifyAnalyzerAsync(
            $$"""
            static class Burgers
            {
                {{Flux}}

                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, double dx)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                        r[i] = -({|#1:G(u[i], u[i + 1])|} - {|#0:G(u[i], u[i - 1])|}) / dx;
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.MismatchedFluxEvaluations).WithLocation(0).WithLocation(1)
                .WithArguments("G(u[i], u[i - 1])", "1/dx", "G(u[i], u[i + 1])", "-1/dx", "G(u[i - 1], u[i])"));

    [Fact]
    public Task DeclaredAntisymmetryClosesTheFace() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Outward
            {
                [NumericalFlux(Antisymmetric = true)]
                static double F(double a, double b, double n) => 0.5 * n * (a + b) - 0.5 * (b - a);

                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, double dx)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                        r[i] = -(F(u[i], u[i + 1], 1) + F(u[i], u[i - 1], -1)) / dx;
                }
            }
            """);

    [Fact]
    public Task MaxWrittenInEitherOrderIsTheSameFlux() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Rusanov
            {
                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, double dx)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        double sR = Math.Max(Math.Abs(u[i]), Math.Abs(u[i + 1]));
                        double sL = Math.Max(Math.Abs(u[i]), Math.Abs(u[i - 1]));
                        r[i] = -(0.5 * sR * (u[i] - u[i + 1]) - 0.5 * sL * (u[i - 1] - u[i])) / dx;
                    }
                }
            }
            """);
}
