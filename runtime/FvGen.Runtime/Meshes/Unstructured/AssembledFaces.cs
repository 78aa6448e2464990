namespace FvGen.Meshes.Unstructured;

/// <summary>The faces of a mesh in their final numbering, as <see cref="FaceAssembler"/> found them.</summary>
internal sealed class AssembledFaces
{
    public required int InteriorFaceCount { get; init; }

    public required int[] Left { get; init; }

    public required int[] Right { get; init; }

    /// <summary>Offsets into <see cref="Nodes"/>.</summary>
    public required int[] NodeOffsets { get; init; }

    /// <summary>The nodes of each face in the outward order of its left cell.</summary>
    public required int[] Nodes { get; init; }

    public required BoundaryPatch[] Patches { get; init; }

    /// <summary>What stops the mesh from being built; empty when the faces are sound.</summary>
    public required List<string> Problems { get; init; }

    public int FaceCount => Left.Length;

    public ReadOnlySpan<int> NodesOf(int face) => Nodes.AsSpan(NodeOffsets[face], NodeOffsets[face + 1] - NodeOffsets[face]);
}
