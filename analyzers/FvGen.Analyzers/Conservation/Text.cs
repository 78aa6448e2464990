namespace FvGen.Analyzers.Conservation;

/// <summary>Keeps terms in messages readable: a long body is cut, with an ellipsis.</summary>
internal static class Text
{
    public const int MaxLength = 80;

    public static string Short(string text) => text.Length <= MaxLength ? text : text.Substring(0, MaxLength - 1) + "…";
}
