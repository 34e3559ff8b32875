namespace SectionTwist.Tests;

/// <summary>Relative-tolerance assertions that print the source of the reference value on failure.</summary>
internal static class Tol
{
    /// <summary>Asserts |actual - expected| &lt;= rel * |expected|.</summary>
    public static void Rel(double expected, double actual, double rel, string source = "")
    {
        double err = Math.Abs(actual - expected) / Math.Max(Math.Abs(expected), double.Epsilon);
        Assert.True(err <= rel,
            $"expected {expected:R} got {actual:R}: relative error {err:E3} > {rel:E1}{(source.Length > 0 ? " (reference: " + source + ")" : "")}");
    }

    /// <summary>Asserts |actual - expected| &lt;= abs.</summary>
    public static void Abs(double expected, double actual, double abs, string source = "")
    {
        double err = Math.Abs(actual - expected);
        Assert.True(err <= abs,
            $"expected {expected:R} got {actual:R}: error {err:E3} > {abs:E1}{(source.Length > 0 ? " (reference: " + source + ")" : "")}");
    }

    /// <summary>Relative error of <paramref name="actual"/> against <paramref name="expected"/>.</summary>
    public static double RelErr(double expected, double actual) => Math.Abs(actual - expected) / Math.Abs(expected);
}
