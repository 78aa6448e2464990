using FvGen.Analyzers.Tests.Verifiers;
using System.Collections.Immutable;
using System.Text.RegularExpressions;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.Tests;

/// <summary>
/// Keeps the conservation corpus (IndependentCorpus/README.md) honest before any analyzer is held to it:
/// every kernel compiles on its own against the BCL and the FvGen runtime, carries a valid
/// expectation header, and every conservative original comes with its mutants.
/// </summary>
public sealed partial class IndependentCorpusCompilesTests
{
    /// <summary>The rule IDs of the analyzers issue (FVC0001–FVC0006, FVC0100).</summary>
    private static readonly ImmutableHashSet<string> KnownRuleIds = ImmutableHashSet.Create(
        "FVC0001", "FVC0002", "FVC0003", "FVC0004", "FVC0005", "FVC0006", "FVC0100");

    private static readonly string CorpusRoot = Path.Combine(AppContext.BaseDirectory, "IndependentCorpus");

    public static TheoryData<string> CorpusFiles()
    {
        var data = new TheoryData<string>();
        foreach (string path in AllCorpusFiles())
        {
            data.Add(Path.GetRelativePath(CorpusRoot, path).Replace('\\', '/'));
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(CorpusFiles))]
    public void CorpusKernelCompilesWithoutErrorsOrWarnings(string relativePath)
    {
        string text = File.ReadAllText(FullPath(relativePath));
        var tree = CSharpSyntaxTree.ParseText(
            text,
            new CSharpParseOptions(LanguageVersion.Latest),
            path: relativePath);
        var compilation = CSharpCompilation.Create(
            "Corpus_" + Path.GetFileNameWithoutExtension(relativePath).Replace('.', '_').Replace('-', '_'),
            [tree],
            TestReferences.All,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, nullableContextOptions: NullableContextOptions.Enable));

        var problems = compilation.GetDiagnostics()
            .Where(d => d.Severity >= DiagnosticSeverity.Warning)
            .Select(d => d.ToString())
            .ToList();

