using System;
using System.Collections.Generic;
using System.Collections.Immutable;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Shifting the parts of an expression. Most shifts leave most parts where they are (a shift in j
/// does not move <c>u[i]</c>), so the parts are kept, and the array itself when none moved: no
/// copy, no new key.
/// </summary>
internal static class Shifted
{
    /// <summary>
    /// <paramref name="items"/> with each item shifted; the same array (<c>==</c> holds) when every
    /// item came back as itself.
    /// </summary>
    public static ImmutableArray<T> Each<T>(ImmutableArray<T> items, IReadOnlyDictionary<string, long> shift, Func<T, IReadOnlyDictionary<string, long>, T> shiftOne)
        where T : class
    {
        ImmutableArray<T>.Builder? moved = null;
        for (int k = 0; k < items.Length; k++)
        {
            var item = items[k];
            var shifted = shiftOne(item, shift);
            if (moved is null && !ReferenceEquals(shifted, item))
            {
                moved = ImmutableArray.CreateBuilder<T>(items.Length);
                for (int before = 0; before < k; before++)
                {
                    moved.Add(items[before]);
                }
            }

            moved?.Add(shifted);
        }

        return moved is null ? items : moved.MoveToImmutable();
    }
}
