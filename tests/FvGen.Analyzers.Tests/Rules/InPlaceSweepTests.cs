using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

public sealed class InPlaceSweepTests
{
    private static readonly AnalyzerVerifier VerifyCS = new(DiagnosticIds.InPlaceSweep);

    [Fact]
    public Task UpwindStepOverwritingItsInput() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Upwind
            {
                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    for (int i = 1; i < u.Length; i++)
                        {|#0:u[i] = u[i] - c * (u[i] - {|#1:u[i - 1]|})|};
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.InPlaceSweep).WithLocation(0).WithLocation(1).WithArguments("u[i]", "u[i - 1]"));

    [Fact]
    public Task AliasThroughALocalSpanIsSeen() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Upwind
            {
                [ConservativeUpdate]
                public static void Step(double[] state, double c)
                {
                    Span<double> next = state;
                    ReadOnlySpan<double> old = state;
                    for (int i = 1; i < state.Length; i++)
                        {|#0:next[i] = old[i] - c * (old[i] - {|#1:old[i - 1]|})|};
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.InPlaceSweep).WithLocation(0).WithLocation(1).WithArguments("state[i]", "state[i - 1]"));

    [Fact]
    public Task SweepAfterALoopThatAlreadyReadsACopyIsStillSeen() =>
        // The first loop writes u from a copy; the second differences u while writing it. That second
        // loop sweeps in place; it must not turn the first loop into a face-data definition.
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class TwoStages
            {
                static double Godunov(double left, double right) => 0.5 * Math.Max(left * left, right * right);

                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    var uOld = (double[])u.Clone();
                    for (int i = 1; i < u.Length - 1; i++)
                        u[i] = uOld[i] - c * (Godunov(uOld[i], uOld[i + 1]) - Godunov(uOld[i - 1], uOld[i]));

                    for (int i = 1; i < u.Length - 1; i++)
                        {|#0:u[i] = u[i] - c * (Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i]))|};
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.InPlaceSweep).WithLocation(0).WithOptions(Microsoft.CodeAnalysis.Testing.DiagnosticOptions.IgnoreAdditionalLocations).WithArguments("u[i]", "u[i - 1]"));

    [Fact]
    public Task OwnCellOnlyIsNotASweep() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Euler
            {
                [ConservativeUpdate]
                public static void Step(double[] u, [FaceData] double[] f, double lambda)
                {
                    for (int i = 0; i < u.Length; i++)
                        u[i] -= lambda * (f[i + 1] - f[i]);
                }
            }
            """);
}
