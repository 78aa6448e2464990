using System;

namespace FvGen.Generator.Common;

/// <summary>One type around a generated member: its keyword (<c>class</c>, <c>struct</c>, <c>record</c>, ...) and name with type parameters.</summary>
internal sealed record ContainingType(string Keyword, string Name) : IEquatable<ContainingType>;
