using System.Linq;
using FvGen.Generator.Common;
using FvGen.Generator.Kernels;
using FvGen.Generator.Unstructured;

namespace FvGen.Generator.Structured;

/// <summary>
/// Writes the parallel gather on structured grids: every face flux · area into the face buffer (interior
/// faces in parallel, wrap and boundary faces serially), then each cell sums its faces in parallel, in the
/// fixed order x-low, x-high, y-low, y-high, z-low, z-high.
/// </summary>
/// <remarks>
/// Face buffer layout: the faces of direction x, then y, then z. Within a direction the face on node
/// plane p (between cells p − 1 and p; p = 0 and p = n are the boundary faces) is numbered like a cell
/// whose index along that direction is p, with n + 1 planes in place of n cells. On a periodic direction
/// the wrap face lies on planes 0 and n and is stored on both (the same value, computed once), so every
/// cell's high face is its low face plus the direction's stride, with no condition. Every stored value is the flux · area toward +axis, so a low boundary
/// face stores minus its outward flux (an exact negation). Each value is computed by the same operations
/// whatever the thread count and each cell adds its faces in one fixed order, so the residual is bitwise
/// identical for any number of threads. The tally is summed serially in face order, as in serial scatter.
/// </remarks>
internal static class StructuredGatherEmitter
{
    private static readonly string[] Axis = { "x", "y", "z" };
    private static readonly string[] Index = { "i", "j", "k" };
    private static readonly string[] Count = { "nx", "ny", "nz" };
    private static readonly string[] Stride = { "1", "nx", "plane" };

