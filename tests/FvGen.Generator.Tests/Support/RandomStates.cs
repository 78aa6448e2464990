using FvGen.Generator.Tests.Kernels;

namespace FvGen.Generator.Tests.Support;

/// <summary>Random cell states for the running tests (conservation and mode checks hold for any data).</summary>
internal static class RandomStates
{
    /// <summary>Scalars drawn uniformly from [offset, offset + range).</summary>
    public static Scalar[] Scalars(Random random, int count, double range = 1.0, double offset = 0.0)
    {
        var state = new Scalar[count];
        for (int c = 0; c < count; c++)
        {
            state[c] = new Scalar(random.NextDouble() * range + offset);
        }

        return state;
    }

    /// <summary>Shallow-water states: depth in [1, 2), each discharge component in [−1, 1).</summary>
    public static WaterState[] Water(Random random, int count)
    {
        var state = new WaterState[count];
        for (int c = 0; c < count; c++)
        {
            state[c].Depth = 1 + random.NextDouble();
            state[c].Discharge.X = random.NextDouble() * 2 - 1;
            state[c].Discharge.Y = random.NextDouble() * 2 - 1;
        }

        return state;
    }
}
