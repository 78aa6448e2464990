using FvGen.Analyzers.Diagnostics;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>FVC0004: see <c>docs/rules/FVC0004.md</c>.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class OneSidedScatterAnalyzer : ConservationRuleAnalyzer
{
    public OneSidedScatterAnalyzer()
        : base(Descriptors.OneSidedScatter)
    {
    }
}
