using System;
using System.Collections.Generic;
using System.Linq;
using System.Threading;
using FvGen.Generator.Common;
using FvGen.Generator.Diagnostics;
using FvGen.Generator.Fluxes;
using FvGen.Generator.States;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Generator.Kernels;

/// <summary>
/// Turns a method marked <c>[ResidualKernel]</c> into a <see cref="ResidualKernelModel"/>, or into
/// problems. The generator and <see cref="FvGenUsageAnalyzer"/> share it, so what is reported is
/// exactly what is not generated.
/// </summary>
internal static class ResidualKernelParser
{
    public static ResidualKernelModel? Parse(IMethodSymbol method, AttributeData attribute, List<Problem>? problems, CancellationToken cancellationToken)
    {
        var location = method.Locations.Length > 0 ? method.Locations[0] : null;
        var type = method.ContainingType;
        if (type is null)
        {
            return null;
        }

        // Shape: static partial void, declared without a body, in partial types.
        var declaration = DefiningDeclaration(method, cancellationToken);
        string? shape = null;
        if (!method.IsStatic)
        {
            shape = "it is not static";
        }
        else if (!method.ReturnsVoid)
        {
            shape = "it returns " + method.ReturnType.ToDisplayString();
        }
        else if (declaration is null || !declaration.Modifiers.Any(SyntaxKind.PartialKeyword))
        {
            shape = "it is not partial, or it has a body";
        }
        else if (method.IsGenericMethod)
        {
            shape = "it is generic";
        }
        else if (method.PartialImplementationPart is { } implementation && !IsGenerated(implementation))
        {
            shape = "it already has an implementation part";
        }

        if (shape is not null)
        {
            problems?.Add(new Problem(Descriptors.KernelNotStaticPartialVoid, location, method.Name, shape));
            return null;
        }

        for (INamedTypeSymbol? t = type; t is not null; t = t.ContainingType)
        {
            if (!TypeLocation.IsPartial(t, cancellationToken))
            {
                problems?.Add(new Problem(Descriptors.ContainingTypeNotPartial, location, method.Name, t.Name));
                return null;
            }
        }

        string typeName = type.ToDisplayString(SymbolDisplayFormat.FullyQualifiedFormat);
        bool ok = true;

        // Parameters: one role each.
        var parameters = new List<KernelParameter>();
        ITypeSymbol? stateType = null;
        MeshKind? mesh = null;
        foreach (var p in method.Parameters)
        {
            var (role, element, meshKind, isMemory, why) = Classify(p, type);
            if (why is not null)
            {
                problems?.Add(new Problem(Descriptors.KernelParameters, First(p) ?? location, method.Name, why));
                ok = false;
                continue;
            }

            if (parameters.Any(existing => existing.Role == role))
            {
                problems?.Add(new Problem(
                    Descriptors.KernelParameters, First(p) ?? location, method.Name, "parameter '" + p.Name + "' is a second " + Describe(role)));
                ok = false;
                continue;
            }

            if (element is not null)
            {
                if (stateType is null)
                {
                    stateType = element;
                }
                else if (!SymbolEqualityComparer.Default.Equals(stateType, element))
                {
                    problems?.Add(new Problem(
                        Descriptors.KernelParameters,
                        First(p) ?? location,
                        method.Name,
                        "parameter '" + p.Name + "' holds " + element.ToDisplayString() + " but the kernel's state is " + stateType.ToDisplayString()));
                    ok = false;
                    continue;
                }
            }

            mesh ??= meshKind;
            string prefix = p.ScopedKind == ScopedKind.ScopedValue ? "scoped " : "";
            parameters.Add(new KernelParameter(Identifier.Escape(p.Name), role, TypeText(p, role, element, typeName), isMemory, prefix));
        }

        if (!ok)
        {
            return null;
        }

        foreach (var required in new[] { ParameterRole.Mesh, ParameterRole.State, ParameterRole.Residual })
        {
            if (!parameters.Any(p => p.Role == required))
            {
                problems?.Add(new Problem(Descriptors.KernelParameters, location, method.Name, "it has no " + Describe(required) + " parameter"));
                ok = false;
            }
        }

        if (!ok || stateType is not INamedTypeSymbol stateSymbol || mesh is null)
        {
            return null;
        }

        var state = ConservedStateParser.Parse(stateSymbol, problems: null, cancellationToken);
        if (state is null)
        {
            problems?.Add(new Problem(
                Descriptors.KernelParameters, location, method.Name, "its state '" + stateSymbol.ToDisplayString() + "' is not a valid [ConservedState] struct"));
            return null;
        }

        // The numerical flux named by the attribute, in the kernel's type.
        string? fluxName = attribute.ConstructorArguments.Length == 1 ? attribute.ConstructorArguments[0].Value as string : null;
        var fluxMethod = fluxName is null
            ? null
            : type.GetMembers(fluxName).OfType<IMethodSymbol>().FirstOrDefault(m => HasAttribute(m, KnownNames.NumericalFluxAttribute));
        if (fluxMethod is null)
        {
            problems?.Add(new Problem(Descriptors.KernelFluxNotFound, location, method.Name, fluxName ?? "(none)", type.Name));
            return null;
        }

        var flux = FluxSignature.Numerical(fluxMethod, problems: null);
        if (flux is null)
        {
            problems?.Add(new Problem(
                Descriptors.KernelFluxNotFound, location, method.Name, fluxName!, type.Name + " (its signature is wrong, see FVG0003 there)"));
            return null;
        }

        if (!SymbolEqualityComparer.Default.Equals(flux.Value.State, stateType))
        {
            problems?.Add(new Problem(
                Descriptors.FluxStateMismatch, location, method.Name, stateType.Name, "numerical flux", fluxMethod.Name, flux.Value.State.Name));
            return null;
        }

        var boundaries = BoundaryFluxesOf(type);
        if (boundaries.Count > 0 && Boundaries.BoundaryNameCheck.Conflict(type) is not null)
        {
            return null; // FVG0013 is reported on the type's own member named Boundary.
        }

        if (boundaries.Count == 0 && parameters.Any(p => p.Role == ParameterRole.Boundaries))
        {
            problems?.Add(new Problem(
                Descriptors.KernelParameters,
                location,
                method.Name,
                "it takes a boundary binding, but '" + type.Name + "' declares no valid [BoundaryFlux] method to bind patches to"));
            return null;
        }

        foreach (var (entry, boundaryState) in boundaries)
        {
            if (!SymbolEqualityComparer.Default.Equals(boundaryState, stateType))
            {
                problems?.Add(new Problem(
                    Descriptors.FluxStateMismatch, location, method.Name, stateType.Name, "boundary flux", entry.Call.Name, boundaryState.Name));
                ok = false;
            }
        }

        if (!ok)
        {
            return null;
        }

        // Mode and reconstruction.
        var mode = (KernelMode)NamedInt(attribute, "Mode", 0);
        var reconstruction = (KernelReconstruction)NamedInt(attribute, "Reconstruction", 0);
        // The attribute's default limiter (minmod) is a MUSCL limiter; on an unstructured mesh an
        // unspecified limiter means Barth–Jespersen, the only one generated there.
        var limiter = (KernelLimiter)NamedInt(attribute, "Limiter", mesh == MeshKind.Unstructured ? (int)KernelLimiter.BarthJespersen : 0);
        var runtimeModes = new List<KernelMode>();
        string? modeProblem;
        if (parameters.Any(p => p.Role == ParameterRole.Mode))
        {
            // The mode is chosen at run time among those these parameters support.
            modeProblem = attribute.NamedArguments.Any(a => a.Key == "Mode")
                ? "choose the execution mode either with the attribute's Mode or with an ExecutionMode parameter, not both"
                : null;
            foreach (KernelMode candidate in Enum.GetValues(typeof(KernelMode)))
            {
                if (CheckMode(candidate, mesh.Value, parameters, modeChosenAtRunTime: true) is null
                    && (candidate == KernelMode.SerialScatter || !parameters.Any(p => p.Role == ParameterRole.GradientBuffer && !p.IsMemory)))
                {
                    runtimeModes.Add(candidate);
                }
            }
        }
        else
        {
            modeProblem = CheckMode(mode, mesh.Value, parameters, modeChosenAtRunTime: false);
        }

        if (modeProblem is not null)
        {
            problems?.Add(new Problem(Descriptors.ModeNotAvailable, location, method.Name, modeProblem));
            return null;
        }

        string? reconstructionProblem = CheckReconstruction(reconstruction, limiter, mesh.Value);
        if (reconstructionProblem is not null)
        {
            problems?.Add(new Problem(Descriptors.ReconstructionNotAvailable, location, method.Name, reconstructionProblem));
            return null;
        }

        FluxCall? user = null;
        if (reconstruction == KernelReconstruction.User)
        {
            string? userName = NamedString(attribute, "UserReconstruction");
            string? why = null;
            bool unstructured = mesh.Value == MeshKind.Unstructured;
            user = userName is null ? null
                : unstructured ? UnstructuredUserReconstructionCall(type, userName, stateSymbol, out why)
                : UserReconstructionCall(type, userName, stateSymbol, out why);
            if (user is null)
            {
                string n = stateSymbol.Name;
                string expected = unstructured
                    ? "static void " + userName + "(in " + n + " cell, in Gradient<" + n + "> gradient, in Vec3 toFace, out " + n + " faceState)"
                    : "static void " + userName + "(in " + n + " leftLeft, in " + n + " left, in " + n + " right, in " + n + " rightRight, [double widthLeftLeft, double widthLeft, double widthRight, double widthRightRight,] out " + n + " leftFace, out " + n + " rightFace)";
                problems?.Add(new Problem(
                    Descriptors.ReconstructionNotAvailable,
                    location,
                    method.Name,
                    userName is null
                        ? "ReconstructionKind.User needs UserReconstruction = nameof(...) naming a static method of " + type.Name
                        : "user reconstruction '" + userName + "' must be '" + expected + "' in " + type.Name + (unstructured ? " on an unstructured mesh" : " on a structured grid") + ": " + why));
                return null;
            }
        }

        bool needsGradients = flux.Value.Call.TakesGradients || (mesh.Value == MeshKind.Unstructured && reconstruction != KernelReconstruction.FirstOrder);
        var gradientBuffer = parameters.FirstOrDefault(p => p.Role == ParameterRole.GradientBuffer);
        string? gradientProblem = (needsGradients, gradientBuffer) switch
        {
            (true, null) => "it computes Green-Gauss cell gradients ("
                + (reconstruction == KernelReconstruction.Linear ? "linear reconstruction" : reconstruction == KernelReconstruction.User && mesh.Value == MeshKind.Unstructured ? "user reconstruction on an unstructured mesh" : "its flux takes gradients")
                + "), so it needs a gradient buffer: add a 'Span<Gradient<" + stateSymbol.Name + ">>' parameter ('Memory<...>' in parallel modes) of one gradient per cell",
            (false, not null) => "gradient buffer '" + gradientBuffer.Name + "' is used only by fluxes that take gradients, and by linear or user reconstruction on unstructured meshes",
            (true, { IsMemory: false }) when mode != KernelMode.SerialScatter && !parameters.Any(p => p.Role == ParameterRole.Mode) => "in ExecutionMode." + mode + " the gradient buffer '" + gradientBuffer!.Name + "' must be a Memory<Gradient<" + stateSymbol.Name + ">>",
            _ => null,
        };
        if (gradientProblem is not null)
        {
            problems?.Add(new Problem(Descriptors.KernelParameters, location, method.Name, gradientProblem));
            return null;
        }

        string modifiers = string.Join(" ", declaration!.Modifiers.Select(m => m.Text));
        return new ResidualKernelModel(
            TypeLocation.Of(type),
            typeName,
            method.Name,
            modifiers,
            mesh.Value,
            state,
            new EquatableArray<KernelParameter>(parameters),
            flux.Value.Call,
            new EquatableArray<BoundaryFluxEntry>(boundaries.Select(b => b.Entry)),
            mode,
            reconstruction,
            limiter,
            user,
            new EquatableArray<KernelMode>(runtimeModes));
    }

