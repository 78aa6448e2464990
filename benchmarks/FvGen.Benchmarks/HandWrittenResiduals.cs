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

    /// <summary>2-D grid with walls on all four sides; interior faces of each direction in parallel by rows (x) and columns (y).</summary>
    public static void StructuredSlabs(StructuredGrid2D grid, Water[] u, Water[] r, ParallelOptions options)
    {
        int nx = grid.Nx, ny = grid.Ny;
        Array.Clear(r);
        Parallel.For(0, ny, options, j =>
        {
            ReadOnlySpan<double> xn = grid.X.Nodes, xc = grid.X.Centres, yc = grid.Y.Centres, dy = grid.Y.Widths;
            int row = nx * j;
            for (int i = 1; i < nx; i++)
            {
                var face = new FaceGeometry(new Vec3(1, 0, 0), dy[j], new Vec3(xn[i], yc[j], 0), xc[i] - xc[i - 1]);
                Water f = ShallowWaterPhysics.Rusanov(in u[row + i - 1], in u[row + i], in face) * dy[j];
                r[row + i - 1] -= f;
                r[row + i] += f;
            }
        });
        {
            ReadOnlySpan<double> xn = grid.X.Nodes, yc = grid.Y.Centres, dx = grid.X.Widths, dy = grid.Y.Widths;
            for (int j = 0; j < ny; j++)
            {
                int row = nx * j;
                var west = new FaceGeometry(new Vec3(-1, 0, 0), dy[j], new Vec3(xn[0], yc[j], 0), 0.5 * dx[0]);
                r[row] -= ShallowWaterPhysics.Wall(in u[row], in west) * dy[j];
                var east = new FaceGeometry(new Vec3(1, 0, 0), dy[j], new Vec3(xn[nx], yc[j], 0), 0.5 * dx[nx - 1]);
                r[row + nx - 1] -= ShallowWaterPhysics.Wall(in u[row + nx - 1], in east) * dy[j];
            }
        }

        Parallel.For(0, nx, options, i =>
        {
            ReadOnlySpan<double> xc = grid.X.Centres, yn = grid.Y.Nodes, yc = grid.Y.Centres, dx = grid.X.Widths;
            for (int j = 1; j < ny; j++)
            {
                int c = i + nx * j;
                var face = new FaceGeometry(new Vec3(0, 1, 0), dx[i], new Vec3(xc[i], yn[j], 0), yc[j] - yc[j - 1]);
                Water f = ShallowWaterPhysics.Rusanov(in u[c - nx], in u[c], in face) * dx[i];
                r[c - nx] -= f;
                r[c] += f;
            }
        });
        {
            ReadOnlySpan<double> xc = grid.X.Centres, yn = grid.Y.Nodes, dx = grid.X.Widths, dy = grid.Y.Widths;
            for (int i = 0; i < nx; i++)
            {
                var south = new FaceGeometry(new Vec3(0, -1, 0), dx[i], new Vec3(xc[i], yn[0], 0), 0.5 * dy[0]);
                r[i] -= ShallowWaterPhysics.Wall(in u[i], in south) * dx[i];
                int top = i + nx * (ny - 1);
                var north = new FaceGeometry(new Vec3(0, 1, 0), dx[i], new Vec3(xc[i], yn[ny], 0), 0.5 * dy[ny - 1]);
                r[top] -= ShallowWaterPhysics.Wall(in u[top], in north) * dx[i];
            }
        }

        var volumes = grid.CellVolumes;
        for (int c = 0; c < r.Length; c++)
        {
            r[c] = r[c] / volumes[c];
        }
    }

    /// <summary>
    /// 1-D periodic MUSCL with the van Leer limiter (LeVeque 2002, ch. 6), component by component, with
    /// slopes over centre distances and extrapolation by half a width (stretched-grid form, common practice).
    /// </summary>
    public static void Muscl1D(StructuredGrid1D grid, ReadOnlySpan<Water> u, Span<Water> r)
    {
        int n = grid.Nx;
        ReadOnlySpan<double> xn = grid.X.Nodes, xc = grid.X.Centres, dx = grid.X.Widths;
        r.Clear();
        for (int f = 0; f < n; f++)
        {
            // Face f lies between cells f - 1 and f (periodic: face 0 joins the last cell and the first).
            int left = f == 0 ? n - 1 : f - 1, right = f;
            int leftLeft = left == 0 ? n - 1 : left - 1, rightRight = right == n - 1 ? 0 : right + 1;
            Water a = u[leftLeft], b = u[left], c = u[right], d = u[rightRight];
            double dLL = 0.5 * (dx[leftLeft] + dx[left]), dLR = 0.5 * (dx[left] + dx[right]), dRR = 0.5 * (dx[right] + dx[rightRight]);
            double ratioL = dLL / dLR, reachL = 0.5 * dx[left] / dLL;
            double ratioR = dLR / dRR, reachR = 0.5 * dx[right] / dLR;
            Water lf = b, rf = c;
            lf.Depth += reachL * VanLeer(b.Depth - a.Depth, c.Depth - b.Depth, ratioL);
            lf.Flow.X += reachL * VanLeer(b.Flow.X - a.Flow.X, c.Flow.X - b.Flow.X, ratioL);
            lf.Flow.Y += reachL * VanLeer(b.Flow.Y - a.Flow.Y, c.Flow.Y - b.Flow.Y, ratioL);
            rf.Depth -= reachR * VanLeer(c.Depth - b.Depth, d.Depth - c.Depth, ratioR);
            rf.Flow.X -= reachR * VanLeer(c.Flow.X - b.Flow.X, d.Flow.X - c.Flow.X, ratioR);
            rf.Flow.Y -= reachR * VanLeer(c.Flow.Y - b.Flow.Y, d.Flow.Y - c.Flow.Y, ratioR);
            double distance = f == 0 ? 0.5 * (dx[n - 1] + dx[0]) : xc[f] - xc[f - 1];
            var face = new FaceGeometry(new Vec3(1, 0, 0), 1.0, new Vec3(xn[f], 0, 0), distance);
            Water flux = ShallowWaterPhysics.Rusanov(in lf, in rf, in face);
            r[left] -= flux;
            r[right] += flux;
        }

        for (int i = 0; i < n; i++)
        {
            r[i] = r[i] / dx[i];
        }
    }

    private static double VanLeer(double backward, double forward, double distanceRatio)
    {
        if (backward * forward <= 0.0)
        {
            return 0.0;
        }

        double theta = forward / backward * distanceRatio;
        return (theta + Math.Abs(theta)) / (1.0 + Math.Abs(theta)) * backward;
    }

    /// <summary>Unstructured mesh, interior faces colour by colour in parallel, walls on every patch.</summary>
    public static void UnstructuredColoured(UnstructuredMesh mesh, Water[] u, Water[] r, ParallelOptions options)
    {
        Array.Clear(r);
        var colouring = mesh.FaceColouring;
        const int Chunk = 2048;
        for (int colour = 0; colour < colouring.ColourCount; colour++)
        {
            int first = colouring.ColourOffsets[colour], last = colouring.ColourOffsets[colour + 1];
            Parallel.For(0, (last - first + Chunk - 1) / Chunk, options, chunk =>
            {
                ReadOnlySpan<int> faces = colouring.Faces, left = mesh.FaceLeft, right = mesh.FaceRight;
                ReadOnlySpan<Vec3> normals = mesh.FaceNormals, centroids = mesh.FaceCentroids;
                ReadOnlySpan<double> areas = mesh.FaceAreas, distances = mesh.FaceCentreDistances;
                int end = Math.Min(last, first + (chunk + 1) * Chunk);
                for (int n = first + chunk * Chunk; n < end; n++)
                {
                    int f = faces[n];
                    var face = new FaceGeometry(normals[f], areas[f], centroids[f], distances[f]);
                    Water flux = ShallowWaterPhysics.Rusanov(in u[left[f]], in u[right[f]], in face) * areas[f];
                    r[left[f]] -= flux;
                    r[right[f]] += flux;
                }
            });
        }

        ReadOnlySpan<int> owner = mesh.FaceLeft;
        ReadOnlySpan<Vec3> faceNormals = mesh.FaceNormals, faceCentroids = mesh.FaceCentroids;
        ReadOnlySpan<double> faceAreas = mesh.FaceAreas, faceDistances = mesh.FaceCentreDistances;
        for (int f = mesh.InteriorFaceCount; f < owner.Length; f++)
        {
            var face = new FaceGeometry(faceNormals[f], faceAreas[f], faceCentroids[f], faceDistances[f]);
            r[owner[f]] -= ShallowWaterPhysics.Wall(in u[owner[f]], in face) * faceAreas[f];
        }

        var volumes = mesh.CellVolumes;
        for (int c = 0; c < r.Length; c++)
        {
            r[c] = r[c] / volumes[c];
        }
    }

    /// <summary>3-D grid with walls on all six sides, serial scatter, first order.</summary>
    public static void Structured3D(StructuredGrid3D grid, ReadOnlySpan<Water> u, Span<Water> r)
    {
        int nx = grid.Nx, ny = grid.Ny, nz = grid.Nz, plane = nx * ny;
        ReadOnlySpan<double> xn = grid.X.Nodes, xc = grid.X.Centres, dx = grid.X.Widths;
        ReadOnlySpan<double> yn = grid.Y.Nodes, yc = grid.Y.Centres, dy = grid.Y.Widths;
        ReadOnlySpan<double> zn = grid.Z.Nodes, zc = grid.Z.Centres, dz = grid.Z.Widths;
        r.Clear();
        var ex = new Vec3(1, 0, 0);
        var ey = new Vec3(0, 1, 0);
        var ez = new Vec3(0, 0, 1);
        for (int k = 0; k < nz; k++)
        {
            for (int j = 0; j < ny; j++)
            {
                int row = nx * j + plane * k;
                double area = dy[j] * dz[k];
                for (int i = 1; i < nx; i++)
                {
                    var face = new FaceGeometry(ex, area, new Vec3(xn[i], yc[j], zc[k]), xc[i] - xc[i - 1]);
                    Water f = ShallowWaterPhysics.Rusanov(in u[row + i - 1], in u[row + i], in face) * area;
                    r[row + i - 1] -= f;
                    r[row + i] += f;
                }

                var west = new FaceGeometry(-ex, area, new Vec3(xn[0], yc[j], zc[k]), 0.5 * dx[0]);
                r[row] -= ShallowWaterPhysics.Wall(in u[row], in west) * area;
                var east = new FaceGeometry(ex, area, new Vec3(xn[nx], yc[j], zc[k]), 0.5 * dx[nx - 1]);
                r[row + nx - 1] -= ShallowWaterPhysics.Wall(in u[row + nx - 1], in east) * area;
            }
        }

        for (int k = 0; k < nz; k++)
        {
            for (int i = 0; i < nx; i++)
            {
                double area = dx[i] * dz[k];
                for (int j = 1; j < ny; j++)
                {
                    int c = i + nx * j + plane * k;
                    var face = new FaceGeometry(ey, area, new Vec3(xc[i], yn[j], zc[k]), yc[j] - yc[j - 1]);
                    Water f = ShallowWaterPhysics.Rusanov(in u[c - nx], in u[c], in face) * area;
                    r[c - nx] -= f;
                    r[c] += f;
                }

                int low = i + plane * k, high = low + nx * (ny - 1);
                var south = new FaceGeometry(-ey, area, new Vec3(xc[i], yn[0], zc[k]), 0.5 * dy[0]);
                r[low] -= ShallowWaterPhysics.Wall(in u[low], in south) * area;
                var north = new FaceGeometry(ey, area, new Vec3(xc[i], yn[ny], zc[k]), 0.5 * dy[ny - 1]);
                r[high] -= ShallowWaterPhysics.Wall(in u[high], in north) * area;
            }
        }

        for (int j = 0; j < ny; j++)
        {
            for (int i = 0; i < nx; i++)
            {
                double area = dx[i] * dy[j];
                for (int k = 1; k < nz; k++)
                {
                    int c = i + nx * j + plane * k;
                    var face = new FaceGeometry(ez, area, new Vec3(xc[i], yc[j], zn[k]), zc[k] - zc[k - 1]);
                    Water f = ShallowWaterPhysics.Rusanov(in u[c - plane], in u[c], in face) * area;
                    r[c - plane] -= f;
                    r[c] += f;
                }

                int bottom = i + nx * j, top = bottom + plane * (nz - 1);
                var floor = new FaceGeometry(-ez, area, new Vec3(xc[i], yc[j], zn[0]), 0.5 * dz[0]);
                r[bottom] -= ShallowWaterPhysics.Wall(in u[bottom], in floor) * area;
                var lid = new FaceGeometry(ez, area, new Vec3(xc[i], yc[j], zn[nz]), 0.5 * dz[nz - 1]);
                r[top] -= ShallowWaterPhysics.Wall(in u[top], in lid) * area;
            }
        }

        var volumes = grid.CellVolumes;
        for (int c = 0; c < r.Length; c++)
        {
            r[c] = r[c] / volumes[c];
        }
    }

    /// <summary>
    /// 2-D grid, walls on all four sides, parallel gather: x-face fluxes (flux in +x, boundary ones
    /// included) into a buffer in parallel rows, y-face fluxes in parallel columns, then each cell
    /// sums x-low, x-high, y-low, y-high in parallel rows.
    /// </summary>
    public static void StructuredGather(StructuredGrid2D grid, Water[] u, Water[] r, Water[] faceFlux, ParallelOptions options)
    {
        int nx = grid.Nx, ny = grid.Ny, xPlanes = nx + 1, yFirst = xPlanes * ny;
        Parallel.For(0, ny, options, j =>
        {
            ReadOnlySpan<double> xn = grid.X.Nodes, xc = grid.X.Centres, dx = grid.X.Widths;
            ReadOnlySpan<double> yc = grid.Y.Centres, dy = grid.Y.Widths;
            var ex = new Vec3(1, 0, 0);
            int row = nx * j, faces = xPlanes * j;
            double area = dy[j];
            var west = new FaceGeometry(-ex, area, new Vec3(xn[0], yc[j], 0), 0.5 * dx[0]);
            faceFlux[faces] = -(ShallowWaterPhysics.Wall(in u[row], in west) * area);
            for (int i = 1; i < nx; i++)
            {
                var face = new FaceGeometry(ex, area, new Vec3(xn[i], yc[j], 0), xc[i] - xc[i - 1]);
                faceFlux[faces + i] = ShallowWaterPhysics.Rusanov(in u[row + i - 1], in u[row + i], in face) * area;
            }

            var east = new FaceGeometry(ex, area, new Vec3(xn[nx], yc[j], 0), 0.5 * dx[nx - 1]);
            faceFlux[faces + nx] = ShallowWaterPhysics.Wall(in u[row + nx - 1], in east) * area;
        });

        Parallel.For(0, nx, options, i =>
        {
            ReadOnlySpan<double> xc = grid.X.Centres, dx = grid.X.Widths;
            ReadOnlySpan<double> yn = grid.Y.Nodes, yc = grid.Y.Centres, dy = grid.Y.Widths;
            var ey = new Vec3(0, 1, 0);
            double area = dx[i];
            var south = new FaceGeometry(-ey, area, new Vec3(xc[i], yn[0], 0), 0.5 * dy[0]);
            faceFlux[yFirst + i] = -(ShallowWaterPhysics.Wall(in u[i], in south) * area);
            for (int j = 1; j < ny; j++)
            {
                int c = i + nx * j;
                var face = new FaceGeometry(ey, area, new Vec3(xc[i], yn[j], 0), yc[j] - yc[j - 1]);
                faceFlux[yFirst + c] = ShallowWaterPhysics.Rusanov(in u[c - nx], in u[c], in face) * area;
            }

            int top = i + nx * (ny - 1);
            var north = new FaceGeometry(ey, area, new Vec3(xc[i], yn[ny], 0), 0.5 * dy[ny - 1]);
            faceFlux[yFirst + top + nx] = ShallowWaterPhysics.Wall(in u[top], in north) * area;
        });

        Parallel.For(0, ny, options, j =>
        {
            ReadOnlySpan<double> volumes = grid.CellVolumes;
            for (int i = 0; i < nx; i++)
            {
                int c = i + nx * j, xLow = i + xPlanes * j, yLow = yFirst + c;
                Water sum = faceFlux[xLow] - faceFlux[xLow + 1];
                sum += faceFlux[yLow];
                sum -= faceFlux[yLow + nx];
                r[c] = sum / volumes[c];
            }
        });
    }
}
