using FvGen.Geometry;
using FvGen.Time;

namespace FvGen.Health;

/// <summary>A cell failed a health check: a non-finite component or an inadmissible state.</summary>
public sealed class UnhealthyStateException : RunStoppedException
{
    internal UnhealthyStateException(string message, int step, double time, int cell, Vec3 position, string? component, string requirement)
        : base(message, step, time)
    {
        Cell = cell;
        Position = position;
        Component = component;
        Requirement = requirement;
    }

    /// <summary>The index of the first failing cell.</summary>
    public int Cell { get; }

    /// <summary>The centroid of that cell.</summary>
    public Vec3 Position { get; }

    /// <summary>The failing component, or <see langword="null"/> when a whole-state check failed.</summary>
    public string? Component { get; }

    /// <summary>The requirement that failed, e.g. <c>finite</c> or <c>Density &gt; 0</c>.</summary>
    public string Requirement { get; }
}
