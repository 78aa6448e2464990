using FvGen.Generator.Diagnostics;
using FvGen.Generator.Tests.Support;

namespace FvGen.Generator.Tests.Diagnostics;

/// <summary>Every FVG diagnostic has a page under docs/rules, and every page a diagnostic.</summary>
public sealed class RulePageTests
{
    [Fact]
    public void EveryDiagnosticHasAPageAndEveryPageADiagnostic()
    {
        string folder = Path.Combine(RepositoryRoot(), "docs", "rules");
        var pages = Directory.GetFiles(folder, "FVG*.md").Select(Path.GetFileNameWithoutExtension).ToHashSet();
        var ids = Descriptors.All.Select(d => d.Id).ToHashSet();
        Assert.Empty(ids.Except(pages!));
        Assert.Empty(pages.Except(ids));
        foreach (var descriptor in Descriptors.All)
        {
            string page = File.ReadAllText(Path.Combine(folder, descriptor.Id + ".md"));
            Assert.StartsWith("# " + descriptor.Id + ": " + descriptor.Title, page);
            foreach (string section in new[] { "## What it detects", "## Non-compliant", "## Compliant", "## How to fix", "## Configure or suppress" })
            {
                Assert.Contains(section, page);
            }
        }
    }

    [Fact]
    public void DiagnosticIdsAreUniqueAndListedInTheReleaseTable()
    {
        var ids = Descriptors.All.Select(d => d.Id).ToList();
        Assert.Equal(ids.Count, ids.Distinct().Count());
        string releases = File.ReadAllText(Path.Combine(RepositoryRoot(), "generator", "FvGen.Generator", "AnalyzerReleases.Unshipped.md"));
        Assert.All(ids, id => Assert.Contains(id + " |", releases));
    }

    private static string RepositoryRoot() => RepositoryPaths.Root;
}
