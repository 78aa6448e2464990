namespace FvGen.Samples.Demo;

/// <summary>
/// An invented scenario: a dye-tracing test on the lower reach of the (fictional) Wrenmoor
/// irrigation channel. A pulse of dye is released near the head gate while the pump station keeps
/// feeding slightly brackish water at a steady rate; the tail end spills freely into a drain.
/// All numbers are made up for the demo.
/// </summary>
internal static class ChannelScenario
{
    /// <summary>Reach length, m.</summary>
    public const double Length = 1200.0;

    /// <summary>Cells along the reach (2 m each).</summary>
    public const int Cells = 600;

    /// <summary>Mean flow velocity, m/s (steady, uniform).</summary>
    public const double Velocity = 0.45;

    /// <summary>Longitudinal dispersion coefficient, m²/s.</summary>
    public const double Dispersion = 2.0;

    /// <summary>Where the dye is released, m from the head gate.</summary>
    public const double ReleaseAt = 150.0;

    /// <summary>Standard deviation of the released pulse, m.</summary>
    public const double PulseWidth = 15.0;

    /// <summary>Peak dye concentration of the released pulse, g/m³.</summary>
    public const double PulsePeak = 8.0;

    /// <summary>Salt already in the channel at the start, g/m³.</summary>
    public const double InitialSalt = 150.0;

    /// <summary>Salt in the water the pump station feeds in, g/m³.</summary>
    public const double InflowSalt = 400.0;

    /// <summary>Duration of the test, s (25 minutes).</summary>
    public const double Duration = 1500.0;

    /// <summary>CFL number of the combined advection–dispersion limit.</summary>
    public const double Cfl = 0.9;

    /// <summary>The water at distance <paramref name="x"/> at the start.</summary>
    public static ChannelWater Initial(double x)
    {
        double z = (x - ReleaseAt) / PulseWidth;
        return new ChannelWater { Dye = PulsePeak * Math.Exp(-0.5 * z * z), Salt = InitialSalt };
    }
}
