using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests;

/// <summary>
/// The corpus with every sum and product of numbers written the other way round
/// (<see cref="CommutedOperands"/>): no conservative kernel may be flagged, and every mutant keeps
/// its rule. The canonical forms of the engine (terms, indices, coefficients) must not depend on the
/// order an engineer happened to write the operands in.
/// </summary>
public sealed class CommutedOperandsTests
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
    public async Task CommutedConservativeKernelIsNotFlagged(string kernel)
    {
        var commuted = CommutedOperands.Apply(CorpusKernel.All.Single(x => x.Name == kernel).Source);
        var result = await AnalyzerRun.RunAsync(commuted);
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        Assert.True(!result.Fvc.Any(), AnalyzerRun.Describe(result.Fvc) + "\n" + commuted);
    }

    [Theory]
    [MemberData(nameof(Mutants))]
    public async Task CommutedMutantKeepsItsRule(string kernel, string label)
    {
        var k = CorpusKernel.All.Single(x => x.Name == kernel);
        var mutant = k.Mutants.Single(m => m.Label == label);
        var result = await AnalyzerRun.RunAsync(CommutedOperands.Apply(k.Apply(mutant)));
        Assert.Empty(result.Exceptions);
        Assert.True(!result.CompilerErrors.Any(), AnalyzerRun.Describe(result.CompilerErrors));
        Assert.True(result.Fvc.Any(d => d.Id == mutant.RuleId), $"expected {mutant.RuleId}, got:\n" + AnalyzerRun.Describe(result.Fvc));
    }

    [Fact]
    public void CommutesSumsAndProductsOfNumbersOnly()
    {
        var source = """
            struct S { public double M; public static S operator +(S a, S b) => new S { M = a.M + b.M }; }
            class C
            {
                void M(double[] u, double[] r, S[] s, double dx)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        r[i] = (u[i + 1] - u[i]) * dx;
                        s[i] = s[i] + s[i - 1];
                    }
                }
            }
            """;
        var commuted = CommutedOperands.Apply(source);
        Assert.True(commuted.Contains("r[i] = (dx) * ((u[(1) + (i)] - u[i]));"), commuted);
        Assert.True(commuted.Contains("s[i] = s[i] + s[(1) + (i)]") is false && commuted.Contains("s[i] = s[i] + s[i - 1];"), commuted);
        Assert.True(commuted.Contains("M = (b.M) + (a.M)"), commuted);
    }
}
