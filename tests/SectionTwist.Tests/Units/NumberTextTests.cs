using System.Globalization;
using FsCheck;
using FsCheck.Xunit;
using SectionTwist.Units;

namespace SectionTwist.Tests.Units;

/// <summary>
/// The house number style (issue 11: "1.2E+04" psi, E+006 in the report and bench, -4.7E-16 centroids). The rules are our
/// own (common practice, no source): plain decimals from 0.001 to under a million, else one exponent style with two digits.
/// </summary>
public sealed class NumberTextTests
{
    [Theory]
    [InlineData(12000, 4, "12000")]          // a psi limit: was "1.2E+04" with G4
    [InlineData(112.5, 4, "112.5")]
    [InlineData(0.93, 4, "0.93")]
    [InlineData(437.676, 5, "437.68")]
    [InlineData(999999.7, 5, "1.0000E+06")]  // rounds up out of the plain range
    [InlineData(2.21912e6, 6, "2.21912E+06")]
    [InlineData(0.00012, 3, "1.20E-04")]
    [InlineData(-4.7e-16, 5, "-4.7000E-16")]
    [InlineData(0, 5, "0")]
    [InlineData(-0.0, 5, "0")]
    [InlineData(1e300, 3, "1.00E+300")]
    [InlineData(double.PositiveInfinity, 3, "∞")]
    [InlineData(double.NaN, 3, "n/a")]
    public void Format_is_plain_in_the_middle_and_two_digit_exponents_outside(double v, int digits, string expected) =>
        Assert.Equal(expected, NumberText.Format(v, digits));

    [Theory]
    [InlineData(2.8e-10, 2, "2.8E-10")]
    [InlineData(9e-4, 2, "9.0E-04")]
    [InlineData(1e-4, 1, "1E-04")]
    [InlineData(1.2345e4, 2, "1.2E+04")]
    public void Exponent_has_two_exponent_digits(double v, int digits, string expected) =>
        Assert.Equal(expected, NumberText.Exponent(v, digits));

    [Fact]
    public void Fixed_never_prints_minus_zero() =>
        Assert.Equal(["0.0000", "-0.0001", "2.00"], [NumberText.Fixed(-1e-9, 4), NumberText.Fixed(-1e-4, 4), NumberText.Fixed(2, 2)]);

    [Theory]
    [InlineData(-9.09e-13, 437.7, 1e-10, 0)]      // a reaction of round-off size next to 437.7 N*m applied
    [InlineData(1e-6, 437.7, 1e-10, 1e-6)]        // a small but real value stays
    public void Clean_zeroes_round_off_relative_to_its_scale(double v, double scale, double rel, double expected) =>
        Assert.Equal(expected, NumberText.Clean(v, scale, rel));

    [Fact]
    public void Styled_maps_dotnet_formats_to_the_house_style() =>
        Assert.Equal(["12000", "3.14", "1.2E+04"], [NumberText.Styled(12000, "G4"), NumberText.Styled(Math.PI, "F2"), NumberText.Styled(12345, "E1")]);

    // Any finite value formats to a number that reads back within half a unit in the last printed digit, and an exponent,
    // when there is one, has at least two digits.
    [Property(MaxTest = 300)]
    public bool Format_reads_back_to_its_digits(NormalFloat x, PositiveInt d)
    {
        double v = x.Get;
        int digits = 1 + d.Get % 8;
        string s = NumberText.Format(v, digits);
        double back = double.Parse(s, NumberStyles.Float, CultureInfo.InvariantCulture);
        int e = s.IndexOf('E', StringComparison.Ordinal);
        bool exponentOk = e < 0 || s.Length - e - 2 >= 2;
        return exponentOk && (v == 0 ? back == 0 : Math.Abs(back - v) <= 0.5000001 * Math.Pow(10, Math.Floor(Math.Log10(Math.Abs(v))) - digits + 1) * 1.0000001 + 1e-300);
    }
}
