namespace FvGen.Ledger;

/// <summary>
/// A running sum with Neumaier's improvement of Kahan's compensated summation (Kahan–Babuška):
/// the rounding error of every addition is carried in a second term, so the result is as if
/// summed in about twice the precision, whatever the order and magnitudes of the terms.
/// </summary>
public struct CompensatedSum
{
    private double _sum;
    private double _compensation;

    /// <summary>The sum so far.</summary>
    public readonly double Value => _sum + _compensation;

    /// <summary>Adds <paramref name="value"/>.</summary>
    public void Add(double value)
    {
        double t = _sum + value;
        // Recover the low-order bits lost in t from whichever operand was the smaller.
        _compensation += Math.Abs(_sum) >= Math.Abs(value) ? (_sum - t) + value : (value - t) + _sum;
        _sum = t;
    }

    /// <summary>Sets the sum to zero.</summary>
    public void Reset()
    {
        _sum = 0;
        _compensation = 0;
    }
}
