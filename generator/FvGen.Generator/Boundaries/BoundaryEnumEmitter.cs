using FvGen.Generator.Common;

namespace FvGen.Generator.Boundaries;

/// <summary>Writes the <c>Boundary</c> enum of a type: one member per boundary flux, plus the kind of each.</summary>
internal static class BoundaryEnumEmitter
{
    public static string HintName(BoundarySetModel model) => model.Location.HintName + ".Boundary.g.cs";

    public static string Emit(BoundarySetModel model)
    {
        return GeneratedFile.Write(model.Location, "boundary fluxes of this type, for BoundaryBinding<Boundary>", w =>
        {
            w.Line("/// <summary>The boundary fluxes of this type; bind mesh patches to them with <c>global::FvGen.Boundaries.BoundaryBinding&lt;Boundary&gt;</c>.</summary>");
            w.Open("public enum " + KnownNames.BoundaryEnumName);
            foreach (var flux in model.Fluxes)
            {
                w.Line("/// <summary>Patches bound here call <see cref=\"" + flux.Call.Name + "\"/> (a " + flux.Kind + " boundary).</summary>");
                w.Line(flux.Call.Name + ",");
            }

            w.Close();
            w.Line();
            w.Line("/// <summary>The declared <see cref=\"global::FvGen.BoundaryKind\"/> of each boundary flux.</summary>");
            w.Open("public static global::FvGen.BoundaryKind KindOf(" + KnownNames.BoundaryEnumName + " boundary) => boundary switch");
            foreach (var flux in model.Fluxes)
            {
                w.Line(KnownNames.BoundaryEnumName + "." + flux.Call.Name + " => global::FvGen.BoundaryKind." + flux.Kind + ",");
            }

            w.Line("_ => throw new global::System.ArgumentOutOfRangeException(nameof(boundary), boundary, \"Not a boundary flux of this type.\"),");
            w.Close(";");
        });
    }
}
