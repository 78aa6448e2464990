using System.Reflection;
using FvGen.Generator.Boundaries;
using FvGen.Generator.Common;
using FvGen.Generator.Kernels;
using FvGen.Generator.States;
using FvGen.Generator.Tests.Support;
using Microsoft.CodeAnalysis;

namespace FvGen.Generator.Tests.Pipeline;

/// <summary>The models that flow through the incremental pipeline hold no Roslyn objects and compare by value.</summary>
public sealed class ModelPurityTests
{
    private static readonly Type[] Forbidden =
    [
        typeof(ISymbol), typeof(SyntaxNode), typeof(SyntaxToken), typeof(SyntaxTree), typeof(Location),
        typeof(Compilation), typeof(SemanticModel), typeof(Diagnostic), typeof(AttributeData),
    ];

    [Theory]
    [InlineData(typeof(ConservedStateModel))]
    [InlineData(typeof(ResidualKernelModel))]
    [InlineData(typeof(BoundarySetModel))]
    [InlineData(typeof(BoundaryFluxFound))]
    public void ModelGraphHoldsOnlyStringsNumbersEnumsAndEquatableArrays(Type model)
    {
        var problems = new List<string>();
        Walk(model, model.Name, new HashSet<Type>(), problems);
        Assert.Empty(problems);
    }

    [Fact]
    public void TheSameDeclarationsInTwoCompilationsGiveEqualModels()
    {
        var first = Kernel(GeneratorHarness.Compile(Samples.Scalar, Samples.Conduction1D));
        var second = Kernel(GeneratorHarness.Compile(Samples.Scalar, Samples.Conduction1D));
        Assert.NotSame(first, second);
        Assert.Equal(first, second);
        Assert.Equal(first.GetHashCode(), second.GetHashCode());

        var changed = Kernel(GeneratorHarness.Compile(Samples.Scalar, Samples.Conduction1D.Replace("Span<Heat> rate", "Span<Heat> change")));
        Assert.NotEqual(first, changed);
    }

    private static ResidualKernelModel Kernel(Compilation compilation)
    {
        var type = compilation.GetTypeByMetadataName("Demo.Conduction")!;
        var method = type.GetMembers("Residual").OfType<IMethodSymbol>().Single();
        var attribute = method.GetAttributes().Single(a => a.AttributeClass!.Name == "ResidualKernelAttribute");
        return ResidualKernelParser.Parse(method, attribute, problems: null, CancellationToken.None)!;
    }

    private static void Walk(Type type, string path, HashSet<Type> seen, List<string> problems)
    {
        if (type == typeof(string) || type.IsPrimitive || type.IsEnum || !seen.Add(type))
        {
            return;
        }

        if (Forbidden.Any(f => f.IsAssignableFrom(type)))
        {
            problems.Add($"{path} is a {type.Name}");
            return;
        }

        if (type.IsGenericType && type.GetGenericTypeDefinition() == typeof(EquatableArray<>))
        {
            Walk(type.GetGenericArguments()[0], path + "[]", seen, problems);
            return;
        }

        if (type.IsArray || type.IsInterface || type == typeof(object) || type.Namespace?.StartsWith("FvGen.Generator", StringComparison.Ordinal) != true)
        {
            problems.Add($"{path} is a {type.FullName}, not a model type, string, number, enum or EquatableArray");
            return;
        }

        if (!typeof(IEquatable<>).MakeGenericType(type).IsAssignableFrom(type))
        {
            problems.Add($"{path} ({type.Name}) is not equatable");
        }

        foreach (var field in type.GetFields(BindingFlags.Instance | BindingFlags.Public | BindingFlags.NonPublic))
        {
            if (field.Name == "<EqualityContract>k__BackingField")
            {
                continue;
            }

            Walk(field.FieldType, path + "." + field.Name, seen, problems);
        }
    }
}