    /// <summary>
    /// Finds the structured user reconstruction <paramref name="name"/> in <paramref name="type"/> and checks its
    /// signature: four cell states, optionally their four widths along the face direction (<c>double</c>), then
    /// the two face states <c>out</c>.
    /// </summary>
    /// <returns>A call whose <c>WidthModifier</c> is null for the geometry-free form.</returns>
    private static FluxCall? UserReconstructionCall(INamedTypeSymbol type, string name, ITypeSymbol state, out string? why)
    {
        why = "no static method of that name";
        foreach (var candidate in type.GetMembers(name).OfType<IMethodSymbol>())
        {
            var p = candidate.Parameters;
            if (!candidate.IsStatic || !candidate.ReturnsVoid || candidate.IsGenericMethod || (p.Length != 6 && p.Length != 10))
            {
                why = "it must be static, return void and take six parameters (four cell states, two face states) or ten (the four cells' widths after the cell states)";
                continue;
            }

            var states = p.Take(4).Concat(p.Skip(p.Length - 2)).ToList();
            var widths = p.Skip(4).Take(p.Length - 6).ToList();
            if (states.Any(x => !SymbolEqualityComparer.Default.Equals(x.Type, state)))
            {
                why = "the four cell states and the two face states must be " + state.Name + "s";
                continue;
            }

            if (widths.Any(x => x.Type.SpecialType != SpecialType.System_Double))
            {
                why = "the four widths after the cell states must be doubles";
                continue;
            }

            if (p.Take(4).Any(x => x.RefKind is not (RefKind.None or RefKind.In)) || p[p.Length - 2].RefKind != RefKind.Out || p[p.Length - 1].RefKind != RefKind.Out)
            {
                why = "the four cell states are passed by value or 'in', the two face states are 'out'";
                continue;
            }

            if (p.Take(4).Any(x => x.RefKind != p[0].RefKind) || widths.Any(x => x.RefKind != widths[0].RefKind) || widths.Any(x => x.RefKind is not (RefKind.None or RefKind.In)))
            {
                why = "the four cell states must all be passed the same way (all by value or all 'in'), and so must the four widths";
                continue;
            }

            why = null;
            return new FluxCall(candidate.Name, Modifier(p[0]), "out ", WidthModifier: widths.Count == 0 ? null : Modifier(widths[0]));
        }

        return null;
    }

