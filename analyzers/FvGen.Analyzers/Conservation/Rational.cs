using System;
using System.Globalization;
using System.Numerics;

namespace FvGen.Analyzers.Conservation;

/// <summary>
/// An exact rational number. Coefficients are compared exactly: a weight of 1/dx on one side of a
/// face must cancel −1/dx on the other, not "nearly" cancel it.
/// </summary>
internal readonly struct Rational : IEquatable<Rational>, IComparable<Rational>
{
    private readonly BigInteger _denominator;

    private Rational(BigInteger numerator, BigInteger denominator)
    {
        Numerator = numerator;
        _denominator = denominator;
    }

    /// <summary>The numerator; carries the sign.</summary>
    public BigInteger Numerator { get; }

    /// <summary>The denominator; always positive (a default instance reads as zero).</summary>
    public BigInteger Denominator => _denominator.IsZero ? BigInteger.One : _denominator;

    private static readonly Rational ZeroValue = new(BigInteger.Zero, BigInteger.One);
    private static readonly Rational OneValue = new(BigInteger.One, BigInteger.One);
    private static readonly Rational MinusOneValue = new(BigInteger.MinusOne, BigInteger.One);

    public static Rational Zero => ZeroValue;

    public static Rational One => OneValue;

    public static Rational MinusOne => MinusOneValue;

    public bool IsZero => Numerator.IsZero;

    public bool IsOne => Numerator.IsOne && Denominator.IsOne;

    public bool IsInteger => Denominator.IsOne;

    public int Sign => Numerator.Sign;

    public static Rational Create(BigInteger numerator, BigInteger denominator)
    {
        if (denominator.IsZero)
        {
            throw new DivideByZeroException("A rational coefficient cannot have a zero denominator.");
        }

        if (denominator.IsOne)
        {
            // An integer: already in lowest terms.
            return new Rational(numerator, denominator);
        }

        if (denominator.Sign < 0)
        {
            numerator = -numerator;
            denominator = -denominator;
        }

        var gcd = BigInteger.GreatestCommonDivisor(numerator, denominator);
        if (!gcd.IsZero && !gcd.IsOne)
        {
            numerator /= gcd;
            denominator /= gcd;
        }

        return new Rational(numerator, denominator);
    }

    public static Rational FromInteger(long value) => Create(value, 1);

    /// <summary>
    /// The rational a programmer meant by a floating literal: the shortest decimal that round-trips
    /// (<c>0.1</c> is 1/10, not the binary neighbour of 1/10). Fails on NaN and infinities.
    /// </summary>
    public static bool TryFromDouble(double value, out Rational result)
    {
        result = Zero;
        if (double.IsNaN(value) || double.IsInfinity(value))
        {
            return false;
        }

        // Most literals of a kernel are integers, halves or quarters (1, 2, 0.5, 0.25): their shortest
        // decimal text names exactly the binary value (below a million, with at most ten significant
        // digits), so the text below would give the same number.
        for (int denominator = 1; denominator <= 8; denominator *= 2)
        {
            double scaled = value * denominator;
            if (Math.Abs(value) < 1e6 && scaled == Math.Floor(scaled))
            {
                result = Create(new BigInteger((long)scaled), denominator);
                return true;
            }
        }

        string text = value.ToString("R", CultureInfo.InvariantCulture);
        int exponent = 0;
        int e = text.IndexOfAny(new[] { 'E', 'e' });
        if (e >= 0)
        {
            exponent = int.Parse(text.Substring(e + 1), NumberStyles.AllowLeadingSign, CultureInfo.InvariantCulture);
            text = text.Substring(0, e);
        }

        bool negative = text.StartsWith("-", StringComparison.Ordinal);
        if (negative)
        {
            text = text.Substring(1);
        }

        int dot = text.IndexOf('.');
        string digits = dot < 0 ? text : text.Remove(dot, 1);
        int fractionDigits = dot < 0 ? 0 : text.Length - dot - 1;
        var numerator = BigInteger.Parse(digits, CultureInfo.InvariantCulture);
        if (negative)
        {
            numerator = -numerator;
        }

        int scale = fractionDigits - exponent;
        result = scale >= 0
            ? Create(numerator, BigInteger.Pow(10, scale))
            : Create(numerator * BigInteger.Pow(10, -scale), 1);
        return true;
    }

    public static Rational operator +(Rational a, Rational b) =>
        Create((a.Numerator * b.Denominator) + (b.Numerator * a.Denominator), a.Denominator * b.Denominator);

    public static Rational operator -(Rational a, Rational b) => a + (-b);

    public static Rational operator -(Rational a) => Create(-a.Numerator, a.Denominator);

    public static Rational operator *(Rational a, Rational b) =>
        Create(a.Numerator * b.Numerator, a.Denominator * b.Denominator);

    public static Rational operator /(Rational a, Rational b) =>
        b.IsZero ? throw new DivideByZeroException("Division of a coefficient by zero.") : Create(a.Numerator * b.Denominator, a.Denominator * b.Numerator);

    public static bool operator ==(Rational a, Rational b) => a.Equals(b);

    public static bool operator !=(Rational a, Rational b) => !a.Equals(b);

    public Rational Abs() => Sign < 0 ? -this : this;

    public bool Equals(Rational other) => Numerator == other.Numerator && Denominator == other.Denominator;

    public override bool Equals(object? obj) => obj is Rational other && Equals(other);

    public override int GetHashCode() => (Numerator.GetHashCode() * 397) ^ Denominator.GetHashCode();

    public int CompareTo(Rational other) => (Numerator * other.Denominator).CompareTo(other.Numerator * Denominator);

    /// <summary>Exact text: <c>3</c>, <c>-1/2</c>.</summary>
    public override string ToString() =>
        Denominator.IsOne
            ? Numerator.ToString(CultureInfo.InvariantCulture)
            : Numerator.ToString(CultureInfo.InvariantCulture) + "/" + Denominator.ToString(CultureInfo.InvariantCulture);

    /// <summary>C# text of the value as a double literal when it is a finite decimal, else a quotient.</summary>
    public string ToCSharp()
    {
        if (Denominator.IsOne)
        {
            return Numerator.ToString(CultureInfo.InvariantCulture);
        }

        var d = Denominator;
        while ((d % 2).IsZero)
        {
            d /= 2;
        }

        while ((d % 5).IsZero)
        {
            d /= 5;
        }

        if (d.IsOne)
        {
            return ((double)Numerator / (double)Denominator).ToString("R", CultureInfo.InvariantCulture);
        }

        return "(" + Numerator.ToString(CultureInfo.InvariantCulture) + ".0 / " + Denominator.ToString(CultureInfo.InvariantCulture) + ")";
    }
}
