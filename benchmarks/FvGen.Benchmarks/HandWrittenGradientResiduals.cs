using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace FvGen.Benchmarks;

/// <summary>
/// Hand-written unstructured residuals that need cell gradients, as a careful engineer would write them
/// against the mesh arrays: Green–Gauss gradients (face value the mean of the two cells, the inside cell
/// on a boundary face), then one pass over the faces.
/// </summary>
public static class HandWrittenGradientResiduals
{
    /// <summary>
    /// Second order: Green–Gauss gradients limited per component by Barth–Jespersen (face-centroid values kept
    /// within the cell's and its face neighbours' range), both face states and the wall's inside state
    /// extrapolated to the face centroid, Rusanov flux, walls on every patch.
    /// </summary>
    public static void UnstructuredLinear(UnstructuredMesh mesh, ReadOnlySpan<Water> u, Span<Water> r, Span<Gradient<Water>> gradients)
    {
        GreenGauss(mesh, u, gradients);
        LimitBarthJespersen(mesh, u, gradients);
        ReadOnlySpan<int> left = mesh.FaceLeft, right = mesh.FaceRight;
        ReadOnlySpan<Vec3> normals = mesh.FaceNormals, centroids = mesh.FaceCentroids, cells = mesh.CellCentroids;
        ReadOnlySpan<double> areas = mesh.FaceAreas, distances = mesh.FaceCentreDistances;
        r.Clear();
        int interior = mesh.InteriorFaceCount;
        for (int f = 0; f < interior; f++)
        {
            int l = left[f], rr = right[f];
            var face = new FaceGeometry(normals[f], areas[f], centroids[f], distances[f]);
            Water uL = Extrapolate(u[l], gradients[l], centroids[f] - cells[l]);
            Water uR = Extrapolate(u[rr], gradients[rr], centroids[f] - cells[rr]);
            Water flux = ShallowWaterPhysics.Rusanov(in uL, in uR, in face) * areas[f];
            r[l] -= flux;
            r[rr] += flux;
        }

        for (int f = interior; f < left.Length; f++)
        {
            int l = left[f];
            var face = new FaceGeometry(normals[f], areas[f], centroids[f], distances[f]);
            Water inside = Extrapolate(u[l], gradients[l], centroids[f] - cells[l]);
            r[l] -= ShallowWaterPhysics.Wall(in inside, in face) * areas[f];
        }

        DivideByVolumes(mesh, r);
    }

    /// <summary>Diffusion: unlimited Green–Gauss gradients, the mean-gradient flux on interior faces, insulated patches.</summary>
    public static void UnstructuredDiffusion(UnstructuredMesh mesh, ReadOnlySpan<Water> u, Span<Water> r, Span<Gradient<Water>> gradients)
    {
        GreenGauss(mesh, u, gradients);
        ReadOnlySpan<int> left = mesh.FaceLeft, right = mesh.FaceRight;
        ReadOnlySpan<Vec3> normals = mesh.FaceNormals, centroids = mesh.FaceCentroids;
        ReadOnlySpan<double> areas = mesh.FaceAreas, distances = mesh.FaceCentreDistances;
        r.Clear();
        int interior = mesh.InteriorFaceCount;
        for (int f = 0; f < interior; f++)
        {
            int l = left[f], rr = right[f];
            var face = new FaceGeometry(normals[f], areas[f], centroids[f], distances[f]);
            Water flux = Smoothing.MeanGradient(in u[l], in u[rr], in face, in gradients[l], in gradients[rr]) * areas[f];
            r[l] -= flux;
            r[rr] += flux;
        }

        // Insulated patches carry no flux: nothing to add for the boundary faces.
        DivideByVolumes(mesh, r);
    }

