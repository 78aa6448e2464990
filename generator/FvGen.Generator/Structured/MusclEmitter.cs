using FvGen.Generator.Common;
using FvGen.Generator.Kernels;

namespace FvGen.Generator.Structured;

/// <summary>
/// Writes MUSCL face states on structured grids: each cell's slope along the face direction is the
/// backward slope times a limiter φ(θ) of the ratio θ of forward to backward slopes, component by
/// component, and the face sees each cell's value extrapolated half its width.
/// </summary>
/// <remarks>
/// Limiters as functions of θ (LeVeque, Finite Volume Methods for Hyperbolic Problems, 2002, ch. 6):
/// minmod max(0, min(1, θ)); van Leer (θ + |θ|)/(1 + |θ|); MC max(0, min((1 + θ)/2, 2, 2θ));
/// superbee max(0, min(1, 2θ), min(2, θ)). All are zero for θ ≤ 0, so a cell at an extremum keeps a
/// zero slope. On a stretched grid the slopes are differences over the centre distances and the
/// extrapolation distance is half the cell's width (the extension of LeVeque's uniform-grid form to
/// non-uniform spacing is common practice): with Δ⁻, Δ⁺ the backward and forward differences and
/// d⁻, d⁺ the centre distances, θ = (Δ⁺/Δ⁻)(d⁻/d⁺) and the face increment is ±(w/2d⁻) φ(θ) Δ⁻. On
/// uniform spacing d⁻/d⁺ = 1 and w/2d⁻ = 1/2 exactly, so the uniform-grid result is unchanged. A cell
/// next to a boundary patch along the face direction has no second neighbour there and keeps a zero
/// slope, so it is first order toward the patch; boundary faces see the cell average.
/// </remarks>
internal static class MusclEmitter
{
    /// <summary>Writes the limiter as a static local function (the periodicity flags are declared with the axes).</summary>
    public static void DeclareLimiter(IndentedWriter w, ResidualKernelModel model)
    {
        w.Line();
        w.Line("// " + model.Limiter + " limiter φ(θ), θ = (forward / backward difference) · (backward / forward centre distance); returns φ(θ) · backward.");
        w.Line("[global::System.Runtime.CompilerServices.MethodImpl(global::System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]");
        w.Open("static double LimitedSlope(double backward, double forward, double distanceRatio)");
        w.Line("if (backward * forward <= 0.0)");
        w.Open();
        w.Line("return 0.0;");
        w.Close();
        w.Line();
        w.Line("double theta = forward / backward * distanceRatio;");
        w.Line(model.Limiter switch
        {
            KernelLimiter.VanLeer => "double phi = (theta + global::System.Math.Abs(theta)) / (1.0 + global::System.Math.Abs(theta));",
            KernelLimiter.MonotonizedCentral => "double phi = global::System.Math.Max(0.0, global::System.Math.Min(global::System.Math.Min(0.5 * (1.0 + theta), 2.0), 2.0 * theta));",
            KernelLimiter.Superbee => "double phi = global::System.Math.Max(0.0, global::System.Math.Max(global::System.Math.Min(1.0, 2.0 * theta), global::System.Math.Min(2.0, theta)));",
            _ => "double phi = global::System.Math.Max(0.0, global::System.Math.Min(1.0, theta));",
        });
        w.Line("return phi * backward;");
        w.Close();
        ExtrapolationFunctions(w, model);
    }

