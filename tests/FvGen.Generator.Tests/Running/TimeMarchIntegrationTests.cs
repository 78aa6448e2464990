using FvGen.Boundaries;
using FvGen.Fields;
using FvGen.Generator.Tests.Kernels;
using FvGen.Generator.Tests.Meshes;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Time;

namespace FvGen.Generator.Tests.Running;

/// <summary>Generated residuals plugged into the runtime's time march, with its conservation ledger watching.</summary>
public sealed class TimeMarchIntegrationTests
{
    [Fact]
    public void GeneratedSecondOrderResidualKeepsTheLedgerBalancedOverAMarch()
    {
        // A hump of water spreading in a box with walls on two sides and open outflow on the others.
        var mesh = TestMeshes.Square(TestMeshes.Kind2D.Triangles, 16, 21);
        var binding = new BoundaryBinding<ShallowWater.Boundary>()
            .Bind("west", ShallowWater.Boundary.Wall)
            .Bind("south", ShallowWater.Boundary.Wall)
            .Bind("east", ShallowWater.Boundary.Outflow)
            .Bind("north", ShallowWater.Boundary.Outflow);
        binding.Validate(mesh);
        var water = new CellField<WaterState>(mesh);
        water.Fill(p => new WaterState { Depth = 1 + 0.3 * Math.Exp(-40 * ((p.X - 0.4) * (p.X - 0.4) + (p.Y - 0.5) * (p.Y - 0.5))) });
        var gradients = new Gradient<WaterState>[mesh.CellCount];

        ResidualFunction<WaterState> residual = (state, rate, _, tally) => ShallowWater.LinearSerial(mesh, state, rate, gradients, binding, tally);
        WaveSpeed<WaterState> speed = (in WaterState u, int _) =>
            Math.Sqrt(u.Discharge.X * u.Discharge.X + u.Discharge.Y * u.Discharge.Y) / u.Depth + Math.Sqrt(ShallowWater.Gravity * u.Depth);
        var march = new TimeMarch<WaterState>(water, residual, new SspRungeKutta3<WaterState>(mesh), TimeStepRule<WaterState>.FromCfl(0.4, speed))
        {
            MaxSteps = 60,
        };

        var result = march.Run(0, 0.05);
        Assert.True(result.Steps > 5);
        Assert.True(march.Ledger.CumulativeRelativeImbalance <= 1e-12, $"cumulative imbalance {march.Ledger.CumulativeRelativeImbalance:E3}");

        // Mass left through the open patches only: the walls' depth flux is zero.
        Assert.True(march.Ledger.Totals[0] < march.Ledger.InitialTotals[0]);
    }
}
