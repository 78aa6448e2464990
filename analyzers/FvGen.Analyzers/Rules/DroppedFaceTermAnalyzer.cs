using FvGen.Analyzers.Diagnostics;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Rules;

/// <summary>FVC0001: see <c>docs/rules/FVC0001.md</c>.</summary>
[DiagnosticAnalyzer(LanguageNames.CSharp)]
public sealed class DroppedFaceTermAnalyzer : ConservationRuleAnalyzer
{
    public DroppedFaceTermAnalyzer()
        : base(Descriptors.DroppedFaceTerm)
    {
    }
}
