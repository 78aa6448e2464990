using FvGen.Fields;
using FvGen.Geometry;
using FvGen.Ledger;
using FvGen.Meshes.Unstructured;
using FvGen.Time;

namespace FvGen.Runtime.Tests.Ledger;

/// <summary>
/// The ledger on unstructured meshes: a manufactured face flux on randomly perturbed triangles and
/// tetrahedra, with inflow and outflow patches. As on the grids, each face flux is computed once and
/// applied with opposite signs to its two cells, so Σ R·V equals minus the boundary outflow exactly
/// in real arithmetic (the discrete divergence theorem, REFERENCES.md "Geometry"), and the ledger
/// must see rounding only.
/// </summary>
public sealed class UnstructuredLedgerClosureTests
{
    private const double RoundingTolerance = 1e-12;

    private static readonly Vec3 Velocity = new(1.0, 0.4, 0.2);

    public static TheoryData<string> Integrators => new() { "Euler", "SSP-RK2", "SSP-RK3" };

    [Theory]
    [MemberData(nameof(Integrators))]
    public void ClosesToRoundingOnPerturbedTriangles(string integratorName)
    {
        var builder = RectangleMesh.CreateBuilder(12, 9, 0.0, 1.2, 0.0, 0.9, RectangleCellKind.Triangles);
        NodePerturbation.PerturbInteriorNodes(builder, 0.25, seed: 11);
        AssertClosure(builder.Build(), integratorName, endTime: 1.0);
    }

    [Theory]
    [MemberData(nameof(Integrators))]
    public void ClosesToRoundingOnPerturbedTetrahedra(string integratorName)
    {
        var builder = BoxMesh.CreateBuilder(4, 3, 3, 0.0, 1.0, 0.0, 0.75, 0.0, 0.75, BoxCellKind.Tetrahedra);
        NodePerturbation.PerturbInteriorNodes(builder, 0.2, seed: 5);
        AssertClosure(builder.Build(), integratorName, endTime: 0.5);
    }

    private static void AssertClosure(UnstructuredMesh mesh, string integratorName, double endTime)
    {
        var field = new CellField<Tracers>(mesh);
        field.Fill(p => new Tracers { Mass = 1 + 0.2 * Math.Sin(5 * p.X + p.Y), Charge = 0.3 * Math.Cos(3 * p.Y - p.Z) });
        var march = new TimeMarch<Tracers>(
            field,
            Residual(mesh),
            TimeIntegrator<Tracers>.Create(integratorName, mesh),
            TimeStepRule<Tracers>.FromCfl(0.4, (in Tracers _, int _) => Velocity.Length),
            new LedgerOptions { StepTolerance = RoundingTolerance, CumulativeTolerance = RoundingTolerance });

        var result = march.Run(0.0, endTime);

        Assert.True(result.Steps > 20, $"{result.Steps} steps");
        foreach (var c in result.Ledger.Components)
        {
            Assert.True(c.RelativeImbalance <= RoundingTolerance, $"{c.Component}: {c.RelativeImbalance:E2}");
            Assert.True(c.WorstStepRelativeImbalance <= RoundingTolerance, $"{c.Component}: worst step {c.WorstStepRelativeImbalance:E2}");
        }

        var mass = result.Ledger.Components[0];
        Assert.True(mass.Inflow > 0.1 && mass.Outflow > 0.1, $"inflow {mass.Inflow}, outflow {mass.Outflow}");
    }

    /// <summary>Upwind advection with a fixed velocity plus a time-dependent background face flux; inflow state prescribed.</summary>
    private static ResidualFunction<Tracers> Residual(UnstructuredMesh mesh)
    {
        int[] left = mesh.FaceLeft.ToArray();
        int[] right = mesh.FaceRight.ToArray();
        Vec3[] area = mesh.FaceAreaVectors.ToArray();
        Vec3[] centroid = mesh.FaceCentroids.ToArray();
        double[] volume = mesh.CellVolumes.ToArray();
        var patchOfFace = new int[mesh.FaceCount];
        foreach (var patch in mesh.Patches)
        {
            Array.Fill(patchOfFace, patch.Index, patch.FirstFace, patch.FaceCount);
        }

        return (state, residual, time, tally) =>
        {
            residual.Clear();
            for (int f = 0; f < left.Length; f++)
            {
                double un = Vec3.Dot(Velocity, area[f]);
                Tracers upwind = un >= 0 ? state[left[f]]
                    : right[f] >= 0 ? state[right[f]]
                    : new Tracers { Mass = ManufacturedFlux.InflowValue(time, 0), Charge = ManufacturedFlux.InflowValue(time, 1) };
                double a = Vec3.Dot(new Vec3(0.1, -0.2, 0.05), area[f]) * Math.Sin(centroid[f].X + 2 * centroid[f].Y - time);
                double mass = un * upwind.Mass + a;
                double charge = un * upwind.Charge - a;
                residual[left[f]].Mass -= mass / volume[left[f]];
                residual[left[f]].Charge -= charge / volume[left[f]];
                if (right[f] >= 0)
                {
                    residual[right[f]].Mass += mass / volume[right[f]];
                    residual[right[f]].Charge += charge / volume[right[f]];
                }
                else
                {
                    tally.Add(patchOfFace[f], 0, mass);
                    tally.Add(patchOfFace[f], 1, charge);
                }
            }
        };
    }
}