    /// <summary>
    /// Finds the unstructured user reconstruction <paramref name="name"/> in <paramref name="type"/>:
    /// <c>static void R(in TState cell, in Gradient&lt;TState&gt; gradient, in Vec3 toFace, out TState faceState)</c>.
    /// </summary>
    /// <returns>A call whose <c>StateModifier</c>, <c>GradientModifier</c> and <c>FaceModifier</c> are those of the cell, gradient and offset parameters.</returns>
    private static FluxCall? UnstructuredUserReconstructionCall(INamedTypeSymbol type, string name, ITypeSymbol state, out string? why)
    {
        why = "no static method of that name";
        foreach (var candidate in type.GetMembers(name).OfType<IMethodSymbol>())
        {
            var p = candidate.Parameters;
            if (!candidate.IsStatic || !candidate.ReturnsVoid || candidate.IsGenericMethod || p.Length != 4)
            {
                why = "it must be static, return void and take four parameters";
                continue;
            }

            if (!SymbolEqualityComparer.Default.Equals(p[0].Type, state) || !FluxSignature.IsGradientOf(p[1].Type, state)
                || p[2].Type.ToDisplayString() != KnownNames.Vec3 || !SymbolEqualityComparer.Default.Equals(p[3].Type, state))
            {
                why = "the parameters must be the cell state, its Gradient<" + state.Name + ">, the Vec3 from the cell centroid to the face centroid, and the face state";
                continue;
            }

            if (p.Take(3).Any(x => x.RefKind is not (RefKind.None or RefKind.In)) || p[3].RefKind != RefKind.Out)
            {
                why = "the cell state, gradient and offset are passed by value or 'in', the face state is 'out'";
                continue;
            }

            why = null;
            return new FluxCall(candidate.Name, Modifier(p[0]), Modifier(p[2]), Modifier(p[1]));
        }

        return null;
    }

