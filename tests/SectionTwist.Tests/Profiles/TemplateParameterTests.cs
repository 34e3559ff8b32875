using SectionTwist.Profiles;

namespace SectionTwist.Tests.Profiles;

/// <summary>Standard-size defaults (DIN 6885-1, ISO 14, hollow-section radii) and rejection of impossible parameters.</summary>
public class TemplateParameterTests
{
    // DIN 6885-1 / ISO 773 rows (the test copy: References/Published.Din6885): shaft diameter -> keyseat width b and depth t1, mm.
    [Theory]
    [InlineData(7, 2, 1.2)]
    [InlineData(16, 5, 3.0)]
    [InlineData(25, 8, 4.0)]
    [InlineData(30, 8, 4.0)]   // "over 22 up to 30"
    [InlineData(30.5, 10, 5.0)]
    [InlineData(40, 12, 5.0)]
    [InlineData(50, 14, 5.5)]
    [InlineData(60, 18, 7.0)]
    [InlineData(90, 25, 9.0)]
    [InlineData(100, 28, 10)]
    public void Keyseat_defaults_follow_DIN_6885_1(double d, double b, double t1)
    {
        var row = ParallelKeyTable.For(d);
        Assert.NotNull(row);
        Assert.Equal(b, row.Value.B);
        Assert.Equal(t1, row.Value.T1);
        // The template uses them: same geometry as with explicit b and t1.
        string ds = d.ToString(System.Globalization.CultureInfo.InvariantCulture);
        string bs = b.ToString(System.Globalization.CultureInfo.InvariantCulture), ts = t1.ToString(System.Globalization.CultureInfo.InvariantCulture);
        Tol.Rel(ProfileTemplates.Create($"keyed:d={ds},b={bs},t1={ts}").Properties.Ixx,
            ProfileTemplates.Create($"keyed:d={ds}").Properties.Ixx, 1e-14);
    }

    [Fact]
    public void Keyseat_defaults_outside_the_table_ask_for_explicit_sizes()
    {
        var e = Assert.Throws<SectionTwistException>(() => ProfileTemplates.Create("keyed:d=150"));
        Assert.Contains("DIN 6885-1 lists shafts over 6 up to 110 mm", e.Message, StringComparison.Ordinal);
        Assert.Contains("give b= and t1= explicitly", e.Message, StringComparison.Ordinal);
        // Explicit sizes work: circle minus the keyseat strip plus two floor spandrels of the default radius, 0.70 mm for
        // a 36 mm key (ISO 773 / DIN 6885-1 from memory, Published.KeyseatRadiusFromMemory); exact integrals (ClosedForms).
        double radius = 0.075, r = 0.7e-3;
        double area = Math.PI * radius * radius - ClosedForms.Keyseat(radius, 0.036, radius - 0.012).A + 2 * ClosedForms.SpandrelArea(r);
        Tol.Rel(area, ProfileTemplates.Create("keyed:d=150,b=36,t1=12").Properties.Area, 1e-10);
    }

