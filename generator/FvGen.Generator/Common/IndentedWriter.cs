using System.Text;

namespace FvGen.Generator.Common;

/// <summary>A small text writer that keeps track of indentation and writes <c>\n</c> line ends.</summary>
internal sealed class IndentedWriter
{
    private readonly StringBuilder _text = new();
    private int _depth;

    public IndentedWriter Line(string line = "")
    {
        if (line.Length > 0)
        {
            _text.Append(' ', _depth * 4).Append(line);
        }

        _text.Append('\n');
        return this;
    }

    /// <summary>Writes <c>{</c> and indents.</summary>
    public IndentedWriter Open(string? header = null)
    {
        if (header is not null)
        {
            Line(header);
        }

        Line("{");
        _depth++;
        return this;
    }

    /// <summary>Unindents and writes <c>}</c> followed by <paramref name="suffix"/>.</summary>
    public IndentedWriter Close(string suffix = "")
    {
        _depth--;
        Line("}" + suffix);
        return this;
    }

    public override string ToString() => _text.ToString();
}
