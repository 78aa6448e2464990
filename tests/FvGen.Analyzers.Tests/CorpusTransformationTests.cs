using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests;

/// <summary>
/// The corpus rewritten in ways that keep what every kernel computes, or keep it up to where the
/// iteration space starts: no conservative kernel may be flagged, and every mutant keeps its rule.
/// <list type="bullet">
/// <item><b>reindexed</b> (<see cref="IterationShift"/>): every loop variable <c>i</c> in a loop body
/// read as <c>(i + 9)</c> or <c>(i + -10)</c>. Conservation does not depend on where the iteration
/// space starts. The offsets make the subscripts cross a change in the number of digits (<c>i + 8</c>,
/// <c>i + 9</c>, <c>i + 10</c>): the engine's keys hold offsets as text, and a normal form that followed
/// the text order instead of the offsets' own order would show here.</item>
/// <item><b>commuted</b> (<see cref="CommutedOperands"/>): every sum and product of numbers written
/// the other way round, subscripts included.</item>
/// <item><b>renamed</b> (<see cref="ReversedNames"/>): parameters and locals renamed so that their
/// names sort the other way round.</item>
/// <item><b>extracted</b> (<see cref="ExtractedValues"/>): the value of every element write moved
/// into a local first.</item>
/// <item><b>reversed</b> (<see cref="ReversedLoops"/>): every counted loop run from its last
/// iteration to its first.</item>
/// <item><b>split</b> (<see cref="SplitWrites"/>): every element write of a sum or difference made
/// as two writes, <c>r[i] = a; r[i] -= b;</c>.</item>
/// </list>
/// </summary>
/// <remarks>
/// Re-indexing changes two readings, and the test allows for them. A loop whose one write with a lone
/// face term goes to a neighbour of the loop's index (<c>r[i - 1]</c>) is read as the kept half of a
/// face loop (FVC0004); one whose write goes to its own index or further off (<c>r[i + ng]</c> in an
/// array with ghost cells) is read as a cell's update missing a face term (FVC0001). The same code
/// (<c>r[c] = -F[c + 1] / dx</c>) is both, and re-indexing moves a write from one reading to the other,
/// so there the two rules count as one. A cell's gather over its face list is recognised only when the
/// list is that of the loop's own cell (<c>offsets[c]</c>) and runs forward
/// (<c>for (n = offsets[c]; n &lt; offsets[c + 1]; n++)</c>); re-indexed or reversed it is not analyzed
/// (FVC0100), which is no verdict either way.
/// </remarks>
public sealed class CorpusTransformationTests
{
    internal static readonly Dictionary<string, Func<string, string>> Transformations = new(StringComparer.Ordinal)
    {
        ["reindexed by 9"] = source => IterationShift.Apply(source, 9),
        ["reindexed by -10"] = source => IterationShift.Apply(source, -10),
        ["commuted"] = CommutedOperands.Apply,
        ["renamed"] = ReversedNames.Apply,
        ["extracted"] = ExtractedValues.Apply,
        ["reversed"] = ReversedLoops.Apply,
        ["split"] = SplitWrites.Apply,
    };

    /// <summary>Corpus kernels that gather a cell's faces from its face list (see the remarks).</summary>
    private static readonly HashSet<string> Gathers = new(StringComparer.Ordinal) { "UnstructuredCellGather" };

    /// <summary>A gather re-indexed or run backwards over its face list is not recognised (see the remarks).</summary>
    private static bool GatherNotRecognised(string transformation, string kernel) =>
        Gathers.Contains(kernel) && (transformation.StartsWith("reindexed", StringComparison.Ordinal) || transformation == "reversed");

    public static TheoryData<string, string> Kernels()
    {
        var data = new TheoryData<string, string>();
        foreach (var (name, transform) in Transformations)
        {
            foreach (var kernel in CorpusKernel.All.Where(k => transform(k.Source) != k.Source))
            {
                data.Add(name, kernel.Name);
            }
        }

        return data;
    }

    public static TheoryData<string, string, string> Mutants()
    {
        // One re-indexing offset is enough for the mutants.
        var data = new TheoryData<string, string, string>();
        foreach (var (name, transform) in Transformations.Where(t => t.Key != "reindexed by -10"))
        {
            foreach (var m in CorpusKernel.All.Where(k => transform(k.Source) != k.Source).SelectMany(k => k.Mutants))
            {
                data.Add(name, m.Kernel, m.Label);
            }
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Kernels))]
    public async Task ConservativeKernelIsNotFlagged(string transformation, string kernel)
    {
        var source = Transformations[transformation](CorpusKernel.All.Single(x => x.Name == kernel).Source);
        var result = await AnalyzerRun.RunAsync(source);
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors) + "\n" + source);
        var wrong = GatherNotRecognised(transformation, kernel) ? result.Fvc.Where(d => d.Id != DiagnosticIds.NotAnalyzed) : result.Fvc;
        Assert.True(!wrong.Any(), AnalyzerRun.Describe(result.Fvc) + "\n" + source);
    }

    [Theory]
    [MemberData(nameof(Mutants))]
    public async Task MutantKeepsItsRule(string transformation, string kernel, string label)
    {
        var k = CorpusKernel.All.Single(x => x.Name == kernel);
        var mutant = k.Mutants.Single(m => m.Label == label);
        var result = await AnalyzerRun.RunAsync(Transformations[transformation](k.Apply(mutant)));
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        var accepted = new HashSet<string>(StringComparer.Ordinal) { mutant.RuleId };
        if (transformation.StartsWith("reindexed", StringComparison.Ordinal))
        {
            // A lone face term written to a neighbour of the loop's index, or further off (see the remarks).
            if (mutant.RuleId is DiagnosticIds.DroppedFaceTerm or DiagnosticIds.OneSidedScatter)
            {
                accepted.Add(DiagnosticIds.DroppedFaceTerm);
                accepted.Add(DiagnosticIds.OneSidedScatter);
            }

        }

        if (GatherNotRecognised(transformation, kernel))
        {
            accepted.Add(DiagnosticIds.NotAnalyzed);
        }

        Assert.True(result.Fvc.Any(d => accepted.Contains(d.Id)), $"expected {string.Join(" or ", accepted)}, got:\n" + AnalyzerRun.Describe(result.Fvc));
    }
}
