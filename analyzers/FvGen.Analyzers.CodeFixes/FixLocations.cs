using System.Globalization;
using System.Linq;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CSharp.Syntax;
using Microsoft.CodeAnalysis.Text;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>Finds, from a diagnostic's properties, the write statement a fix edits.</summary>
internal static class FixLocations
{
    public static AssignmentExpressionSyntax? Write(SyntaxNode root, Diagnostic diagnostic)
    {
        if (!diagnostic.Properties.TryGetValue(FindingPropertyNames.WriteStart, out var start)
            || !diagnostic.Properties.TryGetValue(FindingPropertyNames.WriteLength, out var length)
            || !int.TryParse(start, NumberStyles.Integer, CultureInfo.InvariantCulture, out int s)
            || !int.TryParse(length, NumberStyles.Integer, CultureInfo.InvariantCulture, out int l)
            || s < 0 || l < 0 || s + l > root.FullSpan.End)
        {
            return null;
        }

        var node = root.FindNode(new TextSpan(s, l), findInsideTrivia: false, getInnermostNodeForTie: true);
        for (var n = node; n is not null; n = n.Parent)
        {
            if (n is AssignmentExpressionSyntax assignment)
            {
                return assignment;
            }

            if (n is StatementSyntax)
            {
                break;
            }
        }

        return node.DescendantNodesAndSelf().OfType<AssignmentExpressionSyntax>().FirstOrDefault();
    }
}
