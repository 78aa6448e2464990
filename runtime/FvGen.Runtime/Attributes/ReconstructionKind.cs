namespace FvGen;

/// <summary>How face states are obtained from cell states.</summary>
public enum ReconstructionKind
{
    /// <summary>First order: the face sees the two cell averages.</summary>
    FirstOrder,

    /// <summary>MUSCL on structured grids, or limited linear reconstruction (Green–Gauss gradients) on unstructured meshes.</summary>
    Linear,

    /// <summary>A user reconstruction function named in <see cref="ResidualKernelAttribute.Reconstruction"/>.</summary>
    User,
}
