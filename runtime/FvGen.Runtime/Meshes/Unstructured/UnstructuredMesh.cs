using FvGen.Geometry;

namespace FvGen.Meshes.Unstructured;

/// <summary>
/// A face-based unstructured mesh of polygons (2-D) or polyhedra (3-D).
/// </summary>
/// <remarks>
/// Faces are numbered interior first, <c>[0, InteriorFaceCount)</c>, then boundary faces patch
/// by patch. Every face has a left cell and, when interior, a right cell; its area vector
/// points from left to right (out of the domain on a boundary face, where the right cell is −1).
/// In two dimensions faces are edges, their area is the edge length times a unit depth, and cell
/// volumes are polygon areas. Meshes are made by <c>UnstructuredMeshBuilder</c>, which
/// computes the geometry and validates it.
/// </remarks>
public sealed class UnstructuredMesh : IMesh
{
    private readonly int[] _faceLeft;
    private readonly int[] _faceRight;
    private readonly Vec3[] _faceAreaVectors;
    private readonly Vec3[] _faceNormals;
    private readonly double[] _faceAreas;
    private readonly Vec3[] _faceCentroids;
    private readonly double[] _faceCentreDistances;
    private readonly double[] _cellVolumes;
    private readonly Vec3[] _cellCentroids;
    private readonly double[] _cellSurfaces;
    private readonly int[] _cellFaceOffsets;
    private readonly int[] _cellFaces;
    private readonly Vec3[] _points;
    private readonly int[] _cellNodeOffsets;
    private readonly int[] _cellNodes;
    private readonly CellShape[] _cellShapes;
    private readonly int[] _faceNodeOffsets;
    private readonly int[] _faceNodes;
    private readonly BoundaryPatch[] _patches;
    private readonly string[] _patchNames;
    private FaceColouring? _colouring;

    internal UnstructuredMesh(UnstructuredMeshData data)
    {
        Dimension = data.Dimension;
        InteriorFaceCount = data.InteriorFaceCount;
        _faceLeft = data.FaceLeft;
        _faceRight = data.FaceRight;
        _faceAreaVectors = data.FaceAreaVectors;
        _faceCentroids = data.FaceCentroids;
        _faceNodeOffsets = data.FaceNodeOffsets;
        _faceNodes = data.FaceNodes;
        _cellVolumes = data.CellVolumes;
        _cellCentroids = data.CellCentroids;
        _points = data.Points;
        _cellNodeOffsets = data.CellNodeOffsets;
        _cellNodes = data.CellNodes;
        _cellShapes = data.CellShapes;
        _patches = data.Patches;
        _patchNames = Array.ConvertAll(_patches, p => p.Name);

        int faces = _faceLeft.Length;
        _faceAreas = new double[faces];
        _faceNormals = new Vec3[faces];
        _faceCentreDistances = new double[faces];
        _cellSurfaces = new double[_cellVolumes.Length];
        var counts = new int[_cellVolumes.Length + 1];
        for (int f = 0; f < faces; f++)
        {
            double area = _faceAreaVectors[f].Length;
            _faceAreas[f] = area;
            _faceNormals[f] = _faceAreaVectors[f] / area;
            Vec3 reach = _faceRight[f] >= 0
                ? _cellCentroids[_faceRight[f]] - _cellCentroids[_faceLeft[f]]
                : _faceCentroids[f] - _cellCentroids[_faceLeft[f]];
            _faceCentreDistances[f] = Math.Abs(Vec3.Dot(reach, _faceNormals[f]));
            _cellSurfaces[_faceLeft[f]] += area;
            counts[_faceLeft[f] + 1]++;
            if (_faceRight[f] >= 0)
            {
                _cellSurfaces[_faceRight[f]] += area;
                counts[_faceRight[f] + 1]++;
            }
        }

        // Cell -> face lists, each cell's faces in ascending face order: the fixed order in
        // which a gather sums them, whatever the thread count.
        for (int c = 0; c < _cellVolumes.Length; c++)
        {
            counts[c + 1] += counts[c];
        }

        _cellFaceOffsets = counts;
        _cellFaces = new int[counts[^1]];
        var fill = (int[])counts.Clone();
        for (int f = 0; f < faces; f++)
        {
            _cellFaces[fill[_faceLeft[f]]++] = f;
            if (_faceRight[f] >= 0)
            {
                _cellFaces[fill[_faceRight[f]]++] = f;
            }
        }
    }

