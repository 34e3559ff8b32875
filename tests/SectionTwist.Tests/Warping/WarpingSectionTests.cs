using SectionTwist.Geometry;
using SectionTwist.Profiles;
using SectionTwist.Torsion;
using SectionTwist.Warping;

namespace SectionTwist.Tests.Warping;

/// <summary>Section-level warping properties against exact elasticity solutions and thin-walled closed forms.</summary>
public class WarpingSectionTests
{
    private static readonly AnalysisOptions Coarse = new() { Accuracy = 1e-3, Warping = true };

    private static SectionResult Run(string spec, AnalysisOptions? o = null) => SectionAnalyzer.Analyze(ProfileTemplates.Create(spec), o ?? Coarse);

    private const string TG = "Timoshenko and Goodier, Theory of Elasticity, 3rd ed., sec. 105 (elliptic cross section)";

    // Exact warping function of the ellipse: psi = -(a^2 - b^2)/(a^2 + b^2) x y, so Iw = k^2 pi a^3 b^3 / 24,
    // max |psi| = k a b / 2 at x = a/sqrt2, y = b/sqrt2, shear centre at the centre.
    [Fact]
    public void Ellipse_matches_the_exact_warping_function()
    {
        var r = Run("ellipse:a=30,b=15");
        var w = r.Warping!;
        double a = 0.030, b = 0.015, k = (a * a - b * b) / (a * a + b * b);
        Tol.Rel(k * k * Math.PI * Math.Pow(a * b, 3) / 24, w.WarpingConstant, 1e-4, TG);
        Tol.Rel(k * a * b / 2, w.MaxSectorialCoordinate, 2e-3, TG);
        Tol.Abs(0, w.ShearCentre.X, 1e-7, TG);
        Tol.Abs(0, w.ShearCentre.Y, 1e-7, TG);
        Tol.Rel(Math.PI * Math.Pow(a * b, 3) / (a * a + b * b), w.TorsionConstantUpperBound, 1e-4, TG);
        Assert.Equal(WarpingClass.WarpingNegligible, w.Classification);
    }

    // Circle and round tube: psi = 0 (Timoshenko and Goodier sec. 104 and 115): Iw = 0, shear centre at the centre.
    [Theory]
    [InlineData("circle:d=40")]
    [InlineData("tube:D=50,d=40")]
    public void Round_sections_do_not_warp(string spec)
    {
        var r = Run(spec);
        var w = r.Warping!;
        double d4 = Math.Pow(r.Properties.PolarMoment, 1.5); // m^6 scale
        Assert.True(w.WarpingConstant < 1e-8 * d4, $"Iw = {w.WarpingConstant:E3} (reference: {TG}, psi = 0 for round sections)");
        Tol.Abs(0, w.ShearCentre.X, 1e-7, TG);
        Tol.Abs(0, w.ShearCentre.Y, 1e-7, TG);
        Assert.Equal(WarpingClass.WarpingNegligible, w.Classification);
    }

    // Rectangle a x b: J = beta a b^3 from the series (Timoshenko and Goodier sec. 109). On a polygon the mesh domain is
    // exact, so the warping J is an upper bound and the stress-function J a lower bound: the bracketed estimate holds.
    [Fact]
    public void Rectangle_warping_J_is_an_upper_bound_and_the_estimate_holds()
    {
        double a = 0.060, b = 0.020, s = 0;
        for (int n = 1; n < 60; n += 2) s += Math.Tanh(n * Math.PI * a / (2 * b)) / Math.Pow(n, 5);
        double exact = (1 - 192 / Math.Pow(Math.PI, 5) * (b / a) * s) / 3 * a * b * b * b;
        var r = Run("rect:b=60,h=20");
        var w = r.Warping!;
        Assert.True(w.TorsionConstantUpperBound >= exact * (1 - 1e-12), $"upper {w.TorsionConstantUpperBound:R} < exact {exact:R}");
        double err = Tol.RelErr(exact, r.TorsionConstant);
        Assert.True(err <= r.EstimatedRelativeError.TorsionConstant, $"error {err:E2} above the estimate {r.EstimatedRelativeError.TorsionConstant:E2} (series, Timoshenko and Goodier sec. 109)");
        Tol.Abs(0, w.ShearCentre.X, 1e-8, "symmetry");
        Tol.Abs(0, w.ShearCentre.Y, 1e-8, "symmetry");
        Assert.Equal(WarpingClass.WarpingNegligible, w.Classification);
    }

