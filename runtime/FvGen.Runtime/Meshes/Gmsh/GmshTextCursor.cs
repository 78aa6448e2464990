using System.Globalization;

namespace FvGen.Meshes.Gmsh;

/// <summary>
/// Reads the whitespace-separated tokens of an ASCII Gmsh file one at a time, knowing the line of
/// each, so that every complaint can say where it is and what it expected there.
/// </summary>
internal sealed class GmshTextCursor
{
    private readonly string[] _lines;
    private int _line;
    private int _column;

    public GmshTextCursor(string fileName, string text)
    {
        FileName = fileName;
        _lines = text.Split('\n');
        if (_lines.Length > 1 && _lines[^1].Length == 0)
        {
            _lines = _lines[..^1]; // the newline that ends the last line starts no line of its own
        }
    }

    public string FileName { get; }

    /// <summary>The 1-based line of the last token read.</summary>
    public int TokenLine { get; private set; }

    /// <summary>The next token, or null at the end of the file.</summary>
    public string? Next()
    {
        while (_line < _lines.Length)
        {
            string line = _lines[_line];
            while (_column < line.Length && char.IsWhiteSpace(line[_column]))
            {
                _column++;
            }

            if (_column >= line.Length)
            {
                _line++;
                _column = 0;
                continue;
            }

            int start = _column;
            TokenLine = _line + 1;
            if (line[start] == '"')
            {
                int close = line.IndexOf('"', start + 1);
                _column = close < 0 ? line.Length : close + 1;
                return line[start.._column];
            }

            while (_column < line.Length && !char.IsWhiteSpace(line[_column]))
            {
                _column++;
            }

            return line[start.._column];
        }

        TokenLine = _lines.Length + 1;
        return null;
    }

    /// <summary>The next token; the end of the file is an error saying what was <paramref name="expected"/>.</summary>
    public string Expect(string expected) => Next() ?? throw Error($"expected {expected}, found the end of the file");

    /// <summary>Reads exactly the token <paramref name="marker"/> (a section marker).</summary>
    public void ExpectMarker(string marker)
    {
        string token = Expect(marker);
        if (token != marker)
        {
            throw Error($"expected {marker}, found '{token}'");
        }
    }

    public int ReadCount(string what)
    {
        string token = Expect(what);
        if (!int.TryParse(token, NumberStyles.None, CultureInfo.InvariantCulture, out int value))
        {
            throw Error($"expected {what} (a whole number of at least 0), found '{token}'");
        }

        return value;
    }

    public long ReadTag(string what) => ParseTag(Expect(what), what);

    /// <summary>Parses a token already read as a positive tag.</summary>
    public long ParseTag(string token, string what)
    {
        if (!long.TryParse(token, NumberStyles.None, CultureInfo.InvariantCulture, out long value) || value <= 0)
        {
            throw Error($"expected {what} (a positive whole number), found '{token}'");
        }

        return value;
    }

    /// <summary>A whole number that may be negative (signed bounding-entity tags, physical tags).</summary>
    public long ReadSigned(string what)
    {
        string token = Expect(what);
        if (!long.TryParse(token, NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture, out long value))
        {
            throw Error($"expected {what} (a whole number), found '{token}'");
        }

        return value;
    }

    public double ReadNumber(string what)
    {
        string token = Expect(what);
        if (!double.TryParse(token, NumberStyles.Float, CultureInfo.InvariantCulture, out double value) || !double.IsFinite(value))
        {
            throw Error($"expected {what} (a finite number), found '{token}'");
        }

        return value;
    }

    /// <summary>Skips whole lines up to and including the one that reads <paramref name="endMarker"/>.</summary>
    public void SkipPast(string section, string endMarker)
    {
        int opened = TokenLine;
        _line = TokenLine; // the line after the section's opening marker
        _column = 0;
        while (_line < _lines.Length)
        {
            if (_lines[_line].Trim() == endMarker)
            {
                _line++;
                return;
            }

            _line++;
        }

        TokenLine = _lines.Length + 1;
        throw Error($"expected {endMarker} to close the {section} section opened on line {opened}, found the end of the file");
    }

    public GmshFormatException Error(string problem) => new(FileName, TokenLine, problem);

    public GmshFormatException ErrorAt(int line, string problem) => new(FileName, line, problem);
}
