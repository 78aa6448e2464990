using System.Collections.Immutable;
using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;
using FvGen.Generator;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Tests.Generated;

/// <summary>
/// Runs the conservation rules over the generator's own output, with analysis of generated code
/// on and the scope widened to every method: the generated face loops must prove conservative.
/// </summary>
public sealed class GeneratedKernelsAreProvenTests
{
    private const string Physics = """
        using System;
        using System.Threading.Tasks;
        using FvGen;
        using FvGen.Boundaries;
        using FvGen.Geometry;
        using FvGen.Ledger;
        using FvGen.Meshes.Structured;
        using FvGen.Meshes.Unstructured;

        namespace Plant;

        [ConservedState]
        public partial struct Coolant
        {
            public double Mass;
            public double Enthalpy;
        }

        public static partial class Loop
        {
            [NumericalFlux]
            public static Coolant Upwind(in Coolant left, in Coolant right, in FaceGeometry face)
            {
                double un = face.Normal.X + 0.5 * face.Normal.Y + 0.25 * face.Normal.Z;
                return un >= 0 ? un * left : un * right;
            }

            [BoundaryFlux(BoundaryKind.Outflow)]
            public static Coolant Drain(in Coolant inside, in FaceGeometry face) => face.Normal.X * inside;

            [BoundaryFlux(BoundaryKind.Wall)]
            public static Coolant Shell(in Coolant inside, in FaceGeometry face) => default;

            // Half a cell along the limited gradient, as a user reconstruction on an unstructured mesh.
            public static void HalfSlope(in Coolant cell, in Gradient<Coolant> gradient, in Vec3 toFace, out Coolant faceState) =>
                faceState = cell + 0.5 * (toFace.X * gradient.X + toFace.Y * gradient.Y + toFace.Z * gradient.Z);

            // Fromm's central slope as a user reconstruction (LeVeque 2002, §6.5): each face sees its two cells extrapolated half a cell.
            public static void Fromm(in Coolant leftLeft, in Coolant left, in Coolant right, in Coolant rightRight, out Coolant leftFace, out Coolant rightFace)
            {
                leftFace = left + 0.25 * (right - leftLeft);
                rightFace = right - 0.25 * (rightRight - left);
            }
        __KERNEL__
        }
        """;

    public static TheoryData<string, string> Kernels => new()
    {
        { "1-D serial with patches and a tally", "[ResidualKernel(nameof(Upwind))] public static partial void Residual(StructuredGrid1D grid, ReadOnlySpan<Coolant> state, Span<Coolant> rate, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);" },
        { "2-D serial", "[ResidualKernel(nameof(Upwind))] public static partial void Residual(StructuredGrid2D grid, ReadOnlySpan<Coolant> state, Span<Coolant> rate, BoundaryBinding<Boundary> boundaries);" },
        { "3-D serial", "[ResidualKernel(nameof(Upwind))] public static partial void Residual(StructuredGrid3D grid, ReadOnlySpan<Coolant> state, Span<Coolant> rate, BoundaryBinding<Boundary> boundaries);" },
        { "unstructured serial", "[ResidualKernel(nameof(Upwind))] public static partial void Residual(UnstructuredMesh mesh, ReadOnlySpan<Coolant> state, Span<Coolant> rate, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);" },
        // MUSCL: the far neighbours are read at plain offsets, each in the `if` branch that has it.
        { "1-D MUSCL minmod", "[ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.Minmod)] public static partial void Residual(StructuredGrid1D grid, ReadOnlySpan<Coolant> state, Span<Coolant> rate, BoundaryBinding<Boundary> boundaries);" },
        { "2-D MUSCL minmod", "[ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear, Limiter = LimiterKind.Minmod)] public static partial void Residual(StructuredGrid2D grid, ReadOnlySpan<Coolant> state, Span<Coolant> rate, BoundaryBinding<Boundary> boundaries);" },
        { "unstructured coloured scatter", "[ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelColouredScatter)] public static partial void Residual(UnstructuredMesh mesh, ReadOnlyMemory<Coolant> state, Memory<Coolant> rate, BoundaryBinding<Boundary> boundaries, ParallelOptions options);" },
        { "2-D coloured scatter", "[ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelColouredScatter)] public static partial void Residual(StructuredGrid2D grid, ReadOnlyMemory<Coolant> state, Memory<Coolant> rate, BoundaryBinding<Boundary> boundaries, ParallelOptions options);" },
        { "3-D coloured scatter", "[ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelColouredScatter)] public static partial void Residual(StructuredGrid3D grid, ReadOnlyMemory<Coolant> state, Memory<Coolant> rate, BoundaryBinding<Boundary> boundaries, ParallelOptions options);" },

        // User reconstruction: next to a boundary patch the far neighbour is chosen by a condition; the
        // reconstructed face states feed one flux, given to the two cells of the face with opposite signs.
        { "1-D user reconstruction", "[ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(Fromm))] public static partial void Residual(StructuredGrid1D grid, ReadOnlySpan<Coolant> state, Span<Coolant> rate, BoundaryBinding<Boundary> boundaries, BoundaryFluxTally? tally);" },
        { "2-D user reconstruction", "[ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(Fromm))] public static partial void Residual(StructuredGrid2D grid, ReadOnlySpan<Coolant> state, Span<Coolant> rate, BoundaryBinding<Boundary> boundaries);" },
        { "3-D user reconstruction", "[ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(Fromm))] public static partial void Residual(StructuredGrid3D grid, ReadOnlySpan<Coolant> state, Span<Coolant> rate, BoundaryBinding<Boundary> boundaries);" },

        // Second order on unstructured meshes: the face states use the runtime's Vec3 arithmetic (read as
        // uninterpreted geometry values); the Green-Gauss pass fills the gradient buffer, face data for the face loop.
        { "unstructured Barth-Jespersen", "[ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.Linear)] public static partial void Residual(UnstructuredMesh mesh, ReadOnlySpan<Coolant> state, Span<Coolant> rate, Span<Gradient<Coolant>> gradients, BoundaryBinding<Boundary> boundaries);" },
        { "unstructured user reconstruction", "[ResidualKernel(nameof(Upwind), Reconstruction = ReconstructionKind.User, UserReconstruction = nameof(HalfSlope))] public static partial void Residual(UnstructuredMesh mesh, ReadOnlySpan<Coolant> state, Span<Coolant> rate, Span<Gradient<Coolant>> gradients, BoundaryBinding<Boundary> boundaries);" },
    };

