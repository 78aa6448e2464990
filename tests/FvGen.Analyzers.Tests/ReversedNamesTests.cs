using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests;

/// <summary>
/// The corpus with every parameter and local renamed so that the names sort the other way round
/// (<see cref="ReversedNames"/>): no conservative kernel may be flagged, and every mutant keeps its
/// rule. Whatever order the engine's text keys put arrays and symbols in, the verdict must not follow it.
/// </summary>
public sealed class ReversedNamesTests
{
    public static TheoryData<string> Kernels() => [.. CorpusKernel.All.Select(k => k.Name)];

    public static TheoryData<string, string> Mutants()
    {
        var data = new TheoryData<string, string>();
        foreach (var m in CorpusKernel.All.SelectMany(k => k.Mutants))
        {
            data.Add(m.Kernel, m.Label);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Kernels))]
    public async Task RenamedConservativeKernelIsNotFlagged(string kernel)
    {
        var renamed = ReversedNames.Apply(CorpusKernel.All.Single(x => x.Name == kernel).Source);
        var result = await AnalyzerRun.RunAsync(renamed);
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors) + "\n" + renamed);
        Assert.True(!result.Fvc.Any(), AnalyzerRun.Describe(result.Fvc) + "\n" + renamed);
    }

    [Theory]
    [MemberData(nameof(Mutants))]
    public async Task RenamedMutantKeepsItsRule(string kernel, string label)
    {
        var k = CorpusKernel.All.Single(x => x.Name == kernel);
        var mutant = k.Mutants.Single(m => m.Label == label);
        var result = await AnalyzerRun.RunAsync(ReversedNames.Apply(k.Apply(mutant)));
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        Assert.True(result.Fvc.Any(d => d.Id == mutant.RuleId), $"expected {mutant.RuleId}, got:\n" + AnalyzerRun.Describe(result.Fvc));
    }

    [Fact]
    public void RenamesParametersAndLocalsOnly()
    {
        var source = """
            struct S { public double Mass; }
            class C
            {
                void M(double[] alpha, S[] beta)
                {
                    for (int i = 0; i < alpha.Length; i++)
                        alpha[i] = beta[i].Mass;
                }
            }
            """;
        var renamed = ReversedNames.Apply(source);
        Assert.True(renamed.Contains("void M(double[] v003, S[] v002)"), renamed);
        Assert.True(renamed.Contains("for (int v001 = 0; v001 < v003.Length; v001++)"), renamed);
        Assert.True(renamed.Contains("v003[v001] = v002[v001].Mass;"), renamed);
    }
}
