using System.Globalization;
using FvGen.Geometry;
using FvGen.Meshes.Unstructured;

namespace FvGen.Meshes.Gmsh;

/// <summary>
/// Reads meshes in the Gmsh MSH 4.1 ASCII format: <c>$MeshFormat</c>, <c>$PhysicalNames</c>,
/// <c>$Entities</c>, <c>$Nodes</c> and <c>$Elements</c>; other sections are skipped.
/// </summary>
/// <remarks>
/// The elements of the highest dimension present (2 or 3) are the cells. Elements one dimension
/// lower are boundary faces: each goes into the patch of every physical group of its entity,
/// named by <c>$PhysicalNames</c> or, for an unnamed group, by its tag ("5"). Lower-dimensional
/// elements in no physical group, and all elements of lower dimensions still, are ignored. Tags
/// may be sparse. A malformed file throws a <see cref="GmshFormatException"/> naming the file, the
/// line and what was expected; a file that reads but makes no valid mesh (a boundary face in no
/// patch, an inverted cell) throws the builder's <see cref="MeshValidationException"/>.
/// </remarks>
public static class GmshReader
{
    /// <summary>Reads the mesh in the file at <paramref name="path"/>.</summary>
    public static UnstructuredMesh Read(string path)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        return Parse(File.ReadAllText(path), Path.GetFileName(path));
    }

    /// <summary>Reads a mesh from the text of a file; <paramref name="fileName"/> is what messages call it.</summary>
    public static UnstructuredMesh Parse(string text, string fileName)
    {
        ArgumentNullException.ThrowIfNull(text);
        ArgumentException.ThrowIfNullOrEmpty(fileName);
        var file = new GmshFile(new GmshTextCursor(fileName, text));
        file.ReadSections();
        return file.ToBuilder().Build();
    }

    /// <summary>The content of one file as it is read, section by section.</summary>
    private sealed class GmshFile(GmshTextCursor cursor)
    {
        private readonly Dictionary<(int Dimension, long Tag), string> _physicalNames = [];
        private readonly Dictionary<(int Dimension, long Tag), long[]> _entityPhysicals = [];
        private readonly Dictionary<long, int> _nodeIndex = [];
        private readonly List<Vec3> _nodes = [];
        private readonly List<long> _nodeTags = [];
        private readonly List<int> _nodeLines = [];
        private readonly List<Element> _elements = [];
        private bool _hasEntities;
        private bool _hasNodes;
        private bool _hasElements;
        private int _elementsLine;

        public void ReadSections()
        {
            string first = cursor.Expect("$MeshFormat");
            if (first != "$MeshFormat")
            {
                throw cursor.Error($"expected $MeshFormat as the first section, found '{first}'");
            }

            ReadMeshFormat();
            var seen = new HashSet<string>(StringComparer.Ordinal);
            while (cursor.Next() is { } marker)
            {
                if (marker is "$PhysicalNames" or "$Entities" or "$Nodes" or "$Elements" && !seen.Add(marker))
                {
                    throw cursor.Error($"expected one {marker} section, found a second one");
                }

                switch (marker)
                {
                    case "$MeshFormat":
                        throw cursor.Error("expected one $MeshFormat section, found a second one");
                    case "$PhysicalNames":
                        ReadPhysicalNames();
                        break;
                    case "$Entities":
                        if (_hasNodes)
                        {
                            throw cursor.Error("expected $Entities before $Nodes (wrong section order), found $Entities after $Nodes");
                        }

                        ReadEntities();
                        break;
                    case "$Nodes":
                        if (!_hasEntities)
                        {
                            throw cursor.Error("expected $Entities before $Nodes (wrong section order; the entities carry the physical groups), found $Nodes");
                        }

                        ReadNodes();
                        break;
                    case "$Elements":
                        if (!_hasNodes)
                        {
                            throw cursor.Error("expected $Nodes before $Elements (wrong section order), found $Elements");
                        }

                        ReadElements();
                        break;
                    case "$PartitionedEntities":
                        throw cursor.Error("expected an unpartitioned mesh, found $PartitionedEntities; save the mesh without partitions");
                    default:
                        if (!marker.StartsWith('$') || marker.StartsWith("$End", StringComparison.Ordinal))
                        {
                            throw cursor.Error($"expected the start of a section (such as $Nodes), found '{marker}'");
                        }

                        // Sections FvGen does not use ($Comments, $Periodic, $NodeData, ...) are skipped whole.
                        cursor.SkipPast(marker, "$End" + marker[1..]);
                        break;
                }
            }

            if (!_hasElements)
            {
                throw cursor.Error($"expected {(_hasNodes ? "an $Elements section" : _hasEntities ? "$Nodes and $Elements sections" : "$Entities, $Nodes and $Elements sections")}, found the end of the file");
            }
        }

        public UnstructuredMeshBuilder ToBuilder()
        {
            int dimension = 0;
            foreach (var element in _elements)
            {
                dimension = Math.Max(dimension, element.Dimension);
            }

            if (dimension < 2)
            {
                throw cursor.ErrorAt(_elementsLine, $"expected 2-D elements (triangles, quadrangles) or 3-D elements (tetrahedra, hexahedra, prisms, pyramids), found {(dimension == 1 ? "lines and points only" : "no elements")}; when physical groups are defined Gmsh saves only their elements, so put the cells in a physical surface or volume");
            }

            var builder = new UnstructuredMeshBuilder(dimension, cursor.FileName) { NodeTags = _nodeTags };
            for (int n = 0; n < _nodes.Count; n++)
            {
                Vec3 p = _nodes[n];
                if (dimension == 2 && p.Z != 0.0)
                {
                    throw cursor.ErrorAt(_nodeLines[n], $"expected z = 0 for node {_nodeTags[n]} of a 2-D mesh (FvGen's 2-D meshes lie in the plane z = 0), found z = {p.Z.ToString("R", CultureInfo.InvariantCulture)}");
                }

                builder.AddNode(p);
            }

            foreach (var element in _elements)
            {
                string label = $"element {element.Tag} on line {element.Line}";
                if (element.Dimension == dimension)
                {
                    builder.AddCell(element.Shape!.Value, element.Nodes, label);
                }
                else if (element.Dimension == dimension - 1 && _entityPhysicals.TryGetValue((element.Dimension, element.EntityTag), out var physicals))
                {
                    foreach (long physical in physicals)
                    {
                        builder.AddBoundaryFace(PatchName(element.Dimension, physical), element.Nodes, label);
                    }
                }
            }

            return builder;
        }

        private string PatchName(int dimension, long physical) =>
            _physicalNames.TryGetValue((dimension, physical), out string? name) ? name : physical.ToString(CultureInfo.InvariantCulture);

        private void ReadMeshFormat()
        {
            string version = cursor.Expect("the version number 4.1");
            if (version != "4.1")
            {
                throw cursor.Error($"expected version 4.1 (MSH 4.1 ASCII), found '{version}'{(version.StartsWith('2') ? "; save the mesh in format version 4.1" : "")}");
            }

            int fileType = cursor.ReadCount("the file type (0 for ASCII)");
            if (fileType != 0)
            {
                throw cursor.Error($"expected file type 0 (ASCII), found {fileType}{(fileType == 1 ? " (binary); save the mesh as ASCII" : "")}");
            }

            cursor.ReadCount("the data size");
            cursor.ExpectMarker("$EndMeshFormat");
        }

        private void ReadPhysicalNames()
        {
            int count = cursor.ReadCount("the number of physical names");
            for (int i = 0; i < count; i++)
            {
                int dimension = ReadDimension($"the dimension of physical name {i + 1}");
                long tag = cursor.ReadTag($"the tag of physical name {i + 1}");
                string quoted = cursor.Expect($"the quoted name of physical group {tag}");
                if (quoted.Length < 2 || quoted[0] != '"' || quoted[^1] != '"')
                {
                    throw cursor.Error($"expected the quoted name of physical group {tag} (\"like this\"), found '{quoted}'");
                }

                _physicalNames[(dimension, tag)] = quoted[1..^1];
            }

            cursor.ExpectMarker("$EndPhysicalNames");
        }

        private void ReadEntities()
        {
            var counts = new int[4];
            string[] kinds = ["points", "curves", "surfaces", "volumes"];
            for (int d = 0; d < 4; d++)
            {
                counts[d] = cursor.ReadCount($"the number of {kinds[d]}");
            }

            for (int d = 0; d < 4; d++)
            {
                string kind = kinds[d][..^1];
                for (int i = 0; i < counts[d]; i++)
                {
                    long tag = cursor.ReadTag($"the tag of {kind} {i + 1}");
                    int coordinates = d == 0 ? 3 : 6; // a point has X Y Z; others a bounding box
                    for (int k = 0; k < coordinates; k++)
                    {
                        cursor.ReadNumber($"{(d == 0 ? "coordinate" : "bounding-box value")} {k + 1} of {kind} {tag}");
                    }

                    int physicalCount = cursor.ReadCount($"the number of physical tags of {kind} {tag}");
                    var physicals = new long[physicalCount];
                    for (int k = 0; k < physicalCount; k++)
                    {
                        physicals[k] = Math.Abs(cursor.ReadSigned($"physical tag {k + 1} of {kind} {tag}"));
                    }

                    if (!_entityPhysicals.TryAdd((d, tag), physicals))
                    {
                        throw cursor.Error($"expected each {kind} tag once, found {kind} {tag} a second time");
                    }

                    if (d > 0)
                    {
                        int bounding = cursor.ReadCount($"the number of bounding entities of {kind} {tag}");
                        for (int k = 0; k < bounding; k++)
                        {
                            cursor.ReadSigned($"bounding entity {k + 1} of {kind} {tag}");
                        }
                    }
                }
            }

            cursor.ExpectMarker("$EndEntities");
            _hasEntities = true;
        }

        private void ReadNodes()
        {
            int blocks = cursor.ReadCount("the number of node blocks");
            int declared = cursor.ReadCount("the number of nodes");
            int headerLine = cursor.TokenLine;
            long minTag = cursor.ReadSigned("the smallest node tag");
            long maxTag = cursor.ReadSigned("the largest node tag");
            for (int b = 0; b < blocks; b++)
            {
                int dimension = ReadDimension($"the entity dimension of node block {b + 1}");
                cursor.ReadTag($"the entity tag of node block {b + 1}");
                int parametric = cursor.ReadCount($"the parametric flag (0 or 1) of node block {b + 1}");
                if (parametric > 1 || (parametric == 1 && dimension == 3))
                {
                    throw cursor.Error($"expected the parametric flag 0{(dimension < 3 ? " or 1" : "")} for node block {b + 1}, found {parametric}");
                }

                int count = cursor.ReadCount($"the number of nodes in node block {b + 1}");
                var tags = new long[count];
                for (int i = 0; i < count; i++)
                {
                    tags[i] = cursor.ReadTag($"node tag {i + 1} of node block {b + 1}");
                    if (tags[i] < minTag || tags[i] > maxTag)
                    {
                        throw cursor.Error($"expected node tags in [{minTag}, {maxTag}] as the $Nodes header declares, found node tag {tags[i]}");
                    }

                    if (_nodeIndex.ContainsKey(tags[i]))
                    {
                        throw cursor.Error($"expected each node tag once, found node tag {tags[i]} a second time");
                    }

                    _nodeIndex.Add(tags[i], _nodes.Count + i);
                }

                for (int i = 0; i < count; i++)
                {
                    double x = cursor.ReadNumber($"the x coordinate of node {tags[i]}");
                    int line = cursor.TokenLine;
                    double y = cursor.ReadNumber($"the y coordinate of node {tags[i]}");
                    double z = cursor.ReadNumber($"the z coordinate of node {tags[i]}");
                    for (int k = 0; k < parametric * dimension; k++)
                    {
                        cursor.ReadNumber($"parametric coordinate {k + 1} of node {tags[i]}");
                    }

                    _nodes.Add(new Vec3(x, y, z));
                    _nodeTags.Add(tags[i]);
                    _nodeLines.Add(line);
                }
            }

            if (_nodes.Count != declared)
            {
                throw cursor.ErrorAt(headerLine, $"expected {declared} nodes as the $Nodes header declares, found {_nodes.Count} in {Blocks(blocks)}");
            }

            cursor.ExpectMarker("$EndNodes");
            _hasNodes = true;
        }

        private void ReadElements()
        {
            int blocks = cursor.ReadCount("the number of element blocks");
            _elementsLine = cursor.TokenLine;
            int declared = cursor.ReadCount("the number of elements");
            int headerLine = cursor.TokenLine;
            cursor.ReadSigned("the smallest element tag");
            cursor.ReadSigned("the largest element tag");
            var seen = new HashSet<long>();
            for (int b = 0; b < blocks; b++)
            {
                int dimension = ReadDimension($"the entity dimension of element block {b + 1}");
                long entity = cursor.ReadTag($"the entity tag of element block {b + 1}");
                long type = cursor.ReadSigned($"the element type of element block {b + 1}");
                if (!GmshElementType.TryDescribe(type, out int typeDimension, out int nodeCount, out var shape))
                {
                    throw cursor.Error(GmshElementType.IsHigherOrder(type)
                        ? $"expected a first-order element type ({GmshElementType.Supported}), found type {type}, a higher-order element; mesh with element order 1"
                        : $"expected a supported element type ({GmshElementType.Supported}), found type {type}");
                }

                if (typeDimension != dimension)
                {
                    throw cursor.Error($"expected elements of dimension {dimension} in element block {b + 1} (its entity dimension), found type {type}, which is {typeDimension}-D");
                }

                if (!_entityPhysicals.ContainsKey((dimension, entity)))
                {
                    throw cursor.Error($"expected element block {b + 1} to belong to an entity declared in $Entities, found entity dimension {dimension}, tag {entity}, which is not declared");
                }

                int count = cursor.ReadCount($"the number of elements in element block {b + 1}");
                for (int i = 0; i < count; i++)
                {
                    long tag = cursor.ReadTag($"element tag {i + 1} of element block {b + 1}");
                    int line = cursor.TokenLine;
                    if (!seen.Add(tag))
                    {
                        throw cursor.Error($"expected each element tag once, found element tag {tag} a second time");
                    }

                    var nodes = new int[nodeCount];
                    for (int k = 0; k < nodeCount; k++)
                    {
                        string what = $"node {k + 1} of {nodeCount} of element {tag}";
                        string token = cursor.Expect(what);
                        if (cursor.TokenLine != line)
                        {
                            throw cursor.ErrorAt(line, $"expected {nodeCount} node tags for element {tag} (type {type}) on its line, found {k}");
                        }

                        long nodeTag = cursor.ParseTag(token, what);

                        if (!_nodeIndex.TryGetValue(nodeTag, out nodes[k]))
                        {
                            throw cursor.Error($"expected element {tag} to reference declared nodes, found node tag {nodeTag}, which $Nodes does not declare");
                        }
                    }

                    _elements.Add(new Element(tag, line, dimension, entity, shape, nodes));
                }
            }

            if (_elements.Count != declared)
            {
                throw cursor.ErrorAt(headerLine, $"expected {declared} elements as the $Elements header declares, found {_elements.Count} in {Blocks(blocks)}");
            }

            cursor.ExpectMarker("$EndElements");
            _hasElements = true;
        }

        private static string Blocks(int count) => count == 1 ? "1 block" : $"{count} blocks";

        private int ReadDimension(string what)
        {
            int dimension = cursor.ReadCount(what);
            if (dimension > 3)
            {
                throw cursor.Error($"expected {what} to be 0, 1, 2 or 3, found {dimension}");
            }

            return dimension;
        }
    }

    /// <summary>One element as read: its tag and line, its entity, and its nodes as indices.</summary>
    private sealed record Element(long Tag, int Line, int Dimension, long EntityTag, CellShape? Shape, int[] Nodes);
}
