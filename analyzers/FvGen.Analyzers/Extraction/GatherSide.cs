using System.Collections.Generic;
using System.Linq;
using FvGen.Analyzers.Conservation;
using Microsoft.CodeAnalysis;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// While the loop over one cell's faces is read for one side of the face: which loop variable is the
/// cell, which name the face gets, the face-to-cell maps the code compares the cell with, and which of
/// them the cell is on for this reading (so <c>faceLeft[f] == c</c> is true or false, not data).
/// </summary>
internal sealed class GatherSide
{
    public GatherSide(string cellVariable, string faceVariable, IReadOnlyList<string> maps, string sideMap, ISymbol? position, string? facesRoot)
    {
        CellVariable = cellVariable;
        FaceVariable = faceVariable;
        Maps = maps;
        SideMap = sideMap;
        Position = position;
        FacesRoot = facesRoot;
        Face = SumExpr.Factor(ReadExpr.LoopIndex(faceVariable));
    }

    public string CellVariable { get; }

    public string FaceVariable { get; }

    /// <summary>The maps compared with the cell (one or two), in the order met.</summary>
    public IReadOnlyList<string> Maps { get; }

    /// <summary>The map of the side being read; <see cref="CellGatherExpr.OtherSide"/> of the first map when the code names only one.</summary>
    public string SideMap { get; }

    /// <summary>The position in a CSR face list (<c>n</c>), read only as <c>faces[n]</c>; null for a list of the cell's own.</summary>
    public ISymbol? Position { get; }

    public string? FacesRoot { get; }

    /// <summary>The face as a value: the loop index of the equivalent face loop.</summary>
    public SumExpr Face { get; }

    /// <summary>True when the cell is <c>map[f]</c> on this side, false when it is on the other; null for a map not compared.</summary>
    public bool? IsOnSide(string map)
    {
        if (map == SideMap)
        {
            return true;
        }

        return Maps.Contains(map) ? false : null;
    }
}
