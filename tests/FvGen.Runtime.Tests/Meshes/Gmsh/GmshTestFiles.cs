namespace FvGen.Runtime.Tests.Meshes.Gmsh;

/// <summary>Paths of the shipped Gmsh test files (copied next to the test assembly).</summary>
internal static class GmshTestFiles
{
    public static string Path(string name) => System.IO.Path.Combine(AppContext.BaseDirectory, "Data", "Gmsh", name);

    public static string Malformed(string name) => System.IO.Path.Combine(AppContext.BaseDirectory, "Data", "Gmsh", "Malformed", name);
}
