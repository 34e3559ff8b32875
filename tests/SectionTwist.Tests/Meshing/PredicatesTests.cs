using System.Numerics;
using SectionTwist.Meshing;

namespace SectionTwist.Tests.Meshing;

/// <summary>
/// The robust predicates against exact rational arithmetic (BigInteger on the binary expansions of the doubles).
/// The near-degenerate inputs follow Shewchuk's 1997 paper (section 4.2 and the figure of orient2d on points
/// near the line y = x, perturbed by single ulps) and Kettner et al., "Classroom examples of robustness problems in
/// geometric computations", CGTA 40 (2008), section 3, where naive floating point gives inconsistent answers.
/// </summary>
public class PredicatesTests
{
    private static (BigInteger Mant, int Exp) Decompose(double d)
    {
        long bits = BitConverter.DoubleToInt64Bits(d);
        bool neg = bits < 0;
        int e = (int)((bits >> 52) & 0x7FF);
        long frac = bits & 0xFFFFFFFFFFFFFL;
        BigInteger m = e == 0 ? frac : frac | (1L << 52);
        int exp = e == 0 ? -1074 : e - 1075;
        return (neg ? -m : m, exp);
    }

    /// <summary>Exact integers proportional (by one common power of two) to the given doubles.</summary>
    private static BigInteger[] Exact(params double[] v)
    {
        var parts = v.Select(Decompose).ToArray();
        int min = parts.Min(p => p.Exp);
        return parts.Select(p => p.Mant << (p.Exp - min)).ToArray();
    }

    private static int ExactOrient(double ax, double ay, double bx, double by, double cx, double cy)
    {
        var z = Exact(ax, ay, bx, by, cx, cy);
        return ((z[0] - z[4]) * (z[3] - z[5]) - (z[1] - z[5]) * (z[2] - z[4])).Sign;
    }

    private static int ExactInCircle(double ax, double ay, double bx, double by, double cx, double cy, double dx, double dy)
    {
        var z = Exact(ax, ay, bx, by, cx, cy, dx, dy);
        BigInteger adx = z[0] - z[6], ady = z[1] - z[7], bdx = z[2] - z[6], bdy = z[3] - z[7], cdx = z[4] - z[6], cdy = z[5] - z[7];
        BigInteger det = (adx * adx + ady * ady) * (bdx * cdy - cdx * bdy)
                       + (bdx * bdx + bdy * bdy) * (cdx * ady - adx * cdy)
                       + (cdx * cdx + cdy * cdy) * (adx * bdy - bdx * ady);
        return det.Sign;
    }

    // Shewchuk 1997, section 4.2 (figure of orient2d near y = x): p = (0.5 + i u, 0.5 + j u), q = (12, 12),
    // r = (24, 24), u = 2^-53. Naive evaluation misclassifies many of these; the adaptive predicate must not.
    [Fact]
    public void Orient2D_sign_is_exact_on_ulp_perturbed_collinear_points()
    {
        double u = Math.Pow(2, -53);
        int naiveWrong = 0;
        for (int i = 0; i < 64; i++)
            for (int j = 0; j < 64; j++)
            {
                double px = 0.5 + i * u, py = 0.5 + j * u;
                int exact = ExactOrient(px, py, 12, 12, 24, 24);
                Assert.Equal(exact, Math.Sign(Predicates.Orient2D(px, py, 12, 12, 24, 24)));
                double naive = (px - 24) * (12 - 24) - (py - 24) * (12 - 24);
                if (Math.Sign(naive) != exact) naiveWrong++;
            }
        Assert.True(naiveWrong > 0, "the inputs should defeat naive floating point, else the test proves nothing");
    }

    // Kettner et al. 2008, section 3: points on a line through large coordinates where the differences are inexact
    // (this exercises stages C and D of orient2dadapt).
    [Fact]
    public void Orient2D_sign_is_exact_with_inexact_differences()
    {
        var rng = new Random(7);
        for (int k = 0; k < 2000; k++)
        {
            double ax = 1e6 + rng.NextDouble(), ay = -3e5 + rng.NextDouble();
            double bx = ax + 1e-3 * rng.NextDouble(), by = ay + 1e-3 * rng.NextDouble();
            double t = rng.NextDouble() * 3 - 1;
            double cx = ax + t * (bx - ax), cy = ay + t * (by - ay);
            cx = BitConverter.Int64BitsToDouble(BitConverter.DoubleToInt64Bits(cx) + rng.Next(-2, 3));
            Assert.Equal(ExactOrient(ax, ay, bx, by, cx, cy), Math.Sign(Predicates.Orient2D(ax, ay, bx, by, cx, cy)));
        }
    }

