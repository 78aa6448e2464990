using FvGen.Analyzers.CodeFixes;
using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;
using Microsoft.CodeAnalysis.Testing;
using VerifyCS = FvGen.Analyzers.Tests.Verifiers.CodeFixVerifier<FvGen.Analyzers.CodeFixes.InPlaceSweepFix>;

namespace FvGen.Analyzers.Tests.CodeFixes;

public sealed class InPlaceSweepFixTests
{
    [Fact]
    public Task ReadsTheOldStateFromACopy() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Upwind
            {
                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    for (int i = 1; i < u.Length; i++)
                    {
                        {|#0:u[i] = u[i] - c * (u[i] - {|#1:u[i - 1]|})|};
                    }
                }
            }
            """,
            [VerifyCS.Diagnostic(DiagnosticIds.InPlaceSweep).WithLocation(0).WithLocation(1).WithArguments("u[i]", "u[i - 1]")],
            """
            static class Upwind
            {
                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    var uOld = (double[])u.Clone();
                    for (int i = 1; i < u.Length; i++)
                    {
                        u[i] = uOld[i] - c * (uOld[i] - uOld[i - 1]);
                    }
                }
            }
            """);

    [Fact]
    public Task SpanIsCopiedWithToArray() =>
        VerifyCS.VerifyCodeFixAsync(
            """
            static class Smooth
            {
                [ConservativeUpdate]
                public static void Filter(Span<double> u, double e)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        {|#0:u[i] += e * (u[i + 1] - 2 * u[i] + {|#1:u[i - 1]|})|};
                    }
                }
            }
            """,
            [VerifyCS.Diagnostic(DiagnosticIds.InPlaceSweep).WithLocation(0).WithLocation(1).WithArguments("u[i]", "u[i - 1]")],
            """
            static class Smooth
            {
                [ConservativeUpdate]
                public static void Filter(Span<double> u, double e)
                {
                    var uOld = u.ToArray();
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        u[i] += e * (uOld[i + 1] - 2 * uOld[i] + uOld[i - 1]);
                    }
                }
            }
            """);

    private static DiagnosticResult Swept(int location) =>
        VerifyCS.Diagnostic(DiagnosticIds.InPlaceSweep).WithLocation(location).WithOptions(DiagnosticOptions.IgnoreAdditionalLocations).WithMessage(null);

    /// <summary>The fixed kernel must be clean for every conservation rule, not only for FVC0005.</summary>
    private static async Task AssertCleanAsync(string fixedSource)
    {
        var run = await AnalyzerRun.RunAsync(TestReferences.Usings + fixedSource);
        Assert.Empty(run.CompilerErrors);
        Assert.Empty(run.Exceptions);
        Assert.True(!run.Fvc.Any(), AnalyzerRun.Describe(run.Fvc));
    }

    private const string GodunovSweep = """
        static class Burgers
        {
            static double Godunov(double left, double right) => 0.5 * Math.Max(left * left, right * right);

            [ConservativeUpdate]
            public static void Step(double[] u, double c)
            {
                for (int i = 1; i < u.Length - 1; i++)
                {
                    {|#0:u[i] = u[i] - c * (Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i]))|};
                }
            }
        }
        """;

    private const string GodunovTwoPass = """
        static class Burgers
        {
            static double Godunov(double left, double right) => 0.5 * Math.Max(left * left, right * right);

            [ConservativeUpdate]
            public static void Step(double[] u, double c)
            {
                // flux[i]: the face between cells i - 1 and i, from the old state.
                var flux = new double[u.Length + 1];
                for (int i = 1; i < u.Length; i++)
                {
                    flux[i] = Godunov(u[i - 1], u[i]);
                }

                for (int i = 1; i < u.Length - 1; i++)
                {
                    u[i] = u[i] - c * (flux[i + 1] - flux[i]);
                }
            }
        }
        """;

    [Fact]
    public async Task FluxCallSweepBecomesTheTwoPassFaceFluxForm()
    {
        await VerifyCS.VerifyCodeFixAsync(GodunovSweep, [Swept(0)], GodunovTwoPass, equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
        await AssertCleanAsync(GodunovTwoPass);
    }

    [Fact]
    public Task TheCopyStaysTheFirstActionForTheSameSweep() =>
        VerifyCS.VerifyCodeFixAsync(
            GodunovSweep,
            [Swept(0)],
            GodunovSweep.Replace("{|#0:", string.Empty).Replace("|};", ";")
                .Replace("        for (int i = 1; i < u.Length - 1; i++)", "        var uOld = (double[])u.Clone();\n        for (int i = 1; i < u.Length - 1; i++)")
                .Replace("u[i] = u[i] - c * (Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i]))", "u[i] = uOld[i] - c * (Godunov(uOld[i], uOld[i + 1]) - Godunov(uOld[i - 1], uOld[i]))"),
            equivalenceKey: EquivalenceKeys.ReadOldStateFromCopy);

    [Fact]
    public async Task AveragedFaceExpressionOnASpanWithInclusiveBoundKeepsEveryFace()
    {
        // Cells 1 … n − 2 touch faces 1 … n − 1: the buffer loop runs one face further than the cell loop.
        const string fixedSource = """
            static class Smooth
            {
                [ConservativeUpdate]
                public static void Step(Span<double> u, int n, double c)
                {
                    // flux[i]: the face between cells i - 1 and i, from the old state.
                    var flux = new double[u.Length + 1];
                    for (int i = 1; i <= n - 1; i++)
                    {
                        flux[i] = 0.5 * (u[i - 1] + u[i]);
                    }

                    for (int i = 1; i <= n - 2; i++)
                        u[i] -= c * (flux[i + 1] - flux[i]);
                }
            }
            """;
        await VerifyCS.VerifyCodeFixAsync(
            """
            static class Smooth
            {
                [ConservativeUpdate]
                public static void Step(Span<double> u, int n, double c)
                {
                    for (int i = 1; i <= n - 2; i++)
                        {|#0:u[i] -= c * (0.5 * (u[i] + u[i + 1]) - 0.5 * (u[i - 1] + u[i]))|};
                }
            }
            """,
            [Swept(0)],
            fixedSource,
            equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
        await AssertCleanAsync(fixedSource);
    }

    [Fact]
    public async Task WestMinusEastOrderIsKept()
    {
        const string fixedSource = """
            static class Burgers
            {
                static double Godunov(double left, double right) => 0.5 * Math.Max(left * left, right * right);

                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    // flux[i]: the face between cells i - 1 and i, from the old state.
                    var flux = new double[u.Length + 1];
                    for (int i = 2; i < u.Length - 1; ++i)
                    {
                        flux[i] = Godunov(u[i - 1], u[i]);
                    }

                    for (int i = 2; i < u.Length - 2; ++i)
                    {
                        u[i] += c * (flux[i] - flux[i + 1]);
                    }
                }
            }
            """;
        await VerifyCS.VerifyCodeFixAsync(
            """
            static class Burgers
            {
                static double Godunov(double left, double right) => 0.5 * Math.Max(left * left, right * right);

                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    for (int i = 2; i < u.Length - 2; ++i)
                    {
                        {|#0:u[i] += c * (Godunov(u[i - 1], u[i]) - Godunov(u[i], u[i + 1]))|};
                    }
                }
            }
            """,
            [Swept(0)],
            fixedSource,
            equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
        await AssertCleanAsync(fixedSource);
    }

    [Fact]
    public Task UpwindDifferenceOfCellValuesGetsNoTwoPassForm()
    {
        // `u[i] - u[i - 1]` is a difference of cells, not of face fluxes of two cells: only the copy applies.
        const string source = """
            static class Upwind
            {
                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    for (int i = 1; i < u.Length; i++)
                    {
                        {|#0:u[i] = u[i] - c * (u[i] - u[i - 1])|};
                    }
                }
            }
            """;
        return VerifyCS.VerifyCodeFixAsync(source, [Swept(0)], source, remaining: [Swept(0)], equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
    }

    [Fact]
    public Task ExtraNeighbourReadOutsideTheFacesGetsNoTwoPassForm()
    {
        const string source = """
            static class Burgers
            {
                static double Godunov(double left, double right) => 0.5 * Math.Max(left * left, right * right);

                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        {|#0:u[i] = u[i + 1] - c * (Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i]))|};
                    }
                }
            }
            """;
        return VerifyCS.VerifyCodeFixAsync(source, [Swept(0)], source, remaining: [Swept(0)], equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
    }

    private const string TwoStages = """
        static class Burgers
        {
            static double Godunov(double left, double right) => 0.5 * Math.Max(left * left, right * right);

            [ConservativeUpdate]
            public static void TwoSteps(double[] u, double c)
            {
                for (int i = 1; i < u.Length - 1; i++)
                {
                    {|#0:u[i] = u[i] - c * (Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i]))|};
                }

                for (int i = 1; i < u.Length - 1; i++)
                {
                    {|#1:u[i] = u[i] - c * (Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i]))|};
                }
            }
        }
        """;

    [Fact]
    public async Task FixAllGivesEachSweepItsOwnBuffer()
    {
        const string fixedSource = """
            static class Burgers
            {
                static double Godunov(double left, double right) => 0.5 * Math.Max(left * left, right * right);

                [ConservativeUpdate]
                public static void TwoSteps(double[] u, double c)
                {
                    // flux[i]: the face between cells i - 1 and i, from the old state.
                    var flux = new double[u.Length + 1];
                    for (int i = 1; i < u.Length; i++)
                    {
                        flux[i] = Godunov(u[i - 1], u[i]);
                    }

                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        u[i] = u[i] - c * (flux[i + 1] - flux[i]);
                    }

                    // flux2[i]: the face between cells i - 1 and i, from the old state.
                    var flux2 = new double[u.Length + 1];
                    for (int i = 1; i < u.Length; i++)
                    {
                        flux2[i] = Godunov(u[i - 1], u[i]);
                    }

                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        u[i] = u[i] - c * (flux2[i + 1] - flux2[i]);
                    }
                }
            }
            """;
        await VerifyCS.VerifyCodeFixAsync(TwoStages, [Swept(0), Swept(1)], fixedSource, equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
        await AssertCleanAsync(fixedSource);
    }

    [Fact]
    public Task FixAllGivesEachSweepItsOwnCopy()
    {
        const string fixedSource = """
            static class Burgers
            {
                static double Godunov(double left, double right) => 0.5 * Math.Max(left * left, right * right);

                [ConservativeUpdate]
                public static void TwoSteps(double[] u, double c)
                {
                    var uOld = (double[])u.Clone();
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        u[i] = uOld[i] - c * (Godunov(uOld[i], uOld[i + 1]) - Godunov(uOld[i - 1], uOld[i]));
                    }

                    var uOld2 = (double[])u.Clone();
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        u[i] = uOld2[i] - c * (Godunov(uOld2[i], uOld2[i + 1]) - Godunov(uOld2[i - 1], uOld2[i]));
                    }
                }
            }
            """;
        return VerifyCS.VerifyCodeFixAsync(TwoStages, [Swept(0), Swept(1)], fixedSource, equivalenceKey: EquivalenceKeys.ReadOldStateFromCopy);
    }

    [Fact]
    public async Task TwoDimensionalSweepGetsOneBufferPerDirection()
    {
        // Cells (1 … nx − 2, 1 … ny − 2): x-faces 1 … nx − 1 on those rows, y-faces 1 … ny − 1 on those columns.
        const string fixedSource = """
            static class Plate
            {
                static double Donor(double a, double b) => a;

                [ConservativeUpdate]
                public static void Step(double[,] q, int nx, int ny, double cx, double cy)
                {
                    // fluxX[i, j]: the face between cells (i - 1, j) and (i, j), from the old state.
                    var fluxX = new double[q.GetLength(0) + 1, q.GetLength(1)];
                    for (int j = 1; j < ny - 1; j++)
                    {
                        for (int i = 1; i < nx; i++)
                        {
                            fluxX[i, j] = Donor(q[i - 1, j], q[i, j]);
                        }
                    }

                    // fluxY[i, j]: the face between cells (i, j - 1) and (i, j), from the old state.
                    var fluxY = new double[q.GetLength(0), q.GetLength(1) + 1];
                    for (int j = 1; j < ny; j++)
                    {
                        for (int i = 1; i < nx - 1; i++)
                        {
                            fluxY[i, j] = Donor(q[i, j - 1], q[i, j]);
                        }
                    }

                    for (int j = 1; j < ny - 1; j++)
                        for (int i = 1; i < nx - 1; i++)
                            q[i, j] -= cx * (fluxX[i + 1, j] - fluxX[i, j]) + cy * (fluxY[i, j + 1] - fluxY[i, j]);
                }
            }
            """;
        await VerifyCS.VerifyCodeFixAsync(
            """
            static class Plate
            {
                static double Donor(double a, double b) => a;

                [ConservativeUpdate]
                public static void Step(double[,] q, int nx, int ny, double cx, double cy)
                {
                    for (int j = 1; j < ny - 1; j++)
                        for (int i = 1; i < nx - 1; i++)
                            {|#0:q[i, j] -= cx * (Donor(q[i, j], q[i + 1, j]) - Donor(q[i - 1, j], q[i, j])) + cy * (Donor(q[i, j], q[i, j + 1]) - Donor(q[i, j - 1], q[i, j]))|};
                }
            }
            """,
            [Swept(0)],
            fixedSource,
            equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
        await AssertCleanAsync(fixedSource);
    }

    [Fact]
    public Task TwoDimensionalSweepWithOneDirectionOnlyGetsNoTwoPassForm()
    {
        // A y-neighbour read outside any y-face difference: the update is not a flux difference in y.
        const string source = """
            static class Plate
            {
                static double Donor(double a, double b) => a;

                [ConservativeUpdate]
                public static void Step(double[,] q, int nx, int ny, double cx, double cy)
                {
                    for (int j = 1; j < ny - 1; j++)
                        for (int i = 1; i < nx - 1; i++)
                            {|#0:q[i, j] -= cx * (Donor(q[i, j], q[i + 1, j]) - Donor(q[i - 1, j], q[i, j])) + cy * q[i, j - 1]|};
                }
            }
            """;
        return VerifyCS.VerifyCodeFixAsync(source, [Swept(0)], source, remaining: [Swept(0)], equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
    }

    [Fact]
    public async Task StateStructFluxGetsABufferOfTheStateType()
    {
        const string fixedSource = """
            public struct Wave
            {
                public double H, Hu;

                public Wave(double h, double hu) { H = h; Hu = hu; }

                public static Wave operator +(Wave a, Wave b) => new(a.H + b.H, a.Hu + b.Hu);
                public static Wave operator -(Wave a, Wave b) => new(a.H - b.H, a.Hu - b.Hu);
                public static Wave operator *(double s, Wave a) => new(s * a.H, s * a.Hu);
            }

            static class Channel
            {
                static Wave Rusanov(Wave l, Wave r) => 0.5 * (l + r);

                [ConservativeUpdate]
                public static void Step(Wave[] w, double c)
                {
                    // flux[i]: the face between cells i - 1 and i, from the old state.
                    var flux = new Wave[w.Length + 1];
                    for (int i = 1; i < w.Length; i++)
                    {
                        flux[i] = Rusanov(w[i - 1], w[i]);
                    }

                    for (int i = 1; i < w.Length - 1; i++)
                    {
                        w[i] = w[i] - c * (flux[i + 1] - flux[i]);
                    }
                }
            }
            """;
        await VerifyCS.VerifyCodeFixAsync(
            fixedSource
                .Replace("        // flux[i]: the face between cells i - 1 and i, from the old state.\n        var flux = new Wave[w.Length + 1];\n        for (int i = 1; i < w.Length; i++)\n        {\n            flux[i] = Rusanov(w[i - 1], w[i]);\n        }\n\n", string.Empty)
                .Replace("w[i] = w[i] - c * (flux[i + 1] - flux[i]);", "{|#0:w[i] = w[i] - c * (Rusanov(w[i], w[i + 1]) - Rusanov(w[i - 1], w[i]))|};"),
            [Swept(0)],
            fixedSource,
            equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
        await AssertCleanAsync(fixedSource);
    }

    [Fact]
    public async Task ThreeDimensionalSweepGetsThreeBuffers()
    {
        const string fixedSource = """
            static class Box
            {
                [ConservativeUpdate]
                public static void Step(double[,,] q, int n, double c)
                {
                    // fluxX[i, j, k]: the face between cells (i - 1, j, k) and (i, j, k), from the old state.
                    var fluxX = new double[q.GetLength(0) + 1, q.GetLength(1), q.GetLength(2)];
                    for (int k = 1; k < n - 1; k++)
                    {
                        for (int j = 1; j < n - 1; j++)
                        {
                            for (int i = 1; i < n; i++)
                            {
                                fluxX[i, j, k] = q[i - 1, j, k] * q[i, j, k];
                            }
                        }
                    }

                    // fluxY[i, j, k]: the face between cells (i, j - 1, k) and (i, j, k), from the old state.
                    var fluxY = new double[q.GetLength(0), q.GetLength(1) + 1, q.GetLength(2)];
                    for (int k = 1; k < n - 1; k++)
                    {
                        for (int j = 1; j < n; j++)
                        {
                            for (int i = 1; i < n - 1; i++)
                            {
                                fluxY[i, j, k] = q[i, j - 1, k] * q[i, j, k];
                            }
                        }
                    }

                    // fluxZ[i, j, k]: the face between cells (i, j, k - 1) and (i, j, k), from the old state.
                    var fluxZ = new double[q.GetLength(0), q.GetLength(1), q.GetLength(2) + 1];
                    for (int k = 1; k < n; k++)
                    {
                        for (int j = 1; j < n - 1; j++)
                        {
                            for (int i = 1; i < n - 1; i++)
                            {
                                fluxZ[i, j, k] = q[i, j, k - 1] * q[i, j, k];
                            }
                        }
                    }

                    for (int k = 1; k < n - 1; k++)
                        for (int j = 1; j < n - 1; j++)
                            for (int i = 1; i < n - 1; i++)
                                q[i, j, k] -= c * ((fluxX[i + 1, j, k] - fluxX[i, j, k]) + (fluxY[i, j + 1, k] - fluxY[i, j, k]) + (fluxZ[i, j, k + 1] - fluxZ[i, j, k]));
                }
            }
            """;
        await VerifyCS.VerifyCodeFixAsync(
            """
            static class Box
            {
                [ConservativeUpdate]
                public static void Step(double[,,] q, int n, double c)
                {
                    for (int k = 1; k < n - 1; k++)
                        for (int j = 1; j < n - 1; j++)
                            for (int i = 1; i < n - 1; i++)
                                {|#0:q[i, j, k] -= c * ((q[i, j, k] * q[i + 1, j, k] - q[i - 1, j, k] * q[i, j, k]) + (q[i, j, k] * q[i, j + 1, k] - q[i, j - 1, k] * q[i, j, k]) + (q[i, j, k] * q[i, j, k + 1] - q[i, j, k - 1] * q[i, j, k]))|};
                }
            }
            """,
            [Swept(0)],
            fixedSource,
            equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
        await AssertCleanAsync(fixedSource);
    }

    [Fact]
    public Task ParallelSweepGetsNoTwoPassForm()
    {
        const string source = """
            static class Burgers
            {
                static double Godunov(double left, double right) => 0.5 * Math.Max(left * left, right * right);

                [ConservativeUpdate]
                public static void Step(double[] u, double c)
                {
                    Parallel.For(1, u.Length - 1, i =>
                    {
                        {|#0:u[i] = u[i] - c * (Godunov(u[i], u[i + 1]) - Godunov(u[i - 1], u[i]))|};
                    });
                }
            }
            """;
        return VerifyCS.VerifyCodeFixAsync(source, [Swept(0)], source, remaining: [Swept(0)], equivalenceKey: EquivalenceKeys.TwoPassFaceFlux);
    }
}
