using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

/// <summary>
/// Update form read at the written cell only: a new state written from old states read at its own
/// cell must carry the old total with weight exactly 1 (DESIGN.md, "Update form"). The weights of the
/// SSP Runge–Kutta stages are those of Shu and Osher (J. Comput. Phys. 77, 1988; quoted from memory):
/// stage 2 takes 3/4 of uⁿ and 1/4 of u⁽¹⁾, stage 3 takes 1/3 of uⁿ and 2/3 of u⁽²⁾; each pair sums to 1.
/// </summary>
public sealed class CarriedOldTotalTests
{
    private static readonly AnalyzerVerifier VerifyCS = new(DiagnosticIds.UnbalancedFaceTerm);

    [Fact]
    public Task OldStateCarriedWithNineTenths() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class GlazeLayer
            {
                [ConservativeUpdate]
                public static void Step(double[] u, double[] un, [FaceData] double[] flux, double c)
                {
                    for (int i = 0; i < un.Length; i++)
                        un[i] = 0.9 * {|#0:u[i]|} - c * (flux[i + 1] - flux[i]);
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.UnbalancedFaceTerm).WithLocation(0)
                .WithArguments("u[i]", "`u[i]` 9/10", "9/10", "1", "a new state must carry the old total over with weight exactly 1 (a decay of the state is written with its rate, as in `(1 - k * dt) * u[i]`)"));

    [Theory]
    [InlineData("u[i] + u[i] - c * (flux[i + 1] - flux[i])")]
    [InlineData("0.7 * u[i] + 0.25 * (u1[i] - c * (flux[i + 1] - flux[i]))")]
    [InlineData("u[i] + u[i] - c * (u[i] - u[i - 1])")]
    [InlineData("2.0 / 3.0 * u[i] + 2.0 / 3.0 * (u1[i] - c * (flux[i + 1] - flux[i]))")]
    public async Task WrongNumericWeightIsUnbalanced(string update)
    {
        var result = await Run(update);
        Assert.Equal(new[] { DiagnosticIds.UnbalancedFaceTerm }, result.Fvc.Select(d => d.Id).Distinct());
    }

    [Theory]
    [InlineData("u[i] - c * (flux[i + 1] - flux[i])")]
    [InlineData("0.75 * u[i] + 0.25 * (u1[i] - c * (flux[i + 1] - flux[i]))")]
    [InlineData("1.0 / 3.0 * u[i] + 2.0 / 3.0 * (u1[i] - c * (flux[i + 1] - flux[i]))")]
    [InlineData("(1 - k * dt) * u[i] - c * (flux[i + 1] - flux[i])")]
    [InlineData("u[i] + 0.5 * q[i] - c * (flux[i + 1] - flux[i])")]
    [InlineData("-(flux[i + 1] - flux[i]) / dx - 0.5 * u[i]")]
    [InlineData("u[i] - c * (u[i] - u[i - 1])")]
    [InlineData("k * u[i] + (1 - k) * u1[i] - c * (flux[i + 1] - flux[i])")]
    public async Task WeightOneOrASourceIsQuiet(string update)
    {
        var result = await Run(update);
        Assert.True(!result.Fvc.Any(), AnalyzerRun.Describe(result.Fvc));
    }

    [Fact]
    public async Task LoopWithoutFaceTermsIsNotAnUpdate()
    {
        // Half the state, say for a diagnostic: no face term, so nothing says the target is a new state.
        var result = await Run("0.5 * u[i]");
        Assert.Empty(result.Fvc);
    }

    private static Task<AnalyzerRun.Result> Run(string update) =>
        AnalyzerRun.RunKernelAsync($$"""
            static class KilnShell
            {
                [ConservativeUpdate]
                public static void Step(double[] u, double[] u1, double[] q, double[] un, [FaceData] double[] flux, double c, double k, double dt, double dx)
                {
                    for (int i = 1; i < un.Length; i++)
                        un[i] = {{update}};
                }
            }
            """);
}
