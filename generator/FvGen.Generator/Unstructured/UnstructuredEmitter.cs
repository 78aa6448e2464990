using FvGen.Generator.Common;
using FvGen.Generator.Kernels;

namespace FvGen.Generator.Unstructured;

/// <summary>
/// Writes the face loops of a kernel on an unstructured mesh: the interior faces with their
/// left/right maps, then one loop per boundary patch, in one of three execution modes.
/// </summary>
/// <remarks>
/// <list type="bullet">
/// <item>Serial scatter: each face flux is subtracted from its left cell and added to its right cell.</item>
/// <item>Parallel gather: face fluxes (times area) into the face buffer in parallel chunks, then each
/// cell sums its faces in the mesh's fixed ascending order, in parallel chunks. Every value is computed
/// by the same operations in the same order whatever the thread count, so the result is bitwise
/// identical for any number of threads.</item>
/// <item>Parallel coloured scatter: the interior faces colour by colour (no two faces of a colour share
/// a cell), each colour's faces in parallel chunks; boundary patches serially. A cell receives its
/// faces in colour order, so this too is independent of the thread count.</item>
/// </list>
/// Boundary faces always run serially, patch by patch, in face order; their totals go to the tally.
/// Parallel modes allocate only what <c>Parallel.For</c> allocates per call (its closure and task
/// state), nothing per face.
/// </remarks>
internal static class UnstructuredEmitter
{
    /// <summary>Faces (or cells) per parallel work item: large enough that scheduling is cheap.</summary>
    public const int ChunkSize = 2048;

    public static void Emit(IndentedWriter w, ResidualKernelModel model)
    {
        switch (model.Mode)
        {
            case KernelMode.ParallelGather:
                Gather(w, model);
                break;
            case KernelMode.ParallelColouredScatter:
                ColouredScatter(w, model);
                break;
            default:
                Serial(w, model);
                break;
        }
    }

    private static void Serial(IndentedWriter w, ResidualKernelModel model)
    {
        string s = model.State.FullyQualifiedName;
        if (KernelNames.Find(model, ParameterRole.State)!.IsMemory)
        {
            w.Line("global::System.ReadOnlySpan<" + s + "> state = stateMemory.Span;");
        }

        if (KernelNames.Find(model, ParameterRole.Residual)!.IsMemory)
        {
            w.Line("global::System.Span<" + s + "> residual = residualMemory.Span;");
        }

        if (KernelNames.Find(model, ParameterRole.GradientBuffer) is { IsMemory: true })
        {
            w.Line("global::System.Span<" + GradientEmitter.GradientType(model) + "> gradients = gradientMemory.Span;");
        }

        if (model.NeedsGradients)
        {
            GradientEmitter.Emit(w, model, parallel: false);
            w.Line();
        }

        // The face loops in a block of their own, apart from the locals of the gradient pass.
        w.Open();
        FaceArrays(w, model, declareGradients: false);
        w.Line("residual.Clear();");
        w.Line();
        w.Line("// Interior faces [0, InteriorFaceCount): left -> right, serial scatter.");
        w.Line("int interiorFaces = mesh.InteriorFaceCount;");
        w.Open("for (int f = 0; f < interiorFaces; f++)");
        w.Line("int left = faceLeft[f];");
        w.Line("int right = faceRight[f];");
        InteriorFlux(w, model, "flux");
        w.Line("residual[left] -= flux;");
        w.Line("residual[right] += flux;");
        w.Close();
        Patches(w, model, (body, entry) =>
        {
            body.Line("residual[inside] -= flux;");
        });
        w.Line();
        w.Line("// Residual = -(1/V) Σ flux·area out of each cell.");
        KernelEmitter.DivideByVolumes(w, "residual", "0", "residual.Length");
        w.Close();
    }

