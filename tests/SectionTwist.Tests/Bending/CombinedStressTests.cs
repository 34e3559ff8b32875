using SectionTwist.Bending;
using SectionTwist.Geometry;
using SectionTwist.Profiles;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Bending;

public class CombinedStressTests
{
    // Solid round: sigma = 32 M / (pi d^3), tau = 16 T / (pi d^3) (Shigley 10th ed., sec. 3-12 and 3-13).
    [Fact]
    public void Round_reduces_to_closed_forms()
    {
        double d = 0.05, m = 800, t = 600;
        var s = BendingSection.Round(d);
        var p = CombinedStress.Worst(s, 0, m * 0.6, m * 0.8, t, rotating: false);
        double sigma = 32 * m / (Math.PI * d * d * d), tau = 16 * t / (Math.PI * d * d * d);
        Tol.Rel(sigma, Math.Abs(p.Normal), 1e-3, "32 M / (pi d^3) (72 samples: cos of half the spacing)");
        Tol.Rel(tau, p.Shear, 1e-12, "16 T / (pi d^3)");
        Tol.Rel(Math.Sqrt(sigma * sigma + 3 * tau * tau), p.VonMises, 1e-3);
        var rot = CombinedStress.Worst(s, 0, m * 0.6, m * 0.8, t, rotating: true);
        Tol.Rel(Math.Sqrt(sigma * sigma + 3 * tau * tau), rot.VonMises, 1e-12, "rotating: worst alignment");
        Tol.Rel(32 / (Math.PI * d * d * d), CombinedStress.BendingPerMoment(s), 1e-12);
    }

    /// <summary>
    /// Exact torsional shear on the boundary of a 2a x 2b rectangle (|x| &lt;= a, |y| &lt;= b) per unit torque, from the
    /// Saint-Venant series (Timoshenko and Goodier, Theory of Elasticity, 3rd ed., sec. 109).
    /// </summary>
    private static double RectShear(double a, double b, double x, double y)
    {
        // phi / (G theta) = sum 32 a^2 / (pi^3 n^3) (-1)^((n-1)/2) [1 - cosh(n pi y / 2a) / cosh(n pi b / 2a)] cos(n pi x / 2a)
        double px = 0, py = 0, jsum = 0;
        for (int n = 1; n < 400; n += 2)
        {
            double k = n * Math.PI / (2 * a), c = 32 * a * a / (Math.Pow(Math.PI, 3) * n * n * n) * ((n - 1) / 2 % 2 == 0 ? 1 : -1);
            // cosh(k y) / cosh(k b) and sinh(k y) / cosh(k b) without overflow
            double ay = Math.Abs(y), damp = Math.Exp(k * (ay - b)) / (1 + Math.Exp(-2 * k * b));
            double ch = damp * (1 + Math.Exp(-2 * k * ay)), sh = Math.Sign(y) * damp * (1 - Math.Exp(-2 * k * ay));
            px += c * (1 - ch) * -k * Math.Sin(k * x);
            py += c * -k * sh * Math.Cos(k * x);
            jsum += Math.Tanh(n * Math.PI * b / (2 * a)) / Math.Pow(n, 5);
        }
        double j = 16.0 / 3 * a * a * a * b * (1 - 192 / Math.Pow(Math.PI, 5) * a / b * jsum);
        return Math.Sqrt(px * px + py * py) / j;
    }

    [Fact]
    public void Rectangle_biaxial_bending_and_torsion_matches_dense_boundary_scan()
    {
        double a = 0.015, b = 0.025;   // 30 x 50 mm
        var profile = ProfileTemplates.Create("rect:b=30,h=50");
        var res = SectionAnalyzer.Analyze(profile);
        var s = BendingSection.FromSection(res);
        double ixx = 2 * a * Math.Pow(2 * b, 3) / 12, iyy = 2 * b * Math.Pow(2 * a, 3) / 12;
        Tol.Rel(ixx, s.Ixx, 1e-12); Tol.Rel(iyy, s.Iyy, 1e-12);
        double mx = 450, my = -300, t = 380, n = 20000;
        double best = 0;
        for (int side = 0; side < 4; side++)
            for (int k = 0; k <= 4000; k++)
            {
                double u = -1 + 2.0 * k / 4000;
                (double x, double y) = side switch { 0 => (a * u, b), 1 => (a * u, -b), 2 => (a, b * u), _ => (-a, b * u) };
                double sigma = n / (4 * a * b) + mx * y / ixx - my * x / iyy, tau = t * RectShear(a, b, x, y);
                best = Math.Max(best, Math.Sqrt(sigma * sigma + 3 * tau * tau));
            }
        var worst = CombinedStress.Worst(s, n, mx, my, t, rotating: false);
        Tol.Rel(best, worst.VonMises, 2e-3, "dense scan with the series shear");
    }

    // Rotating the load plane and the section together leaves the stresses unchanged (frame invariance, no source needed).
    [Fact]
    public void Rotating_section_and_load_together_is_invariant()
    {
        var res = SectionAnalyzer.Analyze(ProfileTemplates.Create("keyed:d=40"));
        var s = BendingSection.FromSection(res, 0.04);
        double mx = 300, my = 120, t = 250;
        var p0 = CombinedStress.Worst(s, 1000, mx, my, t, rotating: false);
        foreach (double ang in new[] { 0.4, 1.3, 2.9 })
        {
            double c = Math.Cos(ang), sn = Math.Sin(ang);
            var p1 = CombinedStress.Worst(s.Rotated(ang), 1000, c * mx - sn * my, sn * mx + c * my, t, rotating: false);
            Tol.Rel(p0.VonMises, p1.VonMises, 1e-9, "invariance");
            Tol.Rel(Math.Sqrt(p0.X * p0.X + p0.Y * p0.Y), Math.Sqrt(p1.X * p1.X + p1.Y * p1.Y), 1e-9);
        }
    }
}
