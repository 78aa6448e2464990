namespace FvGen.Analyzers.Tests.Precompiled;

/// <summary>
/// build/FvGen.Analyzers.targets hands the compiler the precompiled analyzer only when one for this runtime
/// identifier sits beside the referenced IL DLL and is not older than it; every other analyzer is left alone.
/// Runs MSBuild on a project that holds nothing but analyzer items and that file.
/// </summary>
public sealed class AnalyzerSelectionTests : IDisposable
{
    private const string Rid = "testos-x64";

    private readonly string _directory = Directory.CreateTempSubdirectory("fvgen-selection-").FullName;

    public enum Case
    {
        ImageNewerThanTheIlDll,
        ImageOlderThanTheIlDll,
        ImageForAnotherRuntimeIdentifierOnly,
        ImageNewerButSwitchedOff,
    }

    [Theory]
    [InlineData(Case.ImageNewerThanTheIlDll, true)]
    [InlineData(Case.ImageOlderThanTheIlDll, false)]
    [InlineData(Case.ImageForAnotherRuntimeIdentifierOnly, false)]
    [InlineData(Case.ImageNewerButSwitchedOff, false)]
    public void TheCompilerGetsTheImageOnlyWhenItIsCurrentAndForThisPlatform(Case situation, bool imageUsed)
    {
        string il = Write("il/FvGen.Analyzers.dll", new DateTime(2026, 1, 1, 12, 0, 0, DateTimeKind.Utc));
        string other = Write("il/Other.Analyzers.dll", new DateTime(2026, 1, 1, 12, 0, 0, DateTimeKind.Utc));
        string image = situation switch
        {
            Case.ImageOlderThanTheIlDll => Write($"il/precompiled/{Rid}/FvGen.Analyzers.dll", new DateTime(2026, 1, 1, 11, 0, 0, DateTimeKind.Utc)),
            Case.ImageForAnotherRuntimeIdentifierOnly => Write("il/precompiled/otheros-arm64/FvGen.Analyzers.dll", new DateTime(2026, 1, 1, 13, 0, 0, DateTimeKind.Utc)),
            _ => Write($"il/precompiled/{Rid}/FvGen.Analyzers.dll", new DateTime(2026, 1, 1, 13, 0, 0, DateTimeKind.Utc)),
        };

        var analyzers = AnalyzersAfterSelection(situation == Case.ImageNewerButSwitchedOff ? "-p:FvGenUsePrecompiledAnalyzer=false" : "");

        string[] expected = imageUsed ? [other, image] : [il, other];
        Assert.Equal(expected.Order(StringComparer.Ordinal), analyzers.Order(StringComparer.Ordinal));
    }

    public void Dispose() => Directory.Delete(_directory, recursive: true);

    private string Write(string relative, DateTime lastWrite)
    {
        string path = Path.Combine(_directory, relative);
        Directory.CreateDirectory(Path.GetDirectoryName(path)!);
        File.WriteAllText(path, "not an assembly: only its name and time are read");
        File.SetLastWriteTimeUtc(path, lastWrite);
        return path;
    }

    private IReadOnlyList<string> AnalyzersAfterSelection(string extraArgument)
    {
        using var json = MsBuildQuery.Run(
            _directory,
            $"""
            <Project>
              <PropertyGroup><NETCoreSdkRuntimeIdentifier>{Rid}</NETCoreSdkRuntimeIdentifier></PropertyGroup>
              <ItemGroup>
                <Analyzer Include="il/FvGen.Analyzers.dll" />
                <Analyzer Include="il/Other.Analyzers.dll" />
              </ItemGroup>
              <Import Project="{PrecompiledImage.SelectionTargets}" />
              <Target Name="CoreCompile" />
            </Project>
            """,
            "-t:CoreCompile",
            "-getItem:Analyzer",
            extraArgument);
        return json.RootElement.GetProperty("Items").GetProperty("Analyzer").EnumerateArray()
            .Select(item => item.GetProperty("FullPath").GetString()!)
            .ToList();
    }
}
