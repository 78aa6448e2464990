using System.Collections.Immutable;
using Microsoft.CodeAnalysis;

namespace FvGen.Analyzers.Extraction;

/// <summary>One diagnostic-to-be: the rule, its message arguments, where, and data for a code fix.</summary>
internal sealed record ConservationIssue(
    string RuleId,
    ImmutableArray<string> Arguments,
    Location Location,
    ImmutableArray<Location> AdditionalLocations,
    ImmutableDictionary<string, string?> Properties);