    /// <summary>
    /// Writes the two face-value extrapolations as static local functions, so the face loops pass the far
    /// neighbour by a plain offset from the face's cells and never pick its index by a condition.
    /// </summary>
    private static void ExtrapolationFunctions(IndentedWriter w, ResidualKernelModel model)
    {
        string s = model.State.FullyQualifiedName;
        w.Line();
        w.Line("// The left cell's value extrapolated to its right face, its slope limited between (farLeft, left) and (left, right).");
        w.Line("[global::System.Runtime.CompilerServices.MethodImpl(global::System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]");
        w.Open("static " + s + " LeftFaceValue(in " + s + " uLL, in " + s + " uL, in " + s + " uR, double widthLL, double widthL, double distanceLR)");
        w.Line(s + " value = uL;");
        w.Line("double distanceLL = 0.5 * (widthLL + widthL);");
        w.Line("double ratio = distanceLL / distanceLR;");
        w.Line("double reach = 0.5 * widthL / distanceLL;");
        foreach (var c in model.State.Components)
        {
            w.Line("value." + c.Access + " += reach * LimitedSlope(uL." + c.Access + " - uLL." + c.Access + ", uR." + c.Access + " - uL." + c.Access + ", ratio);");
        }

        w.Line("return value;");
        w.Close();
        w.Line();
        w.Line("// The right cell's value extrapolated to its left face, its slope limited between (left, right) and (right, farRight).");
        w.Line("[global::System.Runtime.CompilerServices.MethodImpl(global::System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]");
        w.Open("static " + s + " RightFaceValue(in " + s + " uL, in " + s + " uR, in " + s + " uRR, double widthR, double widthRR, double distanceLR)");
        w.Line(s + " value = uR;");
        w.Line("double distanceRR = 0.5 * (widthR + widthRR);");
        w.Line("double ratio = distanceLR / distanceRR;");
        w.Line("double reach = 0.5 * widthR / distanceLR;");
        foreach (var c in model.State.Components)
        {
            w.Line("value." + c.Access + " -= reach * LimitedSlope(uR." + c.Access + " - uL." + c.Access + ", uRR." + c.Access + " - uR." + c.Access + ", ratio);");
        }

        w.Line("return value;");
        w.Close();
    }

    /// <summary>
    /// Writes <c>leftFace</c> and <c>rightFace</c> for the face between <paramref name="left"/> and
    /// <paramref name="right"/>, whose indices along the face direction are <paramref name="leftAlong"/>
    /// and <paramref name="rightAlong"/>.
    /// </summary>
    public static void FaceStates(
        IndentedWriter w, ResidualKernelModel model, string axis, string count, string stride, string left, string right, string leftAlong, string rightAlong)
    {
        string s = model.State.FullyQualifiedName;
        if (model.UserReconstruction is { } user)
        {
            // A missing second neighbour (next to a boundary patch) is replaced by the cell itself.
            string m = user.StateModifier;
            w.Line("int leftLeft = " + leftAlong + " >= 1 ? " + left + " - " + stride + " : " + axis + "Periodic ? " + left + " + (" + count + " - 1) * " + stride + " : -1;");
            w.Line("int rightRight = " + rightAlong + " <= " + count + " - 2 ? " + right + " + " + stride + " : " + axis + "Periodic ? " + right + " - (" + count + " - 1) * " + stride + " : -1;");
            w.Line(model.TypeName + "." + user.Name + "(" + m + "state[leftLeft >= 0 ? leftLeft : " + left + "], " + m + "state[" + left + "], " + m + "state[" + right + "], "
                + m + "state[rightRight >= 0 ? rightRight : " + right + "], out " + s + " leftFace, out " + s + " rightFace);");
            return;
        }

        // Copies, not refs: the JIT keeps the components of small struct locals in registers. The far
        // neighbours are read at plain offsets, each in the branch that has it (inside, or across a periodic wrap).
        string widths = axis + "Widths";
        w.Line(s + " uL = state[" + left + "];");
        w.Line(s + " uR = state[" + right + "];");
        w.Line(s + " leftFace = uL;");
        w.Line(s + " rightFace = uR;");
        w.Line("double widthL = " + widths + "[" + leftAlong + "];");
        w.Line("double widthR = " + widths + "[" + rightAlong + "];");
        w.Line("double distanceLR = 0.5 * (widthL + widthR);");
        w.Line("if (" + leftAlong + " >= 1)");
        w.Open();
        w.Line("leftFace = LeftFaceValue(state[" + left + " - " + stride + "], uL, uR, " + widths + "[" + leftAlong + " - 1], widthL, distanceLR);");
        w.Close();
        w.Line("else if (" + axis + "Periodic)");
        w.Open();
        w.Line("leftFace = LeftFaceValue(state[" + left + " + (" + count + " - 1) * " + stride + "], uL, uR, " + widths + "[" + count + " - 1], widthL, distanceLR);");
        w.Close();
        w.Line();
        w.Line("if (" + rightAlong + " <= " + count + " - 2)");
        w.Open();
        w.Line("rightFace = RightFaceValue(uL, uR, state[" + right + " + " + stride + "], widthR, " + widths + "[" + rightAlong + " + 1], distanceLR);");
        w.Close();
        w.Line("else if (" + axis + "Periodic)");
        w.Open();
        w.Line("rightFace = RightFaceValue(uL, uR, state[" + right + " - (" + count + " - 1) * " + stride + "], widthR, " + widths + "[0], distanceLR);");
        w.Close();
    }
}
