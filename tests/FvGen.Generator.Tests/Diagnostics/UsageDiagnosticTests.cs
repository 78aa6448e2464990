using FvGen.Generator.Tests.Support;
using Microsoft.CodeAnalysis;

namespace FvGen.Generator.Tests.Diagnostics;

/// <summary>Each FVG diagnostic fires on its misuse, at the offending declaration, and nowhere else.</summary>
public sealed class UsageDiagnosticTests
{
    private const string Preamble = """
        using System;
        using FvGen;
        using FvGen.Boundaries;
        using FvGen.Geometry;
        using FvGen.Ledger;
        using FvGen.Meshes.Structured;
        using FvGen.Meshes.Unstructured;

        namespace Demo;

        """;

    private const string Flux = """
            [NumericalFlux]
            public static Heat Central(in Heat left, in Heat right, in FaceGeometry face) => 0.5 * (left + right);
        """;

    /// <summary>(diagnostic ID, source after the preamble, the text the diagnostic must point at).</summary>
    public static TheoryData<string, string, string> Cases => new()
    {
        { "FVG0001", "[ConservedState] public struct Plain { public double Mass; }", "Plain" },
        { "FVG0001", "[ConservedState] public partial class Boxed { public double Mass; }", "Boxed" },
        { "FVG0002", "[ConservedState] public partial struct Counted { public double Mass; public int Count; }", "Count" },
        { "FVG0002", "[ConservedState] public partial struct Frozen { public readonly double Mass; }", "Mass" },
        { "FVG0003", "public static partial class P { [NumericalFlux] public static double Bad(in Heat left, in Heat right, in FaceGeometry face) => 0; }", "Bad" },
        { "FVG0003", "public static partial class P { [NumericalFlux] public static Heat Two(in Heat left, in Heat right) => left; }", "Two" },
        { "FVG0004", "public static partial class P { [BoundaryFlux(BoundaryKind.Wall)] public static Heat NoFace(in Heat inside) => inside; }", "NoFace" },
        { "FVG0005", "public static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central))] public static void Written(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r) { } }", "Written" },
        { "FVG0005", "public partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central))] public partial void Instance(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r); }", "Instance" },
        { "FVG0006", "public static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central))] public static partial void Odd(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r, int steps); }", "steps" },
        { "FVG0006", "public static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central))] public static partial void Meshless(ReadOnlySpan<Heat> u, Span<Heat> r); }", "Meshless" },
        { "FVG0007", "public static partial class P {\n" + Flux + "\n[ResidualKernel(\"Missing\")] public static partial void Lost(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r); }", "Lost" },
        { "FVG0008", "public static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.BarthJespersen)] public static partial void Wrong(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r); }", "Wrong" },
        { "FVG0008", "public static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central), Reconstruction = (ReconstructionKind)9)] public static partial void Unknown(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r); }", "Unknown" },
        { "FVG0008", "public static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central), Reconstruction = ReconstructionKind.User)] public static partial void Unnamed(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r); }", "Unnamed" },
        { "FVG0008", "public static partial class P {\n" + Flux + "\npublic static void Recon(in Heat a, in Heat b, in Heat c, in Heat d, Heat e, Heat f) { }\n[ResidualKernel(nameof(Central), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(Recon))] public static partial void BadRecon(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r); }", "BadRecon" },
        { "FVG0008", "public static partial class P {\n" + Flux + "\npublic static void Recon(in Heat a, in Heat b, in Heat c, in Heat d, int wa, double wb, double wc, double wd, out Heat e, out Heat f) { e = a; f = b; }\n[ResidualKernel(nameof(Central), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(Recon))] public static partial void IntegerWidth(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r); }", "IntegerWidth" },
        { "FVG0008", "public static partial class P {\n" + Flux + "\npublic static void Recon(in Heat a, in Heat b, in Heat c, in Heat d, out Heat e, out Heat f) { e = a; f = b; }\n[ResidualKernel(nameof(Central), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(Recon))] public static partial void Stencil(UnstructuredMesh mesh, ReadOnlySpan<Heat> u, Span<Heat> r, Span<Gradient<Heat>> g); }", "Stencil" },
        { "FVG0009", "public static partial class P { [BoundaryFlux((BoundaryKind)42)] public static Heat Strange(in Heat inside, in FaceGeometry face) => inside; }", "Strange" },
        { "FVG0010", "[ConservedState] public partial struct Other { public double Q; }\npublic static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central))] public static partial void Mixed(StructuredGrid1D grid, ReadOnlySpan<Other> u, Span<Other> r); }", "Mixed" },
        { "FVG0011", "public static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central), Mode = ExecutionMode.ParallelGather)] public static partial void Fast(StructuredGrid2D grid, ReadOnlySpan<Heat> u, Span<Heat> r); }", "Fast" },
        { "FVG0011", "public static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central), Mode = ExecutionMode.ParallelColouredScatter)] public static partial void Line(StructuredGrid1D grid, ReadOnlyMemory<Heat> u, Memory<Heat> r, System.Threading.Tasks.ParallelOptions options); }", "Line" },
        { "FVG0011", "public static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central), Mode = ExecutionMode.ParallelColouredScatter)] public static partial void Spans(UnstructuredMesh mesh, ReadOnlySpan<Heat> u, Span<Heat> r); }", "Spans" },
        { "FVG0011", "public static partial class P {\n" + Flux + "\n[ResidualKernel(nameof(Central), Mode = ExecutionMode.SerialScatter)] public static partial void Twice(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r, ExecutionMode mode); }", "Twice" },
        { "FVG0012", "public static class Closed {\n" + Flux + "\n[ResidualKernel(nameof(Central))] public static partial void Shut(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r); }", "Shut" },
        { "FVG0013", "public static partial class P {\n" + Flux + "\npublic const int Boundary = 3;\n[BoundaryFlux(BoundaryKind.Wall)] public static Heat Wall(in Heat inside, in FaceGeometry face) => inside;\n[ResidualKernel(nameof(Central))] public static partial void Taken(StructuredGrid1D grid, ReadOnlySpan<Heat> u, Span<Heat> r); }", "Boundary" },
    };

