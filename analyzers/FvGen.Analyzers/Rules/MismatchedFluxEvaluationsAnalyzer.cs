using FvGen.Analyzers.Diagnostics;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>FVC0003: see <c>docs/rules/FVC0003.md</c>.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class MismatchedFluxEvaluationsAnalyzer : ConservationRuleAnalyzer
{
    public MismatchedFluxEvaluationsAnalyzer()
        : base(Descriptors.MismatchedFluxEvaluations)
    {
    }
}