        Assert.True(problems.Count == 0, $"{relativePath} does not compile cleanly:\n{string.Join('\n', problems)}");
    }

    [Theory]
    [MemberData(nameof(CorpusFiles))]
    public void CorpusKernelHasExpectationHeaderNamespaceAndMarkedMethod(string relativePath)
    {
        string text = File.ReadAllText(FullPath(relativePath));
        var header = CorpusHeader.Parse(relativePath, text);
        Assert.True(header.Error is null, header.Error);

        var root = CSharpSyntaxTree.ParseText(text).GetCompilationUnitRoot();
        string family = relativePath.Split('/')[0];
        var fileNamespace = root.Members.OfType<FileScopedNamespaceDeclarationSyntax>().SingleOrDefault();
        Assert.True(
            fileNamespace is not null && fileNamespace.Name.ToString() == "Corpus." + family,
            $"{relativePath}: expected a file-scoped 'namespace Corpus.{family};'.");

        bool hasMarkedMethod = root.DescendantNodes()
            .OfType<MethodDeclarationSyntax>()
            .Any(m => m.AttributeLists.SelectMany(l => l.Attributes).Any(a => IsConservativeUpdate(a.Name.ToString())));
        Assert.True(hasMarkedMethod, $"{relativePath}: no method carries [FvGen.ConservativeUpdate].");
    }

    [Fact]
    public void EveryOriginalHasTwoMutantsAndEveryVariantHasItsOriginal()
    {
        var files = AllCorpusFiles()
            .Select(p => Path.GetRelativePath(CorpusRoot, p).Replace('\\', '/'))
            .ToList();
        var problems = new List<string>();
        var names = files.Select(CorpusName.Parse).ToList();
        var originals = names.Where(n => n.Mutation is null).Select(n => n.Kernel).ToHashSet(StringComparer.Ordinal);

        foreach (var name in names)
        {
            if (name.Error is not null)
            {
                problems.Add(name.Error);
            }
            else if (name.Mutation is not null && !originals.Contains(name.Kernel))
            {
                problems.Add($"{name.RelativePath}: variant without its original {name.Kernel}.cs");
            }
        }

        foreach (string original in originals)
        {
            var header = CorpusHeader.Parse(original + ".cs", File.ReadAllText(FullPath(original + ".cs")));
            if (header.Error is null && !header.ExpectsNone)
            {
                problems.Add($"{original}.cs: an original must be conservative ('// expect: none').");
            }

            int mutants = names
                .Where(n => n.Mutation is not null && n.Kernel == original)
                .Select(n => CorpusHeader.Parse(n.RelativePath, File.ReadAllText(FullPath(n.RelativePath))))
                .Count(h => h.Error is null && h.RuleIds.Any(id => id != "FVC0100"));
            if (mutants < 2)
            {
                problems.Add($"{original}.cs has {mutants} mutant(s) expecting an FVC000x warning; at least 2 are required.");
            }
        }

        Assert.True(problems.Count == 0, string.Join('\n', problems));
    }

    [Fact]
    public void CorpusHoldsAtLeastSixtyConservativeKernels()
    {
        int originals = AllCorpusFiles().Count(p => CorpusName.Parse(Path.GetRelativePath(CorpusRoot, p)).Mutation is null);
        Assert.True(originals >= 60, $"the corpus holds {originals} conservative originals; the analyzers issue asks for at least 60.");
    }

    [Theory]
    [InlineData("// expect: none\n// why: fine.\n", true)]
    [InlineData("// expect: FVC0001 FVC0002\n// why: two rules.\n", true)]
    [InlineData("// expect: FVC0100\n// why: not analysable.\n", true)]
    [InlineData("// expect: FVC0007\n// why: unknown rule.\n", false)]
    [InlineData("// expect: none FVC0001\n// why: contradictory.\n", false)]
    [InlineData("// expect: FVC0001 FVC0001\n// why: repeated.\n", false)]
    [InlineData("// expect:\n// why: empty.\n", false)]
    [InlineData("// expect: FVC0001\n// because: wrong second line.\n", false)]
    [InlineData("// expect: FVC0001\n// why:\n", false)]
    [InlineData("namespace Corpus.X;\n", false)]
    public void HeaderParserAcceptsOnlyWellFormedHeaders(string text, bool valid)
    {
        var header = CorpusHeader.Parse("Sample.cs", text);
        Assert.Equal(valid, header.Error is null);
    }

    [Theory]
    [InlineData("Advection1D/Upwind.cs", "Advection1D/Upwind", null, true)]
    [InlineData("Advection1D/Upwind.flipped-sign.cs", "Advection1D/Upwind", "flipped-sign", true)]
    [InlineData("Advection1D/Upwind.Flipped_Sign.cs", null, null, false)]
    [InlineData("Advection1D/Upwind.a.b.cs", null, null, false)]
    [InlineData("Upwind.cs", null, null, false)]
    public void FileNameParserAcceptsOnlyKernelDotKebabMutation(string relativePath, string? kernel, string? mutation, bool valid)
    {
        var name = CorpusName.Parse(relativePath);
        Assert.Equal(valid, name.Error is null);
        if (valid)
        {
            Assert.Equal(kernel, name.Kernel);
            Assert.Equal(mutation, name.Mutation);
        }
    }

    private static bool IsConservativeUpdate(string attributeName) =>
        attributeName is "ConservativeUpdate" or "ConservativeUpdateAttribute"
            or "FvGen.ConservativeUpdate" or "FvGen.ConservativeUpdateAttribute"
            or "global::FvGen.ConservativeUpdate" or "global::FvGen.ConservativeUpdateAttribute";

    internal static string FullPath(string relativePath) => Path.Combine(CorpusRoot, relativePath);

    internal static IEnumerable<string> AllCorpusFiles()
    {
        if (!Directory.Exists(CorpusRoot))
        {
            throw new DirectoryNotFoundException($"No corpus at {CorpusRoot}; the test project must copy IndependentCorpus/**/*.cs to its output.");
        }

        return Directory.EnumerateFiles(CorpusRoot, "*.cs", SearchOption.AllDirectories).Order(StringComparer.Ordinal);
    }

    /// <summary>The two header lines of a corpus file: <c>// expect: …</c> and <c>// why: …</c>.</summary>
    internal sealed record CorpusHeader(ImmutableArray<string> RuleIds, bool ExpectsNone, string? Error)
    {
        public static CorpusHeader Parse(string relativePath, string text)
        {
            string[] lines = text.Replace("\r\n", "\n").Split('\n');
            CorpusHeader Fail(string why) => new([], false, $"{relativePath}: {why}");

            if (lines.Length < 2)
            {
                return Fail("expected two header lines, '// expect: …' and '// why: …'.");
            }

            var expect = ExpectLine().Match(lines[0]);
            if (!expect.Success)
            {
                return Fail($"first line must be '// expect: none' or '// expect: FVC000N …', found '{lines[0]}'.");
            }

            if (!WhyLine().IsMatch(lines[1]))
            {
                return Fail($"second line must be '// why: <one sentence>', found '{lines[1]}'.");
            }

            string[] tokens = expect.Groups["ids"].Value.Split(' ', StringSplitOptions.RemoveEmptyEntries);
            if (tokens is ["none"])
            {
                return new([], true, null);
            }

            var unknown = tokens.Where(t => !KnownRuleIds.Contains(t)).ToList();
            if (unknown.Count > 0)
            {
                return Fail($"unknown rule ID(s) {string.Join(", ", unknown)} in the expect line; known: none, {string.Join(", ", KnownRuleIds.Order())}.");
            }

            if (tokens.Distinct().Count() != tokens.Length)
            {
                return Fail("a rule ID is repeated in the expect line.");
            }

            return new([.. tokens], false, null);
        }
    }

    /// <summary>A corpus path split into family/kernel and the optional kebab-case mutation.</summary>
    internal sealed record CorpusName(string RelativePath, string Kernel, string? Mutation, string? Error)
    {
        public static CorpusName Parse(string relativePath)
        {
            string path = relativePath.Replace('\\', '/');
            var match = FileName().Match(path);
            return match.Success
                ? new(path, match.Groups["family"].Value + "/" + match.Groups["kernel"].Value, match.Groups["mutation"].Success ? match.Groups["mutation"].Value : null, null)
                : new(path, path, null, $"{path}: expected '<Family>/<Kernel>.cs' or '<Family>/<Kernel>.<kebab-case-mutation>.cs'.");
        }
    }

    [GeneratedRegex(@"^// expect: (?<ids>\S+( \S+)*)\s*$")]
    private static partial Regex ExpectLine();

    [GeneratedRegex(@"^// why: \S.*$")]
    private static partial Regex WhyLine();

    [GeneratedRegex(@"^(?<family>[A-Z][A-Za-z0-9]*)/(?<kernel>[A-Z][A-Za-z0-9]*)(\.(?<mutation>[a-z0-9]+(-[a-z0-9]+)*))?\.cs$")]
    private static partial Regex FileName();
}