    /// <summary>
    /// The structured parallel gather: face fluxes into the face buffer (the periodic wrap face on both of
    /// its node planes), then each cell sums its low face minus its high face per direction.
    /// </summary>
    public static TheoryData<string, string> StructuredGathers => new()
    {
        { "1-D structured gather", "[ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelGather)] public static partial void Residual(StructuredGrid1D grid, ReadOnlyMemory<Coolant> state, Memory<Coolant> rate, [FaceData] Memory<Coolant> faceFlux, BoundaryBinding<Boundary> boundaries, ParallelOptions options);" },
        { "2-D structured gather", "[ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelGather)] public static partial void Residual(StructuredGrid2D grid, ReadOnlyMemory<Coolant> state, Memory<Coolant> rate, [FaceData] Memory<Coolant> faceFlux, BoundaryBinding<Boundary> boundaries, ParallelOptions options);" },
        { "3-D structured gather", "[ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelGather)] public static partial void Residual(StructuredGrid3D grid, ReadOnlyMemory<Coolant> state, Memory<Coolant> rate, [FaceData] Memory<Coolant> faceFlux, BoundaryBinding<Boundary> boundaries, ParallelOptions options);" },
    };

    /// <summary>
    /// The unstructured parallel gather: face fluxes into the face buffer, then each cell sums its
    /// faces from the cell-to-face list, with the sign of its side. Checked as the face loop it is.
    /// </summary>
    private const string UnstructuredGather = "[ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelGather)] public static partial void Residual(UnstructuredMesh mesh, ReadOnlyMemory<Coolant> state, Memory<Coolant> rate, [FaceData] Memory<Coolant> faceFlux, BoundaryBinding<Boundary> boundaries, ParallelOptions options);";

    /// <summary>The unstructured parallel gather with Barth-Jespersen reconstruction: a gradient pass, then as above.</summary>
    private const string UnstructuredGatherSecondOrder = "[ResidualKernel(nameof(Upwind), Mode = ExecutionMode.ParallelGather, Reconstruction = ReconstructionKind.Linear)] public static partial void Residual(UnstructuredMesh mesh, ReadOnlyMemory<Coolant> state, Memory<Coolant> rate, [FaceData] Memory<Coolant> faceFlux, Memory<Gradient<Coolant>> gradients, BoundaryBinding<Boundary> boundaries, ParallelOptions options);";

    public static TheoryData<string, string> UnstructuredGathers => new()
    {
        { "unstructured parallel gather", UnstructuredGather },
        { "unstructured gather Barth-Jespersen", UnstructuredGatherSecondOrder },
    };

    /// <summary>Slips inserted into the gather's per-cell sum: each must be refuted.</summary>
    public static TheoryData<string, string, string> GatherSlips => new()
    {
        { "both sides subtract", "sum += faceFlux[f];", "sum -= faceFlux[f];" },
        { "both sides add", "sum -= faceFlux[f];", "sum += faceFlux[f];" },
        { "right side dropped", "sum += faceFlux[f];", ";" },
        { "left side dropped", "sum -= faceFlux[f];", ";" },
    };

