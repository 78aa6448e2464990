using FvGen.Ledger;

namespace FvGen.Runtime.Tests.Ledger;

public sealed class CompensatedSumTests
{
    [Fact]
    public void RecoversTermsThatPlainSummationLosesEntirely()
    {
        // Neumaier's example (A. Neumaier, ZAMM 54, 1974; from memory): 1 + 1e100 + 1 − 1e100 = 2,
        // where both plain and Kahan summation give 0.
        var sum = new CompensatedSum();
        double plain = 0;
        foreach (double x in new[] { 1.0, 1e100, 1.0, -1e100 })
        {
            sum.Add(x);
            plain += x;
        }

        Assert.Equal(0.0, plain);
        Assert.Equal(2.0, sum.Value);
    }

    [Fact]
    public void TenMillionTenthsRoundToTheExactSum()
    {
        // fl(0.1) = 0.1000000000000000055511151231257827…, so the exact sum of 1e7 copies is
        // 1e6 + 5.55e-11; the doubles next to 1e6 are 1.16e-10 apart, so the correctly rounded sum is 1e6.
        // Plain summation drifts by about 1e-4.
        var sum = new CompensatedSum();
        double plain = 0;
        for (int i = 0; i < 10_000_000; i++)
        {
            sum.Add(0.1);
            plain += 0.1;
        }

        Assert.Equal(1e6, sum.Value);
        Assert.True(Math.Abs(plain - 1e6) > 1e-6, $"plain sum {plain:R}");
    }
}
