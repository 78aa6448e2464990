using VerifyCS = FvGen.Analyzers.Tests.Verifiers.AnalyzerVerifier<FvGen.Analyzers.Rules.InPlaceSweepAnalyzer>;

namespace FvGen.Analyzers.Tests.Rules;

public sealed class InPlaceSweepTests
{
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
