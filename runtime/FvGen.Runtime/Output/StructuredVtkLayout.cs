namespace FvGen.Output;

/// <summary>The legacy VTK dataset a structured grid is written as.</summary>
public enum StructuredVtkLayout
{
    /// <summary><c>DATASET STRUCTURED_POINTS</c>: every axis uniform; origin and spacing only.</summary>
    StructuredPoints,

    /// <summary><c>DATASET RECTILINEAR_GRID</c>: at least one stretched axis; node coordinates per axis.</summary>
    RectilinearGrid,
}
