using FvGen.Analyzers.CodeFixes;
using FvGen.Analyzers.Tests.Verifiers;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.Tests.CodeFixes;

/// <summary>When moving a face term one cell along its loop keeps its meaning, decided on kernels directly (shapes the rules may not report).</summary>
public sealed class ShiftSafetyTests
{
    private static readonly Dictionary<string, long> West = new() { ["i"] = -1 };

    /// <summary>Compiles a loop body and asks whether the initializer of <c>fe</c> can be shifted by <c>i = −1</c>.</summary>
    private static bool CanShiftFe(string beforeLoop, string body)
    {
        string source = TestReferences.Usings + $$"""
            static class Kernel
            {
                static double F(double a, double b) => b - a;
                static double G(double a, ref double b) => b - a;
                const double Half = 0.5;

                static void Rate(double[] u, double[] r, double k)
                {
                    {{beforeLoop}}
                    for (int i = 1; i < u.Length - 1; i++)
                    {
                        {{body}}
                    }
                }
            }
            """;
        var tree = CSharpSyntaxTree.ParseText(source);
        var compilation = CSharpCompilation.Create("Shift", [tree], TestReferences.All, new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary));
        Assert.Empty(compilation.GetDiagnostics().Where(d => d.Severity == DiagnosticSeverity.Error));
        var declarator = tree.GetRoot().DescendantNodes().OfType<VariableDeclaratorSyntax>().Single(v => v.Identifier.ValueText == "fe");
        return ShiftSafety.CanShift(declarator.Initializer!.Value, West, compilation.GetSemanticModel(tree), CancellationToken.None);
    }

    [Fact]
    public void ArraysParametersAndConstantsShift() =>
        Assert.True(CanShiftFe("", "double fe = Half * k * F(u[i], u[i + 1]); r[i] = fe;"));

    [Fact]
    public void LocalOfTheLoopDoesNotShift() =>
        Assert.False(CanShiftFe("", "double left = u[i]; double fe = F(left, u[i + 1]); r[i] = fe;"));

    [Fact]
    public void LocalBeforeTheLoopShiftsUnlessTheLoopWritesIt()
    {
        Assert.True(CanShiftFe("double scale = 2;", "double fe = scale * F(u[i], u[i + 1]); r[i] = fe;"));
        Assert.False(CanShiftFe("double scale = 2;", "double fe = scale * F(u[i], u[i + 1]); scale += 1; r[i] = fe;"));
    }

    [Fact]
    public void ParameterWrittenInTheLoopDoesNotShift() =>
        Assert.False(CanShiftFe("", "double fe = k * F(u[i], u[i + 1]); k = fe; r[i] = fe;"));

    [Fact]
    public void ReferenceArgumentIsASideEffect() =>
        Assert.False(CanShiftFe("double s = 0;", "double fe = G(u[i], ref s); r[i] = fe;"));

    [Fact]
    public void IncrementInsideTheTermIsASideEffect() =>
        Assert.False(CanShiftFe("int calls = 0;", "double fe = F(u[i], u[i + 1]) + calls++; r[i] = fe;"));
}