    /// <inheritdoc />
    public int Dimension { get; }

    /// <inheritdoc />
    public int CellCount => _cellVolumes.Length;

    /// <summary>Number of faces, interior and boundary.</summary>
    public int FaceCount => _faceLeft.Length;

    /// <summary>Number of interior faces; they come first in the face numbering.</summary>
    public int InteriorFaceCount { get; }

    /// <summary>The cell behind each face (the normal points out of it).</summary>
    public ReadOnlySpan<int> FaceLeft => _faceLeft;

    /// <summary>The cell in front of each face, or −1 on a boundary face.</summary>
    public ReadOnlySpan<int> FaceRight => _faceRight;

    /// <summary>Face area vectors: unit normal times area, pointing from left to right.</summary>
    public ReadOnlySpan<Vec3> FaceAreaVectors => _faceAreaVectors;

    /// <summary>Unit face normals, pointing from left to right.</summary>
    public ReadOnlySpan<Vec3> FaceNormals => _faceNormals;

    /// <summary>Face areas (edge lengths in 2-D).</summary>
    public ReadOnlySpan<double> FaceAreas => _faceAreas;

    /// <summary>Face centroids.</summary>
    public ReadOnlySpan<Vec3> FaceCentroids => _faceCentroids;

    /// <summary>Distance between the two cell centroids along the normal; cell centroid to face centroid on a boundary face.</summary>
    public ReadOnlySpan<double> FaceCentreDistances => _faceCentreDistances;

    /// <inheritdoc />
    public ReadOnlySpan<double> CellVolumes => _cellVolumes;

    /// <inheritdoc />
    public ReadOnlySpan<Vec3> CellCentroids => _cellCentroids;

    /// <inheritdoc />
    public ReadOnlySpan<double> CellSurfaceAreas => _cellSurfaces;

    /// <summary>Offsets into <see cref="CellFaces"/>: the faces of cell <c>c</c> are <c>CellFaces[CellFaceOffsets[c]..CellFaceOffsets[c + 1]]</c>.</summary>
    public ReadOnlySpan<int> CellFaceOffsets => _cellFaceOffsets;

    /// <summary>The faces of every cell, in ascending order within a cell.</summary>
    public ReadOnlySpan<int> CellFaces => _cellFaces;

    /// <summary>Node coordinates.</summary>
    public ReadOnlySpan<Vec3> Points => _points;

    /// <summary>Offsets into <see cref="CellNodes"/>.</summary>
    public ReadOnlySpan<int> CellNodeOffsets => _cellNodeOffsets;

    /// <summary>The nodes of every cell, in the VTK node order of its shape.</summary>
    public ReadOnlySpan<int> CellNodes => _cellNodes;

    /// <summary>The shape of every cell.</summary>
    public ReadOnlySpan<CellShape> CellShapes => _cellShapes;

    /// <summary>Offsets into <see cref="FaceNodes"/>.</summary>
    public ReadOnlySpan<int> FaceNodeOffsets => _faceNodeOffsets;

    /// <summary>The nodes of every face, ordered so that their right-hand rule gives the area vector.</summary>
    public ReadOnlySpan<int> FaceNodes => _faceNodes;

    /// <summary>The boundary patches, in index order.</summary>
    public IReadOnlyList<BoundaryPatch> Patches => _patches;

    /// <inheritdoc />
    public IReadOnlyList<string> PatchNames => _patchNames;

    /// <summary>The patch called <paramref name="name"/>; throws naming the patches that exist when there is none.</summary>
    public BoundaryPatch Patch(string name)
    {
        foreach (var patch in _patches)
        {
            if (patch.Name == name)
            {
                return patch;
            }
        }

        throw new KeyNotFoundException($"The mesh has no patch '{name}'; its patches are: {string.Join(", ", _patchNames)}.");
    }

    /// <summary>A colouring of the interior faces in which no two faces of one colour share a cell; computed once and kept.</summary>
    public FaceColouring FaceColouring => _colouring ??= FaceColouring.Compute(this);

    /// <inheritdoc />
    public string DescribeCell(int cell) => $"#{cell}";
}
