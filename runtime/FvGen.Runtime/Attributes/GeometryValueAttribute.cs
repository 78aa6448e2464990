namespace FvGen;

/// <summary>
/// Marks a type whose values are geometry (a position, a vector, a normal, a face's measures), never
/// a conserved state, and whose members write nothing outside the value they return. The analyzers
/// read its operators as uninterpreted functions of their operands (an offset
/// <c>faceCentre - cellCentre</c> is one value, not two terms of a balance) and trust its compiled
/// members to be pure. Mark only types for which both hold: the checker cannot look into a compiled
/// body to confirm it.
/// </summary>
[AttributeUsage(AttributeTargets.Struct | AttributeTargets.Class, Inherited = false)]
public sealed class GeometryValueAttribute : Attribute
{
}
