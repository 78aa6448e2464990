using Microsoft.CodeAnalysis;

namespace FvGen.Generator.Diagnostics;

/// <summary>
/// A misuse found while parsing a declaration. Problems never enter a model: the generator drops
/// them (it only skips what it cannot generate), and <see cref="FvGenUsageAnalyzer"/> reports them,
/// so that they are suppressible with <c>#pragma</c> like any analyzer diagnostic.
/// </summary>
internal readonly struct Problem
{
    public Problem(DiagnosticDescriptor descriptor, Location? location, params object[] arguments)
    {
        Descriptor = descriptor;
        Location = location;
        Arguments = arguments;
    }

    public DiagnosticDescriptor Descriptor { get; }

    public Location? Location { get; }

    public object[] Arguments { get; }

    public Diagnostic ToDiagnostic() => Diagnostic.Create(Descriptor, Location, Arguments);
}
