using System.Globalization;

namespace FvGen.Generator.Common;

/// <summary>Numbers and strings written into generated source, culture-independent.</summary>
internal static class SourceLiteral
{
    /// <summary>A <see cref="double"/> literal that round-trips exactly (invariant culture, <c>R</c>).</summary>
    public static string Double(double value)
    {
        string text = value.ToString("R", CultureInfo.InvariantCulture);
        return text.IndexOfAny(new[] { '.', 'E', 'e', 'N', 'I' }) < 0 ? text + ".0" : text;
    }

    /// <summary>An <see cref="int"/> literal in invariant culture.</summary>
    public static string Int(int value) => value.ToString(CultureInfo.InvariantCulture);

    /// <summary>A C# string literal.</summary>
    public static string String(string value) =>
        "\"" + value.Replace("\\", "\\\\").Replace("\"", "\\\"").Replace("\n", "\\n").Replace("\r", "\\r") + "\"";
}
