using System.Collections.Generic;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// Exact Gaussian elimination over the rationals for the small systems that decide whether two
/// bodies differ by a lattice shift (one unknown per loop variable).
/// </summary>
internal static class LinearSolver
{
    /// <summary>
    /// The common system where no row couples two unknowns (each index pair moves one loop variable):
    /// each unknown is read off its rows, which must agree; unknowns no row names are zero, as in
    /// <see cref="Solve"/>. False when some row couples unknowns (then <see cref="Solve"/> decides);
    /// true with a null solution when the system is inconsistent.
    /// </summary>
    public static bool TrySolveSeparated(List<Rational[]> rows, int unknowns, out Rational[]? solution)
    {
        solution = null;
        foreach (var row in rows)
        {
            int nonZero = 0;
            for (int c = 0; c < unknowns; c++)
            {
                if (!row[c].IsZero)
                {
                    nonZero++;
                }
            }

            if (nonZero > 1)
            {
                return false;
            }
        }

        var x = Zeros(unknowns);
        var known = new bool[unknowns];
        foreach (var row in rows)
        {
            int c = 0;
            while (c < unknowns && row[c].IsZero)
            {
                c++;
            }

            if (c == unknowns)
            {
                if (!row[unknowns].IsZero)
                {
                    return true;
                }

                continue;
            }

            var value = row[unknowns] / row[c];
            if (known[c] && x[c] != value)
            {
                return true;
            }

            x[c] = value;
            known[c] = true;
        }

        solution = x;
        return true;
    }

    /// <summary>
    /// Solves <c>A x = b</c> (rows of <paramref name="rows"/>, last entry the right side). Free
    /// unknowns are set to zero. Returns null when the system is inconsistent.
    /// </summary>
    public static Rational[]? Solve(List<Rational[]> rows, int unknowns)
    {
        var m = new List<Rational[]>(rows.Count);
        foreach (var r in rows)
        {
            m.Add((Rational[])r.Clone());
        }

        var pivotColumnOfRow = new List<int>();
        int row = 0;
        for (int col = 0; col < unknowns && row < m.Count; col++)
        {
            int pivot = -1;
            for (int r = row; r < m.Count; r++)
            {
                if (!m[r][col].IsZero)
                {
                    pivot = r;
                    break;
                }
            }

            if (pivot < 0)
            {
                continue;
            }

            (m[row], m[pivot]) = (m[pivot], m[row]);
            var p = m[row][col];
            for (int c = col; c <= unknowns; c++)
            {
                m[row][c] /= p;
            }

            for (int r = 0; r < m.Count; r++)
            {
                if (r != row && !m[r][col].IsZero)
                {
                    var factor = m[r][col];
                    for (int c = col; c <= unknowns; c++)
                    {
                        m[r][c] -= factor * m[row][c];
                    }
                }
            }

            pivotColumnOfRow.Add(col);
            row++;
        }

        for (int r = row; r < m.Count; r++)
        {
            if (!m[r][unknowns].IsZero)
            {
                return null;
            }
        }

        var x = Zeros(unknowns);
        for (int r = 0; r < pivotColumnOfRow.Count; r++)
        {
            x[pivotColumnOfRow[r]] = m[r][unknowns];
        }

        return x;
    }

    /// <summary>The zero vector, the solution when every row is trivially satisfied.</summary>
    public static Rational[] Zeros(int unknowns)
    {
        var x = new Rational[unknowns];
        for (int k = 0; k < unknowns; k++)
        {
            x[k] = Rational.Zero;
        }

        return x;
    }
}
