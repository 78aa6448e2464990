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

    private const string Kernel = """
        using TeamGeometry;

        static class Slopes
        {
            static double Upwind(double a, double b) => a;

            static double Extrapolate(double u, double slope, Point offset) => u + slope * offset.X;

            [ConservativeUpdate]
            public static void Rate(int[] left, int[] right, Point[] faceCentres, Point[] cellCentres, double[] u, double[] slope, double[] r)
            {
                for (int c = 1; c < u.Length - 1; c++)
                {
                    slope[c] = Math.Min(u[c + 1] - u[c], u[c] - u[c - 1]);
                }

                for (int f = 0; f < left.Length; f++)
                {
                    int l = left[f];
                    int k = right[f];
                    Point toLeft = faceCentres[f] - cellCentres[l];
                    Point toRight = faceCentres[f] - cellCentres[k];
                    double flux = Upwind(Extrapolate(u[l], slope[l], toLeft), Extrapolate(u[k], slope[k], toRight));
                    r[l] -= flux;
                    __RIGHT__
                }
            }
        }
        """;

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
        var kernel = CSharpSyntaxTree.ParseText(TestReferences.Usings + Kernel.Replace("__RIGHT__", right), new CSharpParseOptions(LanguageVersion.Latest), path: "/0/Kernel.cs");
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
