using System.Globalization;
using FvGen.Meshes.Structured;
using FvGen.Output;

namespace FvGen.Runtime.Tests.Output;

/// <summary>
/// Files read back and checked against the layout of the legacy VTK format (VTK file formats,
/// "simple legacy formats"): version line, title, ASCII, DATASET with DIMENSIONS in points, then
/// ORIGIN/SPACING (STRUCTURED_POINTS) or X/Y/Z_COORDINATES (RECTILINEAR_GRID), then CELL_DATA with
/// one SCALARS/LOOKUP_TABLE block per array, values with x varying fastest.
/// </summary>
public sealed class StructuredVtkWriterTests
{
    private struct Flow
    {
        public double Density;
        public Velocity Velocity;
    }

    private struct Velocity
    {
        public double X;
        public double Y;
    }

    private static readonly SideBoundary Wall = SideBoundary.Patch("wall");

    [Fact]
    public void UniformGridIsWrittenAsStructuredPointsWithOneScalarArrayPerComponent()
    {
        using var folder = new TemporaryFolder();
        var grid = new StructuredGrid2D(GridAxis.Uniform(3, 1.0, 2.5), GridAxis.Uniform(2, -1.0, 0.0), Wall, Wall, Wall, Wall);
        var state = new Flow[6];
        for (int c = 0; c < 6; c++)
        {
            state[c] = new Flow { Density = 1.0 / (c + 3), Velocity = new Velocity { X = c * 0.1, Y = -c } };
        }

        string path = folder.File("plate.vtk");
        StructuredVtkWriter.Write(path, grid, state.AsSpan(), "test plate");

        var reader = new Tokens(File.ReadAllText(path));
        Assert.Equal("# vtk DataFile Version 3.0", reader.Line());
        Assert.Equal("test plate", reader.Line());
        Assert.Equal("ASCII", reader.Line());
        Assert.Equal("DATASET STRUCTURED_POINTS", reader.Line());
        Assert.Equal("DIMENSIONS 4 3 1", reader.Line());
        Assert.Equal("ORIGIN 1 -1 0", reader.Line());
        Assert.Equal("SPACING 0.5 0.5 1", reader.Line());
        Assert.Equal("CELL_DATA 6", reader.Line());
        foreach (var (name, pick) in new (string, Func<Flow, double>)[] { ("Density", f => f.Density), ("Velocity.X", f => f.Velocity.X), ("Velocity.Y", f => f.Velocity.Y) })
        {
            Assert.Equal($"SCALARS {name} double 1", reader.Line());
            Assert.Equal("LOOKUP_TABLE default", reader.Line());
            Assert.Equal(state.Select(pick), reader.Numbers(6));
        }

        Assert.True(reader.AtEnd);
    }

    [Fact]
    public void StretchedAxisMakesARectilinearGridWithTheNodeCoordinates()
    {
        using var folder = new TemporaryFolder();
        double[] nodes = [0.0, 0.1, 0.3, 0.7, 1.5];
        var grid = new StructuredGrid1D(GridAxis.FromNodes(nodes), Wall, Wall);
        double[] state = [0.1 + 0.2, 1e-300, -0.0, 123456.789];
        string path = folder.File("line.vtk");

        Assert.Equal(StructuredVtkLayout.RectilinearGrid, StructuredVtkWriter.LayoutFor(grid));
        StructuredVtkWriter.Write(path, grid, state.AsSpan());

        var reader = new Tokens(File.ReadAllText(path));
        reader.Line();
        Assert.Equal("FvGen cell data", reader.Line());
        Assert.Equal("ASCII", reader.Line());
        Assert.Equal("DATASET RECTILINEAR_GRID", reader.Line());
        Assert.Equal("DIMENSIONS 5 1 1", reader.Line());
        Assert.Equal("X_COORDINATES 5 double", reader.Line());
        Assert.Equal(nodes, reader.Numbers(5));
        Assert.Equal("Y_COORDINATES 1 double", reader.Line());
        Assert.Equal([0.0], reader.Numbers(1));
        Assert.Equal("Z_COORDINATES 1 double", reader.Line());
        Assert.Equal([0.0], reader.Numbers(1));
        Assert.Equal("CELL_DATA 4", reader.Line());
        Assert.Equal("SCALARS Value double 1", reader.Line());
        Assert.Equal("LOOKUP_TABLE default", reader.Line());
        // Round-trip: every bit back, including the sign of zero.
        var back = reader.Numbers(4);
        Assert.Equal(state.Select(BitConverter.DoubleToInt64Bits), back.Select(BitConverter.DoubleToInt64Bits));
        Assert.True(reader.AtEnd);
    }

