namespace FvGen.Geometry;

/// <summary>
/// What a numerical or boundary flux knows about the face it is evaluated on.
/// </summary>
/// <param name="Normal">Unit normal, pointing from the left cell to the right cell (out of the domain on a boundary).</param>
/// <param name="Area">Face area (length in two dimensions, 1 in one dimension).</param>
/// <param name="Centroid">Face centroid.</param>
/// <param name="CentreDistance">
/// Distance between the two cell centroids along the normal (from the cell centroid to the face
/// centroid on a boundary face); what a two-point diffusion flux divides by.
/// </param>
[GeometryValue]
public readonly record struct FaceGeometry(Vec3 Normal, double Area, Vec3 Centroid, double CentreDistance);
