using System.Collections.Generic;
using System.Linq;
using FvGen.Generator.Common;
using FvGen.Generator.Structured;
using FvGen.Generator.Unstructured;

namespace FvGen.Generator.Kernels;

/// <summary>
/// Writes the body of a residual kernel: argument checks, then the face loops of its mesh kind and
/// mode in a static local function with fixed parameter names.
/// </summary>
/// <remarks>
/// Convention (every mesh kind): the residual is dU/dt per unit volume,
/// R_c = -(1/V_c) Σ_faces F·A, with F the flux leaving the left cell and entering the right one.
/// The residual is overwritten, not added to; boundary flux totals are added to the tally.
/// </remarks>
internal static class KernelEmitter
{
    public static string HintName(ResidualKernelModel model) => model.Location.HintName + "." + model.MethodName + ".Residual.g.cs";

    public static string Describe(ResidualKernelModel model)
    {
        string mesh = model.Mesh switch
        {
            MeshKind.Structured1D => "StructuredGrid1D",
            MeshKind.Structured2D => "StructuredGrid2D",
            MeshKind.Structured3D => "StructuredGrid3D",
            _ => "UnstructuredMesh",
        };
        string order = model.Reconstruction == KernelReconstruction.User
                ? "user reconstruction " + model.UserReconstruction?.Name + (model.Mesh == MeshKind.Unstructured ? " from Green-Gauss gradients limited by Barth-Jespersen" : "")
            : model.Reconstruction != KernelReconstruction.Linear ? "first order"
            : model.Mesh == MeshKind.Unstructured ? "linear reconstruction, Green-Gauss gradients, Barth-Jespersen limiter"
            : "MUSCL, " + model.Limiter + " limiter";
        if (model.Flux.TakesGradients)
        {
            order += ", Green-Gauss gradients to the flux";
        }

        return "residual kernel " + model.MethodName + " (numerical flux " + model.Flux.Name + ", " + mesh + ", " + model.Mode + ", " + order + ")";
    }

    public static string Emit(ResidualKernelModel model)
    {
        return GeneratedFile.Write(model.Location, Describe(model), w =>
        {
            var options = KernelNames.Find(model, ParameterRole.ParallelOptions);
            var modes = model.RuntimeModes.Count > 0 ? model.RuntimeModes.ToList() : new List<KernelMode> { model.Mode };
            bool parallel = modes.Any(m => m != KernelMode.SerialScatter);
            if (parallel && options is null)
            {
                w.Line("private static readonly global::System.Threading.Tasks.ParallelOptions " + model.MethodName + KernelNames.DefaultOptionsSuffix + " = new();");
                w.Line();
            }

            var declared = model.Parameters.Select(p => p.Prefix + p.TypeText + " " + p.Name);
            w.Line("// Face loops in telescoping form: every face flux is evaluated once, taken from the cell behind");
            w.Line("// the face and given to the cell in front, so Σ residual·volume = -Σ boundary flux·area.");
            w.Open(model.Modifiers + " void " + model.MethodName + "(" + string.Join(", ", declared) + ")");
            var passed = model.Parameters.Where(p => p.Role != ParameterRole.Mode).ToList();
            var arguments = passed.Select(p => p.Name).ToList();
            var core = passed.Select(p => p.Prefix + p.TypeText + " " + KernelNames.Of(p)).ToList();
            if (parallel && options is null)
            {
                arguments.Add(model.MethodName + KernelNames.DefaultOptionsSuffix);
                core.Add("global::System.Threading.Tasks.ParallelOptions options");
            }

            string call = "(" + string.Join(", ", arguments) + ");";
            var mode = KernelNames.Find(model, ParameterRole.Mode);
            if (mode is null)
            {
                w.Line(KernelNames.CoreFunction + call);
            }
            else
            {
                w.Line("// The execution mode is chosen at run time among those these parameters support.");
                w.Line("switch (" + mode.Name + ")");
                w.Open();
                foreach (var m in modes)
                {
                    w.Line("case global::FvGen.ExecutionMode." + m + ":");
                    w.Line("    " + KernelNames.CoreFunction + m + call);
                    w.Line("    break;");
                }

                w.Line("default:");
                w.Line("    throw new global::System.ArgumentException(\"" + model.MethodName + ": ExecutionMode.\" + " + mode.Name + " + \" is not available with these parameters; available: "
                    + string.Join(", ", modes) + ".\", " + SourceLiteral.String(mode.Name) + ");");
                w.Close();
            }

            foreach (var m in modes)
            {
                var variant = model with { Mode = m };
                string name = KernelNames.CoreFunction + (mode is null ? "" : m.ToString());
                w.Line();
                w.Line("// ExecutionMode." + m + ": " + m switch
                {
                    KernelMode.ParallelGather => "face fluxes into the face buffer in parallel, then each cell gathers its faces in a fixed order.",
                    KernelMode.ParallelColouredScatter => "faces scattered in parallel, colour by colour (slab by slab on structured grids).",
                    _ => "one thread, each face scattered to its two cells.",
                });
                w.Open("static void " + name + "(" + string.Join(", ", core) + ")");
                Prologue(w, variant);
                if (variant.Mesh == MeshKind.Unstructured)
                {
                    UnstructuredEmitter.Emit(w, variant);
                }
                else
                {
                    StructuredEmitter.Emit(w, variant);
                }

                w.Close();
            }

            w.Close();
        });
    }

