using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests;

/// <summary>
/// Holds the conservation rules to the independent corpus (IndependentCorpus/README.md): kernels
/// and mutants written apart from the analyzers. A file that expects <c>none</c> must get no FVC
/// diagnostic at all; any other file must get every rule its header names.
/// Files listed in <c>IndependentCorpus/known-gaps.txt</c> are known failures: the test accepts
/// exactly those, and fails when a listed file starts to pass, so the list can only shrink.
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
        string? failure = Failure(relativePath, header, result);
        bool known = KnownGaps.Entries.ContainsKey(relativePath);
        if (known)
        {
            Assert.True(failure is not null, $"{relativePath} now matches its header: remove its line from IndependentCorpus/known-gaps.txt");
        }
        else
        {
            Assert.True(failure is null, failure);
        }
    }

    [Fact]
    public void EveryKnownGapNamesACorpusFileAndAReason()
    {
        var files = ((IEnumerable<object[]>)IndependentCorpusCompilesTests.CorpusFiles()).Select(row => (string)row[0]).ToHashSet(StringComparer.Ordinal);
        Assert.All(KnownGaps.Entries, entry =>
        {
            Assert.True(files.Contains(entry.Key), $"known-gaps.txt names {entry.Key}, which is not a corpus file");
            Assert.False(string.IsNullOrWhiteSpace(entry.Value), $"known-gaps.txt gives no reason for {entry.Key}");
        });
    }

    private static string? Failure(string relativePath, IndependentCorpusCompilesTests.CorpusHeader header, AnalyzerRun.Result result)
    {
        var found = result.Fvc.Select(d => d.Id).Distinct().Order(StringComparer.Ordinal).ToList();
        if (header.ExpectsNone)
        {
            return found.Count == 0 ? null : $"{relativePath} conserves but was flagged:\n{AnalyzerRun.Describe(result.Fvc)}";
        }

        var missing = header.RuleIds.Except(found).ToList();
        if (missing.Count > 0)
        {
            return $"{relativePath} expects {string.Join(" ", header.RuleIds)}; missing {string.Join(" ", missing)}; got:\n{AnalyzerRun.Describe(result.Fvc)}";
        }

        // "Not analysed" alone means the checker must not also guess a warning (README, "File format").
        bool notAnalysedOnly = header.RuleIds.Length == 1 && header.RuleIds[0] == "FVC0100";
        return notAnalysedOnly && found.Count > 1
            ? $"{relativePath} expects FVC0100 alone but the checker also guessed a warning:\n{AnalyzerRun.Describe(result.Fvc)}"
            : null;
    }

    /// <summary>The ratchet file: <c>Family/File.cs — reason</c> per line, <c>#</c> comments.</summary>
    private static class KnownGaps
    {
        public static readonly IReadOnlyDictionary<string, string> Entries = Load();

        private static Dictionary<string, string> Load()
        {
            var entries = new Dictionary<string, string>(StringComparer.Ordinal);
            string path = Path.Combine(AppContext.BaseDirectory, "IndependentCorpus", "known-gaps.txt");
            foreach (string raw in File.ReadAllLines(path))
            {
                string line = raw.Trim();
                if (line.Length == 0 || line.StartsWith('#'))
                {
                    continue;
                }

                int dash = line.IndexOf(" — ", StringComparison.Ordinal);
                Assert.True(dash > 0, $"known-gaps.txt: `{line}` is not `Family/File.cs — reason`");
                string file = line[..dash].Trim();
                Assert.True(entries.TryAdd(file, line[(dash + 3)..].Trim()), $"known-gaps.txt lists {file} twice");
            }

            return entries;
        }
    }
}
