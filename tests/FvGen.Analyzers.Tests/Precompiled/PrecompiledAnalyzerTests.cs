using System.Reflection.Metadata;
using System.Reflection.PortableExecutable;
using System.Runtime.Loader;
using FvGen.Analyzers.Rules;
using FvGen.Analyzers.Tests.Harness;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Analyzers.Tests.Precompiled;

/// <summary>
/// The precompiled (ReadyToRun) analyzer that a build on .NET makes beside the IL DLL must be that same
/// assembly with native code added, and must give the verdicts the IL analyzer gives.
/// </summary>
public sealed class PrecompiledAnalyzerTests
{
    [Fact]
    public void TheBuildMakesTheImageOnlyWhenAskedTo()
    {
        Assert.True(
            File.Exists(PrecompiledImage.Path) == PrecompiledImage.Expected,
            PrecompiledImage.Expected
                ? $"the build should have made a precompiled analyzer at {PrecompiledImage.Path}"
                : $"precompiling was switched off, yet an image (stale code) is at {PrecompiledImage.Path}");
    }

    [Fact]
    public void TheImageIsTheAnalyzerAssemblyWithNativeCode()
    {
        if (!PrecompiledImage.Expected)
        {
            return; // TheBuildMakesTheImageOnlyWhenAskedTo checks that there is none.
        }

        var il = Read(typeof(ConservationAnalyzer).Assembly.Location);
        var image = Read(PrecompiledImage.Path);

        // ECMA-335 (6th ed.) II.25.3.3: the CLI header's ManagedNativeHeader is always 0 in an IL image; the .NET
        // runtime's ReadyToRun format puts its header there (dotnet/runtime, docs/design/coreclr/botr/readytorun-format.md; from memory).
        Assert.Equal(0, il.NativeHeaderSize);
        Assert.True(image.NativeHeaderSize > 0, "the image has no ReadyToRun header: crossgen2 did not precompile it");
        Assert.Equal(il.Mvid, image.Mvid);
        Assert.Equal(il.Name, image.Name);
    }

    [Fact]
    public async Task TheImageGivesTheVerdictsOfTheIlAnalyzerOnEveryCorpusKernelAndMutant()
    {
        if (!PrecompiledImage.Expected)
        {
            return;
        }

        // A context of its own lets the image load beside the IL copy this test assembly references;
        // Roslyn itself comes from the default context, so the analyzer types are the compiler's.
        var context = new AssemblyLoadContext("precompiled FvGen analyzer", isCollectible: true);
        try
        {
            var assembly = context.LoadFromAssemblyPath(PrecompiledImage.Path);
            var type = assembly.GetType(typeof(ConservationAnalyzer).FullName!, throwOnError: true)!;
            Assert.NotSame(typeof(ConservationAnalyzer), type);
            var analyzer = (DiagnosticAnalyzer)Activator.CreateInstance(type)!;

            int mutantFindings = 0;
            foreach (var kernel in CorpusKernel.All)
            {
                var sources = new List<(string Name, string Source)> { (kernel.Name, kernel.Source) };
                sources.AddRange(kernel.Mutants.Select(m => (m.ToString(), kernel.Apply(m))));
                foreach (var (name, source) in sources)
                {
                    var fromIl = await AnalyzerRun.RunAsync(source);
                    var fromImage = await AnalyzerRun.RunAsync(source, [analyzer]);
                    Assert.Empty(fromImage.Exceptions);
                    Assert.True(
                        AnalyzerRun.Describe(fromIl.Analyzer) == AnalyzerRun.Describe(fromImage.Analyzer),
                        $"{name}: the IL analyzer reports\n{AnalyzerRun.Describe(fromIl.Analyzer)}\nthe image reports\n{AnalyzerRun.Describe(fromImage.Analyzer)}");
                    if (name != kernel.Name)
                    {
                        mutantFindings += fromImage.Fvc.Count();
                    }
                }
            }

            Assert.True(mutantFindings > 0, "no mutant gave a finding: the comparison would hold for an analyzer that reports nothing");
        }
        finally
        {
            context.Unload();
        }
    }

    private static (int NativeHeaderSize, Guid Mvid, string Name) Read(string path)
    {
        using var stream = File.OpenRead(path);
        using var pe = new PEReader(stream);
        var metadata = pe.GetMetadataReader();
        return (
            pe.PEHeaders.CorHeader!.ManagedNativeHeaderDirectory.Size,
            metadata.GetGuid(metadata.GetModuleDefinition().Mvid),
            metadata.GetString(metadata.GetAssemblyDefinition().Name));
    }
}
