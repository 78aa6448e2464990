// 2-D scalar transport: x- and y-face fluxes into runtime face fields, then the cell difference.
// mutant: FVC0001 dropped-term: `- (fy[c + nx] - fy[c]) / dy` -> `- fy[c + nx] / dy`
// mutant: FVC0002 wrong-spacing: `(fx[f + 1] - fx[f]) / dx` -> `(fx[f + 1] / dx - fx[f] / dy)`
// mutant: FVC0001 cell-index-for-face: `fx[f + 1]` -> `fx[c + 1]`
using System;
using FvGen;
using FvGen.Fields;

public static class TransportFaceFields
{
    [ConservativeUpdate]
    public static void Rate(double[] phi, double[] rate, FaceField<double> xFaces, FaceField<double> yFaces, double u, double v, int nx, int ny, double dx, double dy)
    {
        Span<double> fx = xFaces.Span;
        Span<double> fy = yFaces.Span;
        for (int j = 0; j < ny; j++)
        {
            for (int i = 1; i < nx; i++)
            {
                fx[j * (nx + 1) + i] = u > 0 ? u * phi[j * nx + i - 1] : u * phi[j * nx + i];
            }
        }

        for (int j = 1; j < ny; j++)
        {
            for (int i = 0; i < nx; i++)
            {
                fy[j * nx + i] = v > 0 ? v * phi[(j - 1) * nx + i] : v * phi[j * nx + i];
            }
        }

        for (int j = 1; j < ny - 1; j++)
        {
            for (int i = 1; i < nx - 1; i++)
            {
                int c = j * nx + i;
                int f = j * (nx + 1) + i;
                rate[c] = -(fx[f + 1] - fx[f]) / dx - (fy[c + nx] - fy[c]) / dy;
            }
        }
    }
}
