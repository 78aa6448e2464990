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

    /// <summary>How the loops run. Serial scatter by default.</summary>
    public ExecutionMode Mode { get; set; } = ExecutionMode.SerialScatter;

    /// <summary>First order by default.</summary>
    public ReconstructionKind Reconstruction { get; set; } = ReconstructionKind.FirstOrder;

    /// <summary>The limiter of a linear reconstruction.</summary>
    public LimiterKind Limiter { get; set; } = LimiterKind.Minmod;

    /// <summary>The name of a user reconstruction method when <see cref="Reconstruction"/> is <see cref="ReconstructionKind.User"/>.</summary>
    public string? UserReconstruction { get; set; }
}
