using SectionTwist.Plastic;

namespace SectionTwist.Tests.Plastic;

/// <summary>The bracketing root search of the hole constants (Illinois regula falsi; Dowell and Jarratt, BIT 11, 1971).</summary>
public class MonotoneRootTests
{
    // the root of a smooth increasing function, from starts on both sides and at the ends; superlinear convergence means a
    // handful of values (Illinois: order about 1.44, Dowell and Jarratt)
    [Theory]
    [InlineData(0.0)]
    [InlineData(0.3)]
    [InlineData(0.9)]
    [InlineData(2.0)]
    public void Finds_the_root_of_a_smooth_increasing_function_in_few_values(double start)
    {
        int calls = 0;
        double root = Math.Log(2); // exp(x) - 2
        double x = MonotoneRoot.Find(v => { calls++; return Math.Exp(v) - 2; }, 0, 2, start, 1e-12);
        Tol.Abs(root, x, 1e-12, "exp(ln 2) = 2");
        Assert.True(calls <= 25, $"{calls} values");
    }

    // a function positive (negative) over the whole interval: the minimiser of its convex primitive is that end
    [Fact]
    public void Returns_the_end_when_the_sign_does_not_change()
    {
        Assert.Equal(1.0, MonotoneRoot.Find(v => v + 5, 1, 3, 2, 1e-9));
        Assert.Equal(3.0, MonotoneRoot.Find(v => v - 5, 1, 3, 2, 1e-9));
        Assert.Equal(4.0, MonotoneRoot.Find(v => v, 4, 4, 0, 1e-9));
    }

    // a jump (the derivative of a convex function with a kink) is located like a root, to the tolerance
    [Fact]
    public void Locates_a_jump_to_the_tolerance()
    {
        double x = MonotoneRoot.Find(v => v < 0.7 ? -1 : 1, 0, 1, 0.1, 1e-10);
        Tol.Abs(0.7, x, 2e-10, "step at 0.7");
    }
}
