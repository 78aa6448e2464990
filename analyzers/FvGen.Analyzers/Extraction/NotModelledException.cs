using System;
using Microsoft.CodeAnalysis;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// Raised when a construct is outside what the checker models; becomes FVC0100 with the reason
/// at the construct's location.
/// </summary>
internal sealed class NotModelledException : Exception
{
    public NotModelledException(string reason, SyntaxNode? where, bool conditionalIndex = false)
        : base(reason)
    {
        Where = where;
        ConditionalIndex = conditionalIndex;
    }

    public SyntaxNode? Where { get; }

    /// <summary>Raised for a subscript chosen by a condition: a read there may still feed a balanced face value.</summary>
    public bool ConditionalIndex { get; }
}
