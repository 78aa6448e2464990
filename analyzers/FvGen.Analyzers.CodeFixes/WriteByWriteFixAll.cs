using System;
using System.Linq;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// Fix-all for fixes that add locals before a loop: fixes one write at a time on the document the
/// previous fix left, so the second loop's new local sees the first one's name (a text-merging batch
/// fixer would declare <c>uOld</c> twice). Writes are found again through annotations.
/// </summary>
internal static class WriteByWriteFixAll
{
    /// <param name="fixOne">Fixes one write for the given equivalence key; null when it cannot.</param>
    public static FixAllProvider Create(Func<FixSource, AssignmentExpressionSyntax, string?, CancellationToken, Task<Document?>> fixOne) =>
        FixAllProvider.Create(async (context, document, diagnostics) =>
        {
            var ct = context.CancellationToken;
            var root = await document.GetSyntaxRootAsync(ct).ConfigureAwait(false);
            if (root is null)
            {
                return document;
            }

            var writes = diagnostics.Select(d => FixLocations.Write(root, d)).Where(w => w is not null).Cast<AssignmentExpressionSyntax>()
                .Distinct().OrderBy(w => w.SpanStart).ToList();
            var marks = writes.ToDictionary(w => w, _ => new SyntaxAnnotation());
            var current = document.WithSyntaxRoot(root.ReplaceNodes(writes, (original, rewritten) => rewritten.WithAdditionalAnnotations(marks[original])));
            foreach (var mark in writes.Select(w => marks[w]))
            {
                if (await FixSource.ReadAsync(current, ct).ConfigureAwait(false) is not { } source
                    || source.Root.GetAnnotatedNodes(mark).OfType<AssignmentExpressionSyntax>().FirstOrDefault() is not { } write)
                {
                    continue;
                }

                current = await fixOne(source, write, context.CodeActionEquivalenceKey, ct).ConfigureAwait(false) ?? current;
            }

            return current;
        });
}
