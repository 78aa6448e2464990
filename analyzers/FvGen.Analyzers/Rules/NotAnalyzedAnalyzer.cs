using FvGen.Analyzers.Diagnostics;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>FVC0100: see <c>docs/rules/FVC0100.md</c>.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class NotAnalyzedAnalyzer : ConservationRuleAnalyzer
{
    public NotAnalyzedAnalyzer()
        : base(Descriptors.NotAnalyzed)
    {
    }
}
