using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

/// <summary>
/// A coefficient indexed by only some of the loop variables (a conductivity per layer <c>k[j]</c>, a
/// diffusivity per species, a stage weight <c>b[s]</c>) multiplies a difference along another
/// variable. Such a face term telescopes along that variable, whatever the coefficient's name: a
/// body's factors are sorted by name, so a name that sorts first puts the coefficient, which says
/// nothing of that variable, at the head of the body.
/// </summary>
public sealed class PartlyIndexedCoefficientTests
{
    /// <summary>Names that sort before and after the state array <c>c</c>.</summary>
    public static TheoryData<string> CoefficientNames => new() { "ax", "zx" };

    [Theory]
    [MemberData(nameof(CoefficientNames))]
    public async Task RowCoefficientOnAnXDifferenceIsQuiet(string k)
    {
        var result = await Run($$"""
            static class LayeredSoil
            {
                [ConservativeUpdate]
                public static void Rate(double[,] c, double[,] r, double[] {{k}}, double dx)
                {
                    for (int i = 1; i < c.GetLength(0); i++)
                        for (int j = 0; j < c.GetLength(1); j++)
                            r[i, j] = -{{k}}[j] * (c[i, j] - c[i - 1, j]) / dx;
                }
            }
            """);
        Assert.Empty(result.Fvc);
    }

    [Theory]
    [MemberData(nameof(CoefficientNames))]
    public async Task RowCoefficientInsideAFluxCallIsQuiet(string k)
    {
        var result = await Run($$"""
            static class PipeProfile
            {
                [NumericalFlux]
                static double Upwind(double velocity, double left, double right) => velocity > 0 ? velocity * left : velocity * right;

                [ConservativeUpdate]
                public static void Rate(double[,] c, double[,] r, double[] {{k}}, double dx)
                {
                    for (int i = 1; i < c.GetLength(0) - 1; i++)
                        for (int j = 0; j < c.GetLength(1); j++)
                            r[i, j] = -(Upwind({{k}}[j], c[i, j], c[i + 1, j]) - Upwind({{k}}[j], c[i - 1, j], c[i, j])) / dx;
                }
            }
            """);
        Assert.Empty(result.Fvc);
    }

    [Theory]
    [MemberData(nameof(CoefficientNames))]
    public async Task StageWeightOverAnOuterLoopIsQuiet(string b)
    {
        var result = await Run($$"""
            static class StagedSmoothing
            {
                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, double[] {{b}}, int stages)
                {
                    for (int s = 0; s < stages; s++)
                        for (int i = 1; i < u.Length - 1; i++)
                            r[i] += {{b}}[s] * (u[i + 1] - 2 * u[i] + u[i - 1]);
                }
            }
            """);
        Assert.Empty(result.Fvc);
    }

    [Theory]
    [InlineData("ay", "bx")]
    [InlineData("zy", "bx")]
    [InlineData("ay", "zx")]
    public async Task NoSingleReadNamesEveryVariableAndItStillTelescopes(string row, string column)
    {
        // r[i, j] = row[j] · (column[i + 1] − column[i]): neither read alone fixes both parts of the shift.
        var result = await Run($$"""
            static class SeparableRate
            {
                [ConservativeUpdate]
                public static void Rate(double[,] r, double[] {{row}}, double[] {{column}})
                {
                    for (int i = 0; i < r.GetLength(0); i++)
                        for (int j = 0; j < r.GetLength(1); j++)
                            r[i, j] = -({{row}}[j] * {{column}}[i + 1] - {{row}}[j] * {{column}}[i]);
                }
            }
            """);
        Assert.Empty(result.Fvc);
    }

    [Theory]
    [MemberData(nameof(CoefficientNames))]
    public async Task RowCoefficientOnAYDifferenceIsDropped(string k)
    {
        // Along j the two cells of a face see k[j] and k[j + 1]: neither term has a counterpart.
        var result = await Run($$"""
            static class LayeredSoil
            {
                [ConservativeUpdate]
                public static void Rate(double[,] c, double[,] r, double[] {{k}}, double dy)
                {
                    for (int i = 0; i < c.GetLength(0); i++)
                        for (int j = 0; j < c.GetLength(1) - 1; j++)
                            r[i, j] = {{k}}[j] * (c[i, j + 1] - c[i, j]) / dy;
                }
            }
            """);
        Assert.Equal(new[] { DiagnosticIds.DroppedFaceTerm }, result.Fvc.Select(d => d.Id).Distinct());
    }

    private static Task<AnalyzerRun.Result> Run(string kernel) => AnalyzerRun.RunKernelAsync(kernel);
}
