using System.Globalization;
using System.Xml.Linq;
using FvGen.Fields;
using FvGen.Geometry;
using FvGen.Meshes.Gmsh;
using FvGen.Meshes.Unstructured;
using FvGen.Output;
using FvGen.Runtime.Tests.Meshes.Gmsh;

namespace FvGen.Runtime.Tests.Output;

/// <summary>
/// The .vtu file read back with an XML reader and checked against the VTK file-format documentation
/// (XML UnstructuredGrid: Points, Cells connectivity/offsets/types, CellData; cell types triangle 5,
/// quad 9, tetra 10, hexahedron 12, wedge 13, pyramid 14).
/// </summary>
public sealed class VtuWriterTests : IDisposable
{
    private readonly string _folder = Path.Combine(Path.GetTempPath(), "fvgen-vtu-" + Guid.NewGuid().ToString("N"));

    private struct Momentum
    {
        public double X;
        public double Y;
    }

    private struct FlowState
    {
        public double Density;
        public Momentum Momentum;
    }

    [Fact]
    public void MixedBlockIsWrittenWithVtkCellTypesAndEndOffsets()
    {
        var mesh = GmshReader.Read(GmshTestFiles.Path("mixed-block.msh"));
        string path = Path.Combine(_folder, "mixed-block.vtu");
        VtuWriter.Write(path, mesh);

        var piece = ReadPiece(path);
        Assert.Equal(mesh.Points.Length, (int)piece.Attribute("NumberOfPoints")!);
        Assert.Equal(15, (int)piece.Attribute("NumberOfCells")!);

        var points = Numbers(Array(piece, "Points", null));
        Assert.Equal("3", Array(piece, "Points", null).Attribute("NumberOfComponents")!.Value);
        Assert.Equal(3 * mesh.Points.Length, points.Length);

        var connectivity = Numbers(Array(piece, "Cells", "connectivity")).Select(v => (int)v).ToArray();
        var offsets = Numbers(Array(piece, "Cells", "offsets")).Select(v => (int)v).ToArray();
        var types = Numbers(Array(piece, "Cells", "types")).Select(v => (int)v).ToArray();

        // VTK: offsets[c] is the end of cell c's run in connectivity, so the last offset is its length.
        Assert.Equal(15, offsets.Length);
        Assert.Equal(connectivity.Length, offsets[^1]);
        var expectedNodes = new Dictionary<int, int> { [12] = 8, [14] = 5, [13] = 6, [10] = 4 };
        for (int c = 0; c < 15; c++)
        {
            int start = c == 0 ? 0 : offsets[c - 1];
            Assert.Equal(expectedNodes[types[c]], offsets[c] - start);
        }

        Assert.Equal(1, types.Count(t => t == 12));
        Assert.Equal(6, types.Count(t => t == 14));
        Assert.Equal(2, types.Count(t => t == 13));
        Assert.Equal(6, types.Count(t => t == 10));

        // VTK wedge: the right-hand normal of points (0,1,2) points away from the triangle (3,4,5).
        for (int c = 0; c < 15; c++)
        {
            if (types[c] != 13)
            {
                continue;
            }

            var run = connectivity[offsets[c - 1]..offsets[c]];
            Vec3 P(int n) => new(points[3 * n], points[3 * n + 1], points[3 * n + 2]);
            Vec3 normal = Vec3.Cross(P(run[1]) - P(run[0]), P(run[2]) - P(run[0]));
            Assert.True(Vec3.Dot(normal, P(run[3]) - P(run[0])) < 0, $"wedge {c} is in Gmsh order, not VTK order");
        }

        var volumes = Numbers(Array(piece, "CellData", VtuWriter.CellVolumeName));
        Assert.Equal(4.0, volumes.Sum(), 13);
        Assert.Empty(Directory.GetFiles(_folder, "*.partial"));
    }

    [Fact]
    public void StateComponentsBecomeNamedCellDataArraysThatRoundTrip()
    {
        var mesh = RectangleMesh.Create(3, 2, 0, 1.5, 0, 1, RectangleCellKind.Triangles);
        var state = new CellField<FlowState>(mesh);
        state.Fill(x => new FlowState { Density = 1.0 + x.X / 3.0, Momentum = new Momentum { X = Math.PI * x.Y, Y = -x.X } });
        string path = Path.Combine(_folder, "plate.vtu");
        VtuWriter.Write(path, mesh, state);

        var piece = ReadPiece(path);
        Assert.Equal(12, (int)piece.Attribute("NumberOfCells")!);
        Assert.All(Numbers(Array(piece, "Cells", "types")), t => Assert.Equal(5.0, t));
        var names = piece.Element("CellData")!.Elements("DataArray").Select(a => a.Attribute("Name")!.Value);
        Assert.Equal([VtuWriter.CellVolumeName, "Density", "Momentum.X", "Momentum.Y"], names);

        var density = Numbers(Array(piece, "CellData", "Density"));
        var momentumX = Numbers(Array(piece, "CellData", "Momentum.X"));
        for (int c = 0; c < mesh.CellCount; c++)
        {
            Assert.Equal(state[c].Density, density[c]); // "R" formatting round-trips exactly
            Assert.Equal(state[c].Momentum.X, momentumX[c]);
        }

        // 2-D points carry z = 0.
        var points = Numbers(Array(piece, "Points", null));
        Assert.All(Enumerable.Range(0, points.Length / 3), i => Assert.Equal(0.0, points[3 * i + 2]));
    }

    [Fact]
    public void FieldOfAnotherMeshIsRefused()
    {
        var mesh = RectangleMesh.Create(2, 2, 0, 1, 0, 1);
        var other = RectangleMesh.Create(2, 2, 0, 1, 0, 1);
        var ex = Assert.Throws<ArgumentException>(() => VtuWriter.Write(Path.Combine(_folder, "x.vtu"), mesh, new CellField<FlowState>(other)));
        Assert.Contains("different mesh", ex.Message);
        Assert.False(File.Exists(Path.Combine(_folder, "x.vtu")));
    }

    public void Dispose()
    {
        if (Directory.Exists(_folder))
        {
            Directory.Delete(_folder, recursive: true);
        }
    }

    private static XElement ReadPiece(string path)
    {
        var document = XDocument.Load(path);
        var root = document.Root!;
        Assert.Equal("VTKFile", root.Name.LocalName);
        Assert.Equal("UnstructuredGrid", root.Attribute("type")!.Value);
        return root.Element("UnstructuredGrid")!.Element("Piece")!;
    }

    private static XElement Array(XElement piece, string group, string? name) =>
        piece.Element(group)!.Elements("DataArray").Single(a => (string?)a.Attribute("Name") == name);

    private static double[] Numbers(XElement array)
    {
        Assert.Equal("ascii", array.Attribute("format")!.Value);
        return array.Value.Split((char[]?)null, StringSplitOptions.RemoveEmptyEntries)
            .Select(t => double.Parse(t, CultureInfo.InvariantCulture)).ToArray();
    }
}
