using System;
using Microsoft.CodeAnalysis;

namespace FvGen.Analyzers.Extraction;

/// <summary>
/// Raised when a construct is outside what the checker models; becomes FVC0100 with the reason
/// at the construct's location.
/// </summary>
internal sealed class NotModelledException : Exception
{
    public NotModelledException(string reason, SyntaxNode? where)
        : base(reason)
    {
        Where = where;
    }

    public SyntaxNode? Where { get; }
}
