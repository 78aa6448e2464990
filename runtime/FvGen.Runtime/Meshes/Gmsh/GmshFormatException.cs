namespace FvGen.Meshes.Gmsh;

/// <summary>A Gmsh file that cannot be read; the message names the file, the line and what was expected there.</summary>
public sealed class GmshFormatException : FormatException
{
    /// <summary>Creates the exception for line <paramref name="lineNumber"/> (1-based) of <paramref name="fileName"/>.</summary>
    public GmshFormatException(string fileName, int lineNumber, string problem)
        : base($"{fileName}, line {lineNumber}: {problem}")
    {
        FileName = fileName;
        LineNumber = lineNumber;
    }

    /// <summary>The file as the caller named it.</summary>
    public string FileName { get; }

    /// <summary>The 1-based line the problem is on (one past the last line when the file ended too soon).</summary>
    public int LineNumber { get; }
}