    private const string TGe = "Timoshenko and Gere, Theory of Elastic Stability, 2nd ed., sec. 5.3 (thin-walled open sections); Roark's Formulas for Stress and Strain, 7th ed., Table 10.3";

    // Doubly symmetric I, sharp corners, centreline dimensions: Iw = tf b^3 h0^2 / 24. The FE section has finite wall
    // thickness (web and flange overlap, through-thickness warping): the difference is of order t/b.
    [Theory]
    [InlineData(2.0)]
    [InlineData(4.0)]
    public void Thin_I_section_matches_the_closed_form(double t)
    {
        var w = Run(FormattableString.Invariant($"ibeam:h=200,b=100,tw={t},tf={t}")).Warping!;
        double b = 0.100, h0 = 0.200 - t / 1000, tf = t / 1000;
        Tol.Rel(tf * b * b * b * h0 * h0 / 24, w.WarpingConstant, 1.0 * tf / b, TGe);
        Tol.Abs(0, w.ShearCentre.X, 1e-8, "symmetry");
        Tol.Abs(0, w.ShearCentre.Y, 1e-8, "symmetry");
        Tol.Rel(b * h0 / 4, w.MaxSectorialCoordinate, 1.0 * tf / b, TGe + " (omega = b h0 / 4 at the flange tips)");
        Assert.Equal(WarpingClass.WarpingSensitive, w.Classification);
    }

    private const string WarpingShearSource = "Vlasov, Thin-Walled Elastic Beams, 2nd ed., ch. 1: tau_w = E S_w phi''' / t with the sectorial statical moment S_w";

    // Warping shear of a channel (centreline b, h as above, tf = tw = t, fillets r = t so no corner is singular): omega
    // runs e h / 2 at the corners and (e - b) h / 2 at the tips, so S_w along a flange is extreme where omega changes sign,
    // x = e from the web: |S_w| = t h (b - e)^2 / 4, larger than at the corner (t h b (b - 2 e) / 4) and at mid-web
    // (t h^2 b^2 t / (8 (6 b t + h t))); q_w = h (b - e)^2 / 4. The fillet adds a local concentration of order t / b.
    [Theory]
    [InlineData(1.0)]
    [InlineData(2.0)]
    [InlineData(4.0)]
    public void Channel_warping_shear_matches_the_thin_walled_value(double t)
    {
        var w = Run(FormattableString.Invariant($"channel:h=200,b=80,tw={t},tf={t},r={t}")).Warping!;
        double tt = t / 1000, b = 0.080 - tt / 2, h = 0.200 - tt;
        double e = 3 * b * b * tt / (6 * b * tt + h * tt);
        Tol.Rel(h * (b - e) * (b - e) / 4, w.WarpingShearFactor, 1.0 * tt / b, WarpingShearSource + "; S_w of the channel derived from it");
        Assert.True(w.EstimatedError.WarpingShearFactor < 1e-3 * w.WarpingShearFactor, $"estimate {w.EstimatedError.WarpingShearFactor:E2}");
    }

    // A sharp re-entrant corner makes the warping shear singular, like the Saint-Venant peak (common practice, no source):
    // its estimate is unbounded.
    [Fact]
    public void Warping_shear_at_a_sharp_corner_is_unbounded()
    {
        var w = Run("ibeam:h=200,b=100,tw=2,tf=2").Warping!;
        Assert.True(double.IsPositiveInfinity(w.EstimatedError.WarpingShearFactor));
    }

