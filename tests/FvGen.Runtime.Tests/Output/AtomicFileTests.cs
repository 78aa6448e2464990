using FvGen.Output;

namespace FvGen.Runtime.Tests.Output;

public sealed class AtomicFileTests
{
    [Fact]
    public void BytesAppearWholeAndReplaceTheOldFile()
    {
        string folder = Directory.CreateTempSubdirectory("fvgen-atomic-").FullName;
        string path = Path.Combine(folder, "image.png");
        File.WriteAllBytes(path, [1, 2, 3]);

        AtomicFile.WriteBytes(path, [9, 8, 7, 6]);

        Assert.Equal(new byte[] { 9, 8, 7, 6 }, File.ReadAllBytes(path));
        Assert.Equal([path], Directory.GetFiles(folder));
        Directory.Delete(folder, recursive: true);
    }

    [Fact]
    public void TextWriterThatThrowsLeavesThePreviousFileAndNoTemporary()
    {
        string folder = Directory.CreateTempSubdirectory("fvgen-atomic-").FullName;
        string path = Path.Combine(folder, "profile.csv");
        File.WriteAllText(path, "x,Density\n");

        Assert.Throws<InvalidOperationException>(() => AtomicFile.Write(path, w =>
        {
            w.WriteLine("half a line");
            throw new InvalidOperationException("disk full, say");
        }));

        Assert.Equal("x,Density\n", File.ReadAllText(path));
        Assert.Equal([path], Directory.GetFiles(folder));
        Directory.Delete(folder, recursive: true);
    }
}
