using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests;

/// <summary>
/// Every file of the independent corpus, rewritten by each of <see cref="CorpusTransformationTests"/>'
/// transformations, gets the rules the file itself gets: the verdict is compared with the checker's
/// own verdict on the file as written, not with the header, so the known gaps take part too.
/// Re-indexed, a dropped face term and a one-sided scatter count as one rule (see the remarks there).
/// </summary>
public sealed class IndependentCorpusTransformationTests
{
    public static TheoryData<string, string> Files()
    {
        var data = new TheoryData<string, string>();
        foreach (var row in (IEnumerable<object[]>)IndependentCorpusCompilesTests.CorpusFiles())
        {
            foreach (var transformation in CorpusTransformationTests.Transformations.Keys.Where(t => t != "reindexed by -10"))
            {
                data.Add(transformation, (string)row[0]);
            }
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Files))]
    public async Task TransformedFileGetsTheSameRules(string transformation, string relativePath)
    {
        string text = File.ReadAllText(IndependentCorpusCompilesTests.FullPath(relativePath));
        string transformed = CorpusTransformationTests.Transformations[transformation](text);
        var original = await AsWritten.GetOrAdd(relativePath, _ => AnalyzerRun.RunAsync(text));
        var result = await AnalyzerRun.RunAsync(transformed);
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        bool reindexed = transformation.StartsWith("reindexed", StringComparison.Ordinal);
        var expected = Rules(original, reindexed);
        var found = Rules(result, reindexed);
        Assert.True(expected.SetEquals(found), $"as written: {string.Join(" ", expected)}\n{AnalyzerRun.Describe(original.Fvc)}\n{transformation}: {string.Join(" ", found)}\n{AnalyzerRun.Describe(result.Fvc)}");
    }

    /// <summary>The verdict on each file as written, computed once for all its transformations.</summary>
    private static readonly System.Collections.Concurrent.ConcurrentDictionary<string, Task<AnalyzerRun.Result>> AsWritten = new(StringComparer.Ordinal);

    private static SortedSet<string> Rules(AnalyzerRun.Result result, bool reindexed) =>
        new(result.Fvc.Select(d => reindexed && d.Id == DiagnosticIds.OneSidedScatter ? DiagnosticIds.DroppedFaceTerm : d.Id), StringComparer.Ordinal);
}
