using FvGen.Generator.Common;
using FvGen.Generator.Kernels;

namespace FvGen.Generator.Structured;

/// <summary>
/// Writes Green–Gauss cell gradients on structured grids, for numerical fluxes that take them:
/// along each axis, (U_high face − U_low face) / width, the face value being the mean of the two
/// cells (the wrapped neighbour on a periodic side, the cell itself on a boundary patch).
/// </summary>
/// <remarks>
/// This is the Green–Gauss formula (1/V) Σ_f U_f S_f on a Cartesian cell (REFERENCES.md, "Geometry");
/// it is exact for a linear field on uniform spacing away from boundary patches.
/// </remarks>
internal static class StructuredGradientEmitter
{
    private static readonly string[] Axis = { "x", "y", "z" };
    private static readonly string[] Index = { "i", "j", "k" };
    private static readonly string[] Count = { "nx", "ny", "nz" };
    private static readonly string[] Stride = { "1", "nx", "plane" };
    private static readonly string[] Component = { "X", "Y", "Z" };

    public static void Emit(IndentedWriter w, ResidualKernelModel model, int dim)
    {
        string s = model.State.FullyQualifiedName;
        w.Line();
        w.Line("// Green-Gauss cell gradients for the flux: (U on the high face - U on the low face) / width, per axis.");
        w.Open();
        for (int a = 0; a < dim; a++)
        {
            w.Line("bool " + Axis[a] + "Wraps = mesh.IsPeriodic(" + a + ");");
        }

        for (int a = dim - 1; a >= 0; a--)
        {
            w.Open("for (int " + Index[a] + " = 0; " + Index[a] + " < " + Count[a] + "; " + Index[a] + "++)");
        }

        w.Line("int c = " + (dim == 1 ? "i" : dim == 2 ? "i + nx * j" : "i + nx * (j + ny * k)") + ";");
        w.Line("ref readonly " + s + " uc = ref state[c];");
        w.Line("global::FvGen.Geometry.Gradient<" + s + "> g = default;");
        for (int a = 0; a < dim; a++)
        {
            string idx = Index[a], n = Count[a], st = Stride[a], ax = Axis[a];
            w.Line("int " + ax + "Low = " + idx + " > 0 ? c - " + st + " : " + ax + "Wraps ? c + (" + n + " - 1) * " + st + " : -1;");
            w.Line("int " + ax + "High = " + idx + " < " + n + " - 1 ? c + " + st + " : " + ax + "Wraps ? c - (" + n + " - 1) * " + st + " : -1;");
            w.Line(s + " " + ax + "LowFace = " + ax + "Low < 0 ? uc : 0.5 * (uc + state[" + ax + "Low]);");
            w.Line(s + " " + ax + "HighFace = " + ax + "High < 0 ? uc : 0.5 * (uc + state[" + ax + "High]);");
            w.Line("g." + Component[a] + " = (" + ax + "HighFace - " + ax + "LowFace) / " + ax + "Widths[" + idx + "];");
        }

        w.Line("gradients[c] = g;");
        for (int a = 0; a < dim; a++)
        {
            w.Close();
        }

        w.Close();
    }
}
