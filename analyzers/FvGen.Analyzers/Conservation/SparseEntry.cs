namespace FvGen.Analyzers.Conservation;

/// <summary>
/// A key and its value in a sparse list kept in key order: a polynomial's monomial and coefficient, an
/// index's loop variable and coefficient, a monomial's symbol and power.
/// </summary>
/// <remarks>
/// A class of our own, not <see cref="System.Collections.Generic.KeyValuePair{TKey, TValue}"/>: immutable arrays,
/// lists and queries over a reference type run the framework's shared precompiled code, while over that struct
/// they are JIT-compiled for each instantiation in every fresh compiler process.
/// </remarks>
internal sealed class SparseEntry<TKey, TValue>
{
    public SparseEntry(TKey key, TValue value)
    {
        Key = key;
        Value = value;
    }

    public TKey Key { get; }

    public TValue Value { get; }
}
