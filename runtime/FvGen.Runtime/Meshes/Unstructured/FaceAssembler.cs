namespace FvGen.Meshes.Unstructured;

/// <summary>
/// Finds the faces of a mesh by matching the node sets of the cells' local faces, and puts every
/// face that only one cell has into the patch that names it.
/// </summary>
/// <remarks>
/// Faces are numbered interior first (in the order their first cell lists them), then boundary
/// faces patch by patch, patches in the order their names first appear, faces in the order they
/// were named. Each face keeps the outward node order of its left cell (the first cell that
/// listed it), so its area vector points from left to right.
/// </remarks>
internal static class FaceAssembler
{
    public static AssembledFaces Assemble(UnstructuredMeshBuilder builder)
    {
        var problems = new List<string>();
        var index = new Dictionary<FaceKey, int>();
        var left = new List<int>();
        var right = new List<int>();
        var nodeOffsets = new List<int> { 0 };
        var nodes = new List<int>();
        Span<int> local = stackalloc int[FaceKey.MaxNodes];

        for (int cell = 0; cell < builder.CellCount; cell++)
        {
            var cellNodes = builder.NodesOf(cell);
            var shape = builder.ShapeOf(cell);
            int faceCount = CellTopology.DimensionOf(shape) == 2 ? cellNodes.Length : CellTopology.FacesOf(shape).Length;
            for (int k = 0; k < faceCount; k++)
            {
                var faceNodes = LocalFace(shape, cellNodes, k, local);
                var key = FaceKey.Of(faceNodes, out int repeated);
                if (repeated >= 0)
                {
                    problems.Add($"{builder.DescribeCell(cell)} is degenerate: its face through {builder.DescribeNodes(faceNodes)} lists node {builder.NodeName(repeated)} twice.");
                    continue;
                }

                if (!index.TryGetValue(key, out int face))
                {
                    index.Add(key, left.Count);
                    left.Add(cell);
                    right.Add(-1);
                    foreach (int n in faceNodes)
                    {
                        nodes.Add(n);
                    }

                    nodeOffsets.Add(nodes.Count);
                }
                else if (left[face] == cell || right[face] == cell)
                {
                    problems.Add($"{builder.DescribeCell(cell)} has the face through {builder.DescribeNodes(faceNodes)} twice, so that face would have the same cell on both sides.");
                }
                else if (right[face] < 0)
                {
                    right[face] = cell;
                }
                else
                {
                    problems.Add($"The face through {builder.DescribeNodes(faceNodes)} near {builder.Average(faceNodes)} is shared by more than two cells: cell {left[face]}, cell {right[face]} and {builder.DescribeCell(cell)}.");
                }
            }
        }

        // Boundary faces: each face with one cell must be named by exactly one patch.
        var patchOf = new int[left.Count];
        Array.Fill(patchOf, -1);
        var namedBy = new int[left.Count];
        Array.Fill(namedBy, -1);
        var patchNames = new List<string>();
        var patchIndex = new Dictionary<string, int>(StringComparer.Ordinal);
        var patchFaces = new List<List<int>>();
        for (int b = 0; b < builder.BoundaryFaceCount; b++)
        {
            var faceNodes = builder.NodesOfBoundaryFace(b);
            string patch = builder.PatchOfBoundaryFace(b);
            var key = FaceKey.Of(faceNodes, out int repeated);
            if (repeated >= 0)
            {
                problems.Add($"{builder.DescribeBoundaryFace(b)} lists node {builder.NodeName(repeated)} twice.");
                continue;
            }

            if (!index.TryGetValue(key, out int face))
            {
                problems.Add($"{builder.DescribeBoundaryFace(b)} is not a face of any cell (no cell has a face through {builder.DescribeNodes(faceNodes)}).");
                continue;
            }

            if (right[face] >= 0)
            {
                problems.Add($"{builder.DescribeBoundaryFace(b)} is an interior face, between {builder.DescribeCell(left[face])} and {builder.DescribeCell(right[face])}; a patch holds only faces with one cell.");
                continue;
            }

            if (patchOf[face] >= 0)
            {
                string first = patchNames[patchOf[face]];
                problems.Add(first == patch
                    ? $"{builder.DescribeBoundaryFace(b)} is named twice in patch '{patch}' (boundary faces {namedBy[face]} and {b})."
                    : $"{builder.DescribeBoundaryFace(b)} is in two patches, '{first}' and '{patch}' (boundary faces {namedBy[face]} and {b}); every boundary face belongs to exactly one patch.");
                continue;
            }

            if (!patchIndex.TryGetValue(patch, out int p))
            {
                p = patchNames.Count;
                patchIndex.Add(patch, p);
                patchNames.Add(patch);
                patchFaces.Add([]);
            }

            patchOf[face] = p;
            namedBy[face] = b;
            patchFaces[p].Add(face);
        }

        int interior = 0;
        for (int face = 0; face < left.Count; face++)
        {
            if (right[face] >= 0)
            {
                interior++;
            }
            else if (patchOf[face] < 0)
            {
                var faceNodes = nodes.GetRange(nodeOffsets[face], nodeOffsets[face + 1] - nodeOffsets[face]).ToArray();
                problems.Add($"The boundary face through {builder.DescribeNodes(faceNodes)} near {builder.Average(faceNodes)} of {builder.DescribeCell(left[face])} is in no patch (name it in a patch; if it should be interior, the mesh does not conform there).");
            }
        }

        // Final numbering: interior faces, then each patch's faces.
        var order = new List<int>(left.Count);
        for (int face = 0; face < left.Count; face++)
        {
            if (right[face] >= 0)
            {
                order.Add(face);
            }
        }

        var patches = new BoundaryPatch[patchNames.Count];
        for (int p = 0; p < patchNames.Count; p++)
        {
            patches[p] = new BoundaryPatch(patchNames[p], p, order.Count, patchFaces[p].Count);
            order.AddRange(patchFaces[p]);
        }

        var finalLeft = new int[order.Count];
        var finalRight = new int[order.Count];
        var finalOffsets = new int[order.Count + 1];
        var finalNodes = new List<int>(nodes.Count);
        for (int f = 0; f < order.Count; f++)
        {
            int old = order[f];
            finalLeft[f] = left[old];
            finalRight[f] = right[old];
            for (int n = nodeOffsets[old]; n < nodeOffsets[old + 1]; n++)
            {
                finalNodes.Add(nodes[n]);
            }

            finalOffsets[f + 1] = finalNodes.Count;
        }

        return new AssembledFaces
        {
            InteriorFaceCount = interior,
            Left = finalLeft,
            Right = finalRight,
            NodeOffsets = finalOffsets,
            Nodes = [.. finalNodes],
            Patches = patches,
            Problems = problems,
        };
    }

    /// <summary>Local face <paramref name="k"/> of a cell, in outward order, written into <paramref name="buffer"/>.</summary>
    private static ReadOnlySpan<int> LocalFace(CellShape shape, ReadOnlySpan<int> cellNodes, int k, Span<int> buffer)
    {
        if (CellTopology.DimensionOf(shape) == 2)
        {
            buffer[0] = cellNodes[k];
            buffer[1] = cellNodes[(k + 1) % cellNodes.Length];
            return buffer[..2];
        }

        var positions = CellTopology.FacesOf(shape)[k];
        for (int i = 0; i < positions.Length; i++)
        {
            buffer[i] = cellNodes[positions[i]];
        }

        return buffer[..positions.Length];
    }
}