    private static string Modifier(IParameterSymbol p) => p.RefKind == RefKind.In ? "in " : "";

    private static string? NamedString(AttributeData attribute, string name)
    {
        foreach (var pair in attribute.NamedArguments)
        {
            if (pair.Key == name && pair.Value.Value is string value)
            {
                return value;
            }
        }

        return null;
    }

    /// <summary>The valid boundary fluxes of <paramref name="type"/>, ordered by name (the order of the <c>Boundary</c> enum).</summary>
    public static List<(BoundaryFluxEntry Entry, ITypeSymbol State)> BoundaryFluxesOf(INamedTypeSymbol type)
    {
        var found = new List<(BoundaryFluxEntry, ITypeSymbol)>();
        foreach (var member in type.GetMembers())
        {
            if (member is not IMethodSymbol m)
            {
                continue;
            }

            foreach (var a in m.GetAttributes())
            {
                if (a.AttributeClass?.ToDisplayString() == KnownNames.BoundaryFluxAttribute && FluxSignature.Boundary(m, a, problems: null) is { } entry)
                {
                    found.Add(entry);
                    break;
                }
            }
        }

        found.Sort((x, y) => string.CompareOrdinal(x.Item1.Call.Name, y.Item1.Call.Name));
        return found;
    }

    private static (ParameterRole Role, ITypeSymbol? Element, MeshKind? Mesh, bool IsMemory, string? Why) Classify(IParameterSymbol p, INamedTypeSymbol kernelType)
    {
        if (p.RefKind != RefKind.None)
        {
            return (default, null, null, false, "parameter '" + p.Name + "' must be passed by value");
        }

        if (p.Type is not INamedTypeSymbol named)
        {
            return (default, null, null, false, Unknown(p));
        }

        string original = named.OriginalDefinition.ToDisplayString();
        switch (original)
        {
            case KnownNames.StructuredGrid1D:
                return (ParameterRole.Mesh, null, MeshKind.Structured1D, false, null);
            case KnownNames.StructuredGrid2D:
                return (ParameterRole.Mesh, null, MeshKind.Structured2D, false, null);
            case KnownNames.StructuredGrid3D:
                return (ParameterRole.Mesh, null, MeshKind.Structured3D, false, null);
            case KnownNames.UnstructuredMesh:
                return (ParameterRole.Mesh, null, MeshKind.Unstructured, false, null);
            case KnownNames.BoundaryFluxTally:
                return (ParameterRole.Tally, null, null, false, null);
            case KnownNames.ParallelOptions:
                return (ParameterRole.ParallelOptions, null, null, false, null);
            case KnownNames.ExecutionMode:
                return (ParameterRole.Mode, null, null, false, null);
            case "System.ReadOnlySpan<T>":
            case "System.ReadOnlyMemory<T>":
            case "System.Span<T>":
            case "System.Memory<T>":
                var element = named.TypeArguments[0];
                bool readOnlyContainer = original.StartsWith("System.ReadOnly", StringComparison.Ordinal);
                bool memoryContainer = original.EndsWith("Memory<T>", StringComparison.Ordinal);
                if (element is INamedTypeSymbol { IsGenericType: true } gradient
                    && gradient.OriginalDefinition.ToDisplayString() == KnownNames.GradientOpen
                    && ConservedStateParser.IsConservedState(gradient.TypeArguments[0]))
                {
                    return readOnlyContainer
                        ? (default, null, null, false, "gradient buffer '" + p.Name + "' must be writable (Span or Memory)")
                        : (ParameterRole.GradientBuffer, gradient.TypeArguments[0], null, memoryContainer, null);
                }

                if (!ConservedStateParser.IsConservedState(element))
                {
                    return (default, null, null, false, "parameter '" + p.Name + "' holds " + element.ToDisplayString() + ", which is not a [ConservedState] struct");
                }

                bool readOnly = original.StartsWith("System.ReadOnly", StringComparison.Ordinal);
                bool memory = original.EndsWith("Memory<T>", StringComparison.Ordinal);
                bool faceData = p.GetAttributes().Any(a => a.AttributeClass?.ToDisplayString() == KnownNames.FaceDataAttribute);
                if (readOnly && faceData)
                {
                    return (default, null, null, false, "face buffer '" + p.Name + "' must be writable (Span or Memory)");
                }

                var role = readOnly ? ParameterRole.State : faceData ? ParameterRole.FaceBuffer : ParameterRole.Residual;
                return (role, element, null, memory, null);
        }

        if (named.OriginalDefinition.MetadataName == "BoundaryBinding`1"
            && named.OriginalDefinition.ContainingNamespace?.ToDisplayString() == "FvGen.Boundaries")
        {
            var argument = named.TypeArguments[0];
            bool ours = argument.Name == KnownNames.BoundaryEnumName
                && (argument.TypeKind == TypeKind.Error || SymbolEqualityComparer.Default.Equals(argument.ContainingType, kernelType));
            return ours
                ? (ParameterRole.Boundaries, null, null, false, null)
                : (default, null, null, false, "boundary binding '" + p.Name + "' must be a BoundaryBinding<Boundary> of the kernel's own type (the enum the generator writes from its [BoundaryFlux] methods)");
        }

        return (default, null, null, false, Unknown(p));
    }

