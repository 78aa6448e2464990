using System.Globalization;
using System.Runtime.InteropServices;
using FvGen.Fields;
using FvGen.Meshes;
using FvGen.Time;

namespace FvGen.Ledger;

/// <summary>
/// Balances, after every time step, the change of each conserved total Σ U·V against the boundary
/// fluxes the residual actually applied, weighted by the integrator's effective stage weights.
/// </summary>
/// <remarks>
/// <para>
/// For a conservative residual and an integrator with effective stage weights b_s,
/// Σ_c V_c (U(n+1) − U(n)) = −Δt Σ_s b_s Σ_p F_{s,p}, where F_{s,p} is the outflow through patch p
/// reported in stage s. The ledger computes the <em>imbalance</em>
/// Δ total + Δt Σ_s b_s Σ_p F_{s,p} per component, for the step and since the start; it is zero up to
/// rounding for a conservative scheme.
/// </para>
/// <para>
/// The relative imbalance divides by a scale: for a step, the largest of Σ |U|·V before and after the
/// step and Δt Σ_s b_s Σ_p |F_{s,p}|; since the start, the largest of Σ |U|·V at the start and now and
/// the accumulated Σ Δt b_s |F_{s,p}|. Sums of magnitudes, rather than |total|, because rounding errors
/// scale with them, and a total that is near zero (a momentum with both signs) must not make rounding
/// look like an imbalance. When the scale is zero, the relative imbalance is 0 for a zero imbalance
/// and +∞ otherwise. Totals and accumulated flows use compensated (Neumaier) summation.
/// </para>
/// <para>
/// Call <see cref="Start"/> on the initial state, then per step <see cref="BeginStep"/>, the
/// integrator's step with this ledger as observer, and <see cref="EndStep"/>. A step or cumulative
/// relative imbalance above <see cref="LedgerOptions"/>' tolerances throws a
/// <see cref="ConservationImbalanceException"/> naming step, time, component and imbalance.
/// </para>
/// </remarks>
public sealed class ConservationLedger<TState> : IStageFluxObserver
    where TState : unmanaged
{
    private readonly IMesh _mesh;
    private readonly int _components;
    private readonly int _patches;
    private readonly bool[] _exempt;

    private readonly double[] _initialTotals;
    private readonly double[] _initialMagnitudes;
    private readonly double[] _totals;
    private readonly double[] _magnitudes;
    private readonly double[] _previousTotals;
    private readonly double[] _previousMagnitudes;
    private readonly CompensatedSum[] _totalSums;
    private readonly CompensatedSum[] _magnitudeSums;

    private readonly double[] _stageFlux;
    private readonly double[] _stageFluxMagnitude;
    private readonly double[] _stepOutflow;
    private readonly CompensatedSum[] _cumulativeOutflow;
    private readonly CompensatedSum[] _cumulativeNetOutflow;
    private readonly CompensatedSum[] _cumulativeFlowMagnitude;
    private readonly CompensatedSum[] _inflow;
    private readonly CompensatedSum[] _outflow;

    private readonly double[] _stepImbalance;
    private readonly double[] _stepRelative;
    private readonly double[] _cumulativeImbalance;
    private readonly double[] _cumulativeRelative;
    private readonly double[] _worstStepRelative;

    private double _dt = double.NaN;
    private bool _started;
    private bool _inStep;

    /// <summary>Creates a ledger for the cells and patches of <paramref name="mesh"/>.</summary>
    public ConservationLedger(IMesh mesh, LedgerOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        _mesh = mesh;
        Options = options ?? new LedgerOptions();
        if (!(Options.StepTolerance >= 0) || !(Options.CumulativeTolerance >= 0))
        {
            throw new ArgumentException("Ledger tolerances must be non-negative (use +∞ to never stop).", nameof(options));
        }

        _components = StateLayout<TState>.ComponentCount;
        _patches = mesh.PatchNames.Count;
        _exempt = new bool[_components];
        foreach (string name in Options.ExemptComponents)
        {
            _exempt[StateLayout<TState>.IndexOf(name)] = true;
        }

        int nc = _components;
        int flows = _patches * nc;
        _initialTotals = new double[nc];
        _initialMagnitudes = new double[nc];
        _totals = new double[nc];
        _magnitudes = new double[nc];
        _previousTotals = new double[nc];
        _previousMagnitudes = new double[nc];
        _totalSums = new CompensatedSum[nc];
        _magnitudeSums = new CompensatedSum[nc];
        _stageFlux = new double[flows];
        _stageFluxMagnitude = new double[nc];
        _stepOutflow = new double[flows];
        _cumulativeOutflow = new CompensatedSum[flows];
        _cumulativeNetOutflow = new CompensatedSum[nc];
        _cumulativeFlowMagnitude = new CompensatedSum[nc];
        _inflow = new CompensatedSum[nc];
        _outflow = new CompensatedSum[nc];
        _stepImbalance = new double[nc];
        _stepRelative = new double[nc];
        _cumulativeImbalance = new double[nc];
        _cumulativeRelative = new double[nc];
        _worstStepRelative = new double[nc];
    }

    /// <summary>The tolerances and exemptions in force.</summary>
    public LedgerOptions Options { get; }

    /// <summary>Component names, in component order.</summary>
    public IReadOnlyList<string> ComponentNames => StateLayout<TState>.ComponentNames;

    /// <summary>Patch names, in patch order.</summary>
    public IReadOnlyList<string> PatchNames => _mesh.PatchNames;

    /// <summary>Steps balanced since <see cref="Start"/>.</summary>
    public int StepCount { get; private set; }

    /// <summary>Time of the last balanced state.</summary>
    public double Time { get; private set; }

    /// <summary>Σ U·V of each component at the start.</summary>
    public ReadOnlySpan<double> InitialTotals => _initialTotals;

    /// <summary>Σ U·V of each component now.</summary>
    public ReadOnlySpan<double> Totals => _totals;

    /// <summary>The last step's imbalance per component: Δ total + Δt Σ_s b_s Σ_p F_{s,p}.</summary>
    public ReadOnlySpan<double> StepImbalances => _stepImbalance;

    /// <summary>The last step's relative imbalance per component.</summary>
    public ReadOnlySpan<double> StepRelativeImbalances => _stepRelative;

    /// <summary>The imbalance accumulated since the start per component: (total − initial total) + accumulated outflow.</summary>
    public ReadOnlySpan<double> CumulativeImbalances => _cumulativeImbalance;

    /// <summary>The relative imbalance accumulated since the start per component.</summary>
    public ReadOnlySpan<double> CumulativeRelativeImbalances => _cumulativeRelative;

    /// <summary>The largest step relative imbalance of each component seen since the start.</summary>
    public ReadOnlySpan<double> WorstStepRelativeImbalances => _worstStepRelative;

    /// <summary>The last step's relative imbalance, largest over the components that are not exempt.</summary>
    public double StepRelativeImbalance => WorstOf(_stepRelative);

    /// <summary>The relative imbalance since the start, largest over the components that are not exempt.</summary>
    public double CumulativeRelativeImbalance => WorstOf(_cumulativeRelative);

    /// <summary>Records the totals of the initial state at <paramref name="time"/>; resets every accumulated flow.</summary>
    public void Start(ReadOnlySpan<TState> state, double time)
    {
        ComputeTotals(state, _initialTotals, _initialMagnitudes);
        _initialTotals.CopyTo(_totals, 0);
        _initialMagnitudes.CopyTo(_magnitudes, 0);
        Array.Clear(_cumulativeOutflow);
        Array.Clear(_cumulativeNetOutflow);
        Array.Clear(_cumulativeFlowMagnitude);
        Array.Clear(_inflow);
        Array.Clear(_outflow);
        Array.Clear(_stepImbalance);
        Array.Clear(_stepRelative);
        Array.Clear(_cumulativeImbalance);
        Array.Clear(_cumulativeRelative);
        Array.Clear(_worstStepRelative);
        StepCount = 0;
        Time = time;
        _started = true;
        _inStep = false;
    }

    /// <summary>Opens a step of size <paramref name="dt"/>: the stage fluxes recorded next belong to it.</summary>
    public void BeginStep(double dt)
    {
        if (!_started)
        {
            throw new InvalidOperationException("The ledger was not started: call Start with the initial state first.");
        }

        if (!(dt > 0 && double.IsFinite(dt)))
        {
            throw new ArgumentOutOfRangeException(nameof(dt), dt, "The time step must be positive and finite.");
        }

        _dt = dt;
        Array.Clear(_stageFlux);
        Array.Clear(_stageFluxMagnitude);
        _inStep = true;
    }

    /// <inheritdoc />
    public void RecordStage(int stage, double weight, BoundaryFluxTally tally)
    {
        ArgumentNullException.ThrowIfNull(tally);
        if (!_inStep)
        {
            throw new InvalidOperationException("A stage was recorded outside a step: call BeginStep before the integrator's step.");
        }

        if (tally.PatchCount != _patches || tally.ComponentCount != _components)
        {
            throw new ArgumentException(
                $"The tally has {tally.PatchCount} patches x {tally.ComponentCount} components; the ledger expects {_patches} x {_components}.",
                nameof(tally));
        }

        ReadOnlySpan<double> totals = tally.Totals;
        for (int i = 0; i < totals.Length; i++)
        {
            double flux = weight * totals[i];
            _stageFlux[i] += flux;
            _stageFluxMagnitude[i % _components] += Math.Abs(flux);
        }
    }

    /// <summary>
    /// Closes step <paramref name="step"/>, whose result <paramref name="state"/> holds at <paramref name="time"/>:
    /// computes the new totals and imbalances, and throws a <see cref="ConservationImbalanceException"/>
    /// when a component that is not exempt exceeds a tolerance.
    /// </summary>
    public void EndStep(ReadOnlySpan<TState> state, int step, double time)
    {
        if (!_inStep)
        {
            throw new InvalidOperationException("EndStep without BeginStep.");
        }

        _inStep = false;
        _totals.CopyTo(_previousTotals, 0);
        _magnitudes.CopyTo(_previousMagnitudes, 0);
        ComputeTotals(state, _totals, _magnitudes);

        int nc = _components;
        Span<double> stepNet = stackalloc double[nc];
        stepNet.Clear();
        for (int p = 0; p < _patches; p++)
        {
            for (int k = 0; k < nc; k++)
            {
                int i = p * nc + k;
                double outflow = _dt * _stageFlux[i];
                _stepOutflow[i] = outflow;
                _cumulativeOutflow[i].Add(outflow);
                _cumulativeNetOutflow[k].Add(outflow);
                stepNet[k] += outflow;
                if (outflow < 0)
                {
                    _inflow[k].Add(-outflow);
                }
                else
                {
                    _outflow[k].Add(outflow);
                }
            }
        }

        for (int k = 0; k < nc; k++)
        {
            double flowMagnitude = _dt * _stageFluxMagnitude[k];
            _cumulativeFlowMagnitude[k].Add(flowMagnitude);

            double imbalance = (_totals[k] - _previousTotals[k]) + stepNet[k];
            _stepImbalance[k] = imbalance;
            _stepRelative[k] = Relative(imbalance, Math.Max(Math.Max(_previousMagnitudes[k], _magnitudes[k]), flowMagnitude));
            if (!(_stepRelative[k] <= _worstStepRelative[k]))
            {
                _worstStepRelative[k] = _stepRelative[k];
            }

            double cumulative = (_totals[k] - _initialTotals[k]) + _cumulativeNetOutflow[k].Value;
            _cumulativeImbalance[k] = cumulative;
            _cumulativeRelative[k] = Relative(
                cumulative,
                Math.Max(Math.Max(_initialMagnitudes[k], _magnitudes[k]), _cumulativeFlowMagnitude[k].Value));
        }

        StepCount = step;
        Time = time;

        for (int k = 0; k < nc; k++)
        {
            if (_exempt[k])
            {
                continue;
            }

            if (!(_stepRelative[k] <= Options.StepTolerance))
            {
                throw Imbalance(step, time, k, cumulative: false);
            }

            if (!(_cumulativeRelative[k] <= Options.CumulativeTolerance))
            {
                throw Imbalance(step, time, k, cumulative: true);
            }
        }
    }

    /// <summary>The outflow through patch <paramref name="patch"/> of component <paramref name="component"/> accumulated since the start (negative for inflow).</summary>
    public double CumulativeOutflow(int patch, int component) => _cumulativeOutflow[patch * _components + component].Value;

    /// <summary>The outflow through each patch in the last step, Δt Σ_s b_s F_{s,p}, patch by patch.</summary>
    public ReadOnlySpan<double> StepOutflows => _stepOutflow;

    /// <summary>A snapshot of the balance of every component.</summary>
    public LedgerSummary Summarize()
    {
        var components = new LedgerComponentSummary[_components];
        for (int k = 0; k < _components; k++)
        {
            var patchOutflow = new double[_patches];
            for (int p = 0; p < _patches; p++)
            {
                patchOutflow[p] = CumulativeOutflow(p, k);
            }

            components[k] = new LedgerComponentSummary(
                ComponentNames[k],
                _initialTotals[k],
                _totals[k],
                _inflow[k].Value,
                _outflow[k].Value,
                patchOutflow,
                _cumulativeImbalance[k],
                _cumulativeRelative[k],
                _worstStepRelative[k],
                _exempt[k]);
        }

        return new LedgerSummary(StepCount, Time, PatchNames.ToArray(), components);
    }

    private void ComputeTotals(ReadOnlySpan<TState> state, double[] totals, double[] magnitudes)
    {
        if (state.Length != _mesh.CellCount)
        {
            throw new ArgumentException($"The state has {state.Length} cells but the mesh has {_mesh.CellCount}.", nameof(state));
        }

        ReadOnlySpan<double> u = MemoryMarshal.Cast<TState, double>(state);
        ReadOnlySpan<double> volumes = _mesh.CellVolumes;
        int nc = _components;
        Array.Clear(_totalSums);
        Array.Clear(_magnitudeSums);
        for (int c = 0; c < volumes.Length; c++)
        {
            double volume = volumes[c];
            int offset = c * nc;
            for (int k = 0; k < nc; k++)
            {
                double amount = u[offset + k] * volume;
                _totalSums[k].Add(amount);
                _magnitudeSums[k].Add(Math.Abs(amount));
            }
        }

        for (int k = 0; k < nc; k++)
        {
            totals[k] = _totalSums[k].Value;
            magnitudes[k] = _magnitudeSums[k].Value;
        }
    }

    private static double Relative(double imbalance, double scale)
    {
        if (scale > 0)
        {
            return Math.Abs(imbalance) / scale;
        }

        return imbalance == 0 ? 0 : double.PositiveInfinity;
    }

    private double WorstOf(double[] values)
    {
        double worst = 0;
        for (int k = 0; k < values.Length; k++)
        {
            if (!_exempt[k] && !(values[k] <= worst))
            {
                worst = values[k];
            }
        }

        return worst;
    }

    private ConservationImbalanceException Imbalance(int step, double time, int component, bool cumulative)
    {
        string name = ComponentNames[component];
        double imbalance = cumulative ? _cumulativeImbalance[component] : _stepImbalance[component];
        double relative = cumulative ? _cumulativeRelative[component] : _stepRelative[component];
        double tolerance = cumulative ? Options.CumulativeTolerance : Options.StepTolerance;
        double change = cumulative ? _totals[component] - _initialTotals[component] : _totals[component] - _previousTotals[component];
        double outflow = 0;
        if (cumulative)
        {
            outflow = _cumulativeNetOutflow[component].Value;
        }
        else
        {
            for (int p = 0; p < _patches; p++)
            {
                outflow += _stepOutflow[p * _components + component];
            }
        }

        string what = cumulative ? "since the start of the run" : "in this step";
        var inv = CultureInfo.InvariantCulture;
        string message =
            string.Create(inv, $"Conservation ledger: step {step}, t = {time:G10}: component '{name}' is out of balance {what} by {imbalance:G6} ") +
            string.Create(inv, $"(relative {relative:G3}, tolerance {tolerance:G3}). Change of the total: {change:G10}; ") +
            string.Create(inv, $"boundary outflow (dt * sum of stage weight * flux): {outflow:G10}; they should cancel. ") +
            "Look for a face term applied to one cell only, a flux evaluated differently on the two sides of a face, " +
            "or a boundary flux missing from the tally.";
        return new ConservationImbalanceException(message, step, time, name, imbalance, relative, cumulative);
    }
}
