using SectionTwist.Geometry;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Torsion;

/// <summary>End-to-end checks of <see cref="SectionAnalyzer"/> against exact solutions (references named per test).</summary>
public class SectionAnalyzerTests
{
    private static Profile P(Loop outer, params Loop[] holes) => new([new Region(outer, holes)]);

    // Solid circle: J = pi d^4 / 32, tau = 16 T / (pi d^3) (Timoshenko and Goodier, ch. 10, exact).
    [Theory]
    [InlineData(1e-4, 1e-4, 5e-3)]
    [InlineData(1e-6, 1e-6, 1e-3)]
    public void Circle_matches_exact(double accuracy, double tolJ, double tolT)
    {
        double d = 0.04;
        var r = SectionAnalyzer.Analyze(P(LoopBuilder.Circle(default, d / 2)), new AnalysisOptions { Accuracy = accuracy });
        Tol.Rel(Math.PI * Math.Pow(d, 4) / 32, r.TorsionConstant, tolJ, "circle, exact");
        Tol.Rel(16 / (Math.PI * d * d * d), r.MaxShearPerTorque, tolT, "circle, exact");
        Assert.True(r.EstimatedRelativeError.TorsionConstant <= accuracy, $"estimate {r.EstimatedRelativeError.TorsionConstant}");
        Assert.Empty(r.Warnings);
    }

    // Hollow circle: J = pi (D^4 - d^4) / 32, tau = 16 T D / (pi (D^4 - d^4)) (Timoshenko and Goodier, ch. 10).
    [Theory]
    [InlineData(1e-4, 1e-4, 5e-3)]
    [InlineData(1e-6, 1e-6, 1e-3)]
    public void Hollow_circle_matches_exact(double accuracy, double tolJ, double tolT)
    {
        double D = 0.05, d = 0.036;
        var r = SectionAnalyzer.Analyze(P(LoopBuilder.Circle(default, D / 2), LoopBuilder.Circle(new Point2(0, 0), d / 2)),
            new AnalysisOptions { Accuracy = accuracy });
        double j = Math.PI * (Math.Pow(D, 4) - Math.Pow(d, 4)) / 32;
        Tol.Rel(j, r.TorsionConstant, tolJ, "hollow circle, exact");
        Tol.Rel(16 * D / (Math.PI * (Math.Pow(D, 4) - Math.Pow(d, 4))), r.MaxShearPerTorque, tolT, "hollow circle, exact");
        Tol.Abs(D / 2, r.MaxShearLocation.Length, 1e-3 * D, "peak on the outer surface");
    }

    // Ellipse a >= b: J = pi a^3 b^3 / (a^2 + b^2), tau = 2 T / (pi a b^2) at the ends of the minor axis
    // (Timoshenko and Goodier, sec. 105, exact).
    [Theory]
    [InlineData(2.0, 1e-4, 1e-4, 5e-3)]
    [InlineData(4.0, 1e-4, 1e-4, 5e-3)]
    [InlineData(2.0, 1e-6, 1e-6, 1e-3)]
    [InlineData(4.0, 1e-6, 1e-6, 1e-3)]
    public void Ellipse_matches_exact(double ratio, double accuracy, double tolJ, double tolT)
    {
        double a = 0.02, b = a / ratio;
        var r = SectionAnalyzer.Analyze(P(new Loop([EllipticalArcSegment.Full(default, a, b)])), new AnalysisOptions { Accuracy = accuracy });
        Tol.Rel(Math.PI * Math.Pow(a * b, 3) / (a * a + b * b), r.TorsionConstant, tolJ, "ellipse, exact");
        Tol.Rel(2 / (Math.PI * a * b * b), r.MaxShearPerTorque, tolT, "ellipse, exact");
        Tol.Abs(b, Math.Abs(r.MaxShearLocation.Y), 2e-3 * a, "peak at the end of the minor axis");
    }

    // Equilateral triangle side a: J = sqrt(3) a^4 / 80, tau = 20 T / a^3 at mid-side (Timoshenko and Goodier, sec. 106).
    [Theory]
    [InlineData(1e-4, 1e-4, 5e-3)]
    [InlineData(1e-6, 1e-6, 1e-3)]
    public void Equilateral_triangle_matches_exact(double accuracy, double tolJ, double tolT)
    {
        double s = 0.03, h = s * Math.Sqrt(3) / 2;
        var r = SectionAnalyzer.Analyze(P(LoopBuilder.Polygon([new(-s / 2, 0), new(s / 2, 0), new(0, h)])), new AnalysisOptions { Accuracy = accuracy });
        Tol.Rel(Math.Sqrt(3) * Math.Pow(s, 4) / 80, r.TorsionConstant, tolJ, "equilateral triangle, exact");
        Tol.Rel(20 / (s * s * s), r.MaxShearPerTorque, tolT, "equilateral triangle, exact");
    }