    private static void Prologue(IndentedWriter w, ResidualKernelModel model)
    {
        var mesh = KernelNames.Find(model, ParameterRole.Mesh)!;
        var state = KernelNames.Find(model, ParameterRole.State)!;
        var residual = KernelNames.Find(model, ParameterRole.Residual)!;
        var boundaries = KernelNames.Find(model, ParameterRole.Boundaries);
        var tally = KernelNames.Find(model, ParameterRole.Tally);
        var buffer = KernelNames.Find(model, ParameterRole.FaceBuffer);
        string s = model.State.FullyQualifiedName;
        string kernel = model.MethodName; // an identifier: safe inside a string literal

        w.Line("global::System.ArgumentNullException.ThrowIfNull(mesh, " + SourceLiteral.String(mesh.Name) + ");");
        w.Line("int cellCount = mesh.CellCount;");
        LengthCheck(w, KernelNames.Of(state) + ".Length", "cellCount", state.Name, "cells", kernel);
        LengthCheck(w, KernelNames.Of(residual) + ".Length", "cellCount", residual.Name, "cells", kernel);
        if (KernelNames.Find(model, ParameterRole.GradientBuffer) is { } gradients)
        {
            LengthCheck(w, KernelNames.Of(gradients) + ".Length", "cellCount", gradients.Name, "gradients", kernel);
        }

        if (buffer is not null && model.Mode == KernelMode.ParallelGather)
        {
            w.Line("if (faceFluxMemory.Length < mesh.FaceCount)");
            w.Open();
            w.Line("throw new global::System.ArgumentException(\"" + kernel + ": the face buffer holds \" + faceFluxMemory.Length + \" faces; the mesh has \" + mesh.FaceCount + \".\", " + SourceLiteral.String(buffer.Name) + ");");
            w.Close();
        }

        if (boundaries is not null)
        {
            w.Line("global::System.ArgumentNullException.ThrowIfNull(boundaries, " + SourceLiteral.String(boundaries.Name) + ");");
            w.Line("// Which boundary flux each patch calls; resolved and validated once per mesh.");
            w.Line("global::System.ReadOnlySpan<" + model.TypeName + "." + KnownNames.BoundaryEnumName + "> patchFluxes = boundaries.Resolve(mesh);");
        }
        else
        {
            w.Line("if (mesh.PatchNames.Count != 0)");
            w.Open();
            w.Line("throw new global::System.ArgumentException(\"" + kernel + " has no boundary binding parameter, so it runs only on meshes without boundary patches; this mesh has \" + mesh.PatchNames.Count + \".\", " + SourceLiteral.String(mesh.Name) + ");");
            w.Close();
        }

        if (tally is not null)
        {
            w.Line("if (tally is not null && (tally.PatchCount != mesh.PatchNames.Count || tally.ComponentCount != " + s + ".ComponentCount))");
            w.Open();
            w.Line("throw new global::System.ArgumentException(\"" + kernel + ": the tally has \" + tally.PatchCount + \" patches of \" + tally.ComponentCount + \" components; the mesh has \" + mesh.PatchNames.Count + \" patches and the state \" + " + s + ".ComponentCount + \" components.\", " + SourceLiteral.String(tally.Name) + ");");
            w.Close();
        }

        w.Line();
    }

