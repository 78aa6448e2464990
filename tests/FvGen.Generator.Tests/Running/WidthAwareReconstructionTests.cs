using FvGen.Boundaries;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Support;
using FvGen.Ledger;
using FvGen.Meshes.Structured;

namespace FvGen.Generator.Tests.Running;

/// <summary>
/// The width-aware form of a structured user reconstruction (four cell states, their four widths, two
/// face states): a hand-written van Leer MUSCL over real widths is the built-in <c>Linear</c> bitwise,
/// on stretched grids, with patches (ghost cells and boundary faces included) and periodic wraps, in
/// serial, gather and slab modes; and it reconstructs a linear profile exactly on a stretched grid.
/// </summary>
public sealed class WidthAwareReconstructionTests
{
    public static TheoryData<bool, int> Sides => new() { { false, 71 }, { true, 72 } };

    [Theory]
    [MemberData(nameof(Sides))]
    public void UserMusclIsTheBuiltInLinearBitwiseIn1D(bool periodic, int seed)
    {
        var random = new Random(seed);
        var (low, high) = RandomGrids.Sides(periodic, "x");
        var grid = new StructuredGrid1D(RandomGrids.Axis(random, 37), low, high);
        var binding = Bindings.Each(grid.PatchNames, () => Advection.Boundary.Open);
        var u = RandomStates.Scalars(random, grid.CellCount, 1, -0.5);
        var (builtIn, builtInTally) = Run(grid.PatchNames.Count, u.Length, (r, t) => Advection.MusclVanLeer1D(grid, u, r, binding, t));
        var (user, userTally) = Run(grid.PatchNames.Count, u.Length, (r, t) => Advection.WidthAwareVanLeer1D(grid, u, r, binding, t));
        AssertBitwise(builtIn, builtInTally, user, userTally);
    }

    public static TheoryData<bool, bool, bool, int> Sides3D => new()
    {
        { false, false, false, 73 },
        { true, false, true, 74 },
        { true, true, true, 75 },
    };

    [Theory]
    [MemberData(nameof(Sides3D))]
    public void UserMusclIsTheBuiltInLinearBitwiseIn3DInEveryMode(bool px, bool py, bool pz, int seed)
    {
        var random = new Random(seed);
        var grid = RandomGrids.Grid3D(random, 6, 5, 4, px, py, pz);
        var binding = Bindings.Each(grid.PatchNames, () => Advection.Boundary.Open);
        var u = RandomStates.Scalars(random, grid.CellCount, 1, -0.5);
        int patches = grid.PatchNames.Count, n = grid.CellCount;
        var (builtIn, builtInTally) = Run(patches, n, (r, t) => Advection.MusclVanLeer3D(grid, u, r, binding, t));
        var (user, userTally) = Run(patches, n, (r, t) => Advection.WidthAwareVanLeer3D(grid, u, r, binding, t));
        AssertBitwise(builtIn, builtInTally, user, userTally);
        foreach (int threads in new[] { 1, 2, 8 })
        {
            var options = new ParallelOptions { MaxDegreeOfParallelism = threads };
            var buffer = new Scalar[grid.FaceCount];
            // Gather sums each cell's faces in its own order: compare user with built-in in the same mode.
            var (gatherBuiltIn, gatherBuiltInTally) = Run(patches, n, (r, t) => Advection.MusclGather3D(grid, u, r, buffer, binding, t, options));
            var (gatherUser, gatherUserTally) = Run(patches, n, (r, t) => Advection.WidthAwareVanLeerGather3D(grid, u, r, buffer, binding, t, options));
            AssertBitwise(gatherBuiltIn, gatherBuiltInTally, gatherUser, gatherUserTally);
            // Slabs receive every face in the serial order: bitwise the serial built-in.
            var (slabsBuiltIn, slabsBuiltInTally) = Run(patches, n, (r, t) => Advection.MusclVanLeerSlabs3D(grid, u, r, binding, t, options));
            var (slabsUser, slabsUserTally) = Run(patches, n, (r, t) => Advection.WidthAwareVanLeerSlabs3D(grid, u, r, binding, t, options));
            AssertBitwise(builtIn, builtInTally, slabsBuiltIn, slabsBuiltInTally);
            AssertBitwise(builtIn, builtInTally, slabsUser, slabsUserTally);
        }
    }