    private static void Gather(IndentedWriter w, ResidualKernelModel model)
    {
        string s = model.State.FullyQualifiedName;
        if (model.NeedsGradients)
        {
            GradientEmitter.Emit(w, model, parallel: true);
            w.Line();
        }

        w.Line("int interiorFaces = mesh.InteriorFaceCount;");
        w.Line("int faceChunks = (interiorFaces + " + ChunkSize + " - 1) / " + ChunkSize + ";");
        w.Line();
        w.Line("// Phase 1: interior face fluxes times area into the face buffer, in parallel chunks of faces.");
        w.Open("global::System.Threading.Tasks.Parallel.For(0, faceChunks, options, chunk =>");
        w.Line("global::System.ReadOnlySpan<" + s + "> state = stateMemory.Span;");
        w.Line("global::System.Span<" + s + "> faceFlux = faceFluxMemory.Span;");
        FaceArrays(w, model, declareGradients: true);
        w.Line("int end = global::System.Math.Min(interiorFaces, (chunk + 1) * " + ChunkSize + ");");
        w.Open("for (int f = chunk * " + ChunkSize + "; f < end; f++)");
        w.Line("int left = faceLeft[f];");
        w.Line("int right = faceRight[f];");
        InteriorFlux(w, model, "flux");
        w.Line("faceFlux[f] = flux;");
        w.Close();
        w.Close(");");
        w.Line();
        w.Line("// Phase 2: boundary face fluxes times area into the face buffer, patch by patch.");
        w.Open();
        w.Line("global::System.ReadOnlySpan<" + s + "> state = stateMemory.Span;");
        w.Line("global::System.Span<" + s + "> faceFlux = faceFluxMemory.Span;");
        FaceArrays(w, model, declareGradients: true);
        Patches(w, model, (body, entry) => body.Line("faceFlux[f] = flux;"));
        w.Close();
        w.Line();
        w.Line("// Phase 3: each cell sums its faces in the mesh's fixed ascending order, in parallel chunks of cells.");
        w.Line("int cellChunks = (cellCount + " + ChunkSize + " - 1) / " + ChunkSize + ";");
        w.Open("global::System.Threading.Tasks.Parallel.For(0, cellChunks, options, chunk =>");
        w.Line("global::System.Span<" + s + "> residual = residualMemory.Span;");
        w.Line("global::System.ReadOnlySpan<" + s + "> faceFlux = faceFluxMemory.Span;");
        w.Line("global::System.ReadOnlySpan<int> faceLeft = mesh.FaceLeft;");
        w.Line("global::System.ReadOnlySpan<int> cellFaceOffsets = mesh.CellFaceOffsets;");
        w.Line("global::System.ReadOnlySpan<int> cellFaces = mesh.CellFaces;");
        w.Line("global::System.ReadOnlySpan<double> volumes = mesh.CellVolumes;");
        w.Line("int end = global::System.Math.Min(cellCount, (chunk + 1) * " + ChunkSize + ");");
        w.Open("for (int c = chunk * " + ChunkSize + "; c < end; c++)");
        w.Line(s + " sum = default;");
        w.Open("for (int n = cellFaceOffsets[c]; n < cellFaceOffsets[c + 1]; n++)");
        w.Line("int f = cellFaces[n];");
        w.Open("if (faceLeft[f] == c)");
        w.Line("sum -= faceFlux[f];");
        w.Close();
        w.Open("else");
        w.Line("sum += faceFlux[f];");
        w.Close();
        w.Close();
        w.Line();
        w.Line("residual[c] = sum / volumes[c];");
        w.Close();
        w.Close(");");
    }

    private static void ColouredScatter(IndentedWriter w, ResidualKernelModel model)
    {
        string s = model.State.FullyQualifiedName;
        if (model.NeedsGradients)
        {
            GradientEmitter.Emit(w, model, parallel: true);
            w.Line();
        }

        w.Line("residualMemory.Span.Clear();");
        w.Line("global::FvGen.Meshes.Unstructured.FaceColouring colouring = mesh.FaceColouring;");
        w.Line();
        w.Line("// Interior faces colour by colour; no two faces of one colour share a cell, so a colour's faces scatter in parallel.");
        w.Open("for (int colour = 0; colour < colouring.ColourCount; colour++)");
        w.Line("int first = colouring.ColourOffsets[colour];");
        w.Line("int last = colouring.ColourOffsets[colour + 1];");
        w.Line("int chunks = (last - first + " + ChunkSize + " - 1) / " + ChunkSize + ";");
        w.Open("global::System.Threading.Tasks.Parallel.For(0, chunks, options, chunk =>");
        w.Line("global::System.ReadOnlySpan<" + s + "> state = stateMemory.Span;");
        w.Line("global::System.Span<" + s + "> residual = residualMemory.Span;");
        w.Line("global::System.ReadOnlySpan<int> colourFaces = colouring.Faces;");
        FaceArrays(w, model, declareGradients: true);
        w.Line("int end = global::System.Math.Min(last, first + (chunk + 1) * " + ChunkSize + ");");
        w.Open("for (int n = first + chunk * " + ChunkSize + "; n < end; n++)");
        w.Line("int f = colourFaces[n];");
        w.Line("int left = faceLeft[f];");
        w.Line("int right = faceRight[f];");
        InteriorFlux(w, model, "flux");
        w.Line("residual[left] -= flux;");
        w.Line("residual[right] += flux;");
        w.Close();
        w.Close(");");
        w.Close();
        w.Line();
        w.Open();
        w.Line("global::System.ReadOnlySpan<" + s + "> state = stateMemory.Span;");
        w.Line("global::System.Span<" + s + "> residual = residualMemory.Span;");
        FaceArrays(w, model, declareGradients: true);
        Patches(w, model, (body, entry) => body.Line("residual[inside] -= flux;"));
        w.Line();
        w.Line("// Residual = -(1/V) Σ flux·area out of each cell.");
        KernelEmitter.DivideByVolumes(w, "residual", "0", "residual.Length");
        w.Close();
    }

