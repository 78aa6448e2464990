using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Extraction;

/// <summary>
/// A face buffer handed to a local function (the generator's structured gather fills its buffer that
/// way): a parameter to which every call passes face data is face data, so filling it is a
/// definition, not a one-sided update. A parameter that some call fills with cell data stays cell data.
/// </summary>
public sealed class LocalFunctionFaceDataTests
{
    private const string Kernel = """
        static class Row
        {
            static double F(double a, double b) => 0.5 * (a + b);

            [ConservativeUpdate]
            public static void Fluxes(double[] u, [FaceData] double[] faceFlux, double[] other)
            {
                Fill(u, faceFlux);
                __SECOND__

                static void Fill(double[] state, double[] buffer)
                {
                    for (int i = 1; i < state.Length; i++)
                        buffer[i] = F(state[i - 1], state[i]);
                }
            }
        }
        """;

    [Fact]
    public async Task BufferFilledThroughAFaceDataArgumentIsADefinition()
    {
        var result = await AnalyzerRun.RunAsync(TestReferences.Usings + Kernel.Replace("__SECOND__", string.Empty));
        Assert.Empty(result.CompilerErrors);
        Assert.Empty(result.Exceptions);
        Assert.True(!result.Fvc.Any(), AnalyzerRun.Describe(result.Fvc));
    }

    [Fact]
    public async Task ParameterAlsoGivenCellDataIsCheckedAsAnUpdate()
    {
        var result = await AnalyzerRun.RunAsync(TestReferences.Usings + Kernel.Replace("__SECOND__", "Fill(u, other);"));
        Assert.Empty(result.CompilerErrors);
        Assert.Contains(result.Fvc, d => d.Id is DiagnosticIds.DroppedFaceTerm or DiagnosticIds.OneSidedScatter);
    }
}
