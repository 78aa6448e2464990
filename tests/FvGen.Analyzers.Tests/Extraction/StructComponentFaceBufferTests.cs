using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests.Extraction;

/// <summary>
/// A face-flux buffer of struct elements filled component by component (<c>flux[f].Dye = …</c>) in a
/// first loop is face data, not an update: writing a component of an element does not read the
/// element. Found on the runtime demo's residual, which this reproduces.
/// </summary>
public sealed class StructComponentFaceBufferTests
{
    private const string Kernel = """
        using System;
        using FvGen;

        public struct Water { public double Dye; public double Salt; }

        public sealed class Channel
        {
            private readonly Water[] _faceFlux = new Water[65];
            private readonly double[] _widths = new double[64];
            private readonly double[] _gaps = new double[65];

            [ConservativeUpdate]
            public void Residual(ReadOnlySpan<Water> state, Span<Water> residual, double u, double d)
            {
                Water[] flux = _faceFlux;
                int n = residual.Length;
                for (int f = 1; f < n; f++)
                {
                    double gap = _gaps[f];
                    flux[f].Dye = u * state[f - 1].Dye - d * (state[f].Dye - state[f - 1].Dye) / gap;
                    flux[f].Salt = u * state[f - 1].Salt - d * (state[f].Salt - state[f - 1].Salt) / gap;
                }

                for (int i = 0; i < n; i++)
                {
                    residual[i].Dye = -(flux[i + 1].Dye - flux[i].Dye) / _widths[i];
                    residual[i].Salt = -(flux[i + 1].Salt - flux[i].Salt) / _widths[i];
                }
            }
        }
        """;

    [Fact]
    public async Task ComponentWiseFluxBufferThenDifferenceIsProven()
    {
        var result = await AnalyzerRun.RunAsync(Kernel);

        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        Assert.True(!result.Fvc.Any(), AnalyzerRun.Describe(result.Fvc));
    }

    [Fact]
    public async Task DroppedCounterpartInTheDifferenceIsStillCaught()
    {
        var result = await AnalyzerRun.RunAsync(Kernel.Replace("-(flux[i + 1].Salt - flux[i].Salt)", "-(flux[i + 1].Salt)"));

        Assert.Contains(result.Fvc, d => d.Id == "FVC0001" && d.GetMessage().Contains("[i + 1].Salt", StringComparison.Ordinal));
    }
}
