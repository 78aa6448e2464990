using VerifyCS = FvGen.Analyzers.Tests.Verifiers.AnalyzerVerifier<FvGen.Analyzers.Rules.NotAnalyzedAnalyzer>;

namespace FvGen.Analyzers.Tests.Rules;

public sealed class NotAnalyzedTests
{
    [Fact]
    public Task WriteUnderAConditionIsNotGuessed() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Kernel
            {
                [ConservativeUpdate]
                public static void Rate(double[] f, double[] r, double dx)
                {
                    for (int i = 0; i < r.Length; i++)
                    {
                        {|#0:if (i > 0) r[i] = -(f[i + 1] - f[i]) / dx;|}
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("an array element is written under a condition"));

    [Fact]
    public Task DataDependentIndexIsNamed() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Kernel
            {
                [ConservativeUpdate]
                public static void Rate(double[] f, int[] perm, double[] r)
                {
                    for (int i = 0; i < r.Length; i++)
                        r[i] = f[{|#0:perm[i] + 1|}] - f[perm[i]];
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("the index `perm[i] + 1` adds an offset to an index map"));

    [Fact]
    public Task CallWithoutAVisibleBodyIsNamed() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Kernel
            {
                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, Random noise)
                {
                    for (int i = 1; i < r.Length; i++)
                        r[i] = u[i] - u[i - 1] + {|#0:noise.NextDouble()|};
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("it calls `Random.NextDouble()`, whose body the checker cannot see"));

    [Fact]
    public Task ArrayOfUnknownOriginIsAliasing() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Kernel
            {
                static double[] Pick(double[][] all, int k) => all[k];

                [ConservativeUpdate]
                public static void Rate(double[][] all, double[] r, int k)
                {
                    for (int i = 1; i < r.Length; i++)
                        r[i] = {|#0:Pick(all, k)|}[i] - Pick(all, k)[i - 1];
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("the array `Pick(all, k)` comes from an expression the checker cannot follow (aliasing cannot be ruled out)"));

    [Fact]
    public Task FluxBehindAnInterfaceIsNotGuessedPure() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            interface IFlux { double Evaluate(double left, double right); }

            static class Kernel
            {
                [ConservativeUpdate]
                public static void Rate(IFlux flux, double[] u, double[] r)
                {
                    for (int i = 1; i < r.Length - 1; i++)
                        r[i] = -({|#0:flux.Evaluate(u[i], u[i + 1])|} - flux.Evaluate(u[i - 1], u[i]));
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("it calls `IFlux.Evaluate(double, double)`, whose body the checker cannot see"));
}
