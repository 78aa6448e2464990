namespace FvGen.Meshes.Unstructured;

/// <summary>
/// The node set of a face (sorted, padded with −1), so the two cells of a face find each other
/// whatever the order and starting node in which each lists it.
/// </summary>
internal readonly record struct FaceKey(int A, int B, int C, int D)
{
    /// <summary>The most nodes a face of the supported shapes has.</summary>
    public const int MaxNodes = 4;

    /// <summary>Makes the key of a face; <paramref name="repeatedNode"/> is a node listed twice, or −1.</summary>
    public static FaceKey Of(ReadOnlySpan<int> nodes, out int repeatedNode)
    {
        Span<int> sorted = stackalloc int[MaxNodes];
        sorted.Fill(-1);
        nodes.CopyTo(sorted);
        sorted[..nodes.Length].Sort();
        repeatedNode = -1;
        for (int i = 1; i < nodes.Length; i++)
        {
            if (sorted[i] == sorted[i - 1])
            {
                repeatedNode = sorted[i];
            }
        }

        return new FaceKey(sorted[0], sorted[1], sorted[2], sorted[3]);
    }
}
