using Microsoft.CodeAnalysis.Testing;
using VerifyCS = FvGen.Analyzers.Tests.Verifiers.CodeFixVerifier<FvGen.Analyzers.Rules.InPlaceSweepAnalyzer, FvGen.Analyzers.CodeFixes.InPlaceSweepFix>;

namespace FvGen.Analyzers.Tests.CodeFixes;

public sealed class InPlaceSweepFixTests
{
    [Fact]
    public Task ReadsTheOldStateFromACopy() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Upwind
            {
                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    for (int i = 1; i < u.Length; i++)
                    {
                        {|#0:u[i] = u[i] - c * (u[i] - {|#1:u[i - 1]|})|};
                    }
                }
            }
            """,
            [VerifyCS.Diagnostic(DiagnosticIds.InPlaceSweep).WithLocation(0).WithLocation(1).WithArguments("u[i]", "u[i - 1]")],
            """
            static class Upwind
            {
                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    var uOld = (double[])u.Clone();
                    for (int i = 1; i < u.Length; i++)
                    {
                        u[i] = uOld[i] - c * (uOld[i] - uOld[i - 1]);
                    }
                }
            }
            """);

    [Fact]
    public Task SpanIsCopiedWithToArray() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Smooth
            {
                [ConservativeUpdate]
                public static void Filter(Span<double> u, double e)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        {|#0:u[i] += e * (u[i + 1] - 2 * u[i] + {|#1:u[i - 1]|})|};
                    }
                }
            }
            """,
            [VerifyCS.Diagnostic(DiagnosticIds.InPlaceSweep).WithLocation(0).WithLocation(1).WithArguments("u[i]", "u[i - 1]")],
            """
            static class Smooth
            {
                [ConservativeUpdate]
                public static void Filter(Span<double> u, double e)
                {
                    var uOld = u.ToArray();
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        u[i] += e * (uOld[i + 1] - 2 * uOld[i] + uOld[i - 1]);
                    }
                }
            }
            """);
}
