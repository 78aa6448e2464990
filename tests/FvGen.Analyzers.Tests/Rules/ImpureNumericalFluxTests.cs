using VerifyCS = FvGen.Analyzers.Tests.Verifiers.AnalyzerVerifier<FvGen.Analyzers.Rules.ImpureNumericalFluxAnalyzer>;

namespace FvGen.Analyzers.Tests.Rules;

public sealed class ImpureNumericalFluxTests
{
    [Fact]
    public Task DeclaredFluxWritingAStaticField() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Fluxes
            {
                static int calls;

                [NumericalFlux]
                public static double {|#1:Central|}(double a, double b)
                {
                    {|#0:calls++|};
                    return 0.5 * (a + b);
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.ImpureNumericalFlux).WithLocation(0).WithLocation(1)
                .WithArguments("Central", "writes the static field `calls`"));

    [Fact]
    public Task HelperCalledFromAnUpdateThatCallsAWriter() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Kernel
            {
                static double last;

                static void Remember(double v) => last = v;

                static double Upwind(double a, double b)
                {
                    Remember(a);
                    return a;
                }

                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                        r[i] = -({|#0:Upwind(u[i], u[i + 1])|} - Upwind(u[i - 1], u[i]));
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.ImpureNumericalFlux).WithLocation(0).WithOptions(Microsoft.CodeAnalysis.Testing.DiagnosticOptions.IgnoreAdditionalLocations)
                .WithArguments("Upwind", "calls `Remember`, which writes the static field `last`"));

    [Fact]
    public Task FluxBuildingItsOwnResultIsPure() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            struct Two { public double A, B; }

            static class Fluxes
            {
                [NumericalFlux]
                public static Two Split(double a, double b)
                {
                    Two t;
                    t.A = a;
                    t.B = b;
                    var scratch = new double[2];
                    scratch[0] = a;
                    return t;
                }
            }
            """);
}
