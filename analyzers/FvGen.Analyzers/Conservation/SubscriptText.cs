using System.Collections.Immutable;
using System.Text;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// The key text of an element read, <c>R:u[i:1|1][j:1|0].Mass</c>: a prefix, the array, each group of
/// subscripts in brackets (their full keys, or only their shapes), the component path. Written in
/// one pass: every read and every shifted copy builds one.
/// </summary>
internal static class SubscriptText
{
    public static string Of(string prefix, string array, ImmutableArray<ImmutableArray<IndexTerm>> subscripts, string path, bool shape)
    {
        var text = new StringBuilder(prefix.Length + array.Length + path.Length + (16 * subscripts.Length));
        text.Append(prefix).Append(array);
        foreach (var group in subscripts)
        {
            text.Append('[');
            for (int k = 0; k < group.Length; k++)
            {
                if (k > 0)
                {
                    text.Append(',');
                }

                text.Append(shape ? group[k].ShapeKey : group[k].Key);
            }

            text.Append(']');
        }

        return text.Append(path).ToString();
    }
}
