using System.Globalization;
using FvGen.Geometry;

namespace FvGen.Meshes.Unstructured;

/// <summary>
/// Makes an <see cref="UnstructuredMesh"/> from node coordinates, cells and named boundary faces:
/// finds the faces by matching node sets, computes the geometry with the discrete divergence
/// theorem, and validates the result.
/// </summary>
/// <remarks>
/// Cells are given in Gmsh node order (see <c>AddCell</c>); boundary faces in any node
/// order. Every face that only one cell has must be named in exactly one patch; the builder never
/// invents a patch. <see cref="Build"/> throws a <see cref="MeshValidationException"/> that lists
/// every problem it found.
/// </remarks>
public sealed class UnstructuredMeshBuilder
{
    private readonly List<Vec3> _nodes = [];
    private readonly List<CellShape> _cellShapes = [];
    private readonly List<int> _cellNodeOffsets = [0];
    private readonly List<int> _cellNodes = [];
    private readonly List<string?> _cellLabels = [];
    private readonly List<string> _boundaryPatches = [];
    private readonly List<int> _boundaryNodeOffsets = [0];
    private readonly List<int> _boundaryNodes = [];
    private readonly List<string?> _boundaryLabels = [];

    /// <summary>Starts an empty mesh of <paramref name="dimension"/> 2 (polygons in the plane z = 0) or 3 (polyhedra).</summary>
    /// <param name="dimension">2 or 3.</param>
    /// <param name="source">What the mesh comes from (a file name, a builder name), used in error messages.</param>
    public UnstructuredMeshBuilder(int dimension, string source = "unstructured mesh")
    {
        if (dimension is not (2 or 3))
        {
            throw new ArgumentOutOfRangeException(nameof(dimension), dimension, "An unstructured mesh is 2-D (polygons) or 3-D (polyhedra).");
        }

        ArgumentException.ThrowIfNullOrEmpty(source);
        Dimension = dimension;
        Source = source;
    }

    /// <summary>2 or 3.</summary>
    public int Dimension { get; }

    /// <summary>What the mesh comes from, as error messages name it.</summary>
    public string Source { get; }

    /// <summary>Number of nodes added.</summary>
    public int NodeCount => _nodes.Count;

    /// <summary>Number of cells added.</summary>
    public int CellCount => _cellShapes.Count;

    /// <summary>Number of boundary faces added.</summary>
    public int BoundaryFaceCount => _boundaryPatches.Count;

    /// <summary>Adds a node and returns its index. In 2-D the node must lie in the plane z = 0.</summary>
    public int AddNode(Vec3 position)
    {
        CheckNode(_nodes.Count, position);
        _nodes.Add(position);
        return _nodes.Count - 1;
    }

    /// <summary>Adds a node and returns its index.</summary>
    public int AddNode(double x, double y, double z = 0.0) => AddNode(new Vec3(x, y, z));

    /// <summary>The position of node <paramref name="node"/>.</summary>
    public Vec3 GetNode(int node) => _nodes[node];

    /// <summary>Moves node <paramref name="node"/> (before <see cref="Build"/>); in 2-D it must stay in the plane z = 0.</summary>
    public void MoveNode(int node, Vec3 position)
    {
        ArgumentOutOfRangeException.ThrowIfNegative(node);
        ArgumentOutOfRangeException.ThrowIfGreaterThanOrEqual(node, _nodes.Count);
        CheckNode(node, position);
        _nodes[node] = position;
    }

