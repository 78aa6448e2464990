namespace FvGen.Samples.Demo;

/// <summary>What the channel water carries, per cubic metre: two dissolved tracers, in g/m³.</summary>
[ConservedState]
internal partial struct ChannelWater
{
    /// <summary>Tracer dye released as a pulse.</summary>
    public double Dye;

    /// <summary>Dissolved salt, brought in steadily by the inflow.</summary>
    public double Salt;
}
