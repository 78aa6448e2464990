using System;
using System.Collections.Generic;
using System.Linq;
using FvGen.Generator.Common;
using FvGen.Generator.Kernels;

namespace FvGen.Generator.Structured;

/// <summary>
/// Writes the face loops of a kernel on a structured grid: for each direction, the interior faces,
/// then either the periodic wrap faces or the two sides' boundary faces.
/// </summary>
/// <remarks>
/// Cells are numbered x fastest, <c>c = i + nx * (j + ny * k)</c>; the face between cells
/// <c>c - stride</c> and <c>c</c> along a direction has its normal along +that axis.
/// </remarks>
internal static class StructuredEmitter
{
    private static readonly string[] Axis = { "x", "y", "z" };
    private static readonly string[] Index = { "i", "j", "k" };
    private static readonly string[] Count = { "nx", "ny", "nz" };
    private static readonly string[] Stride = { "1", "nx", "plane" };
    private static readonly string[] Side = { "XLow", "XHigh", "YLow", "YHigh", "ZLow", "ZHigh" };

    public static void Emit(IndentedWriter w, ResidualKernelModel model)
    {
        if (model.Mode == KernelMode.ParallelGather)
        {
            StructuredGatherEmitter.Emit(w, model);
            return;
        }

        int dim = (int)model.Mesh;
        bool parallel = model.Mode == KernelMode.ParallelColouredScatter;
        var state = KernelNames.Find(model, ParameterRole.State)!;
        var residual = KernelNames.Find(model, ParameterRole.Residual)!;
        if (state.IsMemory)
        {
            w.Line("global::System.ReadOnlySpan<" + model.State.FullyQualifiedName + "> state = stateMemory.Span;");
        }

        if (residual.IsMemory)
        {
            w.Line("global::System.Span<" + model.State.FullyQualifiedName + "> residual = residualMemory.Span;");
        }

        DeclareAxes(w, model, dim);
        if (model.NeedsGradients)
        {
            if (KernelNames.Find(model, ParameterRole.GradientBuffer)!.IsMemory)
            {
                w.Line("global::System.Span<global::FvGen.Geometry.Gradient<" + model.State.FullyQualifiedName + ">> gradients = gradientMemory.Span;");
            }

            StructuredGradientEmitter.Emit(w, model, dim);
        }

        w.Line("residual.Clear();");
        if (model.Reconstruction != KernelReconstruction.FirstOrder)
        {
            MusclEmitter.DeclareFunctions(w, model);
        }

        bool hasBoundaries = KernelNames.Find(model, ParameterRole.Boundaries) is not null;
        for (int d = 0; d < dim; d++)
        {
            w.Line();
            if (parallel)
            {
                int slab = SlabAxis(dim, d);
                w.Line("// " + Axis[d] + " faces, interior: one parallel task per " + Axis[slab] + " slab; the faces of a slab touch only its own cells.");
                w.Line("global::System.Threading.Tasks.Parallel.For(0, " + Count[slab] + ", options, slab => Interior" + Axis[d].ToUpperInvariant()
                    + "(mesh, stateMemory.Span, residualMemory.Span, " + (model.NeedsGradients ? "gradientMemory.Span, " : "") + "slab));");
            }
            else
            {
                Interior(w, model, dim, d, Scatter, slabAxis: null);
            }

            w.Line();
            w.Open("if (mesh.IsPeriodic(" + d + "))");
            Periodic(w, model, dim, d, Scatter);
            w.Close();
            if (hasBoundaries)
            {
                w.Open("else");
                BoundarySide(w, model, dim, d, high: false, ScatterInside);
                w.Line();
                BoundarySide(w, model, dim, d, high: true, ScatterInside);
                w.Close();
            }
        }

        w.Line();
        w.Line("// Residual = -(1/V) Σ flux·area out of each cell.");
        KernelEmitter.DivideByVolumes(w, "residual", "0", "residual.Length");
        if (!parallel)
        {
            return;
        }

        string s = model.State.FullyQualifiedName;
        for (int d = 0; d < dim; d++)
        {
            w.Line();
            w.Open("static void Interior" + Axis[d].ToUpperInvariant() + "(" + model.Parameters.First(p => p.Role == ParameterRole.Mesh).TypeText
                + " mesh, global::System.ReadOnlySpan<" + s + "> state, global::System.Span<" + s + "> residual, "
                + (model.NeedsGradients ? "global::System.ReadOnlySpan<global::FvGen.Geometry.Gradient<" + s + ">> gradients, " : "") + "int slab)");
            DeclareAxes(w, model, dim);
            Interior(w, model, dim, d, Scatter, SlabAxis(dim, d));
            w.Close();
        }
    }

    /// <summary>Applies a face flux to its two cells: taken from the left one, given to the right one.</summary>
    private static void Scatter(IndentedWriter w)
    {
        w.Line("residual[left] -= flux;");
        w.Line("residual[right] += flux;");
    }