    /// <summary>
    /// Adds a cell and returns its index. Nodes are in Gmsh order: triangles and quadrilaterals
    /// (and polygons) counter-clockwise seen from +z; a tetrahedron 0,1,2 with node 3 on the side
    /// their right-hand normal points to; a hexahedron 0-3 the bottom counter-clockwise seen from
    /// above, 4-7 above them; a prism 0,1,2 the bottom counter-clockwise seen from above, 3,4,5
    /// above them; a pyramid 0-3 the base counter-clockwise seen from the apex 4.
    /// </summary>
    /// <param name="shape">The shape; it must have the builder's dimension. <see cref="CellShape.Polyhedron"/> is not taken (it needs face lists).</param>
    /// <param name="nodes">The node indices.</param>
    /// <param name="label">An optional name for messages, e.g. <c>element 57</c>.</param>
    public int AddCell(CellShape shape, ReadOnlySpan<int> nodes, string? label = null)
    {
        if (shape == CellShape.Polyhedron)
        {
            throw new ArgumentException("The builder takes no general polyhedra (they need face lists); split them into tetrahedra, hexahedra, prisms or pyramids.", nameof(shape));
        }

        int expected = CellTopology.NodeCountOf(shape);
        if (CellTopology.DimensionOf(shape) != Dimension)
        {
            throw new ArgumentException($"A {shape} is a {CellTopology.DimensionOf(shape)}-D cell; this mesh is {Dimension}-D.", nameof(shape));
        }

        if (expected > 0 ? nodes.Length != expected : nodes.Length < 3)
        {
            throw new ArgumentException($"A {shape} has {(expected > 0 ? expected.ToString(CultureInfo.InvariantCulture) : "at least 3")} nodes; {nodes.Length} were given{LabelSuffix(label)}.", nameof(nodes));
        }

        CheckNodeIndices(nodes, label);
        _cellShapes.Add(shape);
        foreach (int n in nodes)
        {
            _cellNodes.Add(n);
        }

        _cellNodeOffsets.Add(_cellNodes.Count);
        _cellLabels.Add(label);
        return _cellShapes.Count - 1;
    }

    /// <summary>Adds a cell with no label.</summary>
    public int AddCell(CellShape shape, params int[] nodes) => AddCell(shape, nodes.AsSpan(), label: null);

    /// <summary>
    /// Names a boundary face (an edge of two nodes in 2-D; a triangle or quadrilateral in 3-D) as
    /// part of patch <paramref name="patch"/>. The node order does not matter: the face takes the
    /// outward orientation of its cell.
    /// </summary>
    public void AddBoundaryFace(string patch, ReadOnlySpan<int> nodes, string? label = null)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(patch);
        bool sizeOk = Dimension == 2 ? nodes.Length == 2 : nodes.Length is 3 or 4;
        if (!sizeOk)
        {
            throw new ArgumentException($"A boundary face of a {Dimension}-D mesh has {(Dimension == 2 ? "2 nodes" : "3 or 4 nodes")}; {nodes.Length} were given{LabelSuffix(label)}.", nameof(nodes));
        }

        CheckNodeIndices(nodes, label);
        _boundaryPatches.Add(patch);
        foreach (int n in nodes)
        {
            _boundaryNodes.Add(n);
        }

