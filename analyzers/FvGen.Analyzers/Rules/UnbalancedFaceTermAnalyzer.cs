using FvGen.Analyzers.Diagnostics;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>FVC0002: see <c>docs/rules/FVC0002.md</c>.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class UnbalancedFaceTermAnalyzer : ConservationRuleAnalyzer
{
    public UnbalancedFaceTermAnalyzer()
        : base(Descriptors.UnbalancedFaceTerm)
    {
    }
}
