namespace FvGen.Meshes.Unstructured;

/// <summary>How the box builder fills each lattice brick.</summary>
public enum BoxCellKind
{
    /// <summary>One hexahedron per brick.</summary>
    Hexahedra,

    /// <summary>
    /// Six tetrahedra per brick about its diagonal from (x_min, y_min, z_min) to (x_max, y_max, z_max)
    /// (the Kuhn split); every brick is split the same way, so neighbouring bricks share whole triangles.
    /// </summary>
    Tetrahedra,

    /// <summary>Two prisms per brick: the brick's bottom square split as in <see cref="RectangleCellKind.Triangles"/>, extruded in z.</summary>
    Prisms,
}
