using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Import;

/// <summary>
/// SPLINE outlines become arcs within a tolerance whose effect on J is part of the error estimate. References: the
/// rational quadratic circle (Piegl and Tiller, The NURBS Book, 2nd ed., sec. 7.5, nine-point square control polygon)
/// is a circle exactly, area pi r^2; torsion of a solid circle J = pi r^4 / 2 (Timoshenko and Goodier, ch. 10).
/// </summary>
public class SplineDrawingTests
{
    private static DxfText RationalCircle(double r)
    {
        double w = Math.Sqrt(0.5);
        var d = new DxfText().Header(4).Entities().P(0, "SPLINE").P(8, "0").P(70, 4 + 1).P(71, 2).P(72, 12).P(73, 9);
        foreach (double k in new double[] { 0, 0, 0, 1, 1, 2, 2, 3, 3, 4, 4, 4 }) d.P(40, k);
        var pts = new (double X, double Y)[] { (r, 0), (r, r), (0, r), (-r, r), (-r, 0), (-r, -r), (0, -r), (r, -r), (r, 0) };
        for (int i = 0; i < 9; i++) d.P(10, pts[i].X).P(20, pts[i].Y).P(30, 0.0);
        for (int i = 0; i < 9; i++) d.P(41, i % 2 == 0 ? 1.0 : w);
        return d.End();
    }

    [Fact]
    public void A_rational_spline_circle_becomes_arcs_on_the_circle()
    {
        var r = RationalCircle(15).Read();
        Tol.Rel(Math.PI * 225e-6, r.Profile.Properties.Area, 1e-10, "disc r 15 (rational quadratic NURBS circle)");
        Assert.All(r.Profile.Regions[0].Outer.Segments, s => Assert.IsType<ArcSegment>(s));
        Assert.True(r.Profile.Regions[0].Outer.Segments.Count <= 64, $"{r.Profile.Regions[0].Outer.Segments.Count} arcs");
        var result = SectionAnalyzer.Analyze(r.Profile, new AnalysisOptions { Accuracy = 1e-5 });
        Tol.Rel(Math.PI * Math.Pow(0.015, 4) / 2, result.TorsionConstant, 1e-5, "J = pi r^4 / 2");
    }

    [Fact]
    public void The_curve_tolerance_of_a_fit_point_spline_is_inside_the_estimate_of_J()
    {
        // a closed cubic through 10 points of an egg-like curve (no exact J): a coarse curve tolerance (1e-3 of the size)
        // and the default one (1e-7) give different outlines; the coarse estimate covers the difference
        var d = new DxfText().Header(4).Entities().P(0, "SPLINE").P(8, "0").P(70, 1).P(71, 3).P(74, 11);
        for (int i = 0; i <= 10; i++)
        {
            double a = 2 * Math.PI * (i % 10) / 10;
            d.P(11, 20 * Math.Cos(a) + 3 * Math.Cos(2 * a)).P(21, 12 * Math.Sin(a)).P(31, 0.0);
        }
        d.End();
        var opts = new AnalysisOptions { Accuracy = 1e-3 };
        var coarse = d.Read(new DxfReadOptions { SplineTolerance = 1e-3 });
        var fine = d.Read(new DxfReadOptions { SplineTolerance = 1e-7 });
        Assert.True(coarse.Profile.CurveTolerance > 1e3 * fine.Profile.CurveTolerance);
        var jc = SectionAnalyzer.Analyze(coarse.Profile, opts);
        var jf = SectionAnalyzer.Analyze(fine.Profile, opts);
        double moved = Tol.RelErr(jf.TorsionConstant, jc.TorsionConstant);
        Assert.True(moved > 0 && moved <= jc.EstimatedRelativeError.TorsionConstant,
            $"J moved {moved:E2} between curve tolerances; the coarse estimate says {jc.EstimatedRelativeError.TorsionConstant:E2}");
        Assert.True(jf.EstimatedRelativeError.TorsionConstant <= 1e-3, "at the default curve tolerance the curve term is negligible");
    }
}