    // Channel, centreline dimensions b (flange, to the web centreline), h (between flange centrelines): shear centre
    // e = 3 b^2 tf / (6 b tf + h tw) from the web centreline, away from the flanges; Iw = tf b^3 h^2 (3 b tf + 2 h tw) / (12 (6 b tf + h tw)).
    [Theory]
    [InlineData(2.0)]
    [InlineData(4.0)]
    public void Thin_channel_matches_the_closed_form(double t)
    {
        var w = Run(FormattableString.Invariant($"channel:h=200,b=80,tw={t},tf={t}")).Warping!;
        double tf = t / 1000, tw = tf, b = 0.080 - tw / 2, h = 0.200 - tf;
        double e = 3 * b * b * tf / (6 * b * tf + h * tw);
        Tol.Rel(-e, w.ShearCentre.X - tw / 2, 1.0 * tf / b, TGe);
        Tol.Abs(0, w.ShearCentre.Y, 1e-8, "symmetry");
        Tol.Rel(tf * b * b * b * h * h * (3 * b * tf + 2 * h * tw) / (12 * (6 * b * tf + h * tw)), w.WarpingConstant, 1.5 * tf / b, TGe);
        Assert.Equal(WarpingClass.WarpingSensitive, w.Classification);
    }

    // Angle and tee: all walls meet at one point, so the shear centre is at the intersection of the leg centrelines and
    // the sectorial warping vanishes; what is left is the through-thickness warping, for an angle about
    // t^3 (b'^3 + h'^3) / 36 (leg centreline lengths; from memory, as in the steel institutes' torsion guides).
    [Fact]
    public void Angle_shear_centre_is_at_the_leg_intersection()
    {
        var r = Run("angle:h=100,b=80,t=4");
        var w = r.Warping!;
        double t = 0.004, b1 = 0.080 - t / 2, h1 = 0.100 - t / 2;
        Tol.Abs(t / 2, w.ShearCentre.X, 0.2 * t, TGe);
        Tol.Abs(t / 2, w.ShearCentre.Y, 0.2 * t, TGe);
        Tol.Rel(t * t * t * (b1 * b1 * b1 + h1 * h1 * h1) / 36, w.WarpingConstant, 0.1, "from memory");
        Assert.Equal(WarpingClass.WarpingNegligible, w.Classification);
    }

    [Fact]
    public void Tee_shear_centre_is_at_the_flange_web_intersection()
    {
        var w = Run("tee:h=100,b=100,tw=4,tf=4").Warping!;
        Tol.Abs(0, w.ShearCentre.X, 1e-8, "symmetry");
        Tol.Abs(-0.002, w.ShearCentre.Y, 0.2 * 0.004, TGe);
        Assert.Equal(WarpingClass.WarpingNegligible, w.Classification);
    }

    // Invariance (common practice, no source): the shear centre moves with the section under rotation, translation
    // and mirror; Iw and max |omega| do not change; Iw scales as length^6 and omega as length^2.
    [Fact]
    public void Shear_centre_follows_rigid_motion_mirror_and_scaling()
    {
        var p = ProfileTemplates.Create("channel:h=100,b=50,tw=5,tf=6,r=6");
        var baseW = SectionAnalyzer.Analyze(p, Coarse).Warping!;
        Assert.Null(SectionAnalyzer.Analyze(p, new AnalysisOptions { Accuracy = 1e-3 }).Warping); // off by default
        foreach (var t in new[] { new Similarity2(1, 0.7, false, new Point2(0.3, -0.2)), new Similarity2(1, -1.1, true, new Point2(-0.05, 0.4)), new Similarity2(2.5, 0.3, false, default) })
        {
            var w = SectionAnalyzer.Analyze(p.Transformed(t), Coarse).Warping!;
            var expected = t.Apply(baseW.ShearCentre);
            Tol.Abs(0, Point2.Distance(expected, w.ShearCentre), 1e-4 * 0.1 * t.Scale, "rigid motion");
            Tol.Rel(baseW.WarpingConstant * Math.Pow(t.Scale, 6), w.WarpingConstant, 2e-3, "Iw ~ length^6");
            Tol.Rel(baseW.MaxSectorialCoordinate * t.Scale * t.Scale, w.MaxSectorialCoordinate, 2e-3, "omega ~ length^2");
        }
    }
}
