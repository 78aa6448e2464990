using FvGen.Geometry;
using FvGen.Meshes.Structured;
using FvGen.Meshes.Unstructured;

namespace FvGen.Benchmarks;

/// <summary>
/// The same residuals written by hand, as a careful engineer would: the same flux, the same face
/// geometry, spans, one evaluation per face, walls on every side/patch known statically.
/// </summary>
public static class HandWrittenResiduals
{
    /// <summary>2-D grid with walls on all four sides.</summary>
    public static void Structured(StructuredGrid2D grid, ReadOnlySpan<Water> u, Span<Water> r)
    {
        int nx = grid.Nx, ny = grid.Ny;
        ReadOnlySpan<double> xn = grid.X.Nodes, xc = grid.X.Centres, dx = grid.X.Widths;
        ReadOnlySpan<double> yn = grid.Y.Nodes, yc = grid.Y.Centres, dy = grid.Y.Widths;
        r.Clear();
        var ex = new Vec3(1, 0, 0);
        var ey = new Vec3(0, 1, 0);
        for (int j = 0; j < ny; j++)
        {
            int row = nx * j;
            for (int i = 1; i < nx; i++)
            {
                var face = new FaceGeometry(ex, dy[j], new Vec3(xn[i], yc[j], 0), xc[i] - xc[i - 1]);
                Water f = ShallowWaterPhysics.Rusanov(in u[row + i - 1], in u[row + i], in face) * dy[j];
                r[row + i - 1] -= f;
                r[row + i] += f;
            }

            var west = new FaceGeometry(-ex, dy[j], new Vec3(xn[0], yc[j], 0), 0.5 * dx[0]);
            r[row] -= ShallowWaterPhysics.Wall(in u[row], in west) * dy[j];
            var east = new FaceGeometry(ex, dy[j], new Vec3(xn[nx], yc[j], 0), 0.5 * dx[nx - 1]);
            r[row + nx - 1] -= ShallowWaterPhysics.Wall(in u[row + nx - 1], in east) * dy[j];
        }

        for (int j = 1; j < ny; j++)
        {
            for (int i = 0; i < nx; i++)
            {
                int c = i + nx * j;
                var face = new FaceGeometry(ey, dx[i], new Vec3(xc[i], yn[j], 0), yc[j] - yc[j - 1]);
                Water f = ShallowWaterPhysics.Rusanov(in u[c - nx], in u[c], in face) * dx[i];
                r[c - nx] -= f;
                r[c] += f;
            }
        }

        for (int i = 0; i < nx; i++)
        {
            var south = new FaceGeometry(-ey, dx[i], new Vec3(xc[i], yn[0], 0), 0.5 * dy[0]);
            r[i] -= ShallowWaterPhysics.Wall(in u[i], in south) * dx[i];
            int top = i + nx * (ny - 1);
            var north = new FaceGeometry(ey, dx[i], new Vec3(xc[i], yn[ny], 0), 0.5 * dy[ny - 1]);
            r[top] -= ShallowWaterPhysics.Wall(in u[top], in north) * dx[i];
        }

        var volumes = grid.CellVolumes;
        for (int c = 0; c < r.Length; c++)
        {
            r[c] = r[c] / volumes[c];
        }
    }

    /// <summary>Unstructured mesh, walls on every patch, serial scatter.</summary>
    public static void Unstructured(UnstructuredMesh mesh, ReadOnlySpan<Water> u, Span<Water> r)
    {
        ReadOnlySpan<int> left = mesh.FaceLeft, right = mesh.FaceRight;
        ReadOnlySpan<Vec3> normals = mesh.FaceNormals, centroids = mesh.FaceCentroids;
        ReadOnlySpan<double> areas = mesh.FaceAreas, distances = mesh.FaceCentreDistances;
        r.Clear();
        int interior = mesh.InteriorFaceCount;
        for (int f = 0; f < interior; f++)
        {
            var face = new FaceGeometry(normals[f], areas[f], centroids[f], distances[f]);
            Water flux = ShallowWaterPhysics.Rusanov(in u[left[f]], in u[right[f]], in face) * areas[f];
            r[left[f]] -= flux;
            r[right[f]] += flux;
        }

        for (int f = interior; f < left.Length; f++)
        {
            var face = new FaceGeometry(normals[f], areas[f], centroids[f], distances[f]);
            r[left[f]] -= ShallowWaterPhysics.Wall(in u[left[f]], in face) * areas[f];
        }

        var volumes = mesh.CellVolumes;
        for (int c = 0; c < r.Length; c++)
        {
            r[c] = r[c] / volumes[c];
        }
    }

    /// <summary>Unstructured mesh, parallel gather through a face buffer, walls on every patch.</summary>
    public static void UnstructuredGather(UnstructuredMesh mesh, Water[] u, Water[] r, Water[] faceFlux, ParallelOptions options)
    {
        int interior = mesh.InteriorFaceCount;
        const int Chunk = 2048;
        Parallel.For(0, (interior + Chunk - 1) / Chunk, options, chunk =>
        {
            ReadOnlySpan<int> left = mesh.FaceLeft, right = mesh.FaceRight;
            ReadOnlySpan<Vec3> normals = mesh.FaceNormals, centroids = mesh.FaceCentroids;
            ReadOnlySpan<double> areas = mesh.FaceAreas, distances = mesh.FaceCentreDistances;
            int end = Math.Min(interior, (chunk + 1) * Chunk);
            for (int f = chunk * Chunk; f < end; f++)
            {
                var face = new FaceGeometry(normals[f], areas[f], centroids[f], distances[f]);
                faceFlux[f] = ShallowWaterPhysics.Rusanov(in u[left[f]], in u[right[f]], in face) * areas[f];
            }
        });

        {
            ReadOnlySpan<int> left = mesh.FaceLeft;
            ReadOnlySpan<Vec3> normals = mesh.FaceNormals, centroids = mesh.FaceCentroids;
            ReadOnlySpan<double> areas = mesh.FaceAreas, distances = mesh.FaceCentreDistances;
            for (int f = interior; f < left.Length; f++)
            {
                var face = new FaceGeometry(normals[f], areas[f], centroids[f], distances[f]);
                faceFlux[f] = ShallowWaterPhysics.Wall(in u[left[f]], in face) * areas[f];
            }
        }

        int cells = mesh.CellCount;
        Parallel.For(0, (cells + Chunk - 1) / Chunk, options, chunk =>
        {
            ReadOnlySpan<int> left = mesh.FaceLeft, offsets = mesh.CellFaceOffsets, cellFaces = mesh.CellFaces;
            ReadOnlySpan<double> volumes = mesh.CellVolumes;
            int end = Math.Min(cells, (chunk + 1) * Chunk);
            for (int c = chunk * Chunk; c < end; c++)
            {
                Water sum = default;
                for (int n = offsets[c]; n < offsets[c + 1]; n++)
                {
                    int f = cellFaces[n];
                    sum = left[f] == c ? sum - faceFlux[f] : sum + faceFlux[f];
                }

                r[c] = sum / volumes[c];
            }
        });
    }
}
