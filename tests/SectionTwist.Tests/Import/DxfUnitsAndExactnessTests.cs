using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;
using SectionTwist.Units;

namespace SectionTwist.Tests.Import;

/// <summary>$INSUNITS codes and exact areas of curved outlines.</summary>
public class DxfUnitsAndExactnessTests
{
    /// <summary>
    /// Metres per unit for $INSUNITS 1..24 (DXF reference, HEADER variable $INSUNITS; sizes: international inch 0.0254 m,
    /// US survey foot 1200/3937 m (NIST Handbook 44 app. C), au 149597870700 m (IAU 2012 B2), parsec 648000/pi au (IAU 2015 B2),
    /// light year 9460730472580800 m (IAU).
    /// </summary>
    public static TheoryData<int, double> Codes => new()
    {
        { 1, 0.0254 }, { 2, 0.3048 }, { 3, 1609.344 }, { 4, 1e-3 }, { 5, 1e-2 }, { 6, 1 }, { 7, 1e3 }, { 8, 2.54e-8 },
        { 9, 2.54e-5 }, { 10, 0.9144 }, { 11, 1e-10 }, { 12, 1e-9 }, { 13, 1e-6 }, { 14, 0.1 }, { 15, 10 }, { 16, 100 },
        { 17, 1e9 }, { 18, 149597870700 }, { 19, 9460730472580800 }, { 20, 3.0856775814913673e16 },
        { 21, 1200.0 / 3937 }, { 22, 100.0 / 3937 }, { 23, 3600.0 / 3937 }, { 24, 6336000.0 / 3937 },
    };

    [Theory]
    [MemberData(nameof(Codes))]
    public void Each_insunits_code_maps_to_its_size(int code, double metres)
    {
        var r = new DxfText().Header(code).Entities().Rect(0, 0, 2, 1).End().Read();
        Tol.Rel(metres, r.Profile.Unit.Metres, 1e-15);
        Tol.Rel(2 * metres * metres, r.Profile.Properties.Area, 1e-12, "2 x 1 rectangle in drawing units");
        Assert.Equal("$INSUNITS", r.Report.UnitSource);
        Assert.Equal(code, DxfUnits.ToCode(r.Profile.Unit));
    }

    [Fact]
    public void Unknown_code_is_unitless()
    {
        var e = Assert.Throws<SectionTwistException>(() => new DxfText().Header(99).Entities().Rect(0, 0, 2, 1).End().Read());
        Assert.Contains("--unit", e.Message);
    }

    [Fact]
    public void Circle_area_is_exact()
    {
        var r = new DxfText().Header(4).Entities().Circle(12.5, -3, 21).End().Read();
        Tol.Rel(Math.PI * 21 * 21 * 1e-6, r.Profile.Properties.Area, 1e-9, "pi r^2");
    }

    [Fact]
    public void Rounded_rectangle_area_is_exact()
    {
        // 80 x 40, corner radius 6, as one closed LWPOLYLINE with bulge tan(90deg / 4): area b h - (4 - pi) r^2
        double t = Math.Tan(Math.PI / 8), r = 6, b = 80, h = 40;
        var d = new DxfText().Header(4).Entities().LwPolyline(true,
            (r, 0, 0), (b - r, 0, t), (b, r, 0), (b, h - r, t), (b - r, h, 0), (r, h, t), (0, h - r, 0), (0, r, t)).End();
        var read = d.Read();
        Tol.Rel((b * h - (4 - Math.PI) * r * r) * 1e-6, read.Profile.Properties.Area, 1e-9, "b h - (4 - pi) r^2");
        Assert.Equal(4, read.Profile.Regions[0].Outer.Segments.Count(s => s is ArcSegment));
    }

    [Fact]
    public void Ellipse_area_is_exact()
    {
        var r = new DxfText().Header(4).Entities()
            .P(0, "ELLIPSE").P(8, "0").P(10, 0.0).P(20, 0.0).P(30, 0.0).P(11, 0.0).P(21, 25.0).P(31, 0.0)
            .P(40, 0.6).P(41, 0.0).P(42, 2 * Math.PI).End().Read();
        Tol.Rel(Math.PI * 25 * 15 * 1e-6, r.Profile.Properties.Area, 1e-9, "pi a b");
        Tol.Rel(Math.PI * 25 * 15 * 1e-6, Math.Abs(r.Profile.Regions[0].Outer.SignedArea), 1e-9);
    }

    [Fact]
    public void Inch_frame_member_reads_in_inches()
    {
        var r = new DxfText().Header(1).Entities().Rect(0, 0, 3, 3).Rect(0.25, 0.25, 2.5, 2.5).End().Read();
        Assert.Equal(LengthUnit.Inch, r.Profile.Unit);
        Tol.Rel((9 - 6.25) * 0.0254 * 0.0254, r.Profile.Properties.Area, 1e-12, "3 in square tube, 0.25 in wall");
    }
}
