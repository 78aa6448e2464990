using FvGen.Analyzers.Tests.Verifiers;
using System.Collections.Immutable;
using FvGen.Analyzers.Extraction;
using FvGen.Analyzers.Tests.Harness;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.Tests.Extraction;

/// <summary>
/// The purity checker decides from the syntax and the callees where that settles it, and reads the
/// operations otherwise. Both ways must give the same verdict, reason, location and written
/// parameters for every method: here for every method of both corpora (originals and mutants, the
/// impure-flux mutants among them) and for constructs chosen to hide a write or a call.
/// </summary>
public sealed class PurityShortcutTests
{
    private const string Tricky = """
        using System;
        using System.Collections.Generic;
        using System.Linq;
        public static class Ext { public static double Twice(this double x) => x > 100 ? x : (x * 2).Twice(); }
        public struct S { public double A; public double B; }
        public sealed class Holder { public double Value; public static double Shared; }
        public static class Fluxes
        {
            private static double _calls;
            public static double Plain(double a, double b) => 0.5 * (a + b) - 0.5 * Math.Max(Math.Abs(a), Math.Abs(b)) * (b - a);
            public static double CallsPlain(double a, double b) => Plain(a, b) + Plain(b, a);
            public static double Counts(double a) { _calls += 1; return a; }
            public static double CallsCounts(double a) => Counts(a) * 2;
            public static double Increments(double a) { _calls++; return a; }
            public static double Initializer(double a) => new S { A = a, B = a }.A;
            public static double Collection(double a) => new List<double> { a, a }.Sum();
            public static double Query(double[] a) => (from x in a select x * 2).Sum();
            public static string Interpolated(double a) => $"{a} and {a}";
            public static double Anonymous(double a) => new { Value = a }.Value;
            public static double Recursive(double a) => a > 1 ? Recursive(a / 2) : a;
            public static double Extension(double a) => a.Twice();
            public static void Result(double a, out double b) { b = a; }
            public static double CallsResult(double a) { Result(a, out var b); return b; }
            public static double CallsResultIntoField(double a) { Result(a, out Holder.Shared); return a; }
            public static double Delegate(Func<double, double> f, double a) => f(a);
            public static double Local(double a) { return Inner(a) + 1; static double Inner(double x) => Math.Sqrt(x); }
            public static double LocalWrites(double a) { return Inner(a); static double Inner(double x) { Holder.Shared = x; return x; } }
            public static double Name(double a) => nameof(a).Length;
            public static double Writes(Holder h, double a) { h.Value = a; return a; }
            public static double CallsWrites(Holder h, double a) => Writes(h, a);
            public static double Deconstructs((double, double) p) { var (x, y) = p; return x + y; }
            public static double Loops(double[] a) { double s = 0; foreach (var (x, y) in a.Select(v => (v, v))) { s += x * y; } return s; }
        }
        """;

    public static TheoryData<string> Sources()
    {
        var data = new TheoryData<string> { "tricky" };
        foreach (var kernel in CorpusKernel.All)
        {
            data.Add("corpus:" + kernel.Name);
        }

        string independent = Path.Combine(AppContext.BaseDirectory, "IndependentCorpus");
        foreach (string path in Directory.GetFiles(independent, "*.cs", SearchOption.AllDirectories).OrderBy(p => p, StringComparer.Ordinal))
        {
            data.Add("independent:" + Path.GetRelativePath(independent, path).Replace('\\', '/'));
        }

        return data;
    }

    [Theory]
    [MemberData(nameof(Sources))]
    public void ShortcutAgreesWithReadingTheOperations(string source)
    {
        var texts = source switch
        {
            "tricky" => new[] { Tricky },
            _ when source.StartsWith("corpus:", StringComparison.Ordinal) => CorpusVariants(source.Substring("corpus:".Length)),
            _ => new[] { File.ReadAllText(Path.Combine(AppContext.BaseDirectory, "IndependentCorpus", source.Substring("independent:".Length))) },
        };

        int methods = 0;
        foreach (string text in texts)
        {
            var tree = CSharpSyntaxTree.ParseText(text, new CSharpParseOptions(LanguageVersion.Latest));
            var compilation = CSharpCompilation.Create("Purity", [tree], TestReferences.All, new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary, allowUnsafe: true));
            var model = compilation.GetSemanticModel(tree);

            // Fresh checkers for each: the cache must not carry one way's verdicts into the other.
            var shortcut = new PurityChecker(compilation);
            var operations = new PurityChecker(compilation, syntaxFirst: false);
            foreach (var declaration in tree.GetRoot().DescendantNodes().Where(n => n is BaseMethodDeclarationSyntax or LocalFunctionStatementSyntax))
            {
                if (model.GetDeclaredSymbol(declaration) is not IMethodSymbol method)
                {
                    continue;
                }

                var fast = shortcut.Classify(method);
                var full = operations.Classify(method);
                Assert.True(
                    fast.Kind == full.Kind && fast.Reason == full.Reason && Equals(fast.Location, full.Location) && fast.WrittenParameters.SetEquals(full.WrittenParameters),
                    $"{method.ToDisplayString()}: shortcut {fast.Kind} '{fast.Reason}' vs operations {full.Kind} '{full.Reason}'");
                methods++;
            }
        }

        Assert.True(methods > 0, "no method was classified");
    }

    [Fact]
    public void TrickySourceHasBothVerdicts()
    {
        // The table above is not all pure: the comparison sees impure verdicts and written parameters.
        var tree = CSharpSyntaxTree.ParseText(Tricky, new CSharpParseOptions(LanguageVersion.Latest));
        var compilation = CSharpCompilation.Create("Purity", [tree], TestReferences.All, new CSharpCompilationOptions(OutputKind.DynamicallyLinkedLibrary));
        var fluxes = compilation.GetTypeByMetadataName("Fluxes")!;
        var checker = new PurityChecker(compilation);
        PurityKind Kind(string name) => checker.Classify(fluxes.GetMembers(name).OfType<IMethodSymbol>().Single()).Kind;
        Assert.Equal(PurityKind.Pure, Kind("Plain"));
        Assert.Equal(PurityKind.Pure, Kind("CallsPlain"));
        Assert.Equal(PurityKind.Impure, Kind("CallsCounts"));
        Assert.Equal(PurityKind.Impure, Kind("LocalWrites"));
        Assert.Equal(PurityKind.Impure, Kind("CallsResultIntoField"));
        Assert.Equal(PurityKind.Pure, Kind("CallsResult"));
        Assert.Single(checker.Classify(fluxes.GetMembers("Result").OfType<IMethodSymbol>().Single()).WrittenParameters);
    }

    private static string[] CorpusVariants(string name)
    {
        var kernel = CorpusKernel.All.Single(k => k.Name == name);
        return new[] { kernel.Source }.Concat(kernel.Mutants.Select(kernel.Apply)).ToArray();
    }
}
