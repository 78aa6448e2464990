using System.Collections.Generic;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A cell's sum over its faces, taken from the mesh's cell-to-face list (a parallel gather):
/// Σ over faces <c>f</c> of cell <c>c</c> of what the face gives the cell, which depends on the side
/// of the face the cell is on. <see cref="Left"/> is what <c>f</c> gives the cell <c>LeftMap[f]</c>,
/// <see cref="Right"/> what it gives the cell <c>RightMap[f]</c>. Both are written in the face
/// variable only (no read of the cell), so the sum over all cells is the face loop
/// <see cref="CellGatherExpansion"/> turns it into.
/// </summary>
internal sealed class CellGatherExpr : Expr
{
    public CellGatherExpr(string cellVariable, string faceList, string faceVariable, string leftMap, string rightMap, SumExpr left, SumExpr right)
    {
        CellVariable = cellVariable;
        FaceList = faceList;
        FaceVariable = faceVariable;
        LeftMap = leftMap;
        RightMap = rightMap;
        Left = left;
        Right = right;
        Key = "G:" + cellVariable + "|" + faceList + "|" + faceVariable + "|" + leftMap + "|" + rightMap + "(" + left.Key + "|" + right.Key + ")";
    }

    /// <summary>The loop variable of the cell loop (<c>c</c>).</summary>
    public string CellVariable { get; }

    /// <summary>The cell-to-face list summed over (<c>offsets/faces</c>, or the per-cell lists).</summary>
    public string FaceList { get; }

    /// <summary>The name the face gets in the equivalent face loop (<c>f</c>).</summary>
    public string FaceVariable { get; }

    public string LeftMap { get; }

    /// <summary>The other map, or a name of the implicit other side when the code compares the cell with one map only.</summary>
    public string RightMap { get; }

    public SumExpr Left { get; }

    public SumExpr Right { get; }

    public override string Key { get; }

    public override string ShapeKey => Key;

    /// <summary>The face loop this gather sums to: two gathers may share one only when it is the same.</summary>
    public string FaceLoopKey => FaceList + "|" + FaceVariable + "|" + LeftMap + "|" + RightMap;

    /// <summary>The face data read by either side: it keeps the sum from ever passing for a source of the cell.</summary>
    public override IEnumerable<ReadExpr> Reads => Left.Reads.Concat(Right.Reads);

    /// <summary>A gather is read per cell; moving it along the cell loop has no meaning, so it stays put.</summary>
    public override Expr Shift(IReadOnlyDictionary<string, long> shift) => this;

    public override string Render() => "Σ over faces " + FaceVariable + " of cell " + CellVariable + " (" + Left.Render() + " if " + CellVariable + " == " + LeftMap + "[" + FaceVariable + "], " + Right.Render() + " if " + CellVariable + " == " + RightMap + "[" + FaceVariable + "])";

    /// <summary>The implicit map of the other side, for a gather that compares the cell with one map only.</summary>
    public static string OtherSide(string map) => "other(" + map + ")";
}
