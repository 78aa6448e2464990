using System.Text;
using FvGen.Generator.Tests.Support;
using Microsoft.CodeAnalysis.CSharp.Testing;
using Microsoft.CodeAnalysis.Testing;
using Microsoft.CodeAnalysis.Text;

namespace FvGen.Generator.Tests.Emit;

/// <summary>
/// Golden-file tests: the generated text must equal the reviewed files under Golden/. After an
/// intended change of the emitted code, run the tests with FVGEN_UPDATE_GOLDEN=1 and review the diff.
/// </summary>
public sealed class GoldenFileTests
{
    [Fact]
    public Task ConservedStateWithNestedGroup() =>
        Verify([Samples.State], ("Demo.Flow.ConservedState.g.cs", "Flow.ConservedState.g.cs.txt"));

    [Fact]
    public Task StructuredKernelWithBoundaryBinding() =>
        Verify(
            [Samples.Scalar, Samples.Conduction1D],
            ("Demo.Heat.ConservedState.g.cs", "Heat.ConservedState.g.cs.txt"),
            ("Demo.Conduction.Boundary.g.cs", "Conduction.Boundary.g.cs.txt"),
            ("Demo.Conduction.Residual.Residual.g.cs", "Conduction.Residual.g.cs.txt"));

    [Fact]
    public Task PeriodicMusclKernelWithoutBoundaries() =>
        Verify(
            [Samples.Scalar, Samples.Muscl1D],
            ("Demo.Heat.ConservedState.g.cs", "Heat.ConservedState.g.cs.txt"),
            ("Demo.Ring.Residual.Residual.g.cs", "Ring.Residual.g.cs.txt"));

    [Fact]
    public Task MusclKernelsNextToPatches() =>
        Verify(
            [Samples.Scalar, Samples.PatchedMuscl1D],
            ("Demo.Heat.ConservedState.g.cs", "Heat.ConservedState.g.cs.txt"),
            ("Demo.Channel.Boundary.g.cs", "Channel.Boundary.g.cs.txt"),
            ("Demo.Channel.Limited.Residual.g.cs", "Channel.Limited.Residual.g.cs.txt"),
            ("Demo.Channel.Central.Residual.g.cs", "Channel.Central.Residual.g.cs.txt"));

    [Fact]
    public Task UnstructuredGatherKernel() =>
        Verify(
            [Samples.Scalar, Samples.ConductionUnstructured],
            ("Demo.Heat.ConservedState.g.cs", "Heat.ConservedState.g.cs.txt"),
            ("Demo.Spreading.Boundary.g.cs", "Spreading.Boundary.g.cs.txt"),
            ("Demo.Spreading.Residual.Residual.g.cs", "Spreading.Residual.g.cs.txt"));

    [Fact]
    public Task StructuredGatherKernel() =>
        Verify(
            [Samples.Scalar, Samples.Gather2D],
            ("Demo.Heat.ConservedState.g.cs", "Heat.ConservedState.g.cs.txt"),
            ("Demo.Mixing.Boundary.g.cs", "Mixing.Boundary.g.cs.txt"),
            ("Demo.Mixing.Residual.Residual.g.cs", "Mixing.Residual.g.cs.txt"));

    [Fact]
    public Task UnstructuredUserReconstructionKernel() =>
        Verify(
            [Samples.Scalar, Samples.UserUnstructured],
            ("Demo.Heat.ConservedState.g.cs", "Heat.ConservedState.g.cs.txt"),
            ("Demo.Plume.Boundary.g.cs", "Plume.Boundary.g.cs.txt"),
            ("Demo.Plume.Residual.Residual.g.cs", "Plume.Residual.g.cs.txt"));

    private static async Task Verify(string[] sources, params (string HintName, string Golden)[] expected)
    {
        string folder = GoldenFolder();
        if (Environment.GetEnvironmentVariable("FVGEN_UPDATE_GOLDEN") == "1")
        {
            var (result, _) = GeneratorHarness.Run(GeneratorHarness.Compile(sources));
            foreach (var (hint, golden) in expected)
            {
                var generated = result.Results[0].GeneratedSources.Single(g => g.HintName == hint);
                File.WriteAllText(Path.Combine(folder, golden), generated.SourceText.ToString());
            }
        }

        var test = new CSharpSourceGeneratorTest<FvGenGenerator, DefaultVerifier>
        {
            ReferenceAssemblies = new ReferenceAssemblies("net10.0"),
        };
        test.TestState.AdditionalReferences.AddRange(GeneratorHarness.References);
        foreach (string source in sources)
        {
            test.TestState.Sources.Add(source);
        }

        foreach (var (hint, golden) in expected)
        {
            string text = File.ReadAllText(Path.Combine(folder, golden)).Replace("\r\n", "\n");
            test.TestState.GeneratedSources.Add((typeof(FvGenGenerator), hint, SourceText.From(text, new UTF8Encoding(encoderShouldEmitUTF8Identifier: true))));
        }

        await test.RunAsync();
    }

    private static string GoldenFolder() =>
        Path.Combine(RepositoryPaths.Root, "tests", "FvGen.Generator.Tests", "Golden");
}