        _boundaryNodeOffsets.Add(_boundaryNodes.Count);
        _boundaryLabels.Add(label);
    }

    /// <summary>Names a boundary face with no label.</summary>
    public void AddBoundaryFace(string patch, params int[] nodes) => AddBoundaryFace(patch, nodes.AsSpan(), label: null);

    /// <summary>Matches faces, computes the geometry, validates it, and returns the mesh.</summary>
    /// <exception cref="MeshValidationException">The mesh has any of the problems listed in docs/meshes.md.</exception>
    public UnstructuredMesh Build()
    {
        if (CellCount == 0)
        {
            throw new MeshValidationException(Source, ["the mesh has no cells."]);
        }

        var faces = FaceAssembler.Assemble(this);
        if (faces.Problems.Count > 0)
        {
            throw new MeshValidationException(Source, faces.Problems);
        }

        var geometry = MeshGeometry.Compute(this, faces);
        var problems = MeshValidator.Check(this, faces, geometry);
        if (problems.Count > 0)
        {
            throw new MeshValidationException(Source, problems);
        }

        return new UnstructuredMesh(new UnstructuredMeshData
        {
            Dimension = Dimension,
            InteriorFaceCount = faces.InteriorFaceCount,
            FaceLeft = faces.Left,
            FaceRight = faces.Right,
            FaceAreaVectors = geometry.FaceAreaVectors,
            FaceCentroids = geometry.FaceCentroids,
            FaceNodeOffsets = faces.NodeOffsets,
            FaceNodes = faces.Nodes,
            CellVolumes = geometry.CellVolumes,
            CellCentroids = geometry.CellCentroids,
            Points = [.. _nodes],
            CellNodeOffsets = [.. _cellNodeOffsets],
            CellNodes = VtkOrderedCellNodes(),
            CellShapes = [.. _cellShapes],
            Patches = faces.Patches,
        });
    }

    internal ReadOnlySpan<Vec3> Nodes => System.Runtime.InteropServices.CollectionsMarshal.AsSpan(_nodes);

    internal CellShape ShapeOf(int cell) => _cellShapes[cell];

    /// <summary>The nodes of a cell in Gmsh order.</summary>
    internal ReadOnlySpan<int> NodesOf(int cell) =>
        System.Runtime.InteropServices.CollectionsMarshal.AsSpan(_cellNodes)[_cellNodeOffsets[cell].._cellNodeOffsets[cell + 1]];

    internal string PatchOfBoundaryFace(int face) => _boundaryPatches[face];

    internal ReadOnlySpan<int> NodesOfBoundaryFace(int face) =>
        System.Runtime.InteropServices.CollectionsMarshal.AsSpan(_boundaryNodes)[_boundaryNodeOffsets[face].._boundaryNodeOffsets[face + 1]];

    /// <summary>The nodes that lie on a named boundary face.</summary>
    internal bool[] BoundaryNodeMask()
    {
        var mask = new bool[_nodes.Count];
        foreach (int n in _boundaryNodes)
        {
            mask[n] = true;
        }

        return mask;
    }

    /// <summary>"cell 12 (element 57) near (x, y, z)", for messages.</summary>
    internal string DescribeCell(int cell) =>
        $"cell {cell}{LabelSuffix(_cellLabels[cell], " (", ")")} near {Average(NodesOf(cell))}";

    /// <summary>"boundary face 3 (element 9) of patch 'wall' near (x, y, z)", for messages.</summary>
    internal string DescribeBoundaryFace(int face) =>
        $"boundary face {face}{LabelSuffix(_boundaryLabels[face], " (", ")")} of patch '{_boundaryPatches[face]}' near {Average(NodesOfBoundaryFace(face))}";

    /// <summary>
    /// The names messages give the nodes: the file's node tags when a reader set them, else the
    /// node indices.
    /// </summary>
    internal IReadOnlyList<long>? NodeTags { get; set; }

    /// <summary>"nodes 3, 4, 7" (tags when known), for messages.</summary>
    internal string DescribeNodes(ReadOnlySpan<int> nodes)
    {
        var text = new System.Text.StringBuilder(NodeTags is null ? "nodes " : "node tags ");
        for (int i = 0; i < nodes.Length; i++)
        {
            text.Append(i == 0 ? "" : ", ").Append(NodeName(nodes[i]));
        }

        return text.ToString();
    }

    /// <summary>The name of one node in messages.</summary>
    internal string NodeName(int node) =>
        (NodeTags is null ? node : NodeTags[node]).ToString(CultureInfo.InvariantCulture);

    /// <summary>The node average of some nodes.</summary>
    internal Vec3 Average(ReadOnlySpan<int> nodes)
    {
        var sum = Vec3.Zero;
        foreach (int n in nodes)
        {
            sum += _nodes[n];
        }

        return sum / nodes.Length;
    }

    private int[] VtkOrderedCellNodes()
    {
        var ordered = new int[_cellNodes.Count];
        for (int c = 0; c < _cellShapes.Count; c++)
        {
            int start = _cellNodeOffsets[c];
            int count = _cellNodeOffsets[c + 1] - start;
            for (int k = 0; k < count; k++)
            {
                ordered[start + k] = _cellNodes[start + CellTopology.GmshPositionOfVtk(_cellShapes[c], k)];
            }
        }

        return ordered;
    }

    private void CheckNode(int index, Vec3 position)
    {
        if (!double.IsFinite(position.X) || !double.IsFinite(position.Y) || !double.IsFinite(position.Z))
        {
            throw new ArgumentException($"{Source}: node {index} has a non-finite coordinate {position}.", nameof(position));
        }

        if (Dimension == 2 && position.Z != 0.0)
        {
            throw new ArgumentException($"{Source}: a 2-D mesh lies in the plane z = 0, but node {index} is at {position}.", nameof(position));
        }
    }

    private void CheckNodeIndices(ReadOnlySpan<int> nodes, string? label)
    {
        foreach (int n in nodes)
        {
            if ((uint)n >= (uint)_nodes.Count)
            {
                throw new ArgumentException($"{Source}: node index {n}{LabelSuffix(label)} is not a node of the mesh (it has {_nodes.Count} nodes).", nameof(nodes));
            }
        }
    }

    private static string LabelSuffix(string? label, string before = " in ", string after = "") =>
        label is null ? "" : before + label + after;
}
