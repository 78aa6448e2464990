using FvGen.Analyzers.Conservation;

namespace FvGen.Analyzers.Extraction;

/// <summary>What a local variable stands for while a loop body is read.</summary>
internal abstract record Binding;

/// <summary>A value, inlined wherever the local is read.</summary>
internal sealed record ValueBinding(SumExpr Value) : Binding;

/// <summary>An array, span or field: reads through the local are reads of <see cref="Root"/>.</summary>
internal sealed record ArrayBinding(string Root, DataRole Role) : Binding;

/// <summary>A <c>ref</c> local bound to one element.</summary>
internal sealed record RefBinding(ElementTarget Target) : Binding;

/// <summary>A local the checker cannot give a value (assigned across iterations, say), with the reason.</summary>
internal sealed record UnknownBinding(string Reason) : Binding;
