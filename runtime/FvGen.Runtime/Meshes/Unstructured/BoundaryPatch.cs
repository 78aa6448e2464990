namespace FvGen.Meshes.Unstructured;

/// <summary>
/// A named set of boundary faces. The faces of a patch are contiguous in the mesh's face
/// numbering: <c>[FirstFace, FirstFace + FaceCount)</c>.
/// </summary>
/// <param name="Name">The patch name (a Gmsh physical group name, or a builder's side name).</param>
/// <param name="Index">The patch index, its position in <see cref="UnstructuredMesh.Patches"/>.</param>
/// <param name="FirstFace">The first face of the patch.</param>
/// <param name="FaceCount">The number of faces in the patch.</param>
public sealed record BoundaryPatch(string Name, int Index, int FirstFace, int FaceCount)
{
    /// <summary>One past the last face of the patch.</summary>
    public int EndFace => FirstFace + FaceCount;
}
