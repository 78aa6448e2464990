namespace FvGen.Meshes.Unstructured;

/// <summary>
/// An unstructured mesh that cannot be used: faces that do not match up, inverted or degenerate
/// cells, open cells, boundary faces with no patch or with two. The message lists every problem
/// found (the first <see cref="ListedProblems"/> of them), each naming the cells or faces and
/// where they are.
/// </summary>
public sealed class MeshValidationException : Exception
{
    /// <summary>How many problems the message lists before summarising the rest.</summary>
    public const int ListedProblems = 20;

    /// <summary>Creates the exception from the problems found in the mesh from <paramref name="source"/>.</summary>
    public MeshValidationException(string source, IReadOnlyList<string> problems)
        : base(Describe(source, problems))
    {
        Source = source;
        Problems = problems;
    }

    /// <summary>Every problem found, one sentence each.</summary>
    public IReadOnlyList<string> Problems { get; }

    private static string Describe(string source, IReadOnlyList<string> problems)
    {
        var text = new System.Text.StringBuilder();
        text.Append(source).Append(": the mesh is not valid (")
            .Append(problems.Count).Append(problems.Count == 1 ? " problem):" : " problems):");
        for (int i = 0; i < Math.Min(problems.Count, ListedProblems); i++)
        {
            text.Append("\n  - ").Append(problems[i]);
        }

        if (problems.Count > ListedProblems)
        {
            text.Append("\n  ... and ").Append(problems.Count - ListedProblems).Append(" more.");
        }

        return text.ToString();
    }
}
