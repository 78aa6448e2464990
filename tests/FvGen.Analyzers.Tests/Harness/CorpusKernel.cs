using System.Text.RegularExpressions;

namespace FvGen.Analyzers.Tests.Harness;

/// <summary>
/// One corpus kernel: a conservative source and its mutants. A mutant is declared in the source as
/// <c>// mutant: FVC0001 dropped-term: `from` -> `to`</c>; the text <c>from</c> must occur exactly
/// once and is replaced by <c>to</c>.
/// </summary>
internal sealed partial class CorpusKernel
{
    private CorpusKernel(string name, string source, IReadOnlyList<Mutant> mutants)
    {
        Name = name;
        Source = source;
        Mutants = mutants;
    }

    public string Name { get; }

    public string Source { get; }

    public IReadOnlyList<Mutant> Mutants { get; }

    public sealed record Mutant(string Kernel, string RuleId, string Label, string From, string To)
    {
        public override string ToString() => Kernel + "/" + Label;
    }

    public static string Directory => Path.Combine(AppContext.BaseDirectory, "Corpus");

    public static IReadOnlyList<CorpusKernel> All { get; } = Load();

    private static IReadOnlyList<CorpusKernel> Load() =>
        System.IO.Directory.GetFiles(Directory, "*.cs", SearchOption.AllDirectories)
            .OrderBy(f => f, StringComparer.Ordinal)
            .Select(f =>
            {
                string name = Path.GetFileNameWithoutExtension(f);
                string text = File.ReadAllText(f);
                var mutants = MutantLine().Matches(text)
                    .Select(m => new Mutant(name, m.Groups["id"].Value, m.Groups["label"].Value, m.Groups["from"].Value, m.Groups["to"].Value))
                    .ToList();
                return new CorpusKernel(name, text, mutants);
            })
            .ToList();

    public string Apply(Mutant mutant)
    {
        // The declaration lines themselves hold the text; mutate only the code below them.
        int codeStart = Source.IndexOf("\nusing ", StringComparison.Ordinal);
        string header = Source[..codeStart];
        string code = Source[codeStart..];
        int first = code.IndexOf(mutant.From, StringComparison.Ordinal);
        if (first < 0 || code.IndexOf(mutant.From, first + 1, StringComparison.Ordinal) >= 0)
        {
            throw new InvalidOperationException($"{Name}: mutant '{mutant.Label}' text `{mutant.From}` must occur exactly once in the code.");
        }

        return header + code[..first] + mutant.To + code[(first + mutant.From.Length)..];
    }

    [GeneratedRegex(@"^// mutant: (?<id>FVC\d{4}) (?<label>[\w-]+): `(?<from>.*)` -> `(?<to>.*)`\s*$", RegexOptions.Multiline)]
    private static partial Regex MutantLine();
}
