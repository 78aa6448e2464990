using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests;

/// <summary>
/// The corpus under <c>Corpus/</c>: hand-written kernels the way CFD engineers write them. No
/// conservative kernel may be flagged (not even "not analyzed"); every mutant must be flagged with
/// its rule. Sources are data, compiled here, not part of this assembly.
/// </summary>
public sealed class CorpusTests
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
    public async Task ConservativeKernelIsNotFlagged(string kernel)
    {
        var source = CorpusKernel.All.Single(k => k.Name == kernel).Source;
        var result = await AnalyzerRun.RunAsync(source);
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        Assert.True(!result.Fvc.Any(), AnalyzerRun.Describe(result.Fvc));
    }

    [Theory]
    [MemberData(nameof(Mutants))]
    public async Task MutantIsFlaggedWithItsRule(string kernel, string label)
    {
        var k = CorpusKernel.All.Single(x => x.Name == kernel);
        var mutant = k.Mutants.Single(m => m.Label == label);
        var result = await AnalyzerRun.RunAsync(k.Apply(mutant));
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        Assert.True(result.Fvc.Any(d => d.Id == mutant.RuleId), $"expected {mutant.RuleId}, got:\n" + AnalyzerRun.Describe(result.Fvc));
    }

    [Fact]
    public void CorpusHasAtLeastSixtyKernelsEachWithMutants()
    {
        Assert.True(CorpusKernel.All.Count >= 60, $"{CorpusKernel.All.Count} kernels");
        Assert.All(CorpusKernel.All, k => Assert.NotEmpty(k.Mutants));
    }
}
