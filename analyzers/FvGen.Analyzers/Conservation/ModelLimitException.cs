using System;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Raised when an update goes beyond what the checker models; the message is the reason shown in
/// the "not analyzed" diagnostic. Never swallowed into a pass.
/// </summary>
internal sealed class ModelLimitException : Exception
{
    public ModelLimitException(string reason)
        : base(reason)
    {
    }
}