    private static string Unknown(IParameterSymbol p) =>
        "parameter '" + p.Name + "' of type " + p.Type.ToDisplayString()
        + " is none of: a mesh (StructuredGrid1D/2D/3D, UnstructuredMesh), the state (ReadOnlySpan or ReadOnlyMemory of the state), the residual (Span or Memory), "
        + "a [FaceData] face buffer, a gradient buffer (Span or Memory of Gradient<TState>), a BoundaryBinding<Boundary>, a BoundaryFluxTally, ParallelOptions, an ExecutionMode";

    private static string TypeText(IParameterSymbol p, ParameterRole role, ITypeSymbol? element, string kernelType)
    {
        string nullable = p.NullableAnnotation == NullableAnnotation.Annotated ? "?" : "";
        if (role == ParameterRole.Boundaries)
        {
            return "global::FvGen.Boundaries.BoundaryBinding<" + kernelType + "." + KnownNames.BoundaryEnumName + ">" + nullable;
        }

        if (element is not null && p.Type is INamedTypeSymbol named)
        {
            string container = named.OriginalDefinition.ToDisplayString();
            container = container.Substring(0, container.Length - "<T>".Length);
            string item = element.ToDisplayString(SymbolDisplayFormat.FullyQualifiedFormat);
            if (role == ParameterRole.GradientBuffer)
            {
                item = "global::FvGen.Geometry.Gradient<" + item + ">";
            }

            return "global::" + container + "<" + item + ">";
        }

        return p.Type.WithNullableAnnotation(NullableAnnotation.NotAnnotated).ToDisplayString(SymbolDisplayFormat.FullyQualifiedFormat) + nullable;
    }

