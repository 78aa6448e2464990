using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Extraction;

/// <summary>
/// A face-flux buffer on the stack (<c>Span&lt;double&gt; flux = stackalloc double[n + 1]</c>) is a fresh
/// array like <c>new double[n + 1]</c>: the divergence pass that reads it is checked, not set aside.
/// </summary>
public sealed class StackAllocatedBufferTests
{
    [Theory]
    [InlineData("Span<double> flux = stackalloc double[n + 1];")]
    [InlineData("Span<double> flux = stackalloc[] { 0.0, 0.0, 0.0, 0.0 };")]
    [InlineData("Span<double> flux = new double[n + 1];")]
    public async Task CompleteDivergenceOfTheBufferIsQuiet(string buffer)
    {
        var result = await Run(buffer, "r[i] = -(flux[i + 1] - flux[i]) / dx + s * u[i];");
        Assert.True(!result.Fvc.Any(), AnalyzerRun.Describe(result.Fvc));
    }

    [Theory]
    [InlineData("Span<double> flux = stackalloc double[n + 1];")]
    [InlineData("Span<double> flux = new double[n + 1];")]
    public async Task DroppedEastFaceOfTheBufferIsReported(string buffer)
    {
        var result = await Run(buffer, "r[i] = flux[i] / dx + s * u[i];");
        Assert.Equal(new[] { DiagnosticIds.DroppedFaceTerm }, result.Fvc.Select(d => d.Id).Distinct());
    }

    private static Task<AnalyzerRun.Result> Run(string buffer, string divergence) =>
        AnalyzerRun.RunKernelAsync($$"""
            static class CoolingTowerPlume
            {
                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, double a, double dx, double s)
                {
                    int n = u.Length;
                    {{buffer}}
                    for (int f = 1; f < n; f++)
                        flux[f] = a * u[f - 1];
                    for (int i = 1; i < n - 1; i++)
                        {{divergence}}
                }
            }
            """);
}
