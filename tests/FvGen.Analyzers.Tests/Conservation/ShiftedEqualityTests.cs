using FvGen.Analyzers.Conservation;
using static FvGen.Analyzers.Tests.Conservation.Kernel;

namespace FvGen.Analyzers.Tests.Conservation;

/// <summary>
/// The structural test "B is A shifted by n" must give exactly the answer of the definition it
/// replaces in the matcher: A shifted by n, rebuilt, has B's key. Every pair below is decided both
/// ways; where the structural test declines (null), the matcher falls back to the keys, so only a
/// decided answer has to agree.
/// </summary>
public sealed class ShiftedEqualityTests
{
    private static readonly Dictionary<string, long>[] Shifts =
    {
        new() { ["i"] = 0 },
        new() { ["i"] = 1 },
        new() { ["i"] = -1 },
        new() { ["i"] = 1, ["j"] = -2 },
        new() { ["j"] = 1 },
    };

    /// <summary>Bodies of the kinds kernels produce, several of them equal to others after a shift.</summary>
    private static IEnumerable<Term> Bodies()
    {
        var dx = Sym("dx");
        var all = new List<SumExpr>
        {
            Read("u", At("i")),
            Read("u", At("i", 1)),
            Read("u", At("i", 9)),
            Read("u", At("i", 10)),
            Read("u", At("i"), At("j", 1)),
            Read("u", At("i", 1), At("j", -1)),
            Read("v", At("i", 1)),
            ReadMapped("u", "left", At("f")),
            ReadMapped("u", "left", At("f", 1)),
            Read("u", Lin(1, ("i", SymPoly.Constant(2)))),
            Read("u", Lin(3, ("i", SymPoly.Constant(2)))),
            Read("u", Lin(0, ("i", SymPoly.One), ("j", SymPoly.Symbol("nx") + SymPoly.One))),
            Read("u", Lin(2, ("i", SymPoly.One), ("j", SymPoly.Symbol("nx") + SymPoly.One))),

            // Products: the order of the sorted factors changes when offsets 9 and 10 become 10 and 11.
            Read("u", At("i", 9)) * Read("u", At("i", 10)),
            Read("u", At("i", 10)) * Read("u", At("i", 11)),
            Read("u", At("i")) * Read("u", At("i")),
            Read("u", At("i", 1)) * Read("u", At("i", 1)),

            // Calls: as written, symmetric (arguments in any order), antisymmetric, nested sums.
            Call("F", Read("u", At("i")), Read("u", At("i", 1))),
            Call("F", Read("u", At("i", 1)), Read("u", At("i", 2))),
            Call("F", Read("u", At("i", 1)), Read("u", At("i"))),
            Call("Math.Max", CallSymmetry.Symmetric, Read("u", At("i", 9)), Read("u", At("i", 10))),
            Call("Math.Max", CallSymmetry.Symmetric, Read("u", At("i", 11)), Read("u", At("i", 10))),
            Call("Roe", CallSymmetry.Antisymmetric, Read("u", At("i")), Read("u", At("i", 1))),
            Call("Roe", CallSymmetry.Antisymmetric, Read("u", At("i", 1)), Read("u", At("i", 2))),
            Call("L", Read("u", At("i", 9)) - Read("u", At("i", 10)), Num(1, 2) * Read("u", At("i"))),
            Call("L", Read("u", At("i", 10)) - Read("u", At("i", 11)), Num(1, 2) * Read("u", At("i", 1))),
            Call("L", Read("u", At("i", 10)) - Read("u", At("i", 11)), Num(1, 3) * Read("u", At("i", 1))),

            // Reciprocals: the structural test declines, the keys decide.
            Div(Read("F", At("i")), Read("a", At("i")) + dx * Read("b", At("i"))),
            Div(Read("F", At("i", 1)), Read("a", At("i", 1)) + dx * Read("b", At("i", 1))),
        };

        foreach (var sum in all)
        {
            foreach (var term in sum.Terms)
            {
                yield return term;
            }
        }
    }

    [Fact]
    public void AgreesWithComparingTheKeysOfTheShiftedBody()
    {
        var bodies = Bodies().ToList();
        int decided = 0, equal = 0;
        foreach (var a in bodies)
        {
            foreach (var b in bodies)
            {
                foreach (var shift in Shifts)
                {
                    bool byKeys = a.Shift(shift).BodyKey == b.BodyKey;
                    if (ShiftedEquality.Bodies(a, b, shift) is bool structural)
                    {
                        decided++;
                        Assert.True(byKeys == structural, $"{a.RenderBody()} shifted by {string.Join(",", shift)} vs {b.RenderBody()}: keys say {byKeys}, the walk says {structural}");
                        equal += structural ? 1 : 0;
                    }
                }
            }
        }

        // The table is not trivial: most pairs are decided, and shifted copies are found among them.
        Assert.True(decided > bodies.Count * bodies.Count * Shifts.Length * 9 / 10, $"only {decided} decided");
        Assert.True(equal > bodies.Count * 2, $"only {equal} equal pairs");
    }

    [Fact]
    public void FindsTheCopyWhoseFactorsSortInAnotherOrder()
    {
        // u[i+9]·u[i+10] moved by one is u[i+10]·u[i+11]: the sorted factor order differs ("10" < "9").
        var a = Assert.Single((Read("u", At("i", 9)) * Read("u", At("i", 10))).Terms);
        var b = Assert.Single((Read("u", At("i", 10)) * Read("u", At("i", 11))).Terms);
        Assert.True(ShiftedEquality.Bodies(a, b, new Dictionary<string, long> { ["i"] = 1 }));
        Assert.False(ShiftedEquality.Bodies(a, b, new Dictionary<string, long> { ["i"] = 2 }));
    }

    [Fact]
    public void DeclinesReciprocals()
    {
        var a = Assert.Single(Div(Read("F", At("i")), Read("a", At("i")) + Read("b", At("i"))).Terms);
        Assert.Null(ShiftedEquality.Bodies(a, a, new Dictionary<string, long> { ["i"] = 0 }));
    }
}
