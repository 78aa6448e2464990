using FvGen.Analyzers.Conservation;

namespace FvGen.Analyzers.Tests.Conservation;

/// <summary>
/// The shortcut for systems in which no row couples two unknowns must agree with the elimination
/// it stands in for: the same solution (free unknowns zero) or the same inconsistency.
/// </summary>
public sealed class LinearSolverTests
{
    [Fact]
    public void SeparatedSystemsAgreeWithElimination()
    {
        var random = new Random(20261202);
        int separated = 0, inconsistent = 0;
        for (int trial = 0; trial < 2000; trial++)
        {
            int unknowns = random.Next(1, 4);
            var rows = new List<Rational[]>();
            int count = random.Next(1, 5);
            for (int r = 0; r < count; r++)
            {
                var row = new Rational[unknowns + 1];
                for (int c = 0; c <= unknowns; c++)
                {
                    row[c] = Rational.Zero;
                }

                // At most one unknown per row, small integers so that rows often agree or clash.
                if (random.Next(4) > 0)
                {
                    row[random.Next(unknowns)] = Rational.FromInteger(random.Next(1, 3) * (random.Next(2) == 0 ? 1 : -1));
                }

                row[unknowns] = Rational.FromInteger(random.Next(-2, 3));
                rows.Add(row);
            }

            Assert.True(LinearSolver.TrySolveSeparated(rows, unknowns, out var shortcut));
            var eliminated = LinearSolver.Solve(rows, unknowns);
            separated++;
            if (eliminated is null)
            {
                inconsistent++;
                Assert.Null(shortcut);
            }
            else
            {
                Assert.NotNull(shortcut);
                Assert.Equal(eliminated, shortcut!);
            }
        }

        Assert.InRange(inconsistent, 100, separated - 100);
    }

    [Fact]
    public void DeclinesARowThatCouplesTwoUnknowns()
    {
        var rows = new List<Rational[]> { new[] { Rational.One, Rational.One, Rational.FromInteger(2) } };
        Assert.False(LinearSolver.TrySolveSeparated(rows, 2, out _));
    }
}
