using FvGen.Ledger;
using FvGen.Time;

namespace FvGen.Runtime.Tests.Time;

/// <summary>
/// Forward Euler and the SSP Runge–Kutta schemes of Shu &amp; Osher (1988) and Gottlieb &amp; Shu (1998)
/// on a smooth, non-autonomous ODE with a closed-form solution.
/// </summary>
public sealed class SspRungeKuttaTests
{
    // y' = −y + sin t, y(0) = 1 has the exact solution y = 3/2 e^(−t) + (sin t − cos t)/2.
    private static readonly ResidualFunction<double> Ode = (y, r, t, _) => r[0] = -y[0] + Math.Sin(t);

    private static double Exact(double t) => 1.5 * Math.Exp(-t) + 0.5 * (Math.Sin(t) - Math.Cos(t));

    public static TheoryData<string, int> Schemes => new() { { "Euler", 1 }, { "SSP-RK2", 2 }, { "SSP-RK3", 3 } };

    [Theory]
    [MemberData(nameof(Schemes))]
    public void ObservedOrderFromTwoStepSizesMatchesTheFormalOrder(string scheme, int order)
    {
        double coarse = ErrorAtTwo(scheme, steps: 40);
        double fine = ErrorAtTwo(scheme, steps: 80);
        double observed = Math.Log2(coarse / fine);

        Assert.InRange(observed, order - 0.1, order + 0.1);
    }

    [Theory]
    [InlineData("Euler", new[] { 1.0 }, new[] { 0.0 })]
    [InlineData("SSP-RK2", new[] { 0.5, 0.5 }, new[] { 0.0, 1.0 })]
    [InlineData("SSP-RK3", new[] { 1.0 / 6, 1.0 / 6, 2.0 / 3 }, new[] { 0.0, 1.0, 0.5 })]
    public void ExposesTheEffectiveStageWeightsAndTimesOfTheShuOsherForm(string scheme, double[] weights, double[] times)
    {
        var integrator = TimeIntegrator<double>.Create(scheme, OneCell());
        Assert.Equal(weights, integrator.StageWeights.ToArray());
        Assert.Equal(times, integrator.StageTimeFractions.ToArray());
        Assert.Equal(weights.Length, integrator.StageCount);
    }

    [Theory]
    [InlineData("Euler")]
    [InlineData("SSP-RK2")]
    [InlineData("SSP-RK3")]
    public void UpdateEqualsTheStepTimesTheWeightedStageResiduals(string scheme)
    {
        // A residual that ignores the state and returns a different constant in each stage:
        // the update is then dt · Σ b_s r_s exactly, which pins the effective weights independently.
        var integrator = TimeIntegrator<double>.Create(scheme, OneCell());
        double[] rates = [3.0, -5.0, 11.0];
        int call = 0;
        var recorded = new List<double>();
        ResidualFunction<double> residual = (_, r, _, _) => r[0] = rates[call++];
        var y = new[] { 2.0 };

        integrator.Step(y, 0.0, 0.125, residual, new WeightRecorder(recorded));

        double expected = 2.0;
        for (int s = 0; s < integrator.StageCount; s++)
        {
            expected += 0.125 * integrator.StageWeights[s] * rates[s];
        }

        Assert.Equal(expected, y[0], 14);
        Assert.Equal(integrator.StageWeights.ToArray(), recorded);
    }

    [Theory]
    [InlineData("Euler")]
    [InlineData("SSP-RK2")]
    [InlineData("SSP-RK3")]
    public void StepsAllocateNothing(string scheme)
    {
        var integrator = TimeIntegrator<double>.Create(scheme, OneCell());
        var y = new[] { 1.0 };
        var observer = new WeightRecorder(null);
        integrator.Step(y, 0, 0.01, Ode, observer);

        long before = GC.GetAllocatedBytesForCurrentThread();
        for (int n = 0; n < 1000; n++)
        {
            integrator.Step(y, n * 0.01, 0.01, Ode, observer);
        }

        Assert.Equal(0, GC.GetAllocatedBytesForCurrentThread() - before);
    }

    [Fact]
    public void RejectsAStateOfTheWrongSizeAndANonPositiveStep()
    {
        var integrator = new SspRungeKutta3<double>(3, 0);
        var ex = Assert.Throws<ArgumentException>(() => integrator.Step(new double[2], 0, 0.1, Ode));
        Assert.Contains("made for 3 cells but was given a state of 2 cells", ex.Message);
        Assert.Throws<ArgumentOutOfRangeException>(() => integrator.Step(new double[3], 0, 0.0, Ode));
        Assert.Throws<ArgumentException>(() => TimeIntegrator<double>.Create("RK4", OneCell()));
    }

    private static double ErrorAtTwo(string scheme, int steps)
    {
        var integrator = TimeIntegrator<double>.Create(scheme, OneCell());
        double dt = 2.0 / steps;
        var y = new[] { 1.0 };
        for (int n = 0; n < steps; n++)
        {
            integrator.Step(y, n * dt, dt, Ode);
        }

        return Math.Abs(y[0] - Exact(2.0));
    }

    private static FvGen.Meshes.IMesh OneCell() =>
        new FvGen.Meshes.Structured.StructuredGrid1D(
            FvGen.Meshes.Structured.GridAxis.Uniform(1, 0, 1),
            FvGen.Meshes.Structured.SideBoundary.Periodic,
            FvGen.Meshes.Structured.SideBoundary.Periodic);

    private sealed class WeightRecorder(List<double>? weights) : IStageFluxObserver
    {
        public void RecordStage(int stage, double weight, BoundaryFluxTally tally) => weights?.Add(weight);
    }
}
