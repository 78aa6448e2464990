using System;
using System.Collections.Generic;
using System.Collections.Immutable;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// The sum of two sparse lists kept in key order (a polynomial's terms, an index's coefficients, a
/// monomial's powers) by one ordered merge: values of equal keys added, zero sums dropped, the order
/// kept, so the result is canonical without sorting.
/// </summary>
internal static class OrderedMerge
{
    public static ImmutableArray<SparseEntry<TKey, TValue>> Sum<TKey, TValue>(
        ImmutableArray<SparseEntry<TKey, TValue>> a,
        ImmutableArray<SparseEntry<TKey, TValue>> b,
        Func<TKey, TKey, int> compare,
        Func<TValue, TValue, TValue> add,
        Func<TValue, bool> isZero)
    {
        var result = ImmutableArray.CreateBuilder<SparseEntry<TKey, TValue>>(a.Length + b.Length);
        int i = 0, j = 0;
        while (i < a.Length && j < b.Length)
        {
            int order = compare(a[i].Key, b[j].Key);
            if (order < 0)
            {
                result.Add(a[i++]);
            }
            else if (order > 0)
            {
                result.Add(b[j++]);
            }
            else
            {
                var value = add(a[i].Value, b[j].Value);
                if (!isZero(value))
                {
                    result.Add(new SparseEntry<TKey, TValue>(a[i].Key, value));
                }

                i++;
                j++;
            }
        }

        while (i < a.Length)
        {
            result.Add(a[i++]);
        }

        while (j < b.Length)
        {
            result.Add(b[j++]);
        }

        return result.Count == result.Capacity ? result.MoveToImmutable() : result.ToImmutable();
    }
}