    [Theory]
    [MemberData(nameof(Kernels))]
    public async Task GeneratedFaceLoopsProveConservative(string description, string kernel)
    {
        var (generated, generatedTrees) = Generate(description, kernel);

        var inGenerated = (await AnalyzeAsync(generated)).Where(d => d.Location.SourceTree is { } t && generatedTrees.Contains(t)).ToList();

        Assert.True(inGenerated.Count == 0, description + ": the generated loops should prove conservative, but:\n" + AnalyzerRun.Describe(inGenerated));
    }

    [Theory]
    [MemberData(nameof(UnstructuredGathers))]
    public async Task GeneratedUnstructuredGatherProvesConservative(string description, string kernel)
    {
        var (generated, generatedTrees) = Generate(description, kernel);

        var inGenerated = (await AnalyzeAsync(generated)).Where(d => d.Location.SourceTree is { } t && generatedTrees.Contains(t)).ToList();

        Assert.True(inGenerated.Count == 0, description + ": the gather should prove conservative, but:\n" + AnalyzerRun.Describe(inGenerated));
    }

    [Theory]
    [MemberData(nameof(GatherSlips))]
    public async Task SlipInsertedIntoTheGeneratedGatherIsCaught(string description, string from, string to)
    {
        foreach (string kernel in new[] { UnstructuredGather, UnstructuredGatherSecondOrder })
        {
            await SlipIsCaughtAsync(description, kernel, from, to);
        }
    }

    private static async Task SlipIsCaughtAsync(string description, string kernel, string from, string to)
    {
        var (generated, generatedTrees) = Generate(description, kernel);
        var residualTree = generatedTrees.Single(t => t.FilePath.EndsWith(".Residual.g.cs", StringComparison.Ordinal));
        string text = residualTree.GetText().ToString();
        Assert.True(text.Split(from).Length == 2, description + ": `" + from + "` should occur once in the generated gather");
        var broken = generated.ReplaceSyntaxTree(
            residualTree,
            CSharpSyntaxTree.ParseText(text.Replace(from, to), (CSharpParseOptions)residualTree.Options, residualTree.FilePath));

        var found = (await AnalyzeAsync(broken)).Select(d => d.Id).ToList();

        Assert.True(found.Any(id => id is "FVC0002" or "FVC0004"), description + ": expected FVC0002 or FVC0004, got " + string.Join(", ", found));
    }

    [Theory]
    [MemberData(nameof(Kernels))]
    public async Task SignSlipInsertedIntoGeneratedCodeIsCaught(string description, string kernel)
    {
        // Guards the proofs above: generated code really is analyzed under this configuration.
        var (generated, generatedTrees) = Generate(description, kernel);
        var residualTree = generatedTrees.Single(t => t.FilePath.EndsWith(".Residual.g.cs", StringComparison.Ordinal));
        string text = residualTree.GetText().ToString();
        Assert.Contains("residual[right] += flux;", text);
        var broken = generated.ReplaceSyntaxTree(
            residualTree,
            CSharpSyntaxTree.ParseText(text.Replace("residual[right] += flux;", "residual[right] -= flux;"), (CSharpParseOptions)residualTree.Options, residualTree.FilePath));

        var found = (await AnalyzeAsync(broken)).Select(d => d.Id).ToList();

        Assert.Contains(found, id => id is "FVC0002" or "FVC0004");
    }

    private static (Compilation Generated, List<SyntaxTree> GeneratedTrees) Generate(string description, string kernel)
    {
        var source = Physics.Replace("__KERNEL__", kernel);
        var tree = CSharpSyntaxTree.ParseText(source, new CSharpParseOptions(LanguageVersion.Latest), path: "/0/Plant.cs");
        var compilation = CSharpCompilation.Create(
            "Plant",
            [tree],
            TestReferences.All,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, allowUnsafe: true));
        GeneratorDriver driver = CSharpGeneratorDriver.Create(new FvGenGenerator());
        driver.RunGeneratorsAndUpdateCompilation(compilation, out var generated, out var generatorDiagnostics);

        Assert.Empty(generatorDiagnostics);
        var errors = generated.GetDiagnostics().Where(d => d.Severity == DiagnosticSeverity.Error).ToList();
        Assert.True(errors.Count == 0, description + ":\n" + AnalyzerRun.Describe(errors));
        var generatedTrees = generated.SyntaxTrees.Where(t => t != tree).ToList();
        Assert.NotEmpty(generatedTrees);
        return (generated, generatedTrees);
    }

    private static async Task<List<Diagnostic>> AnalyzeAsync(Compilation compilation)
    {
        var result = await AnalyzerRun.RunAsync(compilation, allMethods: true);
        Assert.Empty(result.Exceptions);
        return result.Fvc.ToList();
    }
}
