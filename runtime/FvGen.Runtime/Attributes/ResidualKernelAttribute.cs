namespace FvGen;

/// <summary>
/// Marks a <c>static partial void</c> method whose body the generator writes: the face loops of a
/// finite-volume residual in telescoping conservative form.
/// </summary>
/// <remarks>
/// The parameters name the mesh kind (a structured grid of one, two or three dimensions, or an
/// unstructured mesh), the read-only state span, the residual span, the boundary binding and,
/// optionally, a <c>BoundaryFluxTally</c> that receives the boundary flux totals per patch and
/// component. Every face flux is evaluated once, taken from the cell on one side and given to
/// the cell on the other, so that the cell residuals times volumes sum to minus the boundary fluxes.
/// </remarks>
[AttributeUsage(AttributeTargets.Method, Inherited = false)]
public sealed class ResidualKernelAttribute : Attribute
{
    /// <summary>Creates the attribute naming the numerical flux method (use <c>nameof</c>).</summary>
    public ResidualKernelAttribute(string numericalFlux) => NumericalFlux = numericalFlux;

    /// <summary>The name of a method marked <see cref="NumericalFluxAttribute"/> in the same type.</summary>
    public string NumericalFlux { get; }

    /// <summary>
    /// How the loops run. Serial scatter by default; parallel gather on unstructured meshes; parallel
    /// coloured scatter on unstructured meshes and on 2-D and 3-D structured grids.
    /// </summary>
    public ExecutionMode Mode { get; set; } = ExecutionMode.SerialScatter;

    /// <summary>First order by default.</summary>
    public ReconstructionKind Reconstruction { get; set; } = ReconstructionKind.FirstOrder;

    /// <summary>
    /// The limiter of a linear reconstruction: minmod (the default), van Leer, MC or superbee for MUSCL on
    /// structured grids; on unstructured meshes an unset limiter means Barth–Jespersen, the only one there.
    /// </summary>
    public LimiterKind Limiter { get; set; } = LimiterKind.Minmod;

    /// <summary>
    /// The name of a user reconstruction method in the kernel's type, used when <see cref="Reconstruction"/>
    /// is <see cref="ReconstructionKind.User"/>. On structured grids: <c>static void Name(in TState leftLeft,
    /// in TState left, in TState right, in TState rightRight, out TState leftFace, out TState rightFace)</c>,
    /// the four cells along the face direction, or the same with their four widths along it
    /// (<c>double widthLeftLeft, double widthLeft, double widthRight, double widthRightRight</c>) after the
    /// cell states; next to a boundary patch the missing outer cell is a ghost extrapolated linearly
    /// from inside (the cell itself when the direction has fewer than three cells), and boundary faces
    /// are reconstructed too (docs/generator.md, "Reconstruction"). On unstructured meshes: <c>static void Name(in TState cell,
    /// in Gradient&lt;TState&gt; gradient, in Vec3 toFace, out TState faceState)</c>, for each side of every
    /// face, with the cell's Barth–Jespersen-limited Green–Gauss gradient and the vector from the cell
    /// centroid to the face centroid.
    /// </summary>
    public string? UserReconstruction { get; set; }
}
