namespace FvGen;

/// <summary>
/// Marks a static method that computes the numerical flux per unit area through one face.
/// </summary>
/// <remarks>
/// Expected signature: <c>static TState Name(in TState left, in TState right, in FaceGeometry face)</c>,
/// where <c>TState</c> is a <see cref="ConservedStateAttribute">conserved state</see> and
/// <see cref="Geometry.FaceGeometry.Normal"/> points from the left cell to the right cell. The flux
/// returned is what leaves the left cell and enters the right one, per unit face area.
/// The method must be pure: it reads only its arguments and writes nothing outside itself.
/// </remarks>
[AttributeUsage(AttributeTargets.Method, Inherited = false)]
public sealed class NumericalFluxAttribute : Attribute
{
    /// <summary>
    /// Declares that swapping the two states and reversing the normal negates the flux:
    /// <c>F(a, b, n) == -F(b, a, -n)</c>. The analyzers use this when they compare the two
    /// evaluations of one face.
    /// </summary>
    public bool Antisymmetric { get; set; }
}
