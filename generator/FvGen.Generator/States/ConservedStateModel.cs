using FvGen.Generator.Common;

namespace FvGen.Generator.States;

/// <summary>
/// What the emitter needs to write the members of one conserved-state struct. Like every model of
/// the generator it holds only strings, numbers, enums and equatable arrays — never a symbol,
/// syntax node, location or compilation — so the incremental pipeline can compare and cache it.
/// </summary>
/// <param name="Location">Namespace and containing types; the state struct is the innermost type.</param>
/// <param name="FullyQualifiedName">The <c>global::</c>-qualified name of the struct.</param>
/// <param name="Components">The flattened <see cref="double"/> components, in memory order.</param>
internal sealed record ConservedStateModel(
    TypeLocation Location,
    string FullyQualifiedName,
    EquatableArray<StateComponent> Components);

/// <summary>One <see cref="double"/> component of a state.</summary>
/// <param name="Name">The flattened name, <c>Outer.Inner</c> for nested groups (the ledger and output use it).</param>
/// <param name="Access">The member access path from a state value, e.g. <c>Momentum.X</c>.</param>
internal sealed record StateComponent(string Name, string Access);