    private static void LengthCheck(IndentedWriter w, string actual, string expected, string name, string what, string kernel)
    {
        w.Line("if (" + actual + " != " + expected + ")");
        w.Open();
        w.Line("throw new global::System.ArgumentException(\"" + kernel + ": '" + name + "' holds \" + " + actual + " + \" " + what + "; the mesh has \" + " + expected + " + \".\", " + SourceLiteral.String(name) + ");");
        w.Close();
    }

    /// <summary>Writes the per-patch tally update after a boundary face loop that summed into <c>total</c>.</summary>
    public static void TallyAdd(IndentedWriter w, ResidualKernelModel model, string patch)
    {
        if (KernelNames.Find(model, ParameterRole.Tally) is null)
        {
            return;
        }

        w.Line("if (tally is not null)");
        w.Open();
        w.Line(model.State.FullyQualifiedName + ".AddTo(tally.Patch(" + patch + "), total);");
        w.Close();
    }

    /// <summary>The call of the numerical flux with the modifiers of its signature.</summary>
    public static string FluxCall(ResidualKernelModel model, string left, string right, string face)
    {
        string call = model.TypeName + "." + model.Flux.Name + "(" + model.Flux.StateModifier + left + ", " + model.Flux.StateModifier + right + ", " + model.Flux.FaceModifier + face;
        if (model.Flux.TakesGradients)
        {
            call += ", " + model.Flux.GradientModifier + "gradients[left], " + model.Flux.GradientModifier + "gradients[right]";
        }

        return call + ")";
    }

    /// <summary>The call of one boundary flux.</summary>
    public static string BoundaryCall(ResidualKernelModel model, Fluxes.BoundaryFluxEntry entry, string inside, string face) =>
        model.TypeName + "." + entry.Call.Name + "(" + entry.Call.StateModifier + inside + ", " + entry.Call.FaceModifier + face + ")";

    /// <summary>
    /// Writes <c>switch (patchFluxes[patch])</c> with one case per boundary flux, each running the face loop
    /// <paramref name="loop"/> writes for that flux, and a default that names the patch.
    /// </summary>
    public static void PatchSwitch(IndentedWriter w, ResidualKernelModel model, string patch, System.Action<IndentedWriter, Fluxes.BoundaryFluxEntry> loop)
    {
        string enumName = model.TypeName + "." + KnownNames.BoundaryEnumName;
        w.Line("switch (patchFluxes[" + patch + "])");
        w.Open();
        foreach (var entry in model.BoundaryFluxes)
        {
            w.Line("case " + enumName + "." + entry.Call.Name + ":");
            w.Open();
            loop(w, entry);
            w.Line("break;");
            w.Close();
        }

        w.Line("default:");
        w.Line("    throw new global::System.InvalidOperationException(\"Patch '\" + mesh.PatchNames[" + patch + "] + \"' is bound to \" + patchFluxes[" + patch + "] + \", which is not a boundary flux of " + model.TypeName.Replace("global::", "") + ".\");");
        w.Close();
    }

    /// <summary>Writes the final division by the cell volumes over <c>[start, end)</c>.</summary>
    public static void DivideByVolumes(IndentedWriter w, string residual, string start, string end)
    {
        w.Line("var volumes = mesh.CellVolumes;");
        w.Open("for (int c = " + start + "; c < " + end + "; c++)");
        w.Line(residual + "[c] = " + residual + "[c] / volumes[c];");
        w.Close();
    }
}
