using SectionTwist.Shaft;
using SectionTwist.Tests.Import;
using SectionTwist.Torsion;
using static SectionTwist.Tests.Import.RegressionDrawings;

namespace SectionTwist.Tests.Shaft;

/// <summary>
/// The drawing keys of a shaft file's DXF section (layer lists, part, at, window, hatch, fitArcs, snap, skipOpen, unit),
/// and remedies worded as those keys. Reference: annulus J = pi (D^4 - d^4) / 32 (Timoshenko and Goodier, Theory of
/// Elasticity, ch. 10, hollow circular shaft).
/// </summary>
public sealed class ShaftDxfKeysTests : IDisposable
{
    private readonly string _dir = Directory.CreateTempSubdirectory("shaftdxf").FullName;

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private string Shaft(string section, DxfText drawing)
    {
        File.WriteAllText(Path.Combine(_dir, "view.dxf"), drawing.ToString());
        return ShaftFileTests.Good.Replace("s40: {round: 40}", $"s40: {{dxf: view.dxf, {section}}}", StringComparison.Ordinal);
    }

    private SectionSource Source(string text)
    {
        SectionSource? seen = null;
        ShaftFile.Parse(text, "design.yaml", _dir, s => { seen = s; return SectionStiffness.Round(0.04); });
        return seen!;
    }

    [Fact]
    public void The_keys_reach_the_section_source()
    {
        var s = Source(Shaft("layer: [OUTSIDE, BORES], at: [100, 95], hatch: true, fitArcs: 1e-4, snap: 1e-5, skipOpen: true, unit: in", Sheet()));
        Assert.Equal("OUTSIDE,BORES", s.Layer);
        Assert.Equal(new SectionTwist.Geometry.Point2(100, 95), s.At);
        Assert.True(s.UseHatches && s.SkipOpen);
        Assert.Equal(1e-4, s.FitArcs);
        Assert.Equal(1e-5, s.SnapTolerance);
        Assert.Equal("in", s.Unit!.Symbol);
        var w = Source(Shaft("window: '140, 120, 60, 40'", Sheet())).Window!.Value;
        Assert.Equal((60.0, 40.0, 140.0, 120.0), (w.MinX, w.MinY, w.MaxX, w.MaxY));
    }

    [Theory]
    [InlineData("at: [1]", "at", "expected 2 numbers")]
    [InlineData("window: [0, 0, 0, 1]", "window", "two opposite corners")]
    [InlineData("hatch: maybe", "hatch", "expected true or false")]
    [InlineData("fitArcs: fine", "fitArcs", "expected a number")]
    [InlineData("part: 1, at: [1, 2]", "at", "either 'part' or 'at'")]
    public void Bad_keys_are_placed(string section, string key, string fragment)
    {
        var e = Assert.Throws<SectionTwistException>(() => Source(Shaft(section, Sheet())));
        Assert.Contains($": {key}: ", e.Message);
        Assert.Contains(fragment, e.Message);
    }

    [Fact]
    public void A_template_section_refuses_drawing_keys()
    {
        var text = ShaftFileTests.Good.Replace("s40: {round: 40}", "s40: {template: \"circle:d=40\", hatch: true}", StringComparison.Ordinal);
        var e = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse(text, "design.yaml", _dir, _ => SectionStiffness.Round(0.04)));
        Assert.Contains("'hatch' belongs to DXF sections", e.Message);
    }

    [Fact]
    public void A_sheet_section_is_analysed_by_point_and_its_refusal_names_shaft_keys()
    {
        var opts = new AnalysisOptions { Accuracy = 1e-3 };
        var sheet = Sheet();
        var doc = ShaftFile.Parse(Shaft("at: [100, 95]", sheet), "design.yaml", _dir, ShaftSections.CreateResolver(opts));
        double j = Math.PI * (Math.Pow(0.040, 4) - Math.Pow(0.016, 4)) / 32;
        Tol.Rel(j, doc.Model.Segments[0].Section!.TorsionConstant, 2e-3, "hollow circular shaft pi (D^4 - d^4) / 32");
        var e = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse(Shaft("layer: VIEW", sheet), "design.yaml", _dir, ShaftSections.CreateResolver(opts)).Model.Segments[0].Section);
        Assert.Contains("design.yaml:", e.Message);
        Assert.Contains("'part: 1'", e.Message);
        Assert.DoesNotContain("--", e.Message);
    }

    [Fact]
    public void A_gap_message_in_a_shaft_file_offers_the_snap_key()
    {
        var gap = new DxfText().Header(4).Entities().Line(0, 0, 40, 0).Line(40, 0, 40, 40).Line(40, 40, 0, 40).Line(0, 40, 0, 0.01).End();
        var e = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse(Shaft("part: 1", gap), "design.yaml", _dir, ShaftSections.CreateResolver()).Model.Segments[0].Section);
        Assert.Matches(@"'snap: [0-9.e-]+'", e.Message);
        Assert.DoesNotContain("--snap", e.Message);
    }
}
