using System;
using System.Collections.Generic;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A factor of a term body that depends on the loop variables: an array read, a call, or the
/// reciprocal of a sum. Loop-invariant parts never appear here; they live in the coefficient.
/// </summary>
internal abstract class Expr : IEquatable<Expr>
{
    /// <summary>Full identity, offsets included.</summary>
    public abstract string Key { get; }

    /// <summary>Identity with every index offset erased (candidates for a lattice shift share it).</summary>
    public abstract string ShapeKey { get; }

    /// <summary>The same factor at iteration <c>i + n</c>; the factor itself when the shift does not move it.</summary>
    public abstract Expr Shift(IReadOnlyDictionary<string, long> shift);

    /// <summary>Every array read inside, at any depth.</summary>
    public abstract IEnumerable<ReadExpr> Reads { get; }

    /// <summary>C# text of the factor.</summary>
    public abstract string Render();

    public bool Equals(Expr? other) => other is not null && Key == other.Key;

    public override bool Equals(object? obj) => obj is Expr e && Equals(e);

    public override int GetHashCode() => StringComparer.Ordinal.GetHashCode(Key);

    public override string ToString() => Render();
}

/// <summary>What an array holds, as far as the balance is concerned.</summary>
internal enum DataRole
{
    /// <summary>One value per cell (or not known to be face data).</summary>
    Cell,

    /// <summary>One value per face: a face field, a parameter marked as face data, or an array filled from fluxes by an earlier loop.</summary>
    Face,

    /// <summary>Face data known to be computed from the cells on both sides of interior faces (it cannot be a boundary flux).</summary>
    InteriorFace,
}

/// <summary>How a call may be rearranged without changing its value.</summary>
internal enum CallSymmetry
{
    /// <summary>Arguments in the order written.</summary>
    None,

    /// <summary>Any order (<c>Math.Max</c>, <c>Math.Min</c>).</summary>
    Symmetric,

    /// <summary>Swapping the first two arguments (and negating a third, the normal) negates the value.</summary>
    Antisymmetric,
}
