using FvGen.Ledger;
using FvGen.Meshes;

namespace FvGen.Generator.Tests.Support;

/// <summary>The discrete conservation balance every generated residual must satisfy.</summary>
/// <remarks>
/// With R_c = -(1/V_c) Σ F·A and every interior face flux taken from one cell and given to the
/// other, Σ_c R_c V_c telescopes to minus the flux leaving through the boundary (the discrete form
/// of the divergence theorem, REFERENCES.md "Geometry"). The tolerance is relative to Σ_c |R_c V_c|.
/// </remarks>
internal static class Balance
{
    /// <summary>The largest relative imbalance over the components.</summary>
    public static double RelativeImbalance(IMesh mesh, ReadOnlySpan<double> residualComponents, int componentCount, BoundaryFluxTally tally)
    {
        var volumes = mesh.CellVolumes;
        double worst = 0;
        for (int k = 0; k < componentCount; k++)
        {
            double sum = 0, scale = 0, boundary = 0;
            for (int c = 0; c < volumes.Length; c++)
            {
                double rv = residualComponents[c * componentCount + k] * volumes[c];
                sum += rv;
                scale += Math.Abs(rv);
            }

            for (int p = 0; p < tally.PatchCount; p++)
            {
                boundary += tally.Patch(p)[k];
                scale += Math.Abs(tally.Patch(p)[k]);
            }

            Assert.True(scale > 0, $"component {k}: nothing moved, so the balance cannot decide");
            worst = Math.Max(worst, Math.Abs(sum + boundary) / scale);
        }

        return worst;
    }
}
