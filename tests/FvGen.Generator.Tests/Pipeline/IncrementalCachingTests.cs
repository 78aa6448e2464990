using FvGen.Generator.Tests.Support;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace FvGen.Generator.Tests.Pipeline;

/// <summary>The generator reuses its work: unrelated edits and flux-body edits emit nothing new.</summary>
public sealed class IncrementalCachingTests
{
    private static readonly string[] Steps = [TrackingNames.States, TrackingNames.BoundaryFluxes, TrackingNames.BoundarySets, TrackingNames.Kernels];

    [Fact]
    public void UnrelatedEditLeavesEveryStepCachedOrUnchanged()
    {
        var compilation = GeneratorHarness.Compile(Samples.Scalar, Samples.Conduction1D, Samples.Other);
        var driver = GeneratorHarness.Driver(trackSteps: true).RunGenerators(compilation);
        var edited = compilation.AddSyntaxTrees(CSharpSyntaxTree.ParseText("namespace Demo; internal static class Notes { public const int Revision = 2; }", GeneratorHarness.ParseOptions));
        var result = driver.RunGenerators(edited).GetRunResult().Results[0];

        foreach (string step in Steps)
        {
            Assert.True(result.TrackedSteps.ContainsKey(step), $"step {step} was not tracked");
            foreach (var run in result.TrackedSteps[step])
            {
                Assert.All(run.Outputs, o => Assert.True(o.Reason is IncrementalStepRunReason.Cached or IncrementalStepRunReason.Unchanged, $"{step}: {o.Reason}"));
            }
        }

        AssertNothingEmittedAgain(result);
    }

    [Fact]
    public void EditingAFluxBodyReparsesOnlyTheKernelsOfItsFileAndEmitsNothingNew()
    {
        var compilation = GeneratorHarness.Compile(Samples.Scalar, Samples.Conduction1D, Samples.Other);
        var driver = GeneratorHarness.Driver(trackSteps: true).RunGenerators(compilation);
        var before = driver.GetRunResult().Results[0].GeneratedSources.ToDictionary(s => s.HintName, s => s.SourceText.ToString());
        var oldTree = compilation.SyntaxTrees.ElementAt(1);
        var newTree = oldTree.WithChangedText(oldTree.GetText().Replace(
            Samples.Conduction1D.IndexOf("-Conductivity", StringComparison.Ordinal), "-Conductivity".Length, "-2.0 * Conductivity"));
        var result = driver.RunGenerators(compilation.ReplaceSyntaxTree(oldTree, newTree)).GetRunResult().Results[0];

        var kernels = KernelReasons(result);
        Assert.Equal(2, kernels.Count);
        Assert.Equal(IncrementalStepRunReason.Unchanged, kernels["global::Demo.Conduction"]); // re-parsed, same model
        Assert.True(kernels["global::Demo.Drift"] is IncrementalStepRunReason.Cached or IncrementalStepRunReason.Unchanged);
        AssertNothingEmittedAgain(result);
        Assert.Equal(before, result.GeneratedSources.ToDictionary(s => s.HintName, s => s.SourceText.ToString()));
    }

    [Fact]
    public void ChangingAFluxSignatureReEmitsOnlyTheKernelThatUsesIt()
    {
        var compilation = GeneratorHarness.Compile(Samples.Scalar, Samples.Conduction1D, Samples.Other);
        var driver = GeneratorHarness.Driver(trackSteps: true).RunGenerators(compilation);
        var oldTree = compilation.SyntaxTrees.ElementAt(1);
        string changed = Samples.Conduction1D.Replace("TwoPoint(in Heat left, in Heat right, in FaceGeometry face)", "TwoPoint(Heat left, Heat right, FaceGeometry face)");
        var result = driver.RunGenerators(compilation.ReplaceSyntaxTree(oldTree, oldTree.WithChangedText(Microsoft.CodeAnalysis.Text.SourceText.From(changed))))
            .GetRunResult().Results[0];

        var emitted = result.TrackedOutputSteps.SelectMany(s => s.Value).SelectMany(r => r.Outputs)
            .Where(o => o.Reason is IncrementalStepRunReason.New or IncrementalStepRunReason.Modified)
            .ToList();
        Assert.Single(emitted);
        var kernels = KernelReasons(result);
        Assert.Equal(IncrementalStepRunReason.Modified, kernels["global::Demo.Conduction"]);
        Assert.True(kernels["global::Demo.Drift"] is IncrementalStepRunReason.Cached or IncrementalStepRunReason.Unchanged);
        var kernelText = result.GeneratedSources.Single(s => s.HintName == "Demo.Conduction.Residual.Residual.g.cs").SourceText.ToString();
        Assert.Contains("TwoPoint(state[left], state[right], face)", kernelText);
    }

    private static Dictionary<string, IncrementalStepRunReason> KernelReasons(GeneratorRunResult result) =>
        result.TrackedSteps[TrackingNames.Kernels]
            .SelectMany(r => r.Outputs)
            .ToDictionary(o => ((FvGen.Generator.Kernels.ResidualKernelModel)o.Value!).TypeName, o => o.Reason);

    private static void AssertNothingEmittedAgain(GeneratorRunResult result)
    {
        foreach (var (name, runs) in result.TrackedOutputSteps)
        {
            foreach (var run in runs)
            {
                Assert.All(run.Outputs, o => Assert.True(o.Reason is IncrementalStepRunReason.Cached or IncrementalStepRunReason.Unchanged, $"output {name}: {o.Reason}"));
            }
        }
    }
}
