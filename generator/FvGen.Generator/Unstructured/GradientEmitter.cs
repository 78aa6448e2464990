using FvGen.Generator.Common;
using FvGen.Generator.Kernels;

namespace FvGen.Generator.Unstructured;

/// <summary>
/// Writes Green–Gauss cell gradients on unstructured meshes, optionally limited by Barth–Jespersen,
/// and the linear reconstruction of face states from them.
/// </summary>
/// <remarks>
/// Green–Gauss: ∇U_c = (1/V_c) Σ_f U_f S_f with S_f the outward area vector and U_f the mean of the two
/// cells (the inside cell on a boundary face); a discrete form of Gauss's theorem (REFERENCES.md,
/// "Geometry"). Barth–Jespersen (Barth &amp; Jespersen, AIAA paper 89-0366, 1989; cited from memory):
/// per component, the gradient is scaled by the largest φ ≤ 1 for which the reconstruction at every
/// face centroid stays within the minimum and maximum of the cell and its face neighbours. Each cell
/// gathers its faces in the mesh's fixed order, so the gradients are the same for any thread count.
/// </remarks>
internal static class GradientEmitter
{
    public static string GradientType(ResidualKernelModel model) => "global::FvGen.Geometry.Gradient<" + model.State.FullyQualifiedName + ">";

    /// <summary>Writes the gradient pass: serially, or in parallel chunks of cells.</summary>
    public static void Emit(IndentedWriter w, ResidualKernelModel model, bool parallel)
    {
        // Linear and user reconstruction both get the limited gradients (a user reconstruction may rescale them further).
        bool limited = model.Reconstruction != KernelReconstruction.FirstOrder;
        string s = model.State.FullyQualifiedName;
        w.Line();
        w.Line("// Green-Gauss cell gradients" + (limited ? ", limited by Barth-Jespersen" : "") + "; each cell gathers its faces in the mesh's fixed order.");
        if (limited)
        {
            w.Line("[global::System.Runtime.CompilerServices.MethodImpl(global::System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]");
            w.Line("static double BarthJespersen(double phi, double delta, double toMin, double toMax) =>");
            w.Line("    delta > 0.0 ? global::System.Math.Min(phi, toMax / delta) : delta < 0.0 ? global::System.Math.Min(phi, toMin / delta) : phi;");
            w.Line();
        }

        if (parallel)
        {
            w.Line("int gradientChunks = (cellCount + " + UnstructuredEmitter.ChunkSize + " - 1) / " + UnstructuredEmitter.ChunkSize + ";");
            w.Open("global::System.Threading.Tasks.Parallel.For(0, gradientChunks, options, chunk =>");
            w.Line("global::System.ReadOnlySpan<" + s + "> state = stateMemory.Span;");
            w.Line("global::System.Span<" + GradientType(model) + "> gradients = gradientMemory.Span;");
            Spans(w);
            w.Line("int end = global::System.Math.Min(cellCount, (chunk + 1) * " + UnstructuredEmitter.ChunkSize + ");");
            w.Open("for (int c = chunk * " + UnstructuredEmitter.ChunkSize + "; c < end; c++)");
        }
        else
        {
            w.Open();
            Spans(w);
            w.Open("for (int c = 0; c < cellCount; c++)");
        }

        Body(w, model, limited);
        w.Close();
        w.Close(parallel ? ");" : "");
    }

    /// <summary>Writes <c>{name}</c> = the cell's state extrapolated to the face centroid with its gradient.</summary>
    public static void Reconstruct(IndentedWriter w, ResidualKernelModel model, string name, string cell)
    {
        string v = "toFace" + char.ToUpperInvariant(name[0]) + name.Substring(1);
        string g = "gradient" + char.ToUpperInvariant(name[0]) + name.Substring(1);
        w.Line("global::FvGen.Geometry.Vec3 " + v + " = faceCentroids[f] - cellCentroids[" + cell + "];");
        w.Line("ref readonly " + GradientType(model) + " " + g + " = ref gradients[" + cell + "];");
        w.Line(model.State.FullyQualifiedName + " " + name + " = state[" + cell + "] + (" + v + ".X * " + g + ".X + " + v + ".Y * " + g + ".Y + " + v + ".Z * " + g + ".Z);");
    }

    /// <summary>
    /// Writes <c>{name}</c> = the state the user reconstruction gives the face from <paramref name="cell"/>, its
    /// (limited) gradient and the offset from its centroid to the face centroid; or, for linear reconstruction,
    /// the built-in extrapolation.
    /// </summary>
    public static void FaceState(IndentedWriter w, ResidualKernelModel model, string name, string cell)
    {
        if (model.UserReconstruction is not { } user)
        {
            Reconstruct(w, model, name, cell);
            return;
        }

        string v = "toFace" + char.ToUpperInvariant(name[0]) + name.Substring(1);
        w.Line("global::FvGen.Geometry.Vec3 " + v + " = faceCentroids[f] - cellCentroids[" + cell + "];");
        w.Line(model.TypeName + "." + user.Name + "(" + user.StateModifier + "state[" + cell + "], " + user.GradientModifier + "gradients[" + cell + "], "
            + user.FaceModifier + v + ", out " + model.State.FullyQualifiedName + " " + name + ");");
    }

