using System.Collections.Generic;
using System.Collections.Immutable;
using System.Threading;
using System.Threading.Tasks;
using Microsoft.CodeAnalysis;
using Microsoft.CodeAnalysis.CodeActions;
using Microsoft.CodeAnalysis.CodeFixes;

namespace FvGen.Analyzers.CodeFixes;

/// <summary>
/// The plumbing every conservation fix shares: one rule, the document read once per request, and the
/// actions a fix can make faithfully registered per diagnostic (none when it cannot).
/// </summary>
public abstract class FindingFix : CodeFixProvider
{
    private readonly string _ruleId;

    private protected FindingFix(string ruleId) => _ruleId = ruleId;

    public sealed override ImmutableArray<string> FixableDiagnosticIds => ImmutableArray.Create(_ruleId);

    public sealed override async Task RegisterCodeFixesAsync(CodeFixContext context)
    {
        var source = await FixSource.ReadAsync(context.Document, context.CancellationToken).ConfigureAwait(false);
        if (source is null)
        {
            return;
        }

        foreach (var diagnostic in context.Diagnostics)
        {
            foreach (var action in Offer(source, diagnostic, context.CancellationToken))
            {
                context.RegisterCodeFix(action, diagnostic);
            }
        }
    }

    /// <summary>The code actions for one diagnostic; empty when the fix cannot be written safely.</summary>
    private protected abstract IEnumerable<CodeAction> Offer(FixSource source, Diagnostic diagnostic, CancellationToken cancellationToken);
}