    // Rectangle series (Timoshenko and Goodier sec. 109; table in Roark 7th ed. Table 10.1), evaluated here.
    [Theory]
    [InlineData(1.0)]
    [InlineData(2.0)]
    [InlineData(4.0)]
    [InlineData(10.0)]
    public void Rectangle_matches_series(double aspect)
    {
        double b = 0.01, a = aspect * b;
        var (beta, alpha) = SectionTwist.Tests.References.Published.Rectangle(a, b);
        var r = SectionAnalyzer.Analyze(P(LoopBuilder.Polygon([new(0, 0), new(a, 0), new(a, b), new(0, b)])));
        Tol.Rel(beta * a * b * b * b, r.TorsionConstant, 1e-4, "rectangle series");
        Tol.Rel(1 / (alpha * a * b * b), r.MaxShearPerTorque, 5e-3, "rectangle series");
    }

    // Thin-walled closed section (Bredt-Batho): J = 4 A_m^2 t / perimeter_m for a thin circular tube = 2 pi r^3 t.
    // Thin-wall theory neglects terms of order (t / 2r)^2 (exact: 2 pi r^3 t (1 + (t/2r)^2)), 2.5e-3 here.
    [Fact]
    public void Thin_tube_matches_Bredt_within_thin_wall_error()
    {
        double rm = 0.05, t = 0.005;
        var r = SectionAnalyzer.Analyze(P(LoopBuilder.Circle(default, rm + t / 2), LoopBuilder.Circle(default, rm - t / 2)));
        Tol.Rel(2 * Math.PI * rm * rm * rm * t, r.TorsionConstant, 1.2 * (t / (2 * rm)) * (t / (2 * rm)), "Bredt-Batho thin tube");
        // tau = T / (2 A_m t) (Bredt), thin-wall error of order t / 2r
        Tol.Rel(1 / (2 * Math.PI * rm * rm * t), r.MaxShearPerTorque, 0.06, "Bredt shear, thin wall");
    }

    // Open thin-walled section: J = sum b t^3 / 3 (Hearn, Mechanics of Materials, thin open sections). The theory
    // ignores the end and junction effects; for a tee of two b/t = 20 strips the difference is a few percent.
    [Fact]
    public void Thin_tee_matches_open_section_theory_within_end_effects()
    {
        double b = 0.1, t = 0.005;
        var tee = LoopBuilder.Polygon([new(-b / 2, 0), new(b / 2, 0), new(b / 2, t), new(t / 2, t), new(t / 2, b), new(-t / 2, b), new(-t / 2, t), new(-b / 2, t)]);
        var r = SectionAnalyzer.Analyze(P(tee), new AnalysisOptions { Accuracy = 1e-3 });
        double theory = (b * t * t * t + (b - t) * t * t * t) / 3;
        Tol.Rel(theory, r.TorsionConstant, 0.06, "sum b t^3 / 3, thin open section");
        Assert.Contains(r.Warnings, w => w.Code == "sharp-reentrant-corner");
    }

    [Fact]
    public void Two_disjoint_regions_add_their_torsion_constants()
    {
        double d = 0.02;
        var p = new Profile([new Region(LoopBuilder.Circle(new Point2(-0.03, 0), d / 2)), new Region(LoopBuilder.Circle(new Point2(0.03, 0), d / 2))]);
        var r = SectionAnalyzer.Analyze(p);
        Tol.Rel(2 * Math.PI * Math.Pow(d, 4) / 32, r.TorsionConstant, 1e-4, "two circles, exact each");
        Assert.Equal(2, r.RegionTorsionConstants.Count);
        Tol.Rel(r.RegionTorsionConstants[0], r.RegionTorsionConstants[1], 1e-5);
    }

    [Fact]
    public void Progress_reports_arrive_in_order_and_end_at_one()
    {
        var seen = new List<double>();
        var progress = new SyncProgress(p => seen.Add(p.Fraction));
        SectionAnalyzer.Analyze(P(LoopBuilder.Circle(default, 0.01)), null, default, progress);
        Assert.NotEmpty(seen);
        for (int i = 1; i < seen.Count; i++) Assert.True(seen[i] >= seen[i - 1]);
        Assert.Equal(1.0, seen[^1]);
    }

    [Fact]
    public void Cancellation_stops_the_analysis()
    {
        using var cts = new CancellationTokenSource();
        cts.Cancel();
        Assert.ThrowsAny<OperationCanceledException>(() => SectionAnalyzer.Analyze(P(LoopBuilder.Circle(default, 0.01)), null, cts.Token));
    }

    private sealed class SyncProgress(Action<AnalysisProgress> a) : IProgress<AnalysisProgress>
    {
        public void Report(AnalysisProgress value) => a(value);
    }
}
