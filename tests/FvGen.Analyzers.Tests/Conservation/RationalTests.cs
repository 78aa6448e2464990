using FvGen.Analyzers.Conservation;

namespace FvGen.Analyzers.Tests.Conservation;

public sealed class RationalTests
{
    [Theory]
    [InlineData(0.1, "1/10")]
    [InlineData(0.5, "1/2")]
    [InlineData(-2.5, "-5/2")]
    [InlineData(1e-3, "1/1000")]
    [InlineData(3.0, "3")]
    [InlineData(1e21, "1000000000000000000000")]
    public void LiteralsBecomeTheDecimalTheyWereWrittenAs(double literal, string expected)
    {
        Assert.True(Rational.TryFromDouble(literal, out var value));
        Assert.Equal(expected, value.ToString());
    }

    [Fact]
    public void ArithmeticIsExact()
    {
        // 1/3 + 1/6 = 1/2 exactly (in doubles it is not).
        var third = Rational.Create(1, 3);
        var sixth = Rational.Create(1, 6);
        Assert.Equal(Rational.Create(1, 2), third + sixth);
        Assert.Equal(Rational.Zero, (third * Rational.FromInteger(3)) - Rational.One);
    }

    [Fact]
    public void NanIsRejected() => Assert.False(Rational.TryFromDouble(double.NaN, out _));

    [Fact]
    public void SymbolPowersCombine()
    {
        var dtOverDx = SymPoly.Symbol("dt") * SymPoly.Symbol("dx", -1);
        Assert.Equal("dt/dx", dtOverDx.ToString());
        Assert.True((dtOverDx - (SymPoly.Symbol("dt") * SymPoly.Symbol("dx").TryReciprocal()!)).IsZero);
        Assert.Equal("1/dx²", (SymPoly.Symbol("dx", -1) * SymPoly.Symbol("dx", -1)).ToString());
    }
}
