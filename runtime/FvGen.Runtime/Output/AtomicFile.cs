namespace FvGen.Output;

/// <summary>
/// Writes a file under a temporary name in the same folder and renames it into place when done,
/// so an interrupted run never leaves a half-written file behind.
/// </summary>
public static class AtomicFile
{
    /// <summary>Writes <paramref name="path"/> through <paramref name="write"/>; the file appears whole or not at all.</summary>
    public static void Write(string path, Action<TextWriter> write)
    {
        ArgumentNullException.ThrowIfNull(write);
        WriteStream(path, stream =>
        {
            using var writer = new StreamWriter(stream, new System.Text.UTF8Encoding(encoderShouldEmitUTF8Identifier: false), leaveOpen: true);
            writer.NewLine = "\n";
            write(writer);
        });
    }

    /// <summary>Writes <paramref name="bytes"/> (an image, say) to <paramref name="path"/>; the file appears whole or not at all.</summary>
    public static void WriteBytes(string path, ReadOnlySpan<byte> bytes)
    {
        byte[] copy = bytes.ToArray();
        WriteStream(path, stream => stream.Write(copy));
    }

    private static void WriteStream(string path, Action<Stream> write)
    {
        ArgumentException.ThrowIfNullOrEmpty(path);
        string full = Path.GetFullPath(path);
        string folder = Path.GetDirectoryName(full) ?? ".";
        Directory.CreateDirectory(folder);
        string temporary = Path.Combine(folder, $".{Path.GetFileName(full)}.{Environment.ProcessId}.{Guid.NewGuid():N}.partial");
        try
        {
            using (var stream = new FileStream(temporary, FileMode.CreateNew, FileAccess.Write, FileShare.None))
            {
                write(stream);
                stream.Flush(flushToDisk: true);
            }

            File.Move(temporary, full, overwrite: true);
        }
        catch
        {
            TryDelete(temporary);
            throw;
        }
    }

    private static void TryDelete(string path)
    {
        try
        {
            File.Delete(path);
        }
        catch (IOException)
        {
            // The original error matters more than a leftover temporary file.
        }
        catch (UnauthorizedAccessException)
        {
        }
    }
}
