using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests;

/// <summary>
/// Holds the conservation rules to the independent corpus (IndependentCorpus/README.md): kernels
/// and mutants written apart from the analyzers. A file that expects <c>none</c> must get no FVC
/// diagnostic at all; any other file must get every rule its header names.
/// </summary>
public sealed class IndependentCorpusVerdictTests
{
    [Theory]
    [MemberData(nameof(IndependentCorpusCompilesTests.CorpusFiles), MemberType = typeof(IndependentCorpusCompilesTests))]
    public async Task VerdictMatchesTheHeader(string relativePath)
    {
        string text = File.ReadAllText(IndependentCorpusCompilesTests.FullPath(relativePath));
        var header = IndependentCorpusCompilesTests.CorpusHeader.Parse(relativePath, text);
        Assert.Null(header.Error);

        var result = await AnalyzerRun.RunAsync(text);

        Assert.Empty(result.Exceptions);
        var found = result.Fvc.Select(d => d.Id).Distinct().Order(StringComparer.Ordinal).ToList();
        if (header.ExpectsNone)
        {
            Assert.True(found.Count == 0, $"{relativePath} conserves but was flagged:\n{AnalyzerRun.Describe(result.Fvc)}");
        }
        else
        {
            var missing = header.RuleIds.Except(found).ToList();
            Assert.True(missing.Count == 0, $"{relativePath} expects {string.Join(" ", header.RuleIds)}; missing {string.Join(" ", missing)}; got:\n{AnalyzerRun.Describe(result.Fvc)}");
        }
    }
}
