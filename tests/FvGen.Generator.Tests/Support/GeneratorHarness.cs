using System.Collections.Immutable;
using FvGen.Generator.Diagnostics;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.Diagnostics;

namespace FvGen.Generator.Tests.Support;

/// <summary>Compiles test sources against the .NET 10 reference assemblies and FvGen.Runtime, and runs the generator and analyzer on them.</summary>
internal static class GeneratorHarness
{
    public static readonly CSharpParseOptions ParseOptions = new(LanguageVersion.Preview);

    public static readonly ImmutableArray<MetadataReference> References =
    [
        .. Basic.Reference.Assemblies.Net100.References.All,
        MetadataReference.CreateFromFile(typeof(ConservedStateAttribute).Assembly.Location),
    ];

    public static CSharpCompilation Compile(params string[] sources) =>
        CSharpCompilation.Create(
            "FvGenTestInput",
            sources.Select((s, i) => CSharpSyntaxTree.ParseText(s, ParseOptions, path: $"Input{i}.cs")),
            References,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, nullableContextOptions: NullableContextOptions.Enable));

    public static GeneratorDriver Driver(bool trackSteps = false) =>
        CSharpGeneratorDriver.Create(
            [new FvGenGenerator().AsSourceGenerator()],
            parseOptions: ParseOptions,
            driverOptions: new GeneratorDriverOptions(IncrementalGeneratorOutputKind.None, trackIncrementalGeneratorSteps: trackSteps));

    /// <summary>Runs the generator; returns its result and the compilation with the generated files added.</summary>
    public static (GeneratorDriverRunResult Result, Compilation Output) Run(Compilation compilation)
    {
        var driver = Driver().RunGeneratorsAndUpdateCompilation(compilation, out var output, out _);
        return (driver.GetRunResult(), output);
    }

    /// <summary>The FVG diagnostics the usage analyzer reports on the compilation after generation.</summary>
    public static async Task<ImmutableArray<Diagnostic>> AnalyzeAsync(Compilation withGenerated)
    {
        var analyzers = ImmutableArray.Create<DiagnosticAnalyzer>(new FvGenUsageAnalyzer());
        Exception? thrown = null;
        var options = new CompilationWithAnalyzersOptions(
            new AnalyzerOptions([]),
            onAnalyzerException: (exception, _, _) => thrown ??= exception,
            concurrentAnalysis: false,
            logAnalyzerExecutionTime: false);
        var diagnostics = await withGenerated.WithAnalyzers(analyzers, options).GetAnalyzerDiagnosticsAsync();
        if (thrown is not null)
        {
            throw new InvalidOperationException("The usage analyzer threw.", thrown);
        }

        return diagnostics;
    }

    /// <summary>Compiler errors of the compilation (after generation), as readable lines.</summary>
    public static string[] Errors(Compilation compilation) =>
        compilation.GetDiagnostics()
            .Where(d => d.Severity == DiagnosticSeverity.Error)
            .Select(d => d.ToString())
            .ToArray();
}
