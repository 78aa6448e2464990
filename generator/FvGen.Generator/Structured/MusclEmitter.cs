using System.Linq;
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
/// uniform spacing d⁻/d⁺ = 1 and w/2d⁻ = 1/2 exactly, so the uniform-grid result is unchanged.
/// Next to a boundary patch the missing outer cell is a ghost (<c>Ghost</c>): the cell extrapolated by
/// its own width with the slope of the next pair of cells inward, so the limiter compares the one-sided
/// slopes available inside (common practice). The boundary face sees the inside cell reconstructed with
/// that slope, which is bitwise the slope its inner face uses. With fewer than three cells along the
/// direction there is no such pair: zero slope, and the boundary face sees the cell average.
/// </remarks>
internal static class MusclEmitter
{
    /// <summary>
    /// Writes the static local functions the face states use: the ghost beyond a boundary patch (linear and
    /// user reconstruction) and, for linear reconstruction, the limiter and the two extrapolations.
    /// The periodicity flags are declared with the axes.
    /// </summary>
    public static void DeclareFunctions(IndentedWriter w, ResidualKernelModel model)
    {
        GhostFunction(w, model);
        if (model.Reconstruction == KernelReconstruction.Linear)
        {
            DeclareLimiter(w, model);
        }
    }

    /// <summary>
    /// Writes the ghost beyond a boundary patch: the cell extrapolated by its own width with the slope of the
    /// next pair inward, (far − near) over their centre distance (a second-order ghost for smooth data).
    /// </summary>
    private static void GhostFunction(IndentedWriter w, ResidualKernelModel model)
    {
        string s = model.State.FullyQualifiedName;
        w.Line();
        w.Line("// The ghost beyond a boundary patch: the cell extrapolated one own width outward with the slope of its next pair inward (near, far).");
        w.Line("[global::System.Runtime.CompilerServices.MethodImpl(global::System.Runtime.CompilerServices.MethodImplOptions.AggressiveInlining)]");
        w.Open("static " + s + " Ghost(in " + s + " cell, in " + s + " near, in " + s + " far, double widthCell, double widthNear, double widthFar)");
        w.Line(s + " value = cell;");
        w.Line("double reach = widthCell / (0.5 * (widthNear + widthFar));");
        foreach (var c in model.State.Components)
        {
            w.Line("value." + c.Access + " -= reach * (far." + c.Access + " - near." + c.Access + ");");
        }

        w.Line("return value;");
        w.Close();
    }

    /// <summary>Writes the limiter as a static local function.</summary>
    private static void DeclareLimiter(IndentedWriter w, ResidualKernelModel model)
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
    /// and <paramref name="rightAlong"/>. A far neighbour is read at a plain offset in the branch that has
    /// it (inside, or across a periodic wrap); next to a boundary patch it is the ghost, given three cells.
    /// A <paramref name="wrap"/> face exists only in a periodic direction, so it has no ghost branch.
    /// </summary>
    public static void FaceStates(
        IndentedWriter w, ResidualKernelModel model, string axis, string count, string stride, string left, string right, string leftAlong, string rightAlong, bool wrap)
    {
        string s = model.State.FullyQualifiedName;
        string widths = axis + "Widths";
        // Copies, not refs: the JIT keeps the components of small struct locals in registers.
        w.Line(s + " uL = state[" + left + "];");
        w.Line(s + " uR = state[" + right + "];");
        w.Line("double widthL = " + widths + "[" + leftAlong + "];");
        w.Line("double widthR = " + widths + "[" + rightAlong + "];");
        if (model.UserReconstruction is { } user)
        {
            bool withWidths = user.WidthModifier is not null;
            // Without a ghost (fewer than three cells along the direction) a missing far cell is the cell itself.
            w.Line(s + " uLL = uL;");
            w.Line(s + " uRR = uR;");
            if (withWidths)
            {
                w.Line("double widthLL = widthL;");
                w.Line("double widthRR = widthR;");
            }

            w.Line("if (" + leftAlong + " >= 1)");
            w.Open();
            w.Line("uLL = state[" + left + " - " + stride + "];");
            if (withWidths)
            {
                w.Line("widthLL = " + widths + "[" + leftAlong + " - 1];");
            }

            w.Close();
            w.Line("else if (" + axis + "Periodic)");
            w.Open();
            w.Line("uLL = state[" + left + " + (" + count + " - 1) * " + stride + "];");
            if (withWidths)
            {
                w.Line("widthLL = " + widths + "[" + count + " - 1];");
            }

            w.Close();
            if (!wrap)
            {
                w.Line("else if (" + count + " >= 3)");
                w.Open();
                w.Line("uLL = Ghost(uL, uR, state[" + right + " + " + stride + "], widthL, widthR, " + widths + "[" + rightAlong + " + 1]);");
                w.Close();
            }

            w.Line();
            w.Line("if (" + rightAlong + " <= " + count + " - 2)");
            w.Open();
            w.Line("uRR = state[" + right + " + " + stride + "];");
            if (withWidths)
            {
                w.Line("widthRR = " + widths + "[" + rightAlong + " + 1];");
            }

            w.Close();
            w.Line("else if (" + axis + "Periodic)");
            w.Open();
            w.Line("uRR = state[" + right + " - (" + count + " - 1) * " + stride + "];");
            if (withWidths)
            {
                w.Line("widthRR = " + widths + "[0];");
            }

            w.Close();
            if (!wrap)
            {
                w.Line("else if (" + count + " >= 3)");
                w.Open();
                w.Line("uRR = Ghost(uR, uL, state[" + left + " - " + stride + "], widthR, widthL, " + widths + "[" + leftAlong + " - 1]);");
                w.Close();
            }

            w.Line();
            w.Line(UserCall(model, user, "uLL", "uL", "uR", "uRR", withWidths ? "widthLL, widthL, widthR, widthRR" : null, "out " + s + " leftFace", "out " + s + " rightFace") + ";");
            return;
        }

        w.Line(s + " leftFace = uL;");
        w.Line(s + " rightFace = uR;");
        w.Line("double distanceLR = 0.5 * (widthL + widthR);");
        w.Line("if (" + leftAlong + " >= 1)");
        w.Open();
        w.Line("leftFace = LeftFaceValue(state[" + left + " - " + stride + "], uL, uR, " + widths + "[" + leftAlong + " - 1], widthL, distanceLR);");
        w.Close();
        w.Line("else if (" + axis + "Periodic)");
        w.Open();
        w.Line("leftFace = LeftFaceValue(state[" + left + " + (" + count + " - 1) * " + stride + "], uL, uR, " + widths + "[" + count + " - 1], widthL, distanceLR);");
        w.Close();
        if (!wrap)
        {
            w.Line("else if (" + count + " >= 3)");
            w.Open();
            w.Line("leftFace = LeftFaceValue(Ghost(uL, uR, state[" + right + " + " + stride + "], widthL, widthR, " + widths + "[" + rightAlong + " + 1]), uL, uR, widthL, widthL, distanceLR);");
            w.Close();
        }

        w.Line();
        w.Line("if (" + rightAlong + " <= " + count + " - 2)");
        w.Open();
        w.Line("rightFace = RightFaceValue(uL, uR, state[" + right + " + " + stride + "], widthR, " + widths + "[" + rightAlong + " + 1], distanceLR);");
        w.Close();
        w.Line("else if (" + axis + "Periodic)");
        w.Open();
        w.Line("rightFace = RightFaceValue(uL, uR, state[" + right + " - (" + count + " - 1) * " + stride + "], widthR, " + widths + "[0], distanceLR);");
        w.Close();
        if (!wrap)
        {
            w.Line("else if (" + count + " >= 3)");
            w.Open();
            w.Line("rightFace = RightFaceValue(uL, uR, Ghost(uR, uL, state[" + left + " - " + stride + "], widthR, widthL, " + widths + "[" + leftAlong + " - 1]), widthR, widthR, distanceLR);");
            w.Close();
        }

    }

