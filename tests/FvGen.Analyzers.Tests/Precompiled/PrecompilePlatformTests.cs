namespace FvGen.Analyzers.Tests.Precompiled;

/// <summary>
/// Precompile.targets names crossgen2's target platform after the SDK's runtime identifier, and a
/// runtime identifier it cannot read (none at all, as in the .NET Framework MSBuild) must not break
/// the evaluation of the analyzer project: it only leaves the platform unnamed.
/// </summary>
public sealed class PrecompilePlatformTests : IDisposable
{
    private readonly string _directory = Directory.CreateTempSubdirectory("fvgen-precompile-").FullName;

    // The runtime identifier forms of the .NET RID catalog (https://learn.microsoft.com/dotnet/core/rid-catalog)
    // and crossgen2's --targetos / --targetarch names (crossgen2 --help).
    [Theory]
    [InlineData("linux-x64", "linux", "x64")]
    [InlineData("linux-musl-arm64", "linux", "arm64")]
    [InlineData("win-x64", "windows", "x64")]
    [InlineData("osx-arm64", "osx", "arm64")]
    [InlineData("", "", "")]
    [InlineData("unknown", "", "")]
    public void ThePlatformIsReadFromTheRuntimeIdentifier(string rid, string os, string arch)
    {
        using var json = MsBuildQuery.Run(
            _directory,
            $"""
            <Project>
              <Import Project="{PrecompiledImage.PrecompileTargets}" />
            </Project>
            """,
            $"-p:NETCoreSdkRuntimeIdentifier={rid}",
            "-getProperty:_FvGenTargetOs",
            "-getProperty:_FvGenTargetArch");
        var properties = json.RootElement.GetProperty("Properties");
        Assert.Equal(os, properties.GetProperty("_FvGenTargetOs").GetString());
        Assert.Equal(arch, properties.GetProperty("_FvGenTargetArch").GetString());
    }

    public void Dispose() => Directory.Delete(_directory, recursive: true);
}
