using FvGen.Analyzers.Tests.Harness;
using FvGen.Analyzers.Tests.Verifiers;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;

namespace FvGen.Analyzers.Tests.Rules;

/// <summary>
/// A team's own vector type in a compiled library, marked <c>[GeometryValue]</c>, is read like the
/// runtime's <c>Vec3</c>: its operators give one geometry value, its members are trusted pure. The same
/// library without the mark is not looked into: the checker says it could not model the operator.
/// </summary>
public sealed class GeometryValueTests
{
    private const string Library = """
        namespace TeamGeometry;

        __MARK__
        public readonly struct Point
        {
            public Point(double x, double y) { X = x; Y = y; }
            public double X { get; }
            public double Y { get; }
            public static Point operator -(Point a, Point b) => new(a.X - b.X, a.Y - b.Y);
        }
        """;

    /// <summary>The second-order face loop of <see cref="ReconstructedFaceLoopTests"/>, its offsets built from the library's points.</summary>
    private static string Kernel(string right) =>
        ReconstructedFaceLoopTests.Source(right: right).Replace("using FvGen.Geometry;", "using TeamGeometry;").Replace("Vec3", "Point");

    [Fact]
    public async Task MarkedLibraryVectorIsReadAsGeometry()
    {
        var result = await RunAsync(marked: true, right: "r[k] += flux;");
        Assert.True(!result.Fvc.Any(), "expected a proof, got:\n" + AnalyzerRun.Describe(result.Fvc));
    }

    [Fact]
    public async Task SlipNextToMarkedVectorIsStillCaught()
    {
        var result = await RunAsync(marked: true, right: "r[k] -= flux;");
        Assert.Contains(result.Fvc, d => d.Id == DiagnosticIds.OneSidedScatter);
        Assert.DoesNotContain(result.Fvc, d => d.Id == DiagnosticIds.NotAnalyzed);
    }

    [Fact]
    public async Task UnmarkedLibraryVectorIsNotAnalyzed()
    {
        var result = await RunAsync(marked: false, right: "r[k] += flux;");
        Assert.Contains(result.Fvc, d => d.Id == DiagnosticIds.NotAnalyzed
            && d.GetMessage(System.Globalization.CultureInfo.InvariantCulture).Contains("`Point.operator -(Point, Point)` is not visibly component-wise", StringComparison.Ordinal));
    }

    private static async Task<AnalyzerRun.Result> RunAsync(bool marked, string right)
    {
        var library = CSharpCompilation.Create(
            "TeamGeometry",
            [CSharpSyntaxTree.ParseText(Library.Replace("__MARK__", marked ? "[FvGen.GeometryValue]" : string.Empty), new CSharpParseOptions(LanguageVersion.Latest))],
            TestReferences.All,
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary));
        using var image = new MemoryStream();
        var emitted = library.Emit(image);
        Assert.True(emitted.Success, string.Join("\n", emitted.Diagnostics));
        var kernel = CSharpSyntaxTree.ParseText(TestReferences.Usings + Kernel(right), new CSharpParseOptions(LanguageVersion.Latest), path: "/0/Kernel.cs");
        var compilation = CSharpCompilation.Create(
            "Kernel",
            [kernel],
            TestReferences.All.Add(MetadataReference.CreateFromImage(image.ToArray())),
            new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary));
        var result = await AnalyzerRun.RunAsync(compilation);
        Assert.Empty(result.CompilerErrors);
        Assert.Empty(result.Exceptions);
        return result;
    }
}
