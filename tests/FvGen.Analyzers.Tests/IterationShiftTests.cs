using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests;

/// <summary>
/// The corpus re-indexed (<see cref="IterationShift"/>): every loop variable <c>i</c> in a loop body
/// read as <c>(i + k)</c>. Conservation does not depend on where the iteration space starts, so no
/// conservative kernel may be flagged and every mutant keeps its rule. The offsets are chosen so that
/// the subscripts cross a change in the number of digits (<c>i + 8</c>, <c>i + 9</c>, <c>i + 10</c>;
/// <c>i - 11</c>, <c>i - 10</c>, <c>i - 9</c>): the engine's keys hold offsets as text, and a normal
/// form that followed the text order instead of the offsets' own order would show here.
/// </summary>
/// <remarks>
/// Two readings change with the offset, and the test allows for them. A loop whose one write goes to
/// <c>r[i + 9]</c> rather than to the loop's own cell, with a lone face term, is read as the kept half
/// of a face loop: a dropped face term there is reported as a one-sided scatter (FVC0004) instead of
/// FVC0001, since the same code (<c>r[c] = -F[c + 1] / dx</c>) is both, and the checker takes the loop
/// variable as what the loop runs over. A cell's gather over its face list is recognised only when
/// the list is that of the loop's own cell (<c>offsets[c]</c>); re-indexed it is not analyzed
/// (FVC0100), which is no verdict either way.
/// </remarks>
public sealed class IterationShiftTests
{
    public static TheoryData<string, int> Kernels()
    {
        var data = new TheoryData<string, int>();
        foreach (var kernel in CorpusKernel.All.Where(IsReindexed))
        {
            data.Add(kernel.Name, 9);
            data.Add(kernel.Name, -10);
        }

        return data;
    }

    public static TheoryData<string, string> Mutants()
    {
        var data = new TheoryData<string, string>();
        foreach (var m in CorpusKernel.All.Where(IsReindexed).SelectMany(k => k.Mutants))
        {
            data.Add(m.Kernel, m.Label);
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Kernels))]
    public async Task ReindexedConservativeKernelIsNotFlagged(string kernel, int k)
    {
        var original = CorpusKernel.All.Single(x => x.Name == kernel).Source;
        var shifted = IterationShift.Apply(original, k);
        var result = await AnalyzerRun.RunAsync(shifted);
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        var allowed = Gathers.Contains(kernel) ? result.Fvc.Where(d => d.Id != DiagnosticIds.NotAnalyzed) : result.Fvc;
        Assert.True(!allowed.Any(), AnalyzerRun.Describe(result.Fvc) + "\n" + shifted);
    }

    [Theory]
    [MemberData(nameof(Mutants))]
    public async Task ReindexedMutantKeepsItsRule(string kernel, string label)
    {
        var k = CorpusKernel.All.Single(x => x.Name == kernel);
        var mutant = k.Mutants.Single(m => m.Label == label);
        var result = await AnalyzerRun.RunAsync(IterationShift.Apply(k.Apply(mutant), 9));
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        var accepted = new HashSet<string> { mutant.RuleId };
        if (mutant.RuleId is DiagnosticIds.DroppedFaceTerm)
        {
            accepted.Add(DiagnosticIds.OneSidedScatter);
        }

        if (Gathers.Contains(kernel))
        {
            accepted.Add(DiagnosticIds.NotAnalyzed);
        }

        Assert.True(result.Fvc.Any(d => accepted.Contains(d.Id)), $"expected {string.Join(" or ", accepted)}, got:\n" + AnalyzerRun.Describe(result.Fvc));
    }

    /// <summary>Corpus kernels that gather a cell's faces from its face list (see the remarks).</summary>
    private static readonly HashSet<string> Gathers = new(StringComparer.Ordinal) { "UnstructuredCellGather" };

    /// <summary>Kernels with a loop to re-index (not those over index lists only).</summary>
    private static bool IsReindexed(CorpusKernel kernel) => IterationShift.Apply(kernel.Source, 9) != kernel.Source;

    [Fact]
    public void ReindexingMovesBodiesAndKeepsHeaders()
    {
        var source = """
            class C
            {
                void M(double[] u, double[] r)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                        r[i] = u[i + 1] - u[i];
                    System.Threading.Tasks.Parallel.For(0, r.Length, j => { r[j] += u[j]; });
                    foreach (int c in new[] { 1, 2 }) r[c] = 0;
                }
            }
            """;
        var shifted = IterationShift.Apply(source, 9);
        Assert.Contains("for (int i = 1; i < u.Length - 1; i++)", shifted);
        Assert.True(shifted.Contains("r[(i + 9)] = u[(i + 9) + 1] - u[(i + 9)];"), shifted);
        Assert.Contains("Parallel.For(0, r.Length, j => { r[(j + 9)] += u[(j + 9)]; });", shifted);
        Assert.Contains("foreach (int c in new[] { 1, 2 }) r[c] = 0;", shifted);
    }
}
