using System.Diagnostics;

namespace FvGen.Samples.Tests;

/// <summary>Runs the README's first command the way a new user would, and checks what it leaves behind.</summary>
public sealed class DemoRunTests
{
    [Fact]
    public void DemoRunsToTheEndPrintsTheLedgerAndWritesItsFiles()
    {
        string folder = Path.Combine(Path.GetTempPath(), "fvgen-demo-" + Guid.NewGuid().ToString("N"));
        try
        {
            var (exit, output) = RunDemo(folder);

            Assert.True(exit == 0, $"The demo exited with {exit}:\n{output}");
            Assert.Contains("Conservation ledger after", output);
            Assert.Contains("Dye", output);
            Assert.Contains("Salt", output);
            foreach (string name in new[] { "channel-t0000s.csv", "channel-t1500s.csv", "channel-t1500s.vtk", "channel-profiles.png" })
            {
                string path = Path.Combine(folder, name);
                Assert.True(File.Exists(path), $"missing {path}");
                Assert.Contains(path, output);
            }

            // PNG signature (PNG specification, ISO/IEC 15948, section 5.2).
            byte[] png = File.ReadAllBytes(Path.Combine(folder, "channel-profiles.png"));
            Assert.Equal(new byte[] { 0x89, 0x50, 0x4E, 0x47, 0x0D, 0x0A, 0x1A, 0x0A }, png[..8]);
            Assert.Empty(Directory.GetFiles(folder, "*.partial"));
        }
        finally
        {
            if (Directory.Exists(folder))
            {
                Directory.Delete(folder, recursive: true);
            }
        }
    }

    [Fact]
    public void PlotsHaveAFontToDrawTextWith()
    {
        // Without any installed font ScottPlot draws no text and says nothing.
        Assert.False(string.IsNullOrWhiteSpace(ScottPlot.Fonts.Default));
    }

    private static (int Exit, string Output) RunDemo(string folder)
    {
        string demo = Path.Combine(AppContext.BaseDirectory, "FvGen.Samples.Demo.dll");
        string dotnet = Environment.GetEnvironmentVariable("DOTNET_HOST_PATH") is { Length: > 0 } host ? host : "dotnet";
        var start = new ProcessStartInfo(dotnet)
        {
            RedirectStandardOutput = true,
            RedirectStandardError = true,
            UseShellExecute = false,
        };
        start.ArgumentList.Add("exec");
        start.ArgumentList.Add(demo);
        start.ArgumentList.Add(folder);
        using var process = Process.Start(start) ?? throw new InvalidOperationException($"Could not start {dotnet}.");
        var error = process.StandardError.ReadToEndAsync();
        string output = process.StandardOutput.ReadToEnd();
        if (!process.WaitForExit(TimeSpan.FromMinutes(5)))
        {
            process.Kill(entireProcessTree: true);
            throw new TimeoutException("The demo did not finish within five minutes.");
        }

        return (process.ExitCode, output + error.Result);
    }
}