    [Theory]
    [MemberData(nameof(Cases))]
    public async Task MisuseIsReportedAtTheDeclaration(string id, string source, string pointsAt)
    {
        var (result, output) = GeneratorHarness.Run(GeneratorHarness.Compile(Preamble + source, Samples.Scalar));
        Assert.Null(result.Results[0].Exception);
        var fvg = (await GeneratorHarness.AnalyzeAsync(output)).Where(d => d.Id.StartsWith("FVG", StringComparison.Ordinal)).ToList();
        var diagnostic = Assert.Single(fvg);
        Assert.Equal(id, diagnostic.Id);
        Assert.Equal(DiagnosticSeverity.Error, diagnostic.Severity);
        Assert.Equal(pointsAt, diagnostic.Location.SourceTree!.GetText().ToString(diagnostic.Location.SourceSpan));
        Assert.EndsWith("docs/rules/" + id + ".md", diagnostic.Descriptor.HelpLinkUri);
        Assert.DoesNotContain(result.Results[0].GeneratedSources, g => g.HintName.EndsWith(".Residual.g.cs", StringComparison.Ordinal));
    }

    [Fact]
    public async Task NestedGenericTypesAndKeywordParameterNamesCompile()
    {
        string source = Preamble + """
            public partial class Outer
            {
                public static partial class Physics<TTag>
                {
                    [NumericalFlux]
                    public static Heat Upwind(in Heat left, in Heat right, in FaceGeometry face) => face.Normal.X >= 0 ? face.Normal.X * left : face.Normal.X * right;

                    [BoundaryFlux(BoundaryKind.Outflow)]
                    public static Heat Out(in Heat inside, in FaceGeometry face) => face.Normal.X * inside;

                    [ResidualKernel(nameof(Upwind))]
                    public static partial void Residual(StructuredGrid3D grid, ReadOnlySpan<Heat> @in, Span<Heat> @out, BoundaryBinding<Boundary> @params, BoundaryFluxTally? @ref);
                }
            }

            [ConservedState]
            public partial struct Keyworded
            {
                public double @double;
            }
            """;
        var (result, output) = GeneratorHarness.Run(GeneratorHarness.Compile(source, Samples.Scalar));
        Assert.Null(result.Results[0].Exception);
        Assert.Empty(GeneratorHarness.Errors(output));
        Assert.Empty(await GeneratorHarness.AnalyzeAsync(output));
        Assert.Contains(result.Results[0].GeneratedSources, g => g.HintName == "Demo.Outer.Physics.Residual.Residual.g.cs");
    }

    [Fact]
    public async Task PragmaSuppressesAnFvgDiagnostic()
    {
        string source = Preamble + "#pragma warning disable FVG0002\n[ConservedState] public partial struct Counted { public double Mass; public int Count; }\n#pragma warning restore FVG0002\n";
        var (_, output) = GeneratorHarness.Run(GeneratorHarness.Compile(source));
        Assert.DoesNotContain(await GeneratorHarness.AnalyzeAsync(output), d => d.Id == "FVG0002");
    }

    [Fact]
    public async Task WellFormedSamplesCompileWithoutErrorsOrDiagnostics()
    {
        var (result, output) = GeneratorHarness.Run(GeneratorHarness.Compile(
            Samples.State, Samples.Scalar, Samples.Conduction1D, Samples.ConductionUnstructured, Samples.Other));
        Assert.Null(result.Results[0].Exception);
        Assert.Empty(GeneratorHarness.Errors(output));
        Assert.Empty(await GeneratorHarness.AnalyzeAsync(output));
        Assert.Equal(7, result.Results[0].GeneratedSources.Length); // two states, two Boundary enums, three kernels
    }
}
