using SectionTwist.Plastic;
using Xunit;

namespace SectionTwist.Tests.Plastic;

/// <summary>
/// Brent's line minimum (Brent 1973, ch. 5): exact minima of simple convex functions (closed form, derived in the test),
/// minima on an end of the interval, and fewer function values than a golden-section search to the same width on a
/// smooth function (the golden-section count is log(width/tol)/log(1.618), common practice, no source).
/// </summary>
public class LineMinimumTests
{
    [Theory]
    [InlineData(0.3, 0.0, 1.0)]
    [InlineData(-2.5, -10.0, 4.0)]
    [InlineData(1e-4, 0.0, 1e-3)]
    public void Finds_the_vertex_of_a_parabola_within_the_tolerance(double x0, double a, double b)
    {
        double tol = 1e-8 * (b - a);
        int calls = 0;
        double x = LineMinimum.Minimize(x => { calls++; return (x - x0) * (x - x0); }, a, b, tol);
        Assert.True(Math.Abs(x - x0) <= tol, $"x = {x}, expected {x0}");
        double goldenCalls = Math.Log((b - a) / tol) / Math.Log(1.618034);
        Assert.True(calls < goldenCalls, $"{calls} calls, golden section needs about {goldenCalls:F0}");
    }

    [Fact]
    public void Finds_a_smooth_non_quadratic_minimum()
    {
        // f = exp(x) - 2 x has its minimum at ln 2; f is flat to round-off within about sqrt(eps) of it, so 1e-6
        double x = LineMinimum.Minimize(x => Math.Exp(x) - 2 * x, -3, 5, 1e-6);
        Assert.True(Math.Abs(x - Math.Log(2)) <= 1e-6, $"x = {x}");
    }

    [Theory]
    [InlineData(true)]
    [InlineData(false)]
    public void Approaches_a_minimum_on_an_end_of_the_interval(bool left)
    {
        double x = LineMinimum.Minimize(x => left ? x : -x, 2, 7, 1e-9);
        Assert.True(Math.Abs(x - (left ? 2 : 7)) <= 1e-9, $"x = {x}");
    }

    [Fact]
    public void Handles_a_kink_and_an_empty_interval()
    {
        // |x - 0.7| + 0.1 x: not differentiable at the minimum (the obstacle energies can have kinks)
        double x = LineMinimum.Minimize(x => Math.Abs(x - 0.7) + 0.1 * x, 0, 1, 1e-9);
        Assert.True(Math.Abs(x - 0.7) <= 1e-9, $"x = {x}");
        Assert.Equal(3.0, LineMinimum.Minimize(x => x * x, 3, 3, 1e-9));
    }
}
