using System.Diagnostics;
using System.Text.Json;

namespace FvGen.Analyzers.Tests.Precompiled;

/// <summary>Runs <c>dotnet msbuild</c> on a small project file and returns what it prints as JSON (<c>-getItem</c>, <c>-getProperty</c>).</summary>
internal static class MsBuildQuery
{
    public static JsonDocument Run(string directory, string projectText, params string[] arguments)
    {
        string project = Path.Combine(directory, "Query.proj");
        File.WriteAllText(project, projectText);
        var start = new ProcessStartInfo("dotnet")
        {
            WorkingDirectory = directory,
            RedirectStandardOutput = true,
            RedirectStandardError = true,
        };
        foreach (string argument in new[] { "msbuild", project, "-nologo" }.Concat(arguments).Where(a => a.Length > 0))
        {
            start.ArgumentList.Add(argument);
        }

        // The test host inherits the outer build's MSBuild settings; this MSBuild must start clean.
        foreach (string key in start.Environment.Keys.Where(k => k.StartsWith("MSBUILD", StringComparison.OrdinalIgnoreCase)).ToList())
        {
            start.Environment.Remove(key);
        }

        using var process = Process.Start(start)!;
        var output = process.StandardOutput.ReadToEndAsync();
        var error = process.StandardError.ReadToEndAsync();
        process.WaitForExit();
        Assert.True(process.ExitCode == 0, $"dotnet msbuild failed ({process.ExitCode}):\n{output.Result}\n{error.Result}");
        return JsonDocument.Parse(output.Result);
    }
}