    private static string? CheckMode(KernelMode mode, MeshKind mesh, List<KernelParameter> parameters, bool modeChosenAtRunTime)
    {
        // A kernel whose mode is chosen at run time may carry a face buffer that only its gather path uses.
        bool strayBuffer = !modeChosenAtRunTime && parameters.Any(p => p.Role == ParameterRole.FaceBuffer);
        if (!Enum.IsDefined(typeof(KernelMode), mode))
        {
            return "execution mode " + (int)mode + " is not a member of FvGen.ExecutionMode";
        }

        if (mode == KernelMode.SerialScatter)
        {
            return strayBuffer ? "a [FaceData] face buffer is used only by ExecutionMode.ParallelGather" : null;
        }

        if (mesh == MeshKind.Structured1D && mode == KernelMode.ParallelColouredScatter)
        {
            return "ExecutionMode.ParallelColouredScatter is generated for unstructured meshes and 2-D and 3-D structured grids; a 1-D grid has no slabs to share out, use ParallelGather or SerialScatter";
        }

        if (!parameters.Any(p => p.Role == ParameterRole.State && p.IsMemory) || !parameters.Any(p => p.Role == ParameterRole.Residual && p.IsMemory))
        {
            return "ExecutionMode." + mode + " shares the state and residual with worker threads: declare them as ReadOnlyMemory<TState> and Memory<TState> (spans cannot cross threads)";
        }

        bool hasBuffer = parameters.Any(p => p.Role == ParameterRole.FaceBuffer && p.IsMemory);
        if (mode == KernelMode.ParallelGather && !hasBuffer)
        {
            return "ExecutionMode.ParallelGather needs a face buffer: add a '[FaceData] Memory<TState>' parameter of at least mesh.FaceCount states (allocate it once per mesh)";
        }

        if (mode != KernelMode.ParallelGather && strayBuffer)
        {
            return "a [FaceData] face buffer is used only by ExecutionMode.ParallelGather";
        }

        return null;
    }

