using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;

namespace FvGen.Analyzers.Tests.Rules;

/// <summary>
/// A cell summing its faces from the cell-to-face list (the parallel gather) is checked as the face
/// loop it is equivalent to: face f gives what it gives its left cell and its right cell, and the two
/// must cancel. Run with every rule, so "proven" means no FVC diagnostic at all.
/// </summary>
public sealed class CellGatherTests
{
    private const string CompressedRow = """
        static class Gather
        {
            [ConservativeUpdate]
            public static void Rate(int[] faceLeft, int[] faceRight, int[] cellFaceStart, int[] cellFaces, [FaceData] double[] flux, double[] vol, double[] res)
            {
                for (int c = 0; c < res.Length; c++)
                {
                    double sum = 0;
                    for (int n = cellFaceStart[c]; n < cellFaceStart[c + 1]; n++)
                    {
                        int f = cellFaces[n];
                        __BODY__
                    }

                    res[c] = sum / vol[c];
                }
            }
        }
        """;

    private const string PerCellList = """
        static class Gather
        {
            [ConservativeUpdate]
            public static void Step(int[] faceLeft, int[] faceRight, int[][] facesOfCell, [FaceData] double[] flux, double[] vol, double[] u, double[] un, double dt)
            {
                for (int c = 0; c < u.Length; c++)
                {
                    double sum = 0;
                    foreach (int f in facesOfCell[c])
                    {
                        __BODY__
                    }

                    un[c] = u[c] - dt / vol[c] * sum;
                }
            }
        }
        """;

    private const string ParallelCells = """
        static class Gather
        {
            [ConservativeUpdate]
            public static void Rate(int[] faceLeft, int[][] facesOfCell, [FaceData] double[] flux, double[] res)
            {
                Parallel.For(0, res.Length, c =>
                {
                    double sum = 0;
                    foreach (int f in facesOfCell[c])
                    {
                        __BODY__
                    }

                    res[c] = sum;
                });
            }
        }
        """;

    public static TheoryData<string, string> Conservative => new()
    {
        { "Parallel.For over cells, per-cell list", ParallelCells.Replace("__BODY__", "if (faceLeft[f] == c) sum -= flux[f]; else sum += flux[f];") },
        { "CSR, if on the left map", CompressedRow.Replace("__BODY__", "if (faceLeft[f] == c) sum -= flux[f]; else sum += flux[f];") },
        { "CSR, face read inline", CompressedRow.Replace("int f = cellFaces[n];", string.Empty).Replace("__BODY__", "if (c == faceLeft[cellFaces[n]]) sum -= flux[cellFaces[n]]; else sum += flux[cellFaces[n]];") },
        { "CSR, both maps named", CompressedRow.Replace("__BODY__", "if (faceLeft[f] == c) sum -= flux[f]; else if (faceRight[f] == c) sum += flux[f];") },
        { "CSR, sign local from the right map", CompressedRow.Replace("__BODY__", "double s = faceRight[f] == c ? 1.0 : -1.0; sum += s * flux[f];") },
        { "per-cell list, conditional expression", PerCellList.Replace("__BODY__", "sum += c == faceLeft[f] ? -flux[f] : flux[f];") },
        { "CSR, sign from a table of constants", CompressedRow.Replace("for (int c = 0;", "double[] sideSign = { -1.0, 1.0 }; for (int c = 0;").Replace("__BODY__", "sum += sideSign[faceLeft[f] == c ? 0 : 1] * flux[f];") },
        { "per-cell list, != test", PerCellList.Replace("__BODY__", "if (faceLeft[f] != c) sum += flux[f]; else sum -= flux[f];") },
    };

    public static TheoryData<string, string, string> Broken => new()
    {
        { "Parallel.For over cells, both plus", ParallelCells.Replace("__BODY__", "sum += flux[f];"), DiagnosticIds.OneSidedScatter },
        // Both sides take the flux away: each face loses it twice.
        { "CSR, both minus", CompressedRow.Replace("__BODY__", "sum -= flux[f];"), DiagnosticIds.OneSidedScatter },
        { "CSR, both plus", CompressedRow.Replace("__BODY__", "if (faceLeft[f] == c) sum += flux[f]; else sum += flux[f];"), DiagnosticIds.OneSidedScatter },
        { "CSR, right side dropped", CompressedRow.Replace("__BODY__", "if (faceLeft[f] == c) sum -= flux[f];"), DiagnosticIds.OneSidedScatter },
        { "per-cell list, left side dropped", PerCellList.Replace("__BODY__", "if (faceRight[f] == c) sum += flux[f];"), DiagnosticIds.OneSidedScatter },
        { "CSR, table of constants with equal signs", CompressedRow.Replace("for (int c = 0;", "double[] sideSign = { 1.0, 1.0 }; for (int c = 0;").Replace("__BODY__", "sum += sideSign[faceLeft[f] == c ? 0 : 1] * flux[f];"), DiagnosticIds.OneSidedScatter },
        // A table the method writes is no table of constants: its entries stay symbols, whose sum is not known to vanish.
        { "CSR, sign table written in the method", CompressedRow.Replace("for (int c = 0;", "double[] sideSign = { -1.0, 1.0 }; sideSign[1] = -1.0; for (int c = 0;").Replace("__BODY__", "sum += sideSign[faceLeft[f] == c ? 0 : 1] * flux[f];"), DiagnosticIds.OneSidedScatter },
        { "per-cell list, half weight on one side", PerCellList.Replace("__BODY__", "sum += c == faceLeft[f] ? -flux[f] : 0.5 * flux[f];"), DiagnosticIds.OneSidedScatter },
    };

    public static TheoryData<string, string, string> NotModelled => new()
    {
        { "a sign array read at the list position", CompressedRow.Replace("__BODY__", "sum += sign[n] * flux[f];").Replace("double[] res)", "double[] res, double[] sign)"), "the position `n` in the face list is read as `sign[n]`" },
        { "a condition on the data", CompressedRow.Replace("__BODY__", "if (flux[f] > 0) sum -= flux[f]; else sum += flux[f];"), "a condition other than the side of the face" },
        { "the first face skipped", CompressedRow.Replace("n = cellFaceStart[c]", "n = cellFaceStart[c] + 1").Replace("__BODY__", "if (faceLeft[f] == c) sum -= flux[f]; else sum += flux[f];"), "accumulated over the inner loop" },
        { "a term reading the cell", CompressedRow.Replace("__BODY__", "if (faceLeft[f] == c) sum -= flux[f] * vol[c]; else sum += flux[f] * vol[c];"), "depends on the cell itself" },
        { "a local scaled inside", CompressedRow.Replace("__BODY__", "sum *= 0.5; sum += flux[f];"), "than add to it or subtract from it" },
    };

    [Theory]
    [MemberData(nameof(Conservative))]
    public async Task ConservativeGatherIsProven(string description, string source)
    {
        await Verdicts.AssertProvenAsync(source, description);
    }

    [Theory]
    [MemberData(nameof(Broken))]
    public async Task BrokenGatherIsRefuted(string description, string source, string rule)
    {
        await Verdicts.AssertRefutedAsync(source, rule, description);
    }

    [Theory]
    [MemberData(nameof(NotModelled))]
    public async Task GatherShapesOutsideTheModelAreNotAnalyzed(string description, string source, string reason)
    {
        await Verdicts.AssertNotAnalyzedAsync(source, reason, description, only: true);
    }
}
