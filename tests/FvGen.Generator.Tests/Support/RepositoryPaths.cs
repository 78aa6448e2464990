namespace FvGen.Generator.Tests.Support;

/// <summary>
/// Finds the repository from the test binaries. Source paths recorded at compile time cannot be
/// used: deterministic CI builds map them to "/_/".
/// </summary>
internal static class RepositoryPaths
{
    public static string Root { get; } = FindRoot();

    private static string FindRoot()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "FvGen.sln")))
        {
            dir = dir.Parent;
        }

        return dir?.FullName ?? throw new InvalidOperationException($"FvGen.sln not found above {AppContext.BaseDirectory}.");
    }
}
