using FvGen.Analyzers.Diagnostics;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>FVC0005: see <c>docs/rules/FVC0005.md</c>.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class InPlaceSweepAnalyzer : ConservationRuleAnalyzer
{
    public InPlaceSweepAnalyzer()
        : base(Descriptors.InPlaceSweep)
    {
    }
}