    private static void GreenGauss(UnstructuredMesh mesh, ReadOnlySpan<Water> u, Span<Gradient<Water>> gradients)
    {
        ReadOnlySpan<int> left = mesh.FaceLeft, right = mesh.FaceRight, offsets = mesh.CellFaceOffsets, cellFaces = mesh.CellFaces;
        ReadOnlySpan<Vec3> areaVectors = mesh.FaceAreaVectors;
        ReadOnlySpan<double> volumes = mesh.CellVolumes;
        for (int c = 0; c < u.Length; c++)
        {
            Gradient<Water> g = default;
            for (int n = offsets[c]; n < offsets[c + 1]; n++)
            {
                int f = cellFaces[n];
                bool outward = left[f] == c;
                int other = outward ? right[f] : left[f];
                Vec3 s = outward ? areaVectors[f] : -areaVectors[f];
                Water face = other < 0 ? u[c] : 0.5 * (u[c] + u[other]);
                g.X += s.X * face;
                g.Y += s.Y * face;
                g.Z += s.Z * face;
            }

            double inverseVolume = 1.0 / volumes[c];
            g.X = inverseVolume * g.X;
            g.Y = inverseVolume * g.Y;
            g.Z = inverseVolume * g.Z;
            gradients[c] = g;
        }
    }

    private static void LimitBarthJespersen(UnstructuredMesh mesh, ReadOnlySpan<Water> u, Span<Gradient<Water>> gradients)
    {
        ReadOnlySpan<int> left = mesh.FaceLeft, right = mesh.FaceRight, offsets = mesh.CellFaceOffsets, cellFaces = mesh.CellFaces;
        ReadOnlySpan<Vec3> centroids = mesh.FaceCentroids, cells = mesh.CellCentroids;
        for (int c = 0; c < u.Length; c++)
        {
            Water uc = u[c], min = uc, max = uc;
            for (int n = offsets[c]; n < offsets[c + 1]; n++)
            {
                int f = cellFaces[n];
                int other = left[f] == c ? right[f] : left[f];
                if (other >= 0)
                {
                    Water un = u[other];
                    min.Depth = Math.Min(min.Depth, un.Depth);
                    max.Depth = Math.Max(max.Depth, un.Depth);
                    min.Flow.X = Math.Min(min.Flow.X, un.Flow.X);
                    max.Flow.X = Math.Max(max.Flow.X, un.Flow.X);
                    min.Flow.Y = Math.Min(min.Flow.Y, un.Flow.Y);
                    max.Flow.Y = Math.Max(max.Flow.Y, un.Flow.Y);
                }
            }

            ref Gradient<Water> g = ref gradients[c];
            double phiDepth = 1.0, phiX = 1.0, phiY = 1.0;
            for (int n = offsets[c]; n < offsets[c + 1]; n++)
            {
                Vec3 d = centroids[cellFaces[n]] - cells[c];
                phiDepth = Limit(phiDepth, g.X.Depth * d.X + g.Y.Depth * d.Y + g.Z.Depth * d.Z, min.Depth - uc.Depth, max.Depth - uc.Depth);
                phiX = Limit(phiX, g.X.Flow.X * d.X + g.Y.Flow.X * d.Y + g.Z.Flow.X * d.Z, min.Flow.X - uc.Flow.X, max.Flow.X - uc.Flow.X);
                phiY = Limit(phiY, g.X.Flow.Y * d.X + g.Y.Flow.Y * d.Y + g.Z.Flow.Y * d.Z, min.Flow.Y - uc.Flow.Y, max.Flow.Y - uc.Flow.Y);
            }

            g.X.Depth *= phiDepth;
            g.Y.Depth *= phiDepth;
            g.Z.Depth *= phiDepth;
            g.X.Flow.X *= phiX;
            g.Y.Flow.X *= phiX;
            g.Z.Flow.X *= phiX;
            g.X.Flow.Y *= phiY;
            g.Y.Flow.Y *= phiY;
            g.Z.Flow.Y *= phiY;
        }
    }

    /// <summary>The largest φ ≤ <paramref name="phi"/> keeping the face increment φ·delta within [toMin, toMax].</summary>
    private static double Limit(double phi, double delta, double toMin, double toMax) =>
        delta > 0.0 ? Math.Min(phi, toMax / delta) : delta < 0.0 ? Math.Min(phi, toMin / delta) : phi;

    private static Water Extrapolate(in Water cell, in Gradient<Water> g, Vec3 toFace) =>
        cell + (toFace.X * g.X + toFace.Y * g.Y + toFace.Z * g.Z);

    private static void DivideByVolumes(UnstructuredMesh mesh, Span<Water> r)
    {
        var volumes = mesh.CellVolumes;
        for (int c = 0; c < r.Length; c++)
        {
            r[c] = r[c] / volumes[c];
        }
    }
}
