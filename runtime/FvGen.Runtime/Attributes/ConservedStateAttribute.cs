namespace FvGen;

/// <summary>
/// Marks a <c>partial struct</c> whose fields are the conserved components of one cell
/// (for example density, momentum and total energy per unit volume).
/// </summary>
/// <remarks>
/// The generator expects a <c>partial struct</c> whose instance fields are all <see cref="double"/>
/// or structs made only of <see cref="double"/> fields (a momentum vector, say). Nested groups are
/// flattened into components named <c>Outer.Inner</c>. For the marked struct it generates
/// component-wise <c>+</c>, <c>-</c>, unary <c>-</c>, scaling by a <see cref="double"/>, <c>Zero</c>,
/// the component count and names, and span helpers.
/// </remarks>
[AttributeUsage(AttributeTargets.Struct, Inherited = false)]
public sealed class ConservedStateAttribute : Attribute
{
}
