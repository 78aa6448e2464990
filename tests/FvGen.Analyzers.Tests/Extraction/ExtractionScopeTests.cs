using FvGen.Analyzers.Tests.Harness;

namespace FvGen.Analyzers.Tests.Extraction;

/// <summary>
/// Loop and data forms the extraction must read: each kernel is conservative and must come out with no
/// diagnostic at all, and its broken twin with the rule named (so the form was really read, not skipped).
/// </summary>
public sealed class ExtractionScopeTests
{
    private const string Head = "using System;\nusing System.Linq;\nusing System.Threading.Tasks;\nusing FvGen;\n";

    public static TheoryData<string, string, string, string> Cases() => new()
    {
        {
            "step written as i = i + 1",
            "static class K { [ConservativeUpdate] static void M(double[] f, double[] r) { for (int i = 0; i < r.Length; i = i + 1) r[i] = f[i + 1] - f[i]; } }",
            "f[i + 1] - f[i]", "f[i + 1] + f[i]"
        },
        {
            "stride-two loop over even cells",
            "static class K { [ConservativeUpdate] static void M(double[] f, double[] r) { for (int i = 0; i < r.Length; i += 2) r[i] = f[i + 2] - f[i]; } }",
            "f[i + 2] - f[i]", "f[i + 1] - f[i]"
        },
        {
            "foreach over Enumerable.Range is a lattice",
            "static class K { [ConservativeUpdate] static void M(double[] f, double[] r) { foreach (int i in Enumerable.Range(0, r.Length)) r[i] = f[i + 1] - f[i]; } }",
            "f[i + 1] - f[i]", "f[i + 1]"
        },
        {
            "Parallel.For with a loop state",
            "static class K { [ConservativeUpdate] static void M(double[] f, double[] r) { Parallel.For(0, r.Length, (i, state) => { r[i] = f[i + 1] - f[i]; }); } }",
            "f[i + 1] - f[i]", "f[i + 1] - 2 * f[i]"
        },
        {
            "time loop around the kernel, arrays swapped each step",
            "static class K { [ConservativeUpdate] static void M(double[] a, double[] b, [FaceData] double[] f, int steps) { int n = 0; while (n < steps) { for (int i = 0; i < a.Length; i++) b[i] = a[i] - (f[i + 1] - f[i]); (a, b) = (b, a); n++; } } }",
            "(f[i + 1] - f[i])", "(f[i + 1] - f[i - 1] / 2)"
        },
        {
            "accumulate, then divide by the cell volume in the same loop",
            "static class K { [ConservativeUpdate] static void M(double[] f, double[] vol, double[] r) { for (int i = 0; i < r.Length; i++) { r[i] = 0; r[i] -= f[i + 1]; r[i] += f[i]; r[i] /= vol[i]; } } }",
            "r[i] += f[i];", "r[i] += f[i] / vol[i];"
        },
        {
            "index map held in a local span",
            "static class K { static double H(double a, double b) => a - b; [ConservativeUpdate] static void M(int[] owner, int[] other, double[] u, double[] res) { ReadOnlySpan<int> l = owner, r = other; for (int f = 0; f < l.Length; f++) { double h = H(u[l[f]], u[r[f]]); res[l[f]] -= h; res[r[f]] += h; } } }",
            "res[r[f]] += h;", "res[r[f]] += h * h;"
        },
        {
            "a reduction loop (largest wave speed) before the update is not an update",
            "static class K { [ConservativeUpdate] static void M(double[] u, double[] un, double cfl, double dx) { double smax = 0; for (int i = 0; i < u.Length; i++) smax = Math.Max(smax, Math.Abs(u[i])); double dt = cfl * dx / smax; for (int i = 1; i < u.Length - 1; i++) un[i] = u[i] - dt / dx * (0.5 * u[i + 1] * u[i + 1] - 0.5 * u[i] * u[i]); } }",
            "(0.5 * u[i + 1] * u[i + 1] - 0.5 * u[i] * u[i])", "(0.5 * u[i + 1] * u[i + 1] - 0.5 * u[i] * u[i - 1])"
        },
        {
            "limiter through Math.Min and Math.Max in mixed order",
            "static class K { [ConservativeUpdate] static void M(double[] u, double[] r) { for (int i = 2; i < u.Length - 2; i++) { double hi = Math.Max(0, Math.Min(u[i + 1] - u[i], u[i] - u[i - 1])); double lo = Math.Max(Math.Min(u[i - 1] - u[i - 2], u[i] - u[i - 1]), 0); r[i] = -(hi - lo); } } }",
            "double lo = Math.Max(Math.Min(u[i - 1] - u[i - 2], u[i] - u[i - 1]), 0);", "double lo = Math.Max(Math.Min(u[i - 1] - u[i - 2], u[i + 1] - u[i - 1]), 0);"
        },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public async Task FormIsReadBothWays(string form, string kernel, string from, string to)
    {
        var good = await AnalyzerRun.RunAsync(Head + kernel);
        Assert.True(!good.CompilerErrors.Any(), form + ": " + AnalyzerRun.Describe(good.CompilerErrors));
        Assert.True(!good.Fvc.Any(), form + ": " + AnalyzerRun.Describe(good.Fvc));

        Assert.Contains(from, kernel);
        var bad = await AnalyzerRun.RunAsync(Head + kernel.Replace(from, to));
        Assert.True(bad.Fvc.Any(d => d.Severity == Microsoft.CodeAnalysis.DiagnosticSeverity.Warning), form + " (broken): " + AnalyzerRun.Describe(bad.Fvc));
    }
}