    // Four nearly cocircular points: three exactly on the unit circle and the fourth on it perturbed by a few ulps,
    // then all translated by an offset that makes the coordinate differences inexact (stage C / exact fallback).
    [Theory]
    [InlineData(0.0)]
    [InlineData(1e3)]
    [InlineData(12345.678)]
    public void InCircle_sign_is_exact_on_nearly_cocircular_points(double offset)
    {
        double u = Math.Pow(2, -52);
        int naiveWrong = 0;
        for (int i = -8; i <= 8; i++)
            for (int j = -8; j <= 8; j++)
            {
                double ax = 1 + offset, ay = 0 + offset, bx = 0 + offset, by = 1 + offset, cx = -1 + offset, cy = offset;
                double dx = offset + i * u * Math.Max(1, offset), dy = -1 + offset + j * u * Math.Max(1, offset);
                int exact = ExactInCircle(ax, ay, bx, by, cx, cy, dx, dy);
                Assert.Equal(exact, Math.Sign(Predicates.InCircle(ax, ay, bx, by, cx, cy, dx, dy)));
                Assert.Equal(exact, Math.Sign(Predicates.InCircleExact(ax, ay, bx, by, cx, cy, dx, dy)));
                double adx = ax - dx, ady = ay - dy, bdx = bx - dx, bdy = by - dy, cdx = cx - dx, cdy = cy - dy;
                double naive = (adx * adx + ady * ady) * (bdx * cdy - cdx * bdy) + (bdx * bdx + bdy * bdy) * (cdx * ady - adx * cdy) + (cdx * cdx + cdy * cdy) * (adx * bdy - bdx * ady);
                if (Math.Sign(naive) != exact) naiveWrong++;
            }
        if (offset > 0) Assert.True(naiveWrong > 0, "the offset inputs should defeat naive floating point");
    }

    // Random points on circles with rational-ish radii, snapped to doubles: almost cocircular in general position.
    [Fact]
    public void InCircle_matches_exact_arithmetic_on_random_near_degenerate_inputs()
    {
        var rng = new Random(11);
        for (int k = 0; k < 3000; k++)
        {
            double cx0 = rng.NextDouble() * 100, cy0 = rng.NextDouble() * 100, r = 0.01 + rng.NextDouble();
            double P(double c, double a, bool sin) => c + r * (sin ? Math.Sin(a) : Math.Cos(a));
            double[] a = Enumerable.Range(0, 4).Select(_ => rng.NextDouble() * 2 * Math.PI).ToArray();
            // order three of them counter-clockwise
            Array.Sort(a, 0, 3);
            double ax = P(cx0, a[0], false), ay = P(cy0, a[0], true), bx = P(cx0, a[1], false), by = P(cy0, a[1], true);
            double cx = P(cx0, a[2], false), cy = P(cy0, a[2], true), dx = P(cx0, a[3], false), dy = P(cy0, a[3], true);
            Assert.Equal(ExactInCircle(ax, ay, bx, by, cx, cy, dx, dy), Math.Sign(Predicates.InCircle(ax, ay, bx, by, cx, cy, dx, dy)));
        }
    }

    // Exactly collinear and exactly cocircular inputs must give exactly zero.
    [Fact]
    public void Degenerate_inputs_give_zero()
    {
        Assert.Equal(ExactOrient(0.1, 0.1, 0.2, 0.2, 0.7, 0.7), Math.Sign(Predicates.Orient2D(0.1, 0.1, 0.2, 0.2, 0.7, 0.7)));
        Assert.Equal(0.0, Predicates.Orient2D(1, 2, 3, 4, 5, 6));
        Assert.Equal(0.0, Predicates.InCircle(1, 0, 0, 1, -1, 0, 0, -1));
        Assert.Equal(0.0, Predicates.InCircle(1e8 + 3, 1e8 + 4, 1e8 - 4, 1e8 + 3, 1e8 - 5, 1e8, 1e8, 1e8 - 5));
    }
}
