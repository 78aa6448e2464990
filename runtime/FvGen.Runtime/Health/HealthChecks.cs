using System.Globalization;
using System.Runtime.InteropServices;
using System.Text;
using FvGen.Fields;
using FvGen.Meshes;

namespace FvGen.Health;

/// <summary>
/// The checks a run makes on every cell after every step: every component finite (always), plus
/// the admissibility requirements the user adds (a positive density, a positive pressure). The first
/// failing cell, in cell order, stops the run with a message naming the cell, its centroid, the step,
/// the time and the component.
/// </summary>
public sealed class HealthChecks<TState>
    where TState : unmanaged
{
    private readonly List<ComponentRule> _componentRules = [];
    private readonly List<StateRule> _stateRules = [];

    /// <summary>
    /// Requires component <paramref name="component"/> to satisfy <paramref name="isAdmissible"/>;
    /// <paramref name="requirement"/> describes it in messages, e.g. <c>"&gt; 0"</c>.
    /// </summary>
    public HealthChecks<TState> RequireComponent(string component, Func<double, bool> isAdmissible, string requirement)
    {
        ArgumentNullException.ThrowIfNull(isAdmissible);
        ArgumentException.ThrowIfNullOrWhiteSpace(requirement);
        _componentRules.Add(new ComponentRule(StateLayout<TState>.IndexOf(component), isAdmissible, requirement));
        return this;
    }

    /// <summary>Requires component <paramref name="component"/> to be strictly positive.</summary>
    public HealthChecks<TState> RequirePositive(string component) => RequireComponent(component, static v => v > 0, "> 0");

    /// <summary>Requires component <paramref name="component"/> to be zero or positive.</summary>
    public HealthChecks<TState> RequireNonNegative(string component) => RequireComponent(component, static v => v >= 0, ">= 0");

    /// <summary>
    /// Requires the whole state of every cell to satisfy <paramref name="isAdmissible"/>;
    /// <paramref name="requirement"/> names it in messages, e.g. <c>"positive pressure"</c>.
    /// </summary>
    public HealthChecks<TState> Require(string requirement, AdmissibilityCheck<TState> isAdmissible)
    {
        ArgumentException.ThrowIfNullOrWhiteSpace(requirement);
        ArgumentNullException.ThrowIfNull(isAdmissible);
        _stateRules.Add(new StateRule(requirement, isAdmissible));
        return this;
    }

    /// <summary>Checks every cell of <paramref name="state"/>; throws an <see cref="UnhealthyStateException"/> at the first failure.</summary>
    public void Check(IMesh mesh, ReadOnlySpan<TState> state, int step, double time)
    {
        ArgumentNullException.ThrowIfNull(mesh);
        if (state.Length != mesh.CellCount)
        {
            throw new ArgumentException($"The state has {state.Length} cells but the mesh has {mesh.CellCount}.", nameof(state));
        }

        int nc = StateLayout<TState>.ComponentCount;
        ReadOnlySpan<double> u = MemoryMarshal.Cast<TState, double>(state);
        for (int c = 0; c < state.Length; c++)
        {
            int offset = c * nc;
            for (int k = 0; k < nc; k++)
            {
                if (!double.IsFinite(u[offset + k]))
                {
                    throw Fail(mesh, state, c, step, time, k, "finite", $"has a non-finite {Name(k)} = {Format(u[offset + k])}");
                }
            }

            foreach (var rule in _componentRules)
            {
                double value = u[offset + rule.Component];
                if (!rule.IsAdmissible(value))
                {
                    string requirement = $"{Name(rule.Component)} {rule.Requirement}";
                    throw Fail(mesh, state, c, step, time, rule.Component, requirement, $"violates '{requirement}': {Name(rule.Component)} = {Format(value)}");
                }
            }

            foreach (var rule in _stateRules)
            {
                if (!rule.IsAdmissible(in state[c]))
                {
                    throw Fail(mesh, state, c, step, time, -1, rule.Requirement, $"violates '{rule.Requirement}'");
                }
            }
        }
    }

    private static string Name(int component) => StateLayout<TState>.ComponentNames[component];

    private static string Format(double value) => value.ToString("R", CultureInfo.InvariantCulture);

    private static UnhealthyStateException Fail(
        IMesh mesh,
        ReadOnlySpan<TState> state,
        int cell,
        int step,
        double time,
        int component,
        string requirement,
        string what)
    {
        var position = mesh.CellCentroids[cell];
        ReadOnlySpan<double> values = MemoryMarshal.Cast<TState, double>(state.Slice(cell, 1));
        var all = new StringBuilder();
        for (int k = 0; k < values.Length; k++)
        {
            all.Append(k == 0 ? "" : ", ").Append(Name(k)).Append(" = ").Append(Format(values[k]));
        }

        string message = string.Create(
            CultureInfo.InvariantCulture,
            $"Health check failed at step {step}, t = {time:G10}: cell {mesh.DescribeCell(cell)} at {position} {what} (cell state: {all}).");
        return new UnhealthyStateException(message, step, time, cell, position, component >= 0 ? Name(component) : null, requirement);
    }

    private sealed record ComponentRule(int Component, Func<double, bool> IsAdmissible, string Requirement);

    private sealed record StateRule(string Requirement, AdmissibilityCheck<TState> IsAdmissible);
}
