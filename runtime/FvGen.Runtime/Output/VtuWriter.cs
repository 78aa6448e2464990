using System.Globalization;
using System.Xml;
using FvGen.Fields;
using FvGen.Meshes.Unstructured;

namespace FvGen.Output;

/// <summary>
/// Writes an unstructured mesh and its cell data as a VTK XML unstructured grid (<c>.vtu</c>,
/// ASCII), readable by ParaView and VisIt. Written through <see cref="AtomicFile"/>: the file
/// appears whole or not at all.
/// </summary>
/// <remarks>
/// Layout (VTK file formats, XML "UnstructuredGrid"): one <c>Piece</c> with <c>Points</c>
/// (Float64, 3 components; z = 0 in 2-D), <c>Cells</c> (<c>connectivity</c>, <c>offsets</c> = the end
/// of each cell's run in connectivity, <c>types</c> = the VTK cell type numbers of
/// <see cref="CellShape"/>), and <c>CellData</c> with one Float64 array per state component, named
/// by <see cref="StateLayout{TState}.ComponentNames"/>, plus the cell volumes as <c>CellVolume</c>.
/// </remarks>
public static class VtuWriter
{
    /// <summary>The name of the cell-volume array written with every mesh.</summary>
    public const string CellVolumeName = "CellVolume";

    /// <summary>Writes the mesh alone (with its cell volumes).</summary>
    public static void Write(string path, UnstructuredMesh mesh)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        AtomicFile.Write(path, writer => WriteGrid(writer, mesh, []));
    }

    /// <summary>Writes the mesh and one cell-data array per component of <paramref name="state"/>.</summary>
    public static void Write<TState>(string path, UnstructuredMesh mesh, CellField<TState> state)
        where TState : unmanaged
    {
        ArgumentNullException.ThrowIfNull(mesh);
        ArgumentNullException.ThrowIfNull(state);
        if (!ReferenceEquals(state.Mesh, mesh))
        {
            throw new ArgumentException("The field lives on a different mesh from the one being written.", nameof(state));
        }

        var names = StateLayout<TState>.ComponentNames;
        if (names.Contains(CellVolumeName))
        {
            throw new ArgumentException($"A state component is called '{CellVolumeName}', the name of the cell-volume array; rename it.", nameof(state));
        }

        double[] values = state.Components.ToArray();
        var arrays = new List<(string, Func<int, double>)>();
        for (int k = 0; k < names.Count; k++)
        {
            int component = k;
            arrays.Add((names[k], cell => values[cell * names.Count + component]));
        }

        AtomicFile.Write(path, writer => WriteGrid(writer, mesh, arrays));
    }

    private static void WriteGrid(TextWriter text, UnstructuredMesh mesh, List<(string Name, Func<int, double> Value)> cellData)
    {
        using var xml = XmlWriter.Create(text, new XmlWriterSettings { Indent = true, IndentChars = "  ", NewLineChars = "\n" });
        xml.WriteStartDocument();
        xml.WriteStartElement("VTKFile");
        xml.WriteAttributeString("type", "UnstructuredGrid");
        xml.WriteAttributeString("version", "1.0");
        xml.WriteAttributeString("byte_order", "LittleEndian");
        xml.WriteAttributeString("header_type", "UInt64");
        xml.WriteStartElement("UnstructuredGrid");
        xml.WriteStartElement("Piece");
        xml.WriteAttributeString("NumberOfPoints", Invariant(mesh.Points.Length));
        xml.WriteAttributeString("NumberOfCells", Invariant(mesh.CellCount));

        xml.WriteStartElement("Points");
        var points = mesh.Points.ToArray();
        WriteArray(xml, "Float64", name: null, components: 3, points.Length, i => $"{Invariant(points[i].X)} {Invariant(points[i].Y)} {Invariant(points[i].Z)}");
        xml.WriteEndElement();

        xml.WriteStartElement("Cells");
        var nodes = mesh.CellNodes.ToArray();
        var offsets = mesh.CellNodeOffsets.ToArray();
        var shapes = mesh.CellShapes.ToArray();
        WriteArray(xml, "Int64", "connectivity", 1, mesh.CellCount, c =>
            string.Join(' ', nodes[offsets[c]..offsets[c + 1]].Select(n => Invariant(n))));
        WriteArray(xml, "Int64", "offsets", 1, mesh.CellCount, c => Invariant(offsets[c + 1]));
        WriteArray(xml, "UInt8", "types", 1, mesh.CellCount, c => Invariant((int)shapes[c]));
        xml.WriteEndElement();

        xml.WriteStartElement("CellData");
        var volumes = mesh.CellVolumes.ToArray();
        WriteArray(xml, "Float64", CellVolumeName, 1, mesh.CellCount, c => Invariant(volumes[c]));
        foreach (var (name, value) in cellData)
        {
            WriteArray(xml, "Float64", name, 1, mesh.CellCount, c => Invariant(value(c)));
        }

        xml.WriteEndElement();
        xml.WriteEndElement(); // Piece
        xml.WriteEndElement(); // UnstructuredGrid
        xml.WriteEndElement(); // VTKFile
        xml.WriteEndDocument();
    }

    /// <summary>One DataArray, one entry (tuple or cell) per line.</summary>
    private static void WriteArray(XmlWriter xml, string type, string? name, int components, int count, Func<int, string> entry)
    {
        xml.WriteStartElement("DataArray");
        xml.WriteAttributeString("type", type);
        if (name is not null)
        {
            xml.WriteAttributeString("Name", name);
        }

        if (components != 1)
        {
            xml.WriteAttributeString("NumberOfComponents", Invariant(components));
        }

        xml.WriteAttributeString("format", "ascii");
        xml.WriteString("\n");
        for (int i = 0; i < count; i++)
        {
            xml.WriteString(entry(i));
            xml.WriteString("\n");
        }

        xml.WriteEndElement();
    }

    private static string Invariant(int value) => value.ToString(CultureInfo.InvariantCulture);

    private static string Invariant(double value) => value.ToString("R", CultureInfo.InvariantCulture);
}