    /// <summary>Applies a boundary face flux to its inside cell, which it leaves.</summary>
    private static void ScatterInside(IndentedWriter w) => w.Line("residual[inside] -= flux;");

    /// <summary>The axis whose slabs a parallel task owns for faces of direction <paramref name="d"/>: any other axis, the outermost one possible.</summary>
    internal static int SlabAxis(int dim, int d) => d == dim - 1 ? dim - 2 : dim - 1;

    internal static void DeclareAxes(IndentedWriter w, ResidualKernelModel model, int dim)
    {
        for (int a = 0; a < dim; a++)
        {
            string ax = Axis[a];
            w.Line("int " + Count[a] + " = mesh." + ax.ToUpperInvariant() + ".CellCount;");
            w.Line("global::System.ReadOnlySpan<double> " + ax + "Nodes = mesh." + ax.ToUpperInvariant() + ".Nodes;");
            w.Line("global::System.ReadOnlySpan<double> " + ax + "Centres = mesh." + ax.ToUpperInvariant() + ".Centres;");
            w.Line("global::System.ReadOnlySpan<double> " + ax + "Widths = mesh." + ax.ToUpperInvariant() + ".Widths;");
        }

        if (dim == 3)
        {
            w.Line("int plane = nx * ny;");
        }

        if (model.Reconstruction != KernelReconstruction.FirstOrder)
        {
            for (int a = 0; a < dim; a++)
            {
                w.Line("bool " + Axis[a] + "Periodic = mesh.IsPeriodic(" + a + ");");
            }
        }
    }

    /// <summary>
    /// Writes the interior faces of direction <paramref name="d"/>; <paramref name="apply"/> writes what is done
    /// with each <c>flux</c> (flux · area from <c>left</c> to <c>right</c>). With <paramref name="slabAxis"/> only
    /// one slab's faces, with <paramref name="range"/> only faces whose index along <paramref name="d"/> lies in it.
    /// </summary>
    internal static void Interior(IndentedWriter w, ResidualKernelModel model, int dim, int d, Action<IndentedWriter> apply, int? slabAxis, (string Start, string End)? range = null)
    {
        w.Line("// " + Axis[d] + " faces between cells (" + Index[d] + " - 1) and " + Index[d] + " along " + Axis[d] + ": interior faces, normal +" + Axis[d] + ".");
        Nest(w, dim, d, fixedIndex: null, body =>
        {
            body.Line("int right = " + CellIndex(dim) + ";");
            body.Line("int left = right - " + Stride[d] + ";");
            body.Line("var face = new global::FvGen.Geometry.FaceGeometry(" + Normal(d, "1.0") + ", area, " + Centroid(dim, d, Index[d]) + ", "
                + Axis[d] + "Centres[" + Index[d] + "] - " + Axis[d] + "Centres[" + Index[d] + " - 1]);");
            FaceFlux(body, model, d, "left", "right", Index[d] + " - 1", Index[d], wrap: false);
            apply(body);
        }, slabAxis, range);
    }

    /// <summary>Writes the periodic wrap faces of direction <paramref name="d"/> (index 0 along it), each <c>flux</c> handled by <paramref name="apply"/>.</summary>
    internal static void Periodic(IndentedWriter w, ResidualKernelModel model, int dim, int d, Action<IndentedWriter> apply)
    {
        w.Line("// " + Axis[d] + " periodic faces: the last cell along " + Axis[d] + " (left) wraps to the first (right).");
        Nest(w, dim, d, fixedIndex: "0", body =>
        {
            body.Line("int right = " + CellIndex(dim) + ";");
            body.Line("int left = right + (" + Count[d] + " - 1) * " + Stride[d] + ";");
            body.Line("var face = new global::FvGen.Geometry.FaceGeometry(" + Normal(d, "1.0") + ", area, " + Centroid(dim, d, "0") + ", 0.5 * ("
                + Axis[d] + "Widths[" + Count[d] + " - 1] + " + Axis[d] + "Widths[0]));");
            FaceFlux(body, model, d, "left", "right", Count[d] + " - 1", "0", wrap: true);
            apply(body);
        });
    }

