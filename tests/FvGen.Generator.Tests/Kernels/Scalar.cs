using FvGen;

namespace FvGen.Generator.Tests.Kernels;

/// <summary>One conserved scalar, for linear advection and Burgers' equation.</summary>
[ConservedState]
public partial struct Scalar
{
    public double Value;

    public Scalar(double value) => Value = value;
}