    public static void Emit(IndentedWriter w, ResidualKernelModel model)
    {
        int dim = (int)model.Mesh;
        string s = model.State.FullyQualifiedName;
        string chunk = UnstructuredEmitter.ChunkSize.ToString(System.Globalization.CultureInfo.InvariantCulture);
        string gradientArgument = model.NeedsGradients ? "gradientMemory.Span, " : "";
        w.Line("global::System.ReadOnlySpan<" + s + "> state = stateMemory.Span;");
        w.Line("global::System.Span<" + s + "> faceFlux = faceFluxMemory.Span;");
        StructuredEmitter.DeclareAxes(w, model, dim);
        DeclarePlanes(w, dim);
        if (model.NeedsGradients)
        {
            w.Line("global::System.Span<global::FvGen.Geometry.Gradient<" + s + ">> gradients = gradientMemory.Span;");
            StructuredGradientEmitter.Emit(w, model, dim);
        }

        if (model.Reconstruction != KernelReconstruction.FirstOrder)
        {
            MusclEmitter.DeclareFunctions(w, model);
        }

        bool hasBoundaries = KernelNames.Find(model, ParameterRole.Boundaries) is not null;
        for (int d = 0; d < dim; d++)
        {
            string name = "Faces" + Axis[d].ToUpperInvariant();
            w.Line();
            if (dim == 1)
            {
                w.Line("// Phase 1, x faces, interior: flux · area into the face buffer, in parallel chunks of " + chunk + " faces.");
                w.Line("global::System.Threading.Tasks.Parallel.For(0, (nx + " + chunk + " - 1) / " + chunk + ", options, slab => " + name
                    + "(mesh, stateMemory.Span, faceFluxMemory.Span, " + gradientArgument + "slab));");
            }
            else
            {
                int slab = StructuredEmitter.SlabAxis(dim, d);
                w.Line("// Phase 1, " + Axis[d] + " faces, interior: flux · area into the face buffer, one parallel task per " + Axis[slab] + " slab.");
                w.Line("global::System.Threading.Tasks.Parallel.For(0, " + Count[slab] + ", options, slab => " + name
                    + "(mesh, stateMemory.Span, faceFluxMemory.Span, " + gradientArgument + "slab));");
            }

            w.Line();
            w.Open("if (mesh.IsPeriodic(" + d + "))");
            int axis = d;
            StructuredEmitter.Periodic(w, model, dim, d, body =>
            {
                // The wrap face on both of its node planes, so that every cell's high face is its low face + stride.
                body.Line("faceFlux[" + FaceIndex(dim, axis, "0") + "] = flux;");
                body.Line("faceFlux[" + FaceIndex(dim, axis, Count[axis]) + "] = flux;");
            });
            w.Close();
            if (hasBoundaries)
            {
                w.Open("else");
                StructuredEmitter.BoundarySide(w, model, dim, d, high: false, body => body.Line("faceFlux[" + FaceIndex(dim, axis, "0") + "] = -flux;"));
                w.Line();
                StructuredEmitter.BoundarySide(w, model, dim, d, high: true, body => body.Line("faceFlux[" + FaceIndex(dim, axis, Count[axis]) + "] = flux;"));
                w.Close();
            }
        }

        w.Line();
        w.Line("// Phase 2: each cell sums its faces in the fixed order " + string.Join(", ", Enumerable.Range(0, dim).Select(a => Axis[a] + "-low, " + Axis[a] + "-high"))
            + ", in parallel " + (dim == 1 ? "chunks of " + chunk + " cells." : Axis[dim - 1] + " slabs."));
        w.Line("global::System.Threading.Tasks.Parallel.For(0, " + (dim == 1 ? "(nx + " + chunk + " - 1) / " + chunk : Count[dim - 1])
            + ", options, slab => GatherCells(mesh, faceFluxMemory.Span, residualMemory.Span, " + (dim == 1 ? "slab" : "slab, slab + 1") + "));");

        string meshType = model.Parameters.First(p => p.Role == ParameterRole.Mesh).TypeText;
        for (int d = 0; d < dim; d++)
        {
            int axis = d;
            w.Line();
            w.Open("static void Faces" + Axis[d].ToUpperInvariant() + "(" + meshType + " mesh, global::System.ReadOnlySpan<" + s + "> state, global::System.Span<" + s + "> faceFlux, "
                + (model.NeedsGradients ? "global::System.ReadOnlySpan<global::FvGen.Geometry.Gradient<" + s + ">> gradients, " : "") + "int slab)");
            StructuredEmitter.DeclareAxes(w, model, dim);
            DeclarePlanes(w, dim);
            StructuredEmitter.Interior(
                w,
                model,
                dim,
                d,
                body => body.Line("faceFlux[" + FaceIndex(dim, axis, Index[axis]) + "] = flux;"),
                dim == 1 ? null : StructuredEmitter.SlabAxis(dim, d),
                dim == 1 ? ("global::System.Math.Max(1, slab * " + chunk + ")", "global::System.Math.Min(nx, (slab + 1) * " + chunk + ")") : null);
            w.Close();
        }

        w.Line();
        // In 2-D and 3-D the slab index is a loop variable over [first, end), so that the cell sums read as
        // one loop nest over every index of the cell.
        w.Open("static void GatherCells(" + meshType + " mesh, global::System.ReadOnlySpan<" + s + "> faceFlux, global::System.Span<" + s + "> residual, "
            + (dim == 1 ? "int slab)" : "int first, int end)"));
        for (int a = 0; a < dim; a++)
        {
            w.Line("int " + Count[a] + " = mesh." + Axis[a].ToUpperInvariant() + ".CellCount;");
        }

        if (dim == 3)
        {
            w.Line("int plane = nx * ny;");
        }

        DeclarePlanes(w, dim);
        w.Line("global::System.ReadOnlySpan<double> volumes = mesh.CellVolumes;");
        int opened = 0;
        if (dim == 1)
        {
            w.Open("for (int i = slab * " + chunk + "; i < global::System.Math.Min(nx, (slab + 1) * " + chunk + "); i++)");
            opened++;
        }
        else
        {
            w.Open("for (int " + Index[dim - 1] + " = first; " + Index[dim - 1] + " < end; " + Index[dim - 1] + "++)");
            opened++;
            for (int a = dim - 2; a >= 0; a--)
            {
                w.Open("for (int " + Index[a] + " = 0; " + Index[a] + " < " + Count[a] + "; " + Index[a] + "++)");
                opened++;
            }
        }

        w.Line("int c = " + StructuredEmitter.CellIndex(dim) + ";");
        for (int a = 0; a < dim; a++)
        {
            string ax = Axis[a];
            w.Line("int " + ax + "Low = " + FaceIndex(dim, a, Index[a]) + ";");
            w.Line("int " + ax + "High = " + ax + "Low + " + Stride[a] + ";");
        }

        w.Line(s + " sum = faceFlux[xLow] - faceFlux[xHigh];");
        for (int a = 1; a < dim; a++)
        {
            w.Line("sum += faceFlux[" + Axis[a] + "Low];");
            w.Line("sum -= faceFlux[" + Axis[a] + "High];");
        }

        w.Line("residual[c] = sum / volumes[c];");
        for (int n = 0; n < opened; n++)
        {
            w.Close();
        }

        w.Close();
    }

    /// <summary>Declares the node planes of faces per direction (n + 1, periodic or not) and where the y and z faces start in the buffer.</summary>
    private static void DeclarePlanes(IndentedWriter w, int dim)
    {
        for (int a = 0; a < dim; a++)
        {
            w.Line("int " + Axis[a] + "Planes = " + Count[a] + " + 1;");
        }

        if (dim >= 2)
        {
            w.Line("int yFirst = xPlanes * ny" + (dim == 3 ? " * nz" : "") + ";");
        }

        if (dim == 3)
        {
            w.Line("int zFirst = yFirst + nx * yPlanes * nz;");
        }
    }

    /// <summary>The buffer index of the face of direction <paramref name="d"/> on node plane <paramref name="plane"/> at the current other indices.</summary>
    private static string FaceIndex(int dim, int d, string plane) => (d, dim) switch
    {
        (0, 1) => plane,
        (0, 2) => plane + " + xPlanes * j",
        (0, _) => plane + " + xPlanes * (j + ny * k)",
        (1, 2) => "yFirst + i + nx * " + Parenthesise(plane),
        (1, _) => "yFirst + i + nx * (" + plane + " + yPlanes * k)",
        _ => "zFirst + i + nx * (j + ny * " + Parenthesise(plane) + ")",
    };

    private static string Parenthesise(string expression) => expression.Contains(" ") ? "(" + expression + ")" : expression;
}
