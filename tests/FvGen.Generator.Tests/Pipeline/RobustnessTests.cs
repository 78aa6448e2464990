using FvGen.Generator.Tests.Support;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace FvGen.Generator.Tests.Pipeline;

/// <summary>The generator and the usage analyzer never throw, whatever half-typed code they meet.</summary>
public sealed class RobustnessTests
{
    public static TheoryData<string> SampleNames => new() { nameof(Samples.State), nameof(Samples.Conduction1D), nameof(Samples.ConductionUnstructured), nameof(Samples.Muscl1D), nameof(Samples.Gather2D), nameof(Samples.UserUnstructured), nameof(Samples.Other) };

    [Theory]
    [MemberData(nameof(SampleNames))]
    public async Task EveryTokenPrefixOfASampleIsHandledWithoutException(string name)
    {
        string source = (string)typeof(Samples).GetField(name)!.GetValue(null)!;
        var tokens = CSharpSyntaxTree.ParseText(source, GeneratorHarness.ParseOptions).GetRoot().DescendantTokens().ToList();
        Assert.True(tokens.Count > 20);
        int index = 0;
        foreach (var token in tokens)
        {
            string prefix = source[..token.Span.End];
            var compilation = GeneratorHarness.Compile(prefix, name == nameof(Samples.State) ? "" : Samples.Scalar);
            await AssertNoCrash(compilation, $"prefix ending at token {index} '{token.Text}'");
            index++;
        }
    }

    public static TheoryData<string> Malformed => new()
    {
        "[ConservedState] partial struct Empty { }",
        "[ConservedState] partial struct Loop { public Loop Inner; }",
        "[ConservedState] partial struct Holder { public Inner Part; } struct Inner { private double hidden; }",
        "[ConservedState] partial struct Prop { public double Mass { get; set; } }",
        "[ConservedState] partial struct Generic<T> { public double Mass; }",
        "[ConservedState] partial record struct Rec(double Mass);",
        "[ConservedState(1)] partial struct Args { public double Mass; }",
        "partial class C { [NumericalFlux] static void F() { } }",
        "partial class C { [NumericalFlux] Heat F(Heat a, Heat b, FaceGeometry f) => a; }",
        "partial class C { [NumericalFlux] static Heat F<T>(in Heat a, in Heat b, in FaceGeometry f) => a; }",
        "partial class C { [BoundaryFlux] static Heat B(in Heat a, in FaceGeometry f) => a; }",
        "partial class C { [BoundaryFlux(BoundaryKind.Wall, 3)] static Heat B(in Heat a, in FaceGeometry f) => a; }",
        "partial class C { [ResidualKernel] static partial void R(); }",
        "partial class C { [ResidualKernel(null)] static partial void R(); }",
        "partial class C { [ResidualKernel(nameof(R))] static partial void R(StructuredGrid1D g); }",
        "partial class C { [ResidualKernel(\"F\")] static partial void R(ref StructuredGrid1D g, ReadOnlySpan<Heat> u, Span<Heat> r); }",
        "partial class C { [ResidualKernel(\"F\")] static partial void R(StructuredGrid1D g, StructuredGrid2D h, ReadOnlySpan<Heat> u, Span<Heat> r); }",
        "partial class C { [ResidualKernel(\"F\")] static partial void R(StructuredGrid1D g, ReadOnlySpan<Missing> u, Span<Missing> r); }",
        "partial class C { [ResidualKernel(\"F\")] static partial void R(StructuredGrid1D g, ReadOnlySpan<Heat> u, Span<Heat> r, BoundaryBinding<int> b); }",
        "partial class C { [ResidualKernel(\"F\", Mode = (ExecutionMode)77)] static partial int R(StructuredGrid1D g, ReadOnlySpan<Heat> u, Span<Heat> r); }",
        "partial class C { [ResidualKernel(\"F\")] static partial void R<T>(StructuredGrid1D g, ReadOnlySpan<Heat> u, Span<Heat> r); }",
        "partial class C { [ResidualKernel(\"F\")] static partial void R(StructuredGrid1D g, ReadOnlySpan<Heat> u, Span<Heat> r); static partial void R(StructuredGrid1D g, ReadOnlySpan<Heat> u, Span<Heat> r) { } }",
        "[ResidualKernel(\"F\")] partial class NotAMethod { }",
        "partial class C { [ResidualKernel(\"F\"), ResidualKernel(\"G\")] static partial void R(StructuredGrid1D g, ReadOnlySpan<Heat> u, Span<Heat> r); }",
    };

    [Theory]
    [MemberData(nameof(Malformed))]
    public async Task MalformedDeclarationsAreHandledWithoutException(string declaration)
    {
        string source = "using System; using FvGen; using FvGen.Boundaries; using FvGen.Geometry; using FvGen.Meshes.Structured;\nnamespace Demo;\n" + declaration;
        await AssertNoCrash(GeneratorHarness.Compile(source, Samples.Scalar), declaration);
    }

    private static async Task AssertNoCrash(Compilation compilation, string what)
    {
        var driver = GeneratorHarness.Driver().RunGeneratorsAndUpdateCompilation(compilation, out var output, out var diagnostics);
        var result = driver.GetRunResult().Results[0];
        Assert.True(result.Exception is null, $"{what}: the generator threw {result.Exception}");
        Assert.DoesNotContain(diagnostics, d => d.Id == "CS8785");
        var analyzed = await GeneratorHarness.AnalyzeAsync(output);
        Assert.DoesNotContain(analyzed, d => d.Id == "AD0001");
    }
}
