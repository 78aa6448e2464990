using System;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Raised when an update goes beyond what the checker models; the message is the reason shown in
/// the "not analyzed" diagnostic. Never swallowed into a pass.
/// </summary>
internal sealed class ModelLimitException : Exception
{
    public ModelLimitException(string reason, int origin = -1)
        : base(reason)
    {
        Origin = origin;
    }

    /// <summary>Origin of the term that went beyond the model, or -1 (the loop is then the location).</summary>
    public int Origin { get; }
}
