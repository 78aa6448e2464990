using FvGen.Fields;

#pragma warning disable CS0649 // layouts are read by reflection, never assigned

namespace FvGen.Runtime.Tests.Fields;

public sealed class StateLayoutTests
{
    private struct Momentum
    {
        public double X;
        public double Y;
    }

    private struct GasState
    {
        public double Density;
        public Momentum Momentum;
        public double Energy;
    }

    private struct BadState
    {
        public double Density;
        public int Species;
    }

    [Fact]
    public void NestedGroupsAreFlattenedWithDottedNames()
    {
        Assert.Equal(4, StateLayout<GasState>.ComponentCount);
        Assert.Equal(["Density", "Momentum.X", "Momentum.Y", "Energy"], StateLayout<GasState>.ComponentNames);
    }

    [Fact]
    public void NonDoubleComponentIsRejectedByName()
    {
        var ex = Assert.Throws<TypeInitializationException>(() => StateLayout<BadState>.ComponentCount);
        Assert.Contains("Species", ex.InnerException!.Message);
    }
}
