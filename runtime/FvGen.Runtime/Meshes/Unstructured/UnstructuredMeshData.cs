using FvGen.Geometry;

namespace FvGen.Meshes.Unstructured;

/// <summary>The arrays an <see cref="UnstructuredMesh"/> is made of, as computed by the builder.</summary>
internal sealed class UnstructuredMeshData
{
    public required int Dimension { get; init; }

    public required int InteriorFaceCount { get; init; }

    public required int[] FaceLeft { get; init; }

    public required int[] FaceRight { get; init; }

    public required Vec3[] FaceAreaVectors { get; init; }

    public required Vec3[] FaceCentroids { get; init; }

    public required int[] FaceNodeOffsets { get; init; }

    public required int[] FaceNodes { get; init; }

    public required double[] CellVolumes { get; init; }

    public required Vec3[] CellCentroids { get; init; }

    public required Vec3[] Points { get; init; }

    public required int[] CellNodeOffsets { get; init; }

    public required int[] CellNodes { get; init; }

    public required CellShape[] CellShapes { get; init; }

    public required BoundaryPatch[] Patches { get; init; }
}
