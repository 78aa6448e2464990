using System.Globalization;
using FvGen.Fields;
using FvGen.Meshes.Structured;
using FvGen.Output;

namespace FvGen.Runtime.Tests.Output;

public sealed class CsvProfileWriterTests
{
    private struct Channel
    {
        public double Depth;
        public double Discharge;
    }

    [Fact]
    public void HeaderIsXAndComponentNamesAndRowsRoundTripInInvariantCulture()
    {
        using var folder = new TemporaryFolder();
        var grid = new StructuredGrid1D(GridAxis.FromNodes([0.0, 0.3, 1.0, 1.1]), SideBoundary.Patch("in"), SideBoundary.Patch("out"));
        var field = new CellField<Channel>(grid);
        field[0] = new Channel { Depth = 0.1 + 0.2, Discharge = -1e-300 };
        field[1] = new Channel { Depth = 1.0 / 3.0, Discharge = 6.02214076e23 };
        field[2] = new Channel { Depth = double.NaN, Discharge = -0.0 };
        string path = folder.File("profile.csv");

        // A culture with a decimal comma must not leak into the file.
        var previous = CultureInfo.CurrentCulture;
        var comma = (CultureInfo)CultureInfo.InvariantCulture.Clone();
        comma.NumberFormat.NumberDecimalSeparator = ",";
        CultureInfo.CurrentCulture = comma;
        try
        {
            CsvProfileWriter.Write(path, field);
        }
        finally
        {
            CultureInfo.CurrentCulture = previous;
        }

        string[] lines = File.ReadAllText(path).Split('\n');
        Assert.Equal(5, lines.Length);
        Assert.Equal("x,Depth,Discharge", lines[0]);
        Assert.Equal("", lines[4]);
        for (int c = 0; c < 3; c++)
        {
            double[] row = lines[c + 1].Split(',').Select(t => double.Parse(t, NumberStyles.Float, CultureInfo.InvariantCulture)).ToArray();
            Assert.Equal(3, row.Length);
            Assert.Equal(grid.X.Centres[c], row[0]);
            Assert.Equal(BitConverter.DoubleToInt64Bits(field[c].Depth), BitConverter.DoubleToInt64Bits(row[1]));
            Assert.Equal(BitConverter.DoubleToInt64Bits(field[c].Discharge), BitConverter.DoubleToInt64Bits(row[2]));
        }

        Assert.Equal("0.15,0.30000000000000004,-1E-300", lines[1]);
    }

    [Fact]
    public void AProfileNeedsAOneDimensionalGrid()
    {
        var wall = SideBoundary.Patch("wall");
        var field = new CellField<Channel>(new StructuredGrid2D(GridAxis.Uniform(2, 0, 1), GridAxis.Uniform(2, 0, 1), wall, wall, wall, wall));
        var ex = Assert.Throws<ArgumentException>(() => CsvProfileWriter.Write("never.csv", field));
        Assert.Contains("needs a 1-D structured grid", ex.Message);
        Assert.False(File.Exists("never.csv"));
    }
}
