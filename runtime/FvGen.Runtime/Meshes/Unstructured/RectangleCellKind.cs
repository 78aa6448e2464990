namespace FvGen.Meshes.Unstructured;

/// <summary>How the rectangle builder fills each lattice square.</summary>
public enum RectangleCellKind
{
    /// <summary>One quadrilateral per square.</summary>
    Quadrilaterals,

    /// <summary>Two triangles per square, split along the diagonal from its lower-left to its upper-right corner.</summary>
    Triangles,
}
