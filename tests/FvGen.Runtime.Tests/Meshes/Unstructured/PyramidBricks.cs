using FvGen.Meshes.Unstructured;

namespace FvGen.Runtime.Tests.Meshes.Unstructured;

/// <summary>
/// A test-only box mesh of pyramids: every lattice brick split into six pyramids whose apex is a
/// node at the brick's centre and whose bases are the brick's faces (the bases shared by
/// neighbouring bricks are the interior faces between them).
/// </summary>
internal static class PyramidBricks
{
    public static UnstructuredMeshBuilder CreateBuilder(int nx, int ny, int nz, double lx, double ly, double lz)
    {
        var builder = BoxMesh.CreateBuilder(nx, ny, nz, 0, lx, 0, ly, 0, lz);
        var pyramids = new UnstructuredMeshBuilder(3, "pyramid bricks");
        for (int n = 0; n < builder.NodeCount; n++)
        {
            pyramids.AddNode(builder.GetNode(n));
        }

        int Node(int i, int j, int k) => (k * (ny + 1) + j) * (nx + 1) + i;
        for (int k = 0; k < nz; k++)
        {
            for (int j = 0; j < ny; j++)
            {
                for (int i = 0; i < nx; i++)
                {
                    int apex = pyramids.AddNode((i + 0.5) * lx / nx, (j + 0.5) * ly / ny, (k + 0.5) * lz / nz);
                    int C(int bits) => Node(i + (bits & 1), j + ((bits >> 1) & 1), k + ((bits >> 2) & 1));

                    // Each base is listed counter-clockwise seen from the apex inside the brick (Gmsh pyramid order).
                    pyramids.AddCell(CellShape.Pyramid, C(0), C(1), C(3), C(2), apex); // bottom z = k
                    pyramids.AddCell(CellShape.Pyramid, C(4), C(6), C(7), C(5), apex); // top
                    pyramids.AddCell(CellShape.Pyramid, C(0), C(4), C(5), C(1), apex); // y = j
                    pyramids.AddCell(CellShape.Pyramid, C(2), C(3), C(7), C(6), apex); // y = j + 1
                    pyramids.AddCell(CellShape.Pyramid, C(0), C(2), C(6), C(4), apex); // x = i
                    pyramids.AddCell(CellShape.Pyramid, C(1), C(5), C(7), C(3), apex); // x = i + 1
                }
            }
        }

        for (int b = 0; b < builder.BoundaryFaceCount; b++)
        {
            pyramids.AddBoundaryFace(builder.PatchOfBoundaryFace(b), builder.NodesOfBoundaryFace(b));
        }

        return pyramids;
    }
}
