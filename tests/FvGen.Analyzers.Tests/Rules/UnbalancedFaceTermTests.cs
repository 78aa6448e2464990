using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

public sealed class UnbalancedFaceTermTests
{
    private static readonly AnalyzerVerifier VerifyCS = new(DiagnosticIds.UnbalancedFaceTerm);

    [Fact]
    public Task SignSlipNamesTheWeightsAndTheFix() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Upwind
            {
                [ConservativeUpdate]
                public static void Rate(double[] f, double[] r, double dx)
                {
                    for (int i = 0; i < r.Length; i++)
                        r[i] = -({|#1:f[i + 1]|} + {|#0:f[i]|}) / dx;
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.UnbalancedFaceTerm).WithLocation(0).WithLocation(1)
                .WithArguments("f[i]", "`f[i]` -1/dx, `f[i + 1]` -1/dx", "-2/dx", "0", "for the difference to cancel, `f[i]` needs weight 1/dx"));

    [Fact]
    public Task UpdateThatLosesHalfTheOldTotal() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class LaxFriedrichs
            {
                static double F(double u) => 0.5 * u * u;

                [ConservativeUpdate]
                public static void Step(double[] u, double[] un, double c)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                        un[i] = 0.25 * ({|#0:u[i - 1]|} + {|#1:u[i + 1]|}) - 0.5 * c * (F(u[i + 1]) - F(u[i - 1]));
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.UnbalancedFaceTerm).WithLocation(0).WithLocation(1)
                .WithArguments("u[i - 1]", "`u[i - 1]` 1/4, `u[i + 1]` 1/4", "1/2", "1", "an update must carry the old total over with weight exactly 1"));

    [Fact]
    public Task WeightedReciprocalFluxBehindTheCellIsQuiet() =>
        // Both faces lie behind the cell (u[i - 2], u[i - 1], u[i]): the offsets' text sorts against their
        // order, which once made the two faces' weights differ and this conservative step reported.
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Upstream
            {
                [ConservativeUpdate]
                public static void Step(double[] u, double[] next, double c)
                {
                    for (int i = 2; i < u.Length; i++)
                    {
                        double right = 1.0 / (2.0 * u[i - 1] + 3.0 * u[i]);
                        double left = 1.0 / (2.0 * u[i - 2] + 3.0 * u[i - 1]);
                        next[i] = u[i] - c * (right - left);
                    }
                }
            }
            """);

    [Fact]
    public Task WeightedReciprocalFluxOutOfBalanceShowsWeightsThatAddUp() =>
        // The right face's flux is the left one's moved by a cell, but scaled: it pulled out the weight
        // 2 where the left pulled out 3. It is shown as the left body moved onto it, with the weight the
        // class counts (-c/3, not its own -c/2), so the weights shown add up to the sum shown.
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Upstream
            {
                [ConservativeUpdate]
                public static void Step(double[] u, double[] next, double c)
                {
                    for (int i = 2; i < u.Length; i++)
                    {
                        double right = 1.0 / (2.0 * {|#2:u[i - 1]|} + 3.0 * {|#3:u[i]|});
                        double left = 1.0 / (2.0 * {|#1:u[i - 2]|} + 3.0 * {|#0:u[i - 1]|});
                        next[i] = u[i] - c * (right - 2.0 * left);
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.UnbalancedFaceTerm).WithLocation(0).WithLocation(1).WithLocation(2).WithLocation(3)
                .WithArguments(
                    "(1.0 / (u[i - 1] + 2 * u[i - 2] / 3.0))",
                    "`(1.0 / (u[i - 1] + 2 * u[i - 2] / 3.0))` 2·c/3, `(1.0 / (2 * u[i - 1] / 3.0 + u[i]))` -c/3",
                    "c/3",
                    "0",
                    "for the difference to cancel, `(1.0 / (u[i - 1] + 2 * u[i - 2] / 3.0))` needs weight c/3"));

    [Fact]
    public Task ConservativeLaplacianIsQuiet() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Heat
            {
                [ConservativeUpdate]
                public static void Rate(double[] t, double[] r, double k, double dx)
                {
                    double c = k / (dx * dx);
                    for (int i = 1; i < t.Length - 1; i++)
                        r[i] = c * (t[i + 1] - 2 * t[i] + t[i - 1]);
                }
            }
            """);

    private const string UpwindStepWithDecay = """
        public static class Decay
        {
            [FvGen.ConservativeUpdate]
            public static void Step(double[] u, double[] next, double c, double k)
            {
                for (int i = 1; i < u.Length; i++)
                {
                    double here = u[i];
                    next[i] = here - c * (here - u[i - 1]) - k * here;
                }
            }
        }
        """;

    [Fact]
    public async Task DecayNextToAnUpwindStepIsASource()
    {
        // The decay -k·u[i] is a source; the old total 1 is carried and c moves mass from upwind only.
        var result = await FvGen.Analyzers.Tests.Harness.AnalyzerRun.RunAsync(UpwindStepWithDecay);
        Assert.True(!result.Fvc.Any(), FvGen.Analyzers.Tests.Harness.AnalyzerRun.Describe(result.Fvc));
    }

    [Fact]
    public async Task PrecedenceSlipThatLosesTheOldTotalIsNotTakenForADecay()
    {
        // `- c * here - u[i - 1]`: the upwind cell's old value leaves with weight 1 and -c·u[i] looks like a
        // decay, but then no class carries the old total (common practice: Σ next = Σ u for pure transport).
        var result = await FvGen.Analyzers.Tests.Harness.AnalyzerRun.RunAsync(
            UpwindStepWithDecay.Replace("here - c * (here - u[i - 1]) - k * here", "here - c * here - u[i - 1]", StringComparison.Ordinal));
        Assert.Contains(result.Fvc, d => d.Id == DiagnosticIds.UnbalancedFaceTerm);
    }
}
