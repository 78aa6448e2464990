using System.Collections.Generic;
using System.Collections.Immutable;
using System.Linq;

namespace FvGen.Analyzers.Conservation;

/// <summary>How a loop variable ranges.</summary>
internal enum LoopVariableKind
{
    /// <summary>An arithmetic progression (<c>for</c>, <c>Parallel.For</c>): shifts by multiples of the step telescope.</summary>
    Lattice,

    /// <summary>The elements of a collection (<c>foreach</c>): no shift relates two iterations.</summary>
    Set,
}

/// <summary>One variable of a loop nest.</summary>
internal sealed record LoopVariable(string Name, long Step, LoopVariableKind Kind);

/// <summary>The iteration space of a loop nest: up to three variables (more are accepted).</summary>
internal sealed class LoopSpace
{
    public LoopSpace(ImmutableArray<LoopVariable> variables) => Variables = variables;

    public ImmutableArray<LoopVariable> Variables { get; }

    public static LoopSpace Of(params LoopVariable[] variables) => new(variables.ToImmutableArray());

    public static LoopSpace Lattice(params string[] names) => new(names.Select(n => new LoopVariable(n, 1, LoopVariableKind.Lattice)).ToImmutableArray());

    public LoopVariable? Find(string name) => Variables.FirstOrDefault(v => v.Name == name);

    /// <summary>The lattice variables in order: the unknowns of every shift system, collected once per space.</summary>
    public IReadOnlyList<LoopVariable> LatticeVariables => _lattice ??= CollectLattice(Variables);

    private LoopVariable[]? _lattice;

    private static LoopVariable[] CollectLattice(ImmutableArray<LoopVariable> variables)
    {
        var lattice = new List<LoopVariable>(variables.Length);
        foreach (var v in variables)
        {
            if (v.Kind == LoopVariableKind.Lattice)
            {
                lattice.Add(v);
            }
        }

        return lattice.ToArray();
    }
}
