namespace FvGen.Meshes.Unstructured;

/// <summary>
/// The interior faces of a mesh split into colours such that no two faces of one colour share a
/// cell, so the faces of one colour can scatter into their cells in parallel without races.
/// </summary>
public sealed class FaceColouring
{
    private readonly int[] _colourOffsets;
    private readonly int[] _faces;

    private FaceColouring(int[] colourOffsets, int[] faces)
    {
        _colourOffsets = colourOffsets;
        _faces = faces;
    }

    /// <summary>Number of colours.</summary>
    public int ColourCount => _colourOffsets.Length - 1;

    /// <summary>Offsets into <see cref="Faces"/>: colour <c>k</c> is <c>Faces[ColourOffsets[k]..ColourOffsets[k + 1]]</c>.</summary>
    public ReadOnlySpan<int> ColourOffsets => _colourOffsets;

    /// <summary>The interior faces, colour by colour, ascending within a colour.</summary>
    public ReadOnlySpan<int> Faces => _faces;

    /// <summary>Greedy colouring in face order: each face takes the smallest colour unused by its two cells.</summary>
    internal static FaceColouring Compute(UnstructuredMesh mesh)
    {
        int faces = mesh.InteriorFaceCount;
        var colourOf = new int[faces];
        var left = mesh.FaceLeft;
        var right = mesh.FaceRight;
        var cellFaceOffsets = mesh.CellFaceOffsets.ToArray();
        var cellFaces = mesh.CellFaces.ToArray();
        var used = new List<bool>();
        int colours = 0;
        Array.Fill(colourOf, -1);
        for (int f = 0; f < faces; f++)
        {
            used.Clear();
            MarkUsed(left[f]);
            MarkUsed(right[f]);
            int colour = 0;
            while (colour < used.Count && used[colour])
            {
                colour++;
            }

            colourOf[f] = colour;
            colours = Math.Max(colours, colour + 1);
        }

        var offsets = new int[colours + 1];
        foreach (int c in colourOf)
        {
            offsets[c + 1]++;
        }

        for (int k = 0; k < colours; k++)
        {
            offsets[k + 1] += offsets[k];
        }

        var fill = (int[])offsets.Clone();
        var ordered = new int[faces];
        for (int f = 0; f < faces; f++)
        {
            ordered[fill[colourOf[f]]++] = f;
        }

        return new FaceColouring(offsets, ordered);

        void MarkUsed(int cell)
        {
            for (int n = cellFaceOffsets[cell]; n < cellFaceOffsets[cell + 1]; n++)
            {
                int g = cellFaces[n];
                if (g < faces && colourOf[g] >= 0)
                {
                    while (used.Count <= colourOf[g])
                    {
                        used.Add(false);
                    }

                    used[colourOf[g]] = true;
                }
            }
        }
    }
}