    private static string? CheckReconstruction(KernelReconstruction reconstruction, KernelLimiter limiter, MeshKind mesh)
    {

        if (!Enum.IsDefined(typeof(KernelReconstruction), reconstruction))
        {
            return "reconstruction " + (int)reconstruction + " is not a member of FvGen.ReconstructionKind";
        }

        if (!Enum.IsDefined(typeof(KernelLimiter), limiter))
        {
            return "limiter " + (int)limiter + " is not a member of FvGen.LimiterKind";
        }

        return reconstruction switch
        {
            KernelReconstruction.FirstOrder => null,
            KernelReconstruction.User => null,
            _ when mesh == MeshKind.Unstructured && limiter != KernelLimiter.BarthJespersen =>
                "linear reconstruction on unstructured meshes is limited by Barth-Jespersen; the " + limiter + " limiter is for MUSCL on structured grids",
            _ when mesh != MeshKind.Unstructured && limiter == KernelLimiter.BarthJespersen =>
                "the Barth-Jespersen limiter is for unstructured meshes; MUSCL on structured grids takes Minmod, VanLeer, MonotonizedCentral or Superbee",
            _ => null,
        };
    }

    private static int NamedInt(AttributeData attribute, string name, int fallback)
    {
        foreach (var pair in attribute.NamedArguments)
        {
            if (pair.Key == name && pair.Value.Value is int value)
            {
                return value;
            }
        }

        return fallback;
    }

    private static MethodDeclarationSyntax? DefiningDeclaration(IMethodSymbol method, CancellationToken cancellationToken)
    {
        var definition = method.PartialDefinitionPart ?? method;
        foreach (var reference in definition.DeclaringSyntaxReferences)
        {
            if (reference.GetSyntax(cancellationToken) is MethodDeclarationSyntax { Body: null, ExpressionBody: null } syntax)
            {
                return syntax;
            }
        }

        return null;
    }

    private static bool IsGenerated(IMethodSymbol implementation) =>
        implementation.DeclaringSyntaxReferences.All(r => GeneratedTrees.IsOurs(r.SyntaxTree));

    private static bool HasAttribute(ISymbol symbol, string name) =>
        symbol.GetAttributes().Any(a => a.AttributeClass?.ToDisplayString() == name);

    private static string Describe(ParameterRole role) => role switch
    {
        ParameterRole.Mesh => "mesh",
        ParameterRole.State => "state (ReadOnlySpan<TState> or ReadOnlyMemory<TState>)",
        ParameterRole.Residual => "residual (Span<TState> or Memory<TState>)",
        ParameterRole.Boundaries => "boundary binding",
        ParameterRole.Tally => "boundary flux tally",
        ParameterRole.ParallelOptions => "ParallelOptions",
        ParameterRole.GradientBuffer => "gradient buffer",
        ParameterRole.Mode => "ExecutionMode",
        _ => "face buffer",
    };

    private static Location? First(ISymbol symbol) => symbol.Locations.Length > 0 ? symbol.Locations[0] : null;
}
