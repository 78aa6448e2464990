using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

public sealed class NotAnalyzedTests
{
    private static readonly AnalyzerVerifier VerifyCS = new(DiagnosticIds.NotAnalyzed);

    [Fact]
    public Task WriteUnderAConditionIsNotGuessed() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Kernel
            {
                [ConservativeUpdate]
                public static void Rate(double[] f, double[] r, double dx)
                {
                    for (int i = 0; i < r.Length; i++)
                    {
                        {|#0:if (i > 0) r[i] = -(f[i + 1] - f[i]) / dx;|}
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("an array element is written under a condition"));

    [Fact]
    public Task GatherWithASignArrayIsNotGuessed() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Gather
            {
                [ConservativeUpdate]
                public static void Rate(int[] cellFaceStart, int[] cellFaces, double[] sign, [FaceData] double[] flux, double[] res)
                {
                    for (int c = 0; c < res.Length; c++)
                    {
                        double sum = 0;
                        for (int n = cellFaceStart[c]; n < cellFaceStart[c + 1]; n++)
                            sum += {|#0:sign[n]|} * flux[cellFaces[n]];
                        res[c] = sum;
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0)
                .WithArguments("the position `n` in the face list is read as `sign[n]`, not only to take the face from the list; the side of a face is read only from a comparison of the cell with a face-to-cell map"));

    [Fact]
    public Task ConditionalSubscriptInACellLoopIsReportedWhereItIsRead() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Kernel
            {
                static double G(double a, double b) => a;

                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r)
                {
                    for (int i = 2; i < r.Length - 1; i++)
                    {
                        int far = i >= 3 ? i - 2 : i - 1;
                        r[i] = -(G(u[i], u[i + 1]) - {|#0:G(u[far], u[i])|});
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0)
                .WithArguments("the index `far` is chosen by a condition, which the checker accepts only inside a face value given to the two cells of the face with opposite weights"));

    [Fact]
    public Task DataDependentIndexIsNamed() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Kernel
            {
                [ConservativeUpdate]
                public static void Rate(double[] f, int[] perm, double[] r)
                {
                    for (int i = 0; i < r.Length; i++)
                        r[i] = f[{|#0:perm[i] + 1|}] - f[perm[i]];
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("the index `perm[i] + 1` adds an offset to an index map"));

    [Fact]
    public Task CallWithoutAVisibleBodyIsNamed() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Kernel
            {
                [ConservativeUpdate]
                public static void Rate(double[] u, double[] r, Random noise)
                {
                    for (int i = 1; i < r.Length; i++)
                        r[i] = u[i] - u[i - 1] + {|#0:noise.NextDouble()|};
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("it calls `Random.NextDouble()`, whose body the checker cannot see"));

    [Fact]
    public Task ArrayOfUnknownOriginIsAliasing() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Kernel
            {
                static double[] Pick(double[][] all, int k) => all[k];

                [ConservativeUpdate]
                public static void Rate(double[][] all, double[] r, int k)
                {
                    for (int i = 1; i < r.Length; i++)
                        r[i] = {|#0:Pick(all, k)|}[i] - Pick(all, k)[i - 1];
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("the array `Pick(all, k)` comes from an expression the checker cannot follow (aliasing cannot be ruled out)"));

    [Fact]
    public Task FluxBehindAnInterfaceIsNotGuessedPure() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            interface IFlux { double Evaluate(double left, double right); }

            static class Kernel
            {
                [ConservativeUpdate]
                public static void Rate(IFlux flux, double[] u, double[] r)
                {
                    for (int i = 1; i < r.Length - 1; i++)
                        r[i] = -({|#0:flux.Evaluate(u[i], u[i + 1])|} - flux.Evaluate(u[i - 1], u[i]));
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("it calls `IFlux.Evaluate(double, double)`, whose body the checker cannot see"));

    [Fact]
    public Task StateOperatorThatIsNotComponentWiseIsNotTakenAsArithmetic() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            struct Pair
            {
                public double A, B;
                public Pair(double a, double b) { A = a; B = b; }

                // Mixes the components: not the sum it looks like.
                public static Pair operator +(Pair x, Pair y) => new(x.A + y.B, x.B + y.A);
            }

            static class Kernel
            {
                [ConservativeUpdate]
                public static void Scatter(Pair[] flux, Pair[] r)
                {
                    for (int i = 1; i < r.Length; i++)
                    {
                        r[i - 1] = {|#0:r[i - 1] + flux[i]|};
                        r[i] = r[i] + flux[i];
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("the operator `Pair.operator +(Pair, Pair)` is not visibly component-wise (each field of the result the same field of the operands, combined by that operator)"));

    [Fact]
    public Task StateOperatorsWrittenComponentWiseAreArithmetic() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            struct Pair
            {
                public double A, B;

                public static Pair operator +(Pair x, Pair y) => new Pair { A = x.A + y.A, B = x.B + y.B };

                public static Pair operator -(Pair x, Pair y)
                {
                    Pair d;
                    d.A = x.A - y.A;
                    d.B = x.B - y.B;
                    return d;
                }

                public static Pair operator /(Pair x, double s) => new Pair { A = x.A / s, B = x.B / s };
            }

            static class Kernel
            {
                [ConservativeUpdate]
                public static void Scatter([FaceData] Pair[] flux, Pair[] r, double[] vol)
                {
                    for (int i = 1; i < r.Length; i++)
                    {
                        r[i - 1] -= flux[i] / vol[i - 1];
                        r[i] += flux[i] / vol[i];
                    }
                }
            }
            """);

    [Fact]
    public Task StateOperatorsWithCommutedOperandsAreArithmetic() =>
        // A sum and a scalar product commute, so `y.A + x.A` and `x.A * s` are as component-wise as the
        // other order (they were not analyzed before). A difference does not: see the test below.
        VerifyCS.VerifyAnalyzerAsync(
            """
            struct Pair
            {
                public double A, B;

                public static Pair operator +(Pair x, Pair y) => new Pair { A = y.A + x.A, B = y.B + x.B };

                public static Pair operator *(double s, Pair x) => new Pair { A = x.A * s, B = s * x.B };
            }

            static class Kernel
            {
                [ConservativeUpdate]
                public static void Scatter([FaceData] Pair[] flux, Pair[] r, double dt)
                {
                    for (int i = 1; i < r.Length; i++)
                    {
                        r[i - 1] = r[i - 1] + (-dt) * flux[i];
                        r[i] = r[i] + dt * flux[i];
                    }
                }
            }
            """);

    [Fact]
    public Task StateDifferenceWithSwappedOperandsIsNotTakenAsArithmetic() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            struct Pair
            {
                public double A, B;

                // y - x for x - y: not the difference it looks like.
                public static Pair operator -(Pair x, Pair y) => new Pair { A = y.A - x.A, B = y.B - x.B };
            }

            static class Kernel
            {
                [ConservativeUpdate]
                public static void Scatter([FaceData] Pair[] flux, Pair[] r)
                {
                    for (int i = 1; i < r.Length; i++)
                    {
                        r[i - 1] = {|#0:r[i - 1] - flux[i]|};
                        r[i] = r[i] - flux[i - 1];
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.NotAnalyzed).WithLocation(0).WithArguments("the operator `Pair.operator -(Pair, Pair)` is not visibly component-wise (each field of the result the same field of the operands, combined by that operator)"));

    [Fact]
    public Task DescendingLoopFromAnArrayDimensionIsAnalyzed() =>
        // Where a loop of one variable starts does not matter to the balance; the start `GetLength(0) - 2`
        // (a call the checker cannot see into) once made the update not analyzed.
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Sweep
            {
                [ConservativeUpdate]
                public static void Rate(double[,] f, double[,] r, double dx)
                {
                    for (int i = r.GetLength(0) - 2; i >= 0; i--)
                        for (int j = 0; j < r.GetLength(1); j++)
                            r[i, j] = -(f[i + 1, j] - f[i, j]) / dx;
                }
            }
            """);
}
