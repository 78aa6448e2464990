using System.Reflection;
using FvGen.Analyzers.Rules;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Tests;

/// <summary>Every rule has a page under docs/rules, every page a rule, and the help link points at it.</summary>
public sealed class RuleDocumentationTests
{
    private static readonly string RulesDirectory = Path.Combine(RepositoryRoot(), "docs", "rules");

    private static IReadOnlyList<Microsoft.CodeAnalysis.DiagnosticDescriptor> Descriptors() =>
        typeof(ConservationAnalyzer).Assembly.GetTypes()
            .Where(t => !t.IsAbstract && typeof(DiagnosticAnalyzer).IsAssignableFrom(t) && t.GetCustomAttribute<DiagnosticAnalyzerAttribute>() is not null)
            .SelectMany(t => ((DiagnosticAnalyzer)Activator.CreateInstance(t)!).SupportedDiagnostics)
            .ToList();

    [Fact]
    public void EveryRuleHasAPageAndEveryPageARule()
    {
        var ids = Descriptors().Select(d => d.Id).ToHashSet();
        // docs/rules also holds the generator's FVG pages; these tests own the analyzers' FVC pages.
        var pages = Directory.GetFiles(RulesDirectory, "FVC*.md").Select(Path.GetFileNameWithoutExtension).ToHashSet();
        Assert.Equal(ids.OrderBy(x => x), pages.OrderBy(x => x)!);
    }

    [Fact]
    public void IdsAreTheContractedOnes() =>
        Assert.Equal(
            ["FVC0001", "FVC0002", "FVC0003", "FVC0004", "FVC0005", "FVC0006", "FVC0100"],
            Descriptors().Select(d => d.Id).OrderBy(x => x));

    [Fact]
    public void HelpLinksPointAtTheRulePage() =>
        Assert.All(Descriptors(), d => Assert.EndsWith("docs/rules/" + d.Id + ".md", d.HelpLinkUri));

    [Fact]
    public void PagesHaveTheRequiredSections()
    {
        foreach (var page in Directory.GetFiles(RulesDirectory, "FVC*.md"))
        {
            string text = File.ReadAllText(page);
            string id = Path.GetFileNameWithoutExtension(page);
            Assert.StartsWith("# " + id + ": ", text);
            foreach (var section in new[] { "## What it detects", "## Non-compliant", "## Compliant", "## How to fix", "## Configure or suppress" })
            {
                Assert.True(text.Contains(section), $"{id}.md lacks '{section}'");
            }
        }
    }

    [Fact]
    public void TitlesAndMessagesComeFromResources() =>
        Assert.All(Descriptors(), d =>
        {
            Assert.False(string.IsNullOrWhiteSpace(d.Title.ToString()));
            Assert.False(string.IsNullOrWhiteSpace(d.MessageFormat.ToString()));
            Assert.False(string.IsNullOrWhiteSpace(d.Description.ToString()));
            Assert.Equal(d.Title.ToString(), File.ReadAllLines(Path.Combine(RulesDirectory, d.Id + ".md"))[0][(d.Id.Length + 4)..], ignoreCase: true);
        });

    [Fact]
    public void ReleaseTrackingListsEveryRule()
    {
        string unshipped = File.ReadAllText(Path.Combine(RepositoryRoot(), "analyzers", "FvGen.Analyzers", "AnalyzerReleases.Unshipped.md"));
        Assert.All(Descriptors(), d => Assert.Contains(d.Id + " | Conservation | " + d.DefaultSeverity, unshipped));
    }

    private static string RepositoryRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "FvGen.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException("FvGen.sln not found above the test directory.");
    }
}