    [Fact]
    public void DirectionsOfOneOrTwoCellsHaveNoGhostAndStillBalance()
    {
        // Two cells along x and one along y: no pair inward for a ghost, so zero slopes and cell averages
        // on the boundary faces there; z has three cells and ghosts. Built-in and user agree, and both balance.
        var random = new Random(77);
        var grid = RandomGrids.Grid3D(random, 2, 1, 3, false, false, false);
        var binding = Bindings.Each(grid.PatchNames, () => random.Next(3) == 0 ? Advection.Boundary.Wall : Advection.Boundary.Open);
        var u = RandomStates.Scalars(random, grid.CellCount, 1, -0.5);
        int patches = grid.PatchNames.Count, n = grid.CellCount;
        var (builtIn, builtInTally) = Run(patches, n, (r, t) => Advection.MusclVanLeer3D(grid, u, r, binding, t));
        var (user, userTally) = Run(patches, n, (r, t) => Advection.WidthAwareVanLeer3D(grid, u, r, binding, t));
        AssertBitwise(builtIn, builtInTally, user, userTally);
        Assert.True(Balance.RelativeImbalance(grid, Scalar.AsComponents(builtIn.AsSpan()), 1, builtInTally) <= 1e-13);
    }

    [Fact]
    public void UserMusclReconstructsALinearProfileExactlyOnAStretchedGrid()
    {
        var random = new Random(76);
        // Widths drawn from [0.5, 1.5]: neighbouring cells differ by up to a factor 3, not smoothly.
        var grid = new StructuredGrid1D(RandomGrids.Axis(random, 30), SideBoundary.Patch("west"), SideBoundary.Patch("east"));
        var binding = Bindings.Each(grid.PatchNames, () => Advection.Boundary.Open);
        // u = x: every slope is 1, θ = 1 and φ(1) = 1, so each face, the outflow boundary face included,
        // sees the exact value at its node and u_t = -u_x = -1 (a = Advection.Velocity.X = 1).
        var u = new Scalar[grid.CellCount];
        for (int i = 0; i < u.Length; i++)
        {
            u[i] = new Scalar(grid.X.Centres[i]);
        }

        var rate = new Scalar[grid.CellCount];
        Advection.WidthAwareVanLeer1D(grid, u, rate, binding, null);
        // Cell 0 alone differs: its west face carries the fixed inflow value 0.75, not u = 0.
        for (int i = 1; i < grid.CellCount; i++)
        {
            Assert.True(Math.Abs(rate[i].Value + 1.0) <= 1e-12, $"cell {i}: rate {rate[i].Value:R}, exact -1");
        }
    }



    private static (Scalar[] Rate, BoundaryFluxTally Tally) Run(int patches, int cells, Action<Scalar[], BoundaryFluxTally> kernel)
    {
        var rate = new Scalar[cells];
        var tally = new BoundaryFluxTally(patches, Scalar.ComponentCount);
        kernel(rate, tally);
        return (rate, tally);
    }

    private static void AssertBitwise(Scalar[] expected, BoundaryFluxTally expectedTally, Scalar[] actual, BoundaryFluxTally actualTally)
    {
        for (int c = 0; c < expected.Length; c++)
        {
            Assert.True(BitConverter.DoubleToInt64Bits(expected[c].Value) == BitConverter.DoubleToInt64Bits(actual[c].Value), $"cell {c}: {actual[c].Value:R}, expected {expected[c].Value:R}");
        }

        for (int p = 0; p < expectedTally.Totals.Length; p++)
        {
            Assert.True(
                BitConverter.DoubleToInt64Bits(expectedTally.Totals[p]) == BitConverter.DoubleToInt64Bits(actualTally.Totals[p]),
                $"patch {p}: tally {actualTally.Totals[p]:R}, expected {expectedTally.Totals[p]:R}");
        }
    }
}
