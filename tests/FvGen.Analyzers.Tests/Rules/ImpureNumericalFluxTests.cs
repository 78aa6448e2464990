using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

public sealed class ImpureNumericalFluxTests
{
    private static readonly AnalyzerVerifier VerifyCS = new(DiagnosticIds.ImpureNumericalFlux);

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

    [Fact]
    public Task FluxReturningAnObjectInitializerIsPure() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            struct Surge { public double Depth, Discharge; }

            static class Fluxes
            {
                [NumericalFlux]
                public static Surge Upwind(in Surge l, in Surge r) =>
                    l.Discharge >= 0 ? new Surge { Depth = l.Discharge, Discharge = l.Discharge * l.Discharge / l.Depth } : new Surge { Depth = r.Discharge, Discharge = 0 };
            }
            """);

    [Fact]
    public Task HelperHandingResultsBackThroughOutLocalsIsPure() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Fluxes
            {
                static double Physical(double u, out double speed)
                {
                    speed = System.Math.Abs(u);
                    return 0.5 * u * u;
                }

                static double Relay(double u, out double speed) => Physical(u, out speed);

                [NumericalFlux]
                public static double Rusanov(double a, double b)
                {
                    double fa = Relay(a, out double sa);
                    double fb = Physical(b, out var sb);
                    return 0.5 * (fa + fb) - 0.5 * System.Math.Max(sa, sb) * (b - a);
                }
            }
            """);

    [Fact]
    public Task HelperWritingAFieldThroughItsOutParameterIsImpure() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Fluxes
            {
                static double lastSpeed;

                static double Physical(double u, out double speed)
                {
                    speed = System.Math.Abs(u);
                    return 0.5 * u * u;
                }

                [NumericalFlux]
                public static double {|#1:Rusanov|}(double a, double b)
                {
                    double fa = Physical(a, {|#0:out lastSpeed|});
                    return fa + 0 * b;
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.ImpureNumericalFlux).WithLocation(0).WithLocation(1)
                .WithArguments("Rusanov", "passes the static field `lastSpeed` to `Physical`, which writes it"));

    [Fact]
    public Task DeclaredFluxWritingItsOutParameterIsImpure() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Fluxes
            {
                [NumericalFlux]
                public static double {|#0:Central|}(double a, double b, out double speed)
                {
                    speed = System.Math.Max(a, b);
                    return 0.5 * (a + b);
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.ImpureNumericalFlux).WithLocation(0).WithLocation(0)
                .WithArguments("Central", "writes its parameter `speed`; a flux hands back only its return value"));
}
