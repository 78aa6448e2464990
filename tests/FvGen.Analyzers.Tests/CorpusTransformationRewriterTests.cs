using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests;

/// <summary>The rewriters behind <see cref="CorpusTransformationTests"/> change what they say and nothing else.</summary>
public sealed class CorpusTransformationRewriterTests
{
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
        Assert.True(commuted.Contains("s[i] = s[i] + s[i - 1];"), commuted);
        Assert.True(commuted.Contains("M = (b.M) + (a.M)"), commuted);
    }

    [Fact]
    public void RenamesParametersAndLocalsOnly()
    {
        var source = """
            struct S { public double Mass; }
            class C
            {
                void M(double[] alpha, S[] beta)
                {
                    for (int i = 0; i < alpha.Length; i++)
                        alpha[i] = beta[i].Mass;
                }
            }
            """;
        var renamed = ReversedNames.Apply(source);
        Assert.True(renamed.Contains("void M(double[] v003, S[] v002)"), renamed);
        Assert.True(renamed.Contains("for (int v001 = 0; v001 < v003.Length; v001++)"), renamed);
        Assert.True(renamed.Contains("v003[v001] = v002[v001].Mass;"), renamed);
    }

    [Fact]
    public void MovesElementWritesOnly()
    {
        var source = """
            class C
            {
                void M(double[] u, double[] r, double dx)
                {
                    double s = 0;
                    for (int i = 1; i < u.Length; i++)
                        r[i] -= (u[i] - u[i - 1]) / dx;
                    s = r[0];
                }
            }
            """;
        var extracted = ExtractedValues.Apply(source);
        Assert.True(extracted.Contains("var extracted1 = (u[i] - u[i - 1]) / dx;"), extracted);
        Assert.True(extracted.Contains("r[i] -= extracted1;"), extracted);
        Assert.True(extracted.Contains("s = r[0];"), extracted);
    }

    [Fact]
    public void ReversesCountedLoopsOnly()
    {
        var source = """
            class C
            {
                void M(double[] u, double[] r)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                        r[i] = u[i + 1] - u[i];
                    for (int j = 0; j < 4; j += 2)
                        r[j] = 0;
                }
            }
            """;
        var reversed = ReversedLoops.Apply(source);
        Assert.True(reversed.Contains("for (int i = (u.Length - 1) - 1; i >= (1); i--)"), reversed);
        Assert.True(reversed.Contains("r[i] = u[i + 1] - u[i];"), reversed);
        Assert.True(reversed.Contains("for (int j = 0; j < 4; j += 2)"), reversed);
    }

    [Fact]
    public void SplitsSumsThatDoNotReadTheirTarget()
    {
        var source = """
            class C
            {
                void M(double[] u, double[] r, double[] f, double dx)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        r[i] = (f[i + 1] - f[i]) / dx + u[i];
                        u[i] = u[i] - (u[i] - u[i - 1]);
                    }
                }
            }
            """;
        var split = SplitWrites.Apply(source);
        Assert.True(split.Contains("r[i] = (f[i + 1] - f[i]) / dx;"), split);
        Assert.True(split.Contains("r[i] += u[i];"), split);
        Assert.True(split.Contains("u[i] = u[i] - (u[i] - u[i - 1]);"), split);
    }
}
