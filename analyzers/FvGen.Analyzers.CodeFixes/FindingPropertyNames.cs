using FvGen.Analyzers;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>The property names the analyzers put on diagnostics (kept equal to the engine's, which the fixes cannot see as public API).</summary>
internal static class FindingPropertyNames
{
    public const string CounterpartShift = Conservation.FindingProperties.CounterpartShift;

    public const string CounterpartTemplate = Conservation.FindingProperties.CounterpartTemplate;

    public const string SingleFactor = Conservation.FindingProperties.SingleFactor;

    public const string OppositeTarget = Conservation.FindingProperties.OppositeTarget;

    public const string SweptArray = Conservation.FindingProperties.SweptArray;

    public const string WriteStart = Conservation.FindingProperties.WriteStart;

    public const string WriteLength = Conservation.FindingProperties.WriteLength;
}