    /// <summary>
    /// Writes <c>insideFace</c>, the state the boundary face of cell <c>inside</c> sees: with three cells along the
    /// direction, the cell reconstructed toward the patch with the slope its inner face uses (the far cell being
    /// the ghost); otherwise the cell average. <paramref name="high"/> is the side.
    /// </summary>
    public static void BoundaryFaceState(IndentedWriter w, ResidualKernelModel model, string axis, string count, string stride, bool high)
    {
        string s = model.State.FullyQualifiedName;
        string widths = axis + "Widths";
        string inner = high ? "inside - " + stride : "inside + " + stride;
        string next = high ? "inside - 2 * " + stride : "inside + 2 * " + stride;
        string w0 = widths + "[" + (high ? count + " - 1" : "0") + "]";
        string w1 = widths + "[" + (high ? count + " - 2" : "1") + "]";
        string w2 = widths + "[" + (high ? count + " - 3" : "2") + "]";
        w.Line(s + " insideFace = state[inside];");
        w.Line("if (" + count + " >= 3)");
        w.Open();
        w.Line(s + " ghost = Ghost(state[inside], state[" + inner + "], state[" + next + "], " + w0 + ", " + w1 + ", " + w2 + ");");
        if (model.UserReconstruction is { } user)
        {
            // The outer of the two cells missing beyond the patch repeats the ghost.
            string? widthsText = user.WidthModifier is null ? null : high ? w1 + ", " + w0 + ", " + w0 + ", " + w0 : w0 + ", " + w0 + ", " + w0 + ", " + w1;
            w.Line(high
                ? UserCall(model, user, "state[" + inner + "]", "state[inside]", "ghost", "ghost", widthsText, "out insideFace", "out _") + ";"
                : UserCall(model, user, "ghost", "ghost", "state[inside]", "state[" + inner + "]", widthsText, "out _", "out insideFace") + ";");
        }
        else
        {
            w.Line(high
                ? "insideFace = LeftFaceValue(state[" + inner + "], state[inside], ghost, " + w1 + ", " + w0 + ", " + w0 + ");"
                : "insideFace = RightFaceValue(ghost, state[inside], state[" + inner + "], " + w0 + ", " + w1 + ", " + w0 + ");");
        }

        w.Close();
    }

    /// <summary>The call of a structured user reconstruction, with the four widths when its form takes them.</summary>
    private static string UserCall(ResidualKernelModel model, Fluxes.FluxCall user, string ll, string l, string r, string rr, string? widths, string leftOut, string rightOut)
    {
        string m = user.StateModifier;
        string call = model.TypeName + "." + user.Name + "(" + m + ll + ", " + m + l + ", " + m + r + ", " + m + rr + ", ";
        if (widths is not null)
        {
            call += string.Join(", ", widths.Split(new[] { ", " }, System.StringSplitOptions.None).Select(x => user.WidthModifier + x)) + ", ";
        }

        return call + leftOut + ", " + rightOut + ")";
    }
}
