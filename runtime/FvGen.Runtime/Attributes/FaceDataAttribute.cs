namespace FvGen;

/// <summary>
/// Marks a parameter or field that holds one value per face (a face flux, a face area). The
/// analyzers then never treat its reads as cell sources.
/// </summary>
[AttributeUsage(AttributeTargets.Parameter | AttributeTargets.Field | AttributeTargets.Property, Inherited = false)]
public sealed class FaceDataAttribute : Attribute
{
}