    [Fact]
    public void BoxDimensionsCountPointsInEveryDirectionAndCellsVaryXFastest()
    {
        using var folder = new TemporaryFolder();
        var grid = new StructuredGrid3D(GridAxis.Uniform(2, 0, 1), GridAxis.Uniform(3, 0, 1), GridAxis.Uniform(4, 0, 1), Wall, Wall, Wall, Wall, Wall, Wall);
        var state = Enumerable.Range(0, grid.CellCount).Select(c => (double)c).ToArray();
        string path = folder.File("box.vtk");
        StructuredVtkWriter.Write(path, grid, state.AsSpan());

        var reader = new Tokens(File.ReadAllText(path));
        for (int i = 0; i < 4; i++)
        {
            reader.Line();
        }

        Assert.Equal("DIMENSIONS 3 4 5", reader.Line());
        reader.Line();
        reader.Line();
        Assert.Equal("CELL_DATA 24", reader.Line());
        reader.Line();
        reader.Line();
        Assert.Equal(state, reader.Numbers(24));
    }

    [Fact]
    public void UniformAxisWithRoundedNodesStillCountsAsUniformButAGeometricOneDoesNot()
    {
        // Nodes start + i·h carry rounding (0.1 + 3·0.1 ≠ 0.4 exactly); that is still a uniform grid.
        var uniform = new StructuredGrid2D(GridAxis.Uniform(7, 0.1, 0.8), GridAxis.Uniform(3, 0, 0.3), Wall, Wall, Wall, Wall);
        var stretched = new StructuredGrid2D(GridAxis.Uniform(7, 0.1, 0.8), GridAxis.Geometric(3, 0, 0.3, 1.01), Wall, Wall, Wall, Wall);
        Assert.Equal(StructuredVtkLayout.StructuredPoints, StructuredVtkWriter.LayoutFor(uniform));
        Assert.Equal(StructuredVtkLayout.RectilinearGrid, StructuredVtkWriter.LayoutFor(stretched));
    }

    [Fact]
    public void WriteInterruptedByAnExceptionLeavesNoFileAndNoTemporaryFile()
    {
        using var folder = new TemporaryFolder();
        var grid = new StructuredGrid1D(GridAxis.Uniform(50, 0, 1), Wall, Wall);
        var state = Enumerable.Repeat(1.0, 50).ToArray();
        state[37] = double.PositiveInfinity; // found only after the header and the first values are written
        string path = folder.File("blown.vtk");

        var ex = Assert.Throws<ArgumentException>(() => StructuredVtkWriter.Write(path, grid, state.AsSpan()));

        Assert.Contains("Cell (37) has Value = Infinity", ex.Message);
        Assert.Empty(Directory.EnumerateFileSystemEntries(folder.Path));
    }

    [Fact]
    public void FailedRewriteKeepsThePreviousFileWhole()
    {
        using var folder = new TemporaryFolder();
        var grid = new StructuredGrid1D(GridAxis.Uniform(3, 0, 1), Wall, Wall);
        string path = folder.File("kept.vtk");
        StructuredVtkWriter.Write(path, grid, new[] { 1.0, 2.0, 3.0 }.AsSpan());
        string before = File.ReadAllText(path);

        Assert.Throws<ArgumentException>(() => StructuredVtkWriter.Write(path, grid, new[] { 1.0, double.NaN, 3.0 }.AsSpan()));

        Assert.Equal(before, File.ReadAllText(path));
        Assert.Single(Directory.EnumerateFileSystemEntries(folder.Path));
    }

    /// <summary>Reads a legacy VTK file line by line, or as a run of whitespace-separated numbers.</summary>
    private sealed class Tokens(string text)
    {
        private readonly string[] _lines = text.Split('\n');
        private int _line;

        public bool AtEnd => _line == _lines.Length - 1 && _lines[_line].Length == 0;

        public string Line() => _lines[_line++];

        public double[] Numbers(int count)
        {
            var values = new List<double>();
            while (values.Count < count)
            {
                values.AddRange(Line().Split(' ', StringSplitOptions.RemoveEmptyEntries).Select(t => double.Parse(t, NumberStyles.Float, CultureInfo.InvariantCulture)));
            }

            Assert.Equal(count, values.Count);
            return values.ToArray();
        }
    }
}
