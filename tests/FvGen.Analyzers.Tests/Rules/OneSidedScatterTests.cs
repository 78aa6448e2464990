using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

public sealed class OneSidedScatterTests
{
    private static readonly AnalyzerVerifier VerifyCS = new(DiagnosticIds.OneSidedScatter);

    [Fact]
    public Task FaceFluxGivenToTheOwnerOnly() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Scatter
            {
                static double H(double a, double b) => 0.5 * (a + b);

                [ConservativeUpdate]
                public static void Residual(int[] left, int[] right, double[] u, double[] res)
                {
                    for (int f = 0; f < left.Length; f++)
                    {
                        double flux = {|#0:H(u[left[f]], u[right[f]])|};
                        res[left[f]] -= flux;
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.OneSidedScatter).WithLocation(0)
                .WithArguments("H(u[left[f]], u[right[f]])", "it goes to res[left[f]] with weight -1 and to no other cell; the face also reads through `right`, so `res[right[f]]` must receive the opposite weight"));

    [Fact]
    public Task FaceFluxGivenBackToTheCellItLeft() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Scatter
            {
                static double H(double a, double b) => 0.5 * (a + b);

                [ConservativeUpdate]
                public static void Residual(int[] left, int[] right, double[] u, double[] res)
                {
                    foreach (int f in left)
                    {
                        double flux = {|#0:H(u[left[f]], u[right[f]])|};
                        res[left[f]] -= flux;
                        res[left[f]] += flux;
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.OneSidedScatter).WithLocation(0)
                .WithArguments("H(u[left[f]], u[right[f]])", "it is taken from and given back to the same cell res[left[f]], so the other cell of the face gets nothing"));

    [Fact]
    public Task GatherThatDropsTheRightSideOfEachFace() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Gather
            {
                [ConservativeUpdate]
                public static void Rate(int[] faceLeft, int[] cellFaceStart, int[] cellFaces, [FaceData] double[] flux, double[] vol, double[] res)
                {
                    for (int c = 0; c < res.Length; c++)
                    {
                        double sum = 0;
                        for (int n = cellFaceStart[c]; n < cellFaceStart[c + 1]; n++)
                        {
                            int f = cellFaces[n];
                            if (faceLeft[f] == c) sum -= {|#0:flux[f]|};
                        }

                        res[c] = sum / vol[c];
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.OneSidedScatter).WithLocation(0)
                .WithArguments("flux[f]", "it goes to res[faceLeft[f]] with weight -1 and to no other cell; the other cell of the face must receive the opposite weight"));

    [Fact]
    public Task GatherThatSubtractsOnBothSides() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Gather
            {
                [ConservativeUpdate]
                public static void Rate(int[] faceLeft, int[][] facesOfCell, [FaceData] double[] flux, double[] res)
                {
                    for (int c = 0; c < res.Length; c++)
                    {
                        double sum = 0;
                        foreach (int f in facesOfCell[c])
                        {
                            sum += c == faceLeft[f] ? -{|#0:flux[f]|} : -{|#1:flux[f]|};
                        }

                        res[c] = sum;
                    }
                }
            }
            """,
            VerifyCS.Diagnostic(DiagnosticIds.OneSidedScatter).WithLocation(0).WithLocation(1)
                .WithArguments("flux[f]", "it goes to res[faceLeft[f]] with weight -1 and to res[other(faceLeft)[f]] with weight -1, which sum to -2, not 0"));

    [Fact]
    public Task BoundaryPatchGivingItsFluxToTheOwnerIsASource() =>
        VerifyCS.VerifyAnalyzerAsync(
            """
            static class Wall
            {
                static double Reflect(double inside, double area) => 0.0 * inside * area;

                [ConservativeUpdate]
                public static void Boundary(int[] patchFaces, int[] owner, [FaceData] double[] area, double[] u, double[] res)
                {
                    foreach (int b in patchFaces)
                        res[owner[b]] -= Reflect(u[owner[b]], area[b]);
                }
            }
            """);
}
