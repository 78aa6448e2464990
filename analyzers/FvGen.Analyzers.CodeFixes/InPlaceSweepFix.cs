using System.Collections.Generic;
using System.Composition;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;
using Microsoft.CodeAnalysis.CSharp.Syntax;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// FVC0005: two ways to make the sweep read only the old state — read it from a copy made before the
/// loop (<see cref="OldStateCopy"/>, offered whenever the array can be copied), or, for a 1-D
/// flux-difference update, the two-pass face-flux form (<see cref="TwoPassFaceFlux"/>).
/// </summary>
[ExportCodeFixProvider(LanguageNames.CSharp, Name = nameof(InPlaceSweepFix))]
[Shared]
public sealed class InPlaceSweepFix : FindingFix
{
    public InPlaceSweepFix()
        : base(DiagnosticIds.InPlaceSweep)
    {
    }

    public override FixAllProvider GetFixAllProvider() => WriteByWriteFixAll.Create(FixOneAsync);

    private protected override IEnumerable<CodeAction> Offer(FixSource source, Diagnostic diagnostic, CancellationToken cancellationToken)
    {
        if (source.WriteOf(diagnostic) is not { } write)
        {
            yield break;
        }

        if (OldStateCopy.Create(source, write, cancellationToken) is { } copy)
        {
            yield return CodeAction.Create(
                "Read the old state from a copy `" + copy.CopyName + "` made before the loop",
                ct => copy.ApplyAsync(source.Document, ct),
                EquivalenceKeys.ReadOldStateFromCopy);
        }

        if (TwoPassFaceFlux.Create(source, write, cancellationToken) is { } twoPass)
        {
            yield return CodeAction.Create(
                "Compute each face flux once into `" + twoPass.BufferNames + "` first, then update in place",
                ct => twoPass.ApplyAsync(source.Document, ct),
                EquivalenceKeys.TwoPassFaceFlux);
        }
    }

    private static async Task<Document?> FixOneAsync(FixSource source, AssignmentExpressionSyntax write, string? equivalenceKey, CancellationToken cancellationToken) =>
        equivalenceKey switch
        {
            EquivalenceKeys.ReadOldStateFromCopy when OldStateCopy.Create(source, write, cancellationToken) is { } copy =>
                await copy.ApplyAsync(source.Document, cancellationToken).ConfigureAwait(false),
            EquivalenceKeys.TwoPassFaceFlux when TwoPassFaceFlux.Create(source, write, cancellationToken) is { } twoPass =>
                await twoPass.ApplyAsync(source.Document, cancellationToken).ConfigureAwait(false),
            _ => null,
        };
}
