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

    /// <summary>
    /// Integers, halves, quarters and eighths take a shortcut past the decimal text; it must give the
    /// number the text gives (the reference here parses the shortest round-trip text, as .NET prints it).
    /// </summary>
    [Fact]
    public void TheShortcutForDyadicLiteralsAgreesWithTheDecimalText()
    {
        var values = Enumerable.Range(-400, 801).Select(k => k / 8.0)
            .Concat([999_999.875, -999_999.5, 123_456.25, 0.1, 0.3, 1e-7, 2.5e5, 1e6, 1e6 + 0.5, 562949953421312.125, 4503599627370495.5, 1e15]);
        foreach (double v in values)
        {
            Assert.True(Rational.TryFromDouble(v, out var fast));
            Assert.Equal(FromText(v), fast);
        }
    }

    private static Rational FromText(double v)
    {
        var text = v.ToString("R", System.Globalization.CultureInfo.InvariantCulture);
        int exponent = 0;
        int e = text.IndexOfAny(['E', 'e']);
        if (e >= 0)
        {
            exponent = int.Parse(text[(e + 1)..], System.Globalization.CultureInfo.InvariantCulture);
            text = text[..e];
        }

        int dot = text.IndexOf('.');
        int fraction = dot < 0 ? 0 : text.Length - dot - 1;
        var digits = System.Numerics.BigInteger.Parse(text.Replace(".", string.Empty), System.Globalization.CultureInfo.InvariantCulture);
        int scale = fraction - exponent;
        return scale >= 0
            ? Rational.Create(digits, System.Numerics.BigInteger.Pow(10, scale))
            : Rational.Create(digits * System.Numerics.BigInteger.Pow(10, -scale), 1);
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
