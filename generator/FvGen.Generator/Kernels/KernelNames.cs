using System.Linq;

namespace FvGen.Generator.Kernels;

/// <summary>
/// The fixed names the generated face loops use. The loops live in a static local function whose
/// parameters have these names, so no user parameter name can clash with a generated local.
/// </summary>
internal static class KernelNames
{
    public const string CoreFunction = "FaceLoops";
    public const string DefaultOptionsSuffix = "DefaultParallelOptions";

    public static string Of(KernelParameter p) => p.Role switch
    {
        ParameterRole.Mesh => "mesh",
        ParameterRole.State => p.IsMemory ? "stateMemory" : "state",
        ParameterRole.Residual => p.IsMemory ? "residualMemory" : "residual",
        ParameterRole.Boundaries => "boundaries",
        ParameterRole.Tally => "tally",
        ParameterRole.ParallelOptions => "options",
        ParameterRole.GradientBuffer => p.IsMemory ? "gradientMemory" : "gradients",
        ParameterRole.Mode => "mode",
        _ => "faceFluxMemory",
    };

    public static KernelParameter? Find(ResidualKernelModel model, ParameterRole role) =>
        model.Parameters.FirstOrDefault(p => p.Role == role);

    public static string TypeOf(ResidualKernelModel model, ParameterRole role) => Find(model, role)!.TypeText;
}
