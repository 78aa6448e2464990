namespace FvGen;

/// <summary>
/// Asks the FvGen analyzers to check every hand-written update in the marked method, or in
/// every method of the marked type, against the conservation criterion: each face term must
/// leave one cell exactly as it enters the neighbouring one.
/// </summary>
/// <remarks>
/// The name and namespace of this attribute are a contract with the analyzers and never change.
/// </remarks>
[AttributeUsage(AttributeTargets.Method | AttributeTargets.Class | AttributeTargets.Struct, Inherited = false)]
public sealed class ConservativeUpdateAttribute : Attribute
{
}
