using SectionTwist.Geometry;
using SectionTwist.Import;
using SectionTwist.Import.Dxf;
using SectionTwist.Torsion;
using static SectionTwist.Tests.Import.RegressionDrawings;

namespace SectionTwist.Tests.Import;

/// <summary>
/// Curves drawn as facets: detected and named, or replaced by arcs through the facet corners (--fit-arcs). Areas: disc
/// pi r^2, regular n-gon (n/2) r^2 sin(2 pi / n), rectangle with a rounded corner b h - (1 - pi/4) r^2.
/// </summary>
public class FacetDrawingTests
{
    private const double Mm2 = 1e-6;

    [Fact]
    public void A_circle_drawn_as_72_facets_is_named_and_fitting_arcs_restores_the_circle()
    {
        var d = new DxfText().Header(4).Entities().Polygon("0", Facets(0, 0, 20, 72)).End();
        var kept = d.Read();
        Tol.Rel(36 * 400 * Math.Sin(2 * Math.PI / 72) * Mm2, kept.Profile.Properties.Area, 1e-12, "regular 72-gon (n/2) r^2 sin(2 pi/n)");
        var info = Assert.Single(kept.Report.Facets);
        Assert.Equal(72, info.Facets);
        Assert.False(info.Concave);
        Assert.Null(info.Arcs);
        var warn = Assert.Single(kept.Report.Warnings, w => w.StartsWith("curve drawn as 72 facets", StringComparison.Ordinal));
        Assert.Contains("LWPOLYLINE (line", warn);
        Assert.Contains("segments 1 to 72", warn);
        Assert.Contains("export true arcs or use --fit-arcs 1e-6", warn);

        var fitted = d.Read(new DxfReadOptions { FitArcs = 1e-6 });
        Tol.Rel(Math.PI * 400 * Mm2, fitted.Profile.Properties.Area, 1e-9, "disc r 20 (corners on the circle)");
        Assert.All(fitted.Profile.Regions[0].Outer.Segments, s => Assert.IsType<ArcSegment>(s));
        Assert.True(Assert.Single(fitted.Report.Facets).Arcs <= 4);
    }

    [Fact]
    public void A_rounded_corner_drawn_as_facets_between_straight_edges_is_fitted_by_one_arc()
    {
        // 60 x 30 plate, corner radius 8 at the top right drawn as 16 facets (open polyline joined to LINEs)
        const double r = 8;
        var arc = Facets(60 - r, 30 - r, r, 16, 0, Math.PI / 2, closed: false).Select(p => (p.X, p.Y, 0.0)).ToArray();
        var d = new DxfText().Header(4).Entities().Line(0, 0, 60, 0).Line(60, 0, 60, 30 - r).LwPolylineOn("0", false, arc)
            .Line(60 - r, 30, 0, 30).Line(0, 30, 0, 0).End();
        var fitted = d.Read(new DxfReadOptions { FitArcs = 1e-6 });
        Tol.Rel((1800 - (1 - Math.PI / 4) * r * r) * Mm2, fitted.Profile.Properties.Area, 1e-9, "rectangle with a rounded corner");
        Assert.Equal(1, Assert.Single(fitted.Report.Facets).Arcs);
        Assert.Single(fitted.Profile.Regions[0].Outer.Segments.OfType<ArcSegment>());
    }

    [Fact]
    public void A_hexagon_and_a_straight_edge_split_in_pieces_are_not_facets()
    {
        double rc = 10;
        var hex = new DxfText().Header(4).Entities().Polygon("0", Facets(0, 0, rc, 6)).End().Read();
        Assert.Empty(hex.Report.Facets);
        var split = new DxfText().Header(4).Entities().Polygon("0", [(0, 0), (10, 0), (20, 0), (30, 0), (40, 0), (50, 0), (60, 0), (60, 10), (0, 10)]).End().Read();
        Assert.Empty(split.Report.Facets);
    }

    [Fact]
    public void Concave_facets_are_reported_as_a_faceted_curve_not_as_sharp_corners()
    {
        // 40 x 40 square with a half-round notch r 8 cut into the top edge, the notch drawn as 12 facets: each facet
        // corner is re-entrant (interior angle 195 degrees)
        var outline = new DxfText().Header(4).Entities().Polygon("0", BuildNotch(8)).End().Read();
        Assert.True(Assert.Single(outline.Report.Facets).Concave);
        var result = SectionAnalyzer.Analyze(outline.Profile, new AnalysisOptions { Accuracy = 1e-2 });
        var warn = Assert.Single(result.Warnings, w => w.Code == "faceted-curve");
        Assert.Contains("curve drawn as 12 facets", warn.Message);
        Assert.Contains("--fit-arcs", warn.Message);
        Assert.DoesNotContain(result.Warnings, w => w.Code == "sharp-reentrant-corner");
        Assert.True(double.IsPositiveInfinity(result.EstimatedRelativeError.MaxShear), "the peak depends on the facets: unbounded estimate");
    }

    [Fact]
    public void A_point_list_of_a_circle_is_named_as_facets_and_fitted_on_request()
    {
        string path = Path.Combine(Cli.CliRunner.TempDir(), "pin.csv");
        File.WriteAllLines(path, Facets(0, 0, 12.5, 48).Select(p => FormattableString.Invariant($"{p.X:R}, {p.Y:R}")));
        var notes = new List<string>();
        var kept = ProfileSources.Load(path, new ProfileSourceOptions { Notes = notes.Add });
        Tol.Rel(24 * 156.25 * Math.Sin(2 * Math.PI / 48) * Mm2, kept.Properties.Area, 1e-12, "regular 48-gon (n/2) r^2 sin(2 pi/n)");
        Assert.Contains(notes, n => n.StartsWith("curve drawn as 48 facets", StringComparison.Ordinal) && n.Contains("--fit-arcs 1e-4", StringComparison.Ordinal));
        var fitted = ProfileSources.Load(path, new ProfileSourceOptions { FitArcs = 1e-4 });
        Tol.Rel(Math.PI * 156.25 * Mm2, fitted.Properties.Area, 1e-9, "disc d 25 (corners on the circle)");
    }

    /// <summary>Square 40 with a half-round notch of radius r in the top edge (centre (20, 40)), the notch as 12 facets.</summary>
    private static IEnumerable<(double X, double Y)> BuildNotch(double r)
    {
        yield return (0, 0);
        yield return (40, 0);
        yield return (40, 40);
        // from (28, 40) down through (20, 32) to (12, 40): angles 0 .. -180 degrees about (20, 40)
        for (int k = 0; k <= 12; k++)
        {
            double a = -Math.PI * k / 12;
            yield return (20 + r * Math.Cos(a), 40 + r * Math.Sin(a));
        }
        yield return (0, 40);
    }
}