    private static void Spans(IndentedWriter w)
    {
        w.Line("global::System.ReadOnlySpan<int> faceLeft = mesh.FaceLeft;");
        w.Line("global::System.ReadOnlySpan<int> faceRight = mesh.FaceRight;");
        w.Line("global::System.ReadOnlySpan<global::FvGen.Geometry.Vec3> faceAreaVectors = mesh.FaceAreaVectors;");
        w.Line("global::System.ReadOnlySpan<global::FvGen.Geometry.Vec3> faceCentroids = mesh.FaceCentroids;");
        w.Line("global::System.ReadOnlySpan<global::FvGen.Geometry.Vec3> cellCentroids = mesh.CellCentroids;");
        w.Line("global::System.ReadOnlySpan<int> cellFaceOffsets = mesh.CellFaceOffsets;");
        w.Line("global::System.ReadOnlySpan<int> cellFaces = mesh.CellFaces;");
        w.Line("global::System.ReadOnlySpan<double> volumes = mesh.CellVolumes;");
    }

    private static void Body(IndentedWriter w, ResidualKernelModel model, bool limited)
    {
        string s = model.State.FullyQualifiedName;
        var components = model.State.Components;
        w.Line("ref readonly " + s + " uc = ref state[c];");
        w.Line(GradientType(model) + " g = default;");
        w.Open("for (int n = cellFaceOffsets[c]; n < cellFaceOffsets[c + 1]; n++)");
        w.Line("int f = cellFaces[n];");
        w.Line("bool outward = faceLeft[f] == c;");
        w.Line("int other = outward ? faceRight[f] : faceLeft[f];");
        w.Line("global::FvGen.Geometry.Vec3 area = outward ? faceAreaVectors[f] : -faceAreaVectors[f];");
        w.Line(s + " uf = other < 0 ? uc : 0.5 * (uc + state[other]);");
        w.Line("g.X += area.X * uf;");
        w.Line("g.Y += area.Y * uf;");
        w.Line("g.Z += area.Z * uf;");
        w.Close();
        w.Line();
        w.Line("double inverseVolume = 1.0 / volumes[c];");
        w.Line("g.X = inverseVolume * g.X;");
        w.Line("g.Y = inverseVolume * g.Y;");
        w.Line("g.Z = inverseVolume * g.Z;");
        if (limited)
        {
            w.Line();
            w.Line("// Barth-Jespersen, per component: the range of the cell and its face neighbours ...");
            for (int k = 0; k < components.Count; k++)
            {
                w.Line("double min" + k + " = uc." + components[k].Access + ", max" + k + " = min" + k + ", phi" + k + " = 1.0;");
            }

            w.Open("for (int n = cellFaceOffsets[c]; n < cellFaceOffsets[c + 1]; n++)");
            w.Line("int f = cellFaces[n];");
            w.Line("int other = faceLeft[f] == c ? faceRight[f] : faceLeft[f];");
            w.Open("if (other >= 0)");
            w.Line("ref readonly " + s + " un = ref state[other];");
            for (int k = 0; k < components.Count; k++)
            {
                string a = components[k].Access;
                w.Line("min" + k + " = global::System.Math.Min(min" + k + ", un." + a + ");");
                w.Line("max" + k + " = global::System.Math.Max(max" + k + ", un." + a + ");");
            }

            w.Close();
            w.Close();
            w.Line();
            w.Line("// ... and the largest φ ≤ 1 keeping every face-centroid value inside it.");
            w.Line("global::FvGen.Geometry.Vec3 centre = cellCentroids[c];");
            w.Open("for (int n = cellFaceOffsets[c]; n < cellFaceOffsets[c + 1]; n++)");
            w.Line("global::FvGen.Geometry.Vec3 d = faceCentroids[cellFaces[n]] - centre;");
            for (int k = 0; k < components.Count; k++)
            {
                string a = components[k].Access;
                w.Line("phi" + k + " = BarthJespersen(phi" + k + ", g.X." + a + " * d.X + g.Y." + a + " * d.Y + g.Z." + a + " * d.Z, min" + k + " - uc." + a + ", max" + k + " - uc." + a + ");");
            }

            w.Close();
            w.Line();
            for (int k = 0; k < components.Count; k++)
            {
                string a = components[k].Access;
                w.Line("g.X." + a + " *= phi" + k + ";");
                w.Line("g.Y." + a + " *= phi" + k + ";");
                w.Line("g.Z." + a + " *= phi" + k + ";");
            }
        }

        w.Line("gradients[c] = g;");
    }
}