    [Fact]
    public void Iso14_rows_by_series_or_by_size()
    {
        // ISO 14 rows checked against the standard (Published.Iso14Checked): light 8x32x36 (6), medium 8x36x42 (7).
        Tol.Rel(ProfileTemplates.Create("spline:N=8,d=32,D=36,B=6").Properties.Area, ProfileTemplates.Create("spline:series=light,d=32").Properties.Area, 1e-14);
        Tol.Rel(ProfileTemplates.Create("spline:N=8,d=36,D=42,B=7").Properties.Area, ProfileTemplates.Create("iso14:8x36x42").Properties.Area, 1e-14);
        Tol.Rel(ProfileTemplates.Create("spline:N=8,d=36,D=42,B=7").Properties.Area, ProfileTemplates.Create("spline:series=medium,N=8,d=36").Properties.Area, 1e-14);
        Tol.Rel(36e-3, ProfileTemplates.OuterSize("iso14:8x32x36"), 1e-14);
        var e = Assert.Throws<SectionTwistException>(() => ProfileTemplates.Create("spline:series=light,d=33"));
        Assert.Contains("no ISO 14 light row with d=33 mm", e.Message, StringComparison.Ordinal);
        var both = Assert.Throws<SectionTwistException>(() => ProfileTemplates.Create("spline:d=32"));
        Assert.Contains("in both ISO 14 series", both.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Hollow_section_default_radii()
    {
        // Hot-finished ro = 1.5 t, ri = t (from memory); cold-formed EN 10219-2 (from memory) by wall thickness.
        var (oh, ih) = HollowSectionTemplates.DefaultRadii(0.005, cold: false);
        Tol.Rel(0.0075, oh, 1e-14);
        Tol.Rel(0.005, ih, 1e-14);
        var (oc, ic) = HollowSectionTemplates.DefaultRadii(0.005, cold: true);
        Tol.Rel(0.010, oc, 1e-14);
        Tol.Rel(0.005, ic, 1e-14);
        var (o8, i8) = HollowSectionTemplates.DefaultRadii(0.008, cold: true);
        Tol.Rel(0.020, o8, 1e-14);
        Tol.Rel(0.012, i8, 1e-14);
        var (o12, i12) = HollowSectionTemplates.DefaultRadii(0.012, cold: true);
        Tol.Rel(0.036, o12, 1e-14);
        Tol.Rel(0.024, i12, 1e-14);
    }

    [Theory]
    [InlineData("keyed:d=40,b=12,t1=20", "t1: keyseat depth 20 mm reaches the axis (radius 20 mm); use t1 < d/2")]
    [InlineData("keyed:d=40,b=40,t1=5", "b: keyseat width 40 mm is not less than the diameter 40 mm; use b < d")]
    [InlineData("keyed:d=40,b=12,t1=0.5", "keyseat depth 0.5 mm is too shallow for width 12 mm")]
    [InlineData("keyed:d=40,b=12,t1=5,r=5", "r: floor radius 5 mm does not fit")]
    [InlineData("keyed:d=20,b=12,t1=4,n=4", "overlap; space them further apart")]
    [InlineData("keyed:d=40,n=2,at=90", "1 angle(s) given for n=2 keyseats")]
    [InlineData("keyed:d=40,n=0", "n: 0 keyseats: use 1 to 8")]
    [InlineData("shs:B=80,t=40", "t: wall 40 mm is not less than half the width 80 mm: no hole is left")]
    [InlineData("rhs:H=100,B=50,t=30", "t: wall 30 mm is not less than half the width 50 mm")]
    [InlineData("shs:B=80,t=5,ri=40", "ri: inner corner radius 40 mm exceeds half the inner width")]
    [InlineData("shs:B=80,t=-5", "t: must be positive, got -5")]
    [InlineData("tube:D=40,d=45", "d: inner diameter 45 mm is not less than the outer diameter 40 mm")]
    [InlineData("tube:D=40,t=20", "t: wall 20 mm is not less than half of D")]
    [InlineData("flats:D=20,h=10,n=2", "two opposite flats would meet")]
    [InlineData("flats:D=20,h=3,n=4", "four flats would meet at the corners")]
    [InlineData("flats:D=20,h=2,n=3", "n: 3 flats: use 1 (D shape), 2 (double D) or 4")]
    [InlineData("spline:N=8,d=32,D=36,B=13", "teeth of width 13 mm overlap")]
    [InlineData("spline:N=8,d=32,D=30,B=6", "D: major diameter 30 mm is not larger than the minor diameter 32 mm")]
    [InlineData("iso14:8x32x36,r=3", "r: root fillet 3 mm does not fit")]
    [InlineData("involute:m=2,z=20,alpha=45,Df=20", "neighbouring teeth overlap at the minor diameter")]
    [InlineData("involute:m=2,z=20,Da=48", "the teeth come to a point below the major diameter")]
    [InlineData("involute:m=2,z=20,alpha=20", "alpha: pressure angle 20 deg: use 30, 37.5 or 45")]
    [InlineData("involute:m=2,z=20,r=2", "r: root fillet")]
    [InlineData("ibeam:h=200,b=100,tw=6,tf=100", "tf: flange thickness 100 mm leaves no web")]
    [InlineData("ibeam:h=200,b=100,tw=6,tf=9,taper=60", "thins the flange tip to nothing")]
    [InlineData("ibeam:h=200,b=100,tw=6,tf=9,r=60", "do not fit on the edge between them")]
    [InlineData("angle:h=60,t=60", "t: thickness 60 mm is not less than the shorter leg")]
    [InlineData("flat:b=5,t=50", "t: thickness 50 mm exceeds the width 5 mm")]
    [InlineData("rect:b=60,h=20,r=11", "r: corner radius 11 mm is more than half the smaller side")]
    [InlineData("hex:s=24,r=13", "r: corner radius 13 mm is not less than half the across-flats size")]
    public void Impossible_parameters_are_rejected_with_the_remedy(string spec, string expected)
    {
        var e = Assert.Throws<SectionTwistException>(() => ProfileTemplates.Create(spec));
        Assert.Contains(expected, e.Message, StringComparison.Ordinal);
        Assert.StartsWith(spec + ":", e.Message, StringComparison.Ordinal);
    }
}