    private static void FaceArrays(IndentedWriter w, ResidualKernelModel model, bool declareGradients)
    {
        if (model.NeedsGradients)
        {
            if (declareGradients)
            {
                w.Line("global::System.ReadOnlySpan<" + GradientEmitter.GradientType(model) + "> gradients = gradientMemory.Span;");
            }

            w.Line("global::System.ReadOnlySpan<global::FvGen.Geometry.Vec3> cellCentroids = mesh.CellCentroids;");
        }

        w.Line("global::System.ReadOnlySpan<int> faceLeft = mesh.FaceLeft;");
        w.Line("global::System.ReadOnlySpan<int> faceRight = mesh.FaceRight;");
        w.Line("global::System.ReadOnlySpan<global::FvGen.Geometry.Vec3> faceNormals = mesh.FaceNormals;");
        w.Line("global::System.ReadOnlySpan<double> faceAreas = mesh.FaceAreas;");
        w.Line("global::System.ReadOnlySpan<global::FvGen.Geometry.Vec3> faceCentroids = mesh.FaceCentroids;");
        w.Line("global::System.ReadOnlySpan<double> faceDistances = mesh.FaceCentreDistances;");
    }

    private static void InteriorFlux(IndentedWriter w, ResidualKernelModel model, string name)
    {
        w.Line("var face = new global::FvGen.Geometry.FaceGeometry(faceNormals[f], faceAreas[f], faceCentroids[f], faceDistances[f]);");
        string left = "state[left]", right = "state[right]";
        if (model.Reconstruction != KernelReconstruction.FirstOrder)
        {
            GradientEmitter.FaceState(w, model, "leftFace", "left");
            GradientEmitter.FaceState(w, model, "rightFace", "right");
            left = "leftFace";
            right = "rightFace";
        }

        w.Line(model.State.FullyQualifiedName + " " + name + " = " + KernelEmitter.FluxCall(model, left, right, "face") + " * faceAreas[f];");
    }

    /// <summary>Writes the loop over patches: per patch a switch on its bound flux, each case a face loop ending in <paramref name="apply"/>.</summary>
    private static void Patches(IndentedWriter w, ResidualKernelModel model, System.Action<IndentedWriter, Fluxes.BoundaryFluxEntry> apply)
    {
        if (KernelNames.Find(model, ParameterRole.Boundaries) is null)
        {
            return;
        }

        string s = model.State.FullyQualifiedName;
        w.Line();
        w.Line("// Boundary faces, patch by patch: the switch picks the patch's bound flux once, outside its face loop.");
        w.Line("var patches = mesh.Patches;");
        w.Open("for (int p = 0; p < patchFluxes.Length; p++)");
        w.Line("int firstFace = patches[p].FirstFace;");
        w.Line("int endFace = patches[p].EndFace;");
        w.Line(s + " total = default;");
        KernelEmitter.PatchSwitch(w, model, "p", (sw, entry) =>
        {
            sw.Open("for (int f = firstFace; f < endFace; f++)");
            sw.Line("int inside = faceLeft[f];");
            sw.Line("var face = new global::FvGen.Geometry.FaceGeometry(faceNormals[f], faceAreas[f], faceCentroids[f], faceDistances[f]);");
            string inside = "state[inside]";
            if (model.Reconstruction != KernelReconstruction.FirstOrder)
            {
                GradientEmitter.FaceState(sw, model, "insideFace", "inside");
                inside = "insideFace";
            }

            sw.Line(s + " flux = " + KernelEmitter.BoundaryCall(model, entry, inside, "face") + " * faceAreas[f];");
            apply(sw, entry);
            sw.Line("total += flux;");
            sw.Close();
        });
        KernelEmitter.TallyAdd(w, model, "p");
        w.Close();
    }
}
