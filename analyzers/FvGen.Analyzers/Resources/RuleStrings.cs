using System.Resources;

namespace FvGen.Analyzers;

/// <summary>Access to <c>RuleStrings.resx</c> (embedded as <c>FvGen.Analyzers.Resources.RuleStrings.resources</c>).</summary>
internal static class RuleStrings
{
    public static ResourceManager ResourceManager { get; } = new("FvGen.Analyzers.Resources.RuleStrings", typeof(RuleStrings).Assembly);
}