    /// <summary>
    /// Writes the boundary faces of one side of direction <paramref name="d"/>: each <c>flux</c> (flux · area
    /// out of the domain from cell <c>inside</c>) handled by <paramref name="apply"/> and summed into the patch's tally.
    /// With reconstruction the boundary flux sees the inside cell reconstructed toward the patch.
    /// </summary>
    internal static void BoundarySide(IndentedWriter w, ResidualKernelModel model, int dim, int d, bool high, Action<IndentedWriter> apply)
    {
        string s = model.State.FullyQualifiedName;
        string side = Side[2 * d + (high ? 1 : 0)];
        string inside = high ? Count[d] + " - 1" : "0";
        string node = high ? Count[d] : "0";
        w.Line("// " + side + " side: boundary faces, normal " + (high ? "+" : "-") + Axis[d] + " out of the domain.");
        w.Open();
        w.Line("int patch = mesh.PatchIndex(global::FvGen.Meshes.Structured.GridSide." + side + ");");
        w.Line(s + " total = default;");
        KernelEmitter.PatchSwitch(w, model, "patch", (sw, entry) =>
        {
            Nest(sw, dim, d, fixedIndex: inside, body =>
            {
                body.Line("int inside = " + CellIndex(dim) + ";");
                body.Line("var face = new global::FvGen.Geometry.FaceGeometry(" + Normal(d, high ? "1.0" : "-1.0") + ", area, " + Centroid(dim, d, node) + ", 0.5 * "
                    + Axis[d] + "Widths[" + Index[d] + "]);");
                if (model.Reconstruction != KernelReconstruction.FirstOrder)
                {
                    MusclEmitter.BoundaryFaceState(body, model, Axis[d], Count[d], Stride[d], high);
                    body.Line(s + " flux = " + KernelEmitter.BoundaryCall(model, entry, "insideFace", "face") + " * area;");
                }
                else
                {
                    body.Line(s + " flux = " + KernelEmitter.BoundaryCall(model, entry, "state[inside]", "face") + " * area;");
                }

                apply(body);
                body.Line("total += flux;");
            });
        });
        KernelEmitter.TallyAdd(w, model, "patch");
        w.Close();
    }

    private static void FaceFlux(IndentedWriter w, ResidualKernelModel model, int d, string left, string right, string leftAlong, string rightAlong, bool wrap)
    {
        string s = model.State.FullyQualifiedName;
        if (model.Reconstruction != KernelReconstruction.FirstOrder)
        {
            MusclEmitter.FaceStates(w, model, Axis[d], Count[d], Stride[d], left, right, leftAlong, rightAlong, wrap);
            w.Line(s + " flux = " + KernelEmitter.FluxCall(model, "leftFace", "rightFace", "face") + " * area;");
        }
        else
        {
            w.Line(s + " flux = " + KernelEmitter.FluxCall(model, "state[" + left + "]", "state[" + right + "]", "face") + " * area;");
        }
    }

    /// <summary>
    /// Writes the loops over the cells of a face set, x innermost. Along direction <paramref name="d"/> the index
    /// runs from 1 (interior faces) or is fixed to <paramref name="fixedIndex"/> (one layer of faces).
    /// The face area is written as soon as the indices it needs are known.
    /// </summary>
    private static void Nest(IndentedWriter w, int dim, int d, string? fixedIndex, Action<IndentedWriter> body, int? slabAxis = null, (string Start, string End)? range = null)
    {
        var areaAxes = new List<int>();
        for (int a = 0; a < dim; a++)
        {
            if (a != d)
            {
                areaAxes.Add(a);
            }
        }

        string area = areaAxes.Count == 0 ? "1.0" : string.Join(" * ", areaAxes.ConvertAll(a => Axis[a] + "Widths[" + Index[a] + "]"));
        var bound = new HashSet<int>();
        bool areaWritten = false;
        // Each face set in a block of its own, so its locals never meet another set's.
        w.Open();
        int opened = 1;
        if (fixedIndex is not null)
        {
            w.Line("int " + Index[d] + " = " + fixedIndex + ";");
            bound.Add(d);
        }

        if (slabAxis is { } slab)
        {
            w.Line("int " + Index[slab] + " = slab;");
            bound.Add(slab);
        }

        void WriteAreaIfReady()
        {
            if (!areaWritten && areaAxes.TrueForAll(bound.Contains))
            {
                w.Line("double area = " + area + ";");
                areaWritten = true;
            }
        }

        WriteAreaIfReady();
        for (int a = dim - 1; a >= 0; a--)
        {
            if (bound.Contains(a))
            {
                continue;
            }

            string start = a == d ? "1" : "0";
            string end = Count[a];
            if (a == d && range is { } r)
            {
                start = r.Start;
                end = r.End;
            }

            w.Open("for (int " + Index[a] + " = " + start + "; " + Index[a] + " < " + end + "; " + Index[a] + "++)");
            opened++;
            bound.Add(a);
            WriteAreaIfReady();
        }

        body(w);
        for (int n = 0; n < opened; n++)
        {
            w.Close();
        }
    }

    internal static string CellIndex(int dim) => dim switch
    {
        1 => "i",
        2 => "i + nx * j",
        _ => "i + nx * (j + ny * k)",
    };

    private static string Normal(int d, string sign)
    {
        var parts = new[] { "0.0", "0.0", "0.0" };
        parts[d] = sign;
        return "new global::FvGen.Geometry.Vec3(" + string.Join(", ", parts) + ")";
    }

    private static string Centroid(int dim, int d, string node)
    {
        var parts = new string[3];
        for (int a = 0; a < 3; a++)
        {
            parts[a] = a >= dim ? "0.0" : a == d ? Axis[a] + "Nodes[" + node + "]" : Axis[a] + "Centres[" + Index[a] + "]";
        }

        return "new global::FvGen.Geometry.Vec3(" + string.Join(", ", parts) + ")";
    }
}
