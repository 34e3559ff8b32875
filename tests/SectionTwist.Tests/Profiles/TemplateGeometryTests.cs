using SectionTwist.Geometry;
using SectionTwist.Profiles;
using static SectionTwist.Tests.Profiles.ClosedForms;

namespace SectionTwist.Tests.Profiles;

/// <summary>
/// Area, centroid and second moments of every template against closed forms (exact integrals; formulas from any
/// strength-of-materials text, common practice), to 1e-10 relative. Specs are in millimetres, properties in metres.
/// </summary>
public class TemplateGeometryTests
{
    private const double Exact = 1e-10;
    private const double Mm = 1e-3;

    private static SectionProperties P(string spec) => ProfileTemplates.Create(spec).Properties;

    [Fact]
    public void Circle_tube_ellipse()
    {
        double r = 20 * Mm;
        Tol.Rel(Math.PI * r * r, P("circle:d=40").Area, Exact);
        Tol.Rel(Math.PI * Math.Pow(r, 4) / 4, P("circle:d=40").Ixx, Exact);
        double ri = 16 * Mm;
        var tube = P("tube:D=40,d=32");
        Tol.Rel(Math.PI * (r * r - ri * ri), tube.Area, Exact);
        Tol.Rel(Math.PI * (Math.Pow(r, 4) - Math.Pow(ri, 4)) / 2, tube.PolarMoment, Exact);
        Tol.Rel(tube.Area, P("tube:D=40,t=4").Area, Exact);
        double a = 30 * Mm, b = 15 * Mm;
        var e = P("ellipse:a=30,b=15");
        Tol.Rel(Math.PI * a * b, e.Area, Exact);
        Tol.Rel(Math.PI * a * b * b * b / 4, e.Ixx, Exact);
        Tol.Rel(Math.PI * a * a * a * b / 4, e.Iyy, Exact);
    }

    [Fact]
    public void Rectangle_flat_triangle_square_hexagon()
    {
        double b = 60 * Mm, h = 20 * Mm;
        var rect = P("rect:b=60,h=20");
        Tol.Rel(b * h, rect.Area, Exact);
        Tol.Rel(b * h * h * h / 12, rect.Ixx, Exact);
        Tol.Rel(h * b * b * b / 12, rect.Iyy, Exact);
        double r = 3 * Mm;
        Tol.Rel(RoundedRectArea(b, h, r), P("rect:b=60,h=20,r=3").Area, Exact);
        Tol.Rel(RoundedRectIxx(b, h, r), P("rect:b=60,h=20,r=3").Ixx, Exact);
        Tol.Rel(RoundedRectIxx(h, b, r), P("rect:b=60,h=20,r=3").Iyy, Exact);
        Tol.Rel(50 * 5 * Mm * Mm, P("flat:b=50,t=5").Area, Exact);
        // Equilateral triangle side a: A = sqrt3/4 a^2, I = sqrt3 a^4 / 96 about any centroidal axis.
        double ta = 50 * Mm;
        var tri = P("triangle:a=50");
        Tol.Rel(Math.Sqrt(3) / 4 * ta * ta, tri.Area, Exact);
        Tol.Rel(Math.Sqrt(3) * Math.Pow(ta, 4) / 96, tri.Ixx, Exact);
        Tol.Rel(Math.Sqrt(3) * Math.Pow(ta, 4) / 96, tri.Iyy, Exact);
        // Square side s: s^2, s^4/12; rounded corners: s^2 - (4 - pi) r^2.
        double s = 30 * Mm, rs = 2 * Mm;
        Tol.Rel(s * s, P("square:s=30").Area, Exact);
        Tol.Rel(Math.Pow(s, 4) / 12, P("square:s=30").Ixx, Exact);
        Tol.Rel(RoundedRectArea(s, s, rs), P("square:s=30,r=2").Area, Exact);
        Tol.Rel(RoundedRectIxx(s, s, rs), P("square:s=30,r=2").Ixx, Exact);
        // Regular hexagon, across flats s: A = (sqrt3/2) s^2, I = 5 sqrt3 s^4 / 144 about any centroidal axis.
        double hs = 24 * Mm;
        var hex = P("hex:s=24");
        Tol.Rel(Math.Sqrt(3) / 2 * hs * hs, hex.Area, Exact);
        Tol.Rel(5 * Math.Sqrt(3) * Math.Pow(hs, 4) / 144, hex.Ixx, Exact);
        Tol.Rel(5 * Math.Sqrt(3) * Math.Pow(hs, 4) / 144, hex.Iyy, Exact);
        // Rounding a corner of interior angle beta by r removes r^2 (cot(beta/2) - (pi - beta)/2): beta = 120 deg.
        double hr = 2 * Mm;
        Tol.Rel(Math.Sqrt(3) / 2 * hs * hs - 6 * hr * hr * (1 / Math.Sqrt(3) - Math.PI / 6), P("hex:s=24,r=2").Area, Exact);
    }

    [Fact]
    public void Polygon_coordinates_in_default_and_explicit_units()
    {
        var p = P("polygon:0 0 40 0 40 10 0 10");
        Tol.Rel(400 * Mm * Mm, p.Area, Exact);
        Tol.Rel(20 * Mm, p.Centroid.X, Exact);
        Tol.Rel(400 * Mm * Mm, P("polygon:0,0,4cm,0,4cm,1cm,0,1cm").Area, Exact);
    }

    [Fact]
    public void Keyed_shaft_is_circle_minus_keyseat()
    {
        // One keyseat on +y, sharp floor corners: exact strip integrals (ClosedForms.Keyseat).
        double radius = 20 * Mm, b = 12 * Mm, t1 = 5 * Mm;
        var k = Keyseat(radius, b, radius - t1);
        double a = Math.PI * radius * radius - k.A, yc = -k.Sy / a;
        var p = P("keyed:d=40,b=12,t1=5,r=0");
        Tol.Rel(a, p.Area, Exact);
        Tol.Rel(yc, p.Centroid.Y, Exact);
        Tol.Rel(Math.PI * Math.Pow(radius, 4) / 4 - k.Iy2 - a * yc * yc, p.Ixx, Exact);
        Tol.Rel(Math.PI * Math.Pow(radius, 4) / 4 - k.Ix2, p.Iyy, Exact);
        // Two opposite keyseats: centroid at the axis; four at 90 deg: Ixx = Iyy.
        var two = P("keyed:d=40,b=12,t1=5,n=2,r=0");
        Tol.Rel(Math.PI * radius * radius - 2 * k.A, two.Area, Exact);
        Tol.Rel(Math.PI * Math.Pow(radius, 4) / 4 - 2 * k.Iy2, two.Ixx, Exact);
        var four = P("keyed:d=40,b=12,t1=5,n=4,r=0");
        Tol.Rel(Math.PI * Math.Pow(radius, 4) / 4 - 2 * k.Iy2 - 2 * k.Ix2, four.Ixx, Exact);
        // Floor corner radius r puts back two spandrels per keyseat.
        double r = 0.6 * Mm;
        Tol.Rel(Math.PI * radius * radius - k.A + 2 * SpandrelArea(r), P("keyed:d=40,b=12,t1=5,r=0.6").Area, Exact);
        // Without r: the smallest floor radius of DIN 6885-1 / ISO 773 for a 12 mm key, 0.25 mm (from memory).
        Tol.Rel(Math.PI * radius * radius - k.A + 2 * SpandrelArea(0.25 * Mm), P("keyed:d=40,b=12,t1=5").Area, Exact);
        // Angular position: a keyseat at 0 deg swaps the roles of x and y.
        var side = P("keyed:d=40,b=12,t1=5,at=0,r=0");
        Tol.Rel(p.Ixx, side.Iyy, Exact);
        Tol.Rel(p.Ixx, P("keyed:d=40,b=12,t1=5,r=0,at=0.5pi".Replace("0.5pi", (Math.PI / 2).ToString("R", System.Globalization.CultureInfo.InvariantCulture) + "rad")).Ixx, 1e-9);
    }

    [Theory]
    [InlineData(1)]
    [InlineData(2)]
    [InlineData(4)]
    public void Flats_are_circle_minus_circular_segments(int n)
    {
        double radius = 10 * Mm, h = 2 * Mm;
        var s = Segment(radius, radius - h);
        var p = P($"flats:D=20,h=2,n={n}");
        double a = Math.PI * radius * radius - n * s.A;
        Tol.Rel(a, p.Area, Exact);
        double full = Math.PI * Math.Pow(radius, 4) / 4;
        double ixx = n switch { 1 => full - s.Iy2, 2 => full - 2 * s.Iy2, _ => full - 2 * s.Iy2 - 2 * s.Ix2 };
        double yc = n == 1 ? -s.Sy / a : 0;
        Tol.Rel(ixx - a * yc * yc, p.Ixx, Exact);
        double iyy = n switch { 1 => full - s.Ix2, 2 => full - 2 * s.Ix2, _ => full - 2 * s.Iy2 - 2 * s.Ix2 };
        Tol.Rel(iyy, p.Iyy, Exact);
    }

    [Fact]
    public void Hollow_sections_with_corner_radii()
    {
        // shs 80 x 5, hot-finished defaults ro = 1.5 t, ri = t (from memory).
        double b = 80 * Mm, t = 5 * Mm, ro = 7.5 * Mm, ri = 5 * Mm;
        var shs = P("shs:B=80,t=5");
        Tol.Rel(RoundedRectArea(b, b, ro) - RoundedRectArea(b - 2 * t, b - 2 * t, ri), shs.Area, Exact);
        Tol.Rel(RoundedRectIxx(b, b, ro) - RoundedRectIxx(b - 2 * t, b - 2 * t, ri), shs.Ixx, Exact);
        // rhs 100 x 50 x 4 cold-formed (t <= 6 mm: ro = 2 t, ri = t, EN 10219-2 from memory).
        double hh = 100 * Mm, bb = 50 * Mm, tt = 4 * Mm;
        var rhs = P("rhs:H=100,B=50,t=4,form=cold");
        Tol.Rel(RoundedRectArea(bb, hh, 2 * tt) - RoundedRectArea(bb - 2 * tt, hh - 2 * tt, tt), rhs.Area, Exact);
        Tol.Rel(RoundedRectIxx(bb, hh, 2 * tt) - RoundedRectIxx(bb - 2 * tt, hh - 2 * tt, tt), rhs.Ixx, Exact);
        Tol.Rel(RoundedRectIxx(hh, bb, 2 * tt) - RoundedRectIxx(hh - 2 * tt, bb - 2 * tt, tt), rhs.Iyy, Exact);
        // Explicit radii and sharp corners.
        Tol.Rel(b * b - (b - 2 * t) * (b - 2 * t), P("shs:B=80,t=5,ro=0,ri=0").Area, Exact);
    }

    [Fact]
    public void IBeam_with_root_fillets_and_taper()
    {
        double h = 200 * Mm, b = 100 * Mm, tw = 6 * Mm, tf = 9 * Mm, r = 12 * Mm;
        double web = h - 2 * tf;
        var ib = P("ibeam:h=200,b=100,tw=6,tf=9,r=12");
        Tol.Rel(2 * b * tf + web * tw + 4 * SpandrelArea(r), ib.Area, Exact);
        double ixx = b * h * h * h / 12 - (b - tw) * web * web * web / 12 + 4 * Spandrel(h / 2 - tf - r, r).S2;
        Tol.Rel(ixx, ib.Ixx, Exact);
        double iyy = 2 * tf * b * b * b / 12 + web * tw * tw * tw / 12 + 4 * Spandrel(-(tw / 2 + r), r).S2;
        Tol.Rel(iyy, ib.Iyy, Exact);
        // 14 % taper, tf at mid-outstand: same area; void under each outstand is a trapezoid.
        var tap = P("ibeam:h=200,b=100,tw=6,tf=9,taper=14");
        double l = (b - tw) / 2, g0 = h / 2 - (tf + 0.14 * l / 2), g1 = h / 2 - (tf - 0.14 * l / 2);
        Tol.Rel(b * h - 4 * l * (h / 2 - tf), tap.Area, Exact);
        Tol.Rel(b * h * h * h / 12 - 4 * l * (g0 + g1) * (g0 * g0 + g1 * g1) / 12, tap.Ixx, Exact);
    }

    [Fact]
    public void Channel_angle_tee_area_and_centroid()
    {
        double h = 100 * Mm, b = 50 * Mm, tw = 6 * Mm, tf = 8 * Mm, r = 8 * Mm;
        var ch = P("channel:h=100,b=50,tw=6,tf=8,r=8");
        double a = 2 * b * tf + (h - 2 * tf) * tw + 2 * SpandrelArea(r);
        Tol.Rel(a, ch.Area, Exact);
        double sx = 2 * tf * b * b / 2 + (h - 2 * tf) * tw * tw / 2 - 2 * Spandrel(-(tw + r), r).S1;
        Tol.Rel(sx / a, ch.Centroid.X, Exact);
        // Angle 60 x 60 x 6, root r = 8: heel at the origin.
        double l = 60 * Mm, t = 6 * Mm, ra = 8 * Mm;
        var an = P("angle:h=60,t=6,r=8");
        double aa = (2 * l - t) * t + SpandrelArea(ra);
        Tol.Rel(aa, an.Area, Exact);
        double s1 = l * t * l / 2 + (l - t) * t * t / 2 - Spandrel(-(t + ra), ra).S1;
        Tol.Rel(s1 / aa, an.Centroid.X, Exact);
        Tol.Rel(s1 / aa, an.Centroid.Y, Exact);
        Tol.Rel(an.Ixx, an.Iyy, Exact);
        // Tee 50 x 50 x 6 x 6, r = 6, flange top at y = 0.
        double th = 50 * Mm, tb = 50 * Mm, ttw = 6 * Mm, ttf = 6 * Mm, tr = 6 * Mm;
        var tee = P("tee:h=50,b=50,tw=6,tf=6,r=6");
        double ta = tb * ttf + (th - ttf) * ttw + 2 * SpandrelArea(tr);
        Tol.Rel(ta, tee.Area, Exact);
        // Spandrel below the flange: y in [-tf - r, -tf], disc centre at -tf - r opening down: mirror y.
        double sy = -tb * ttf * ttf / 2 - (th - ttf) * ttw * (ttf + th) / 2 + 2 * Spandrel(-ttf - tr, tr).S1;
        Tol.Rel(sy / ta, tee.Centroid.Y, Exact);
    }

    [Fact]
    public void Straight_spline_is_core_plus_parallel_teeth()
    {
        // 8 x 32 x 36, B = 6 (ISO 14 light, Published.Iso14Checked): tooth = {|y| < B/2, rf < |p| < ra, x > 0}.
        double rf = 16 * Mm, ra = 18 * Mm, u = 3 * Mm;
        double tooth = 2 * (F1(ra, u) - F1(rf, u));
        double a = Math.PI * rf * rf + 8 * tooth;
        Tol.Rel(a, P("iso14:8x32x36,r=0").Area, Exact);
        Tol.Rel(a, P("spline:series=light,N=8,d=32,r=0").Area, Exact);
        Tol.Rel(a, P("spline:N=8,d=32,D=36,B=6,r=0").Area, Exact);
        // The default root fillet for D = 36 mm is 0.3 mm (ISO 14 r column, from memory; Iso14Table.RootFillet).
        Tol.Rel(a + 16 * LineCircleFilletArea(rf, u, 0.3 * Mm), P("iso14:8x32x36").Area, Exact);
        // Root fillets put back two pieces per tooth, each the closed-form line-to-circle fillet area.
        var f = P("iso14:8x32x36,r=0.4");
        Tol.Rel(a + 16 * LineCircleFilletArea(rf, u, 0.4 * Mm), f.Area, Exact);
        Assert.True(Math.Abs(f.Centroid.X) < 1e-12 && Math.Abs(f.Centroid.Y) < 1e-12);
        Tol.Rel(f.Ixx, f.Iyy, Exact);
    }

    [Theory]
    [InlineData(30.0, 20)]
    [InlineData(37.5, 24)]
    [InlineData(45.0, 30)]
    public void Involute_spline_area_matches_polar_integral_of_the_true_involute(double alphaDeg, int z)
    {
        // No root fillet: each tooth is {|phi| < psi(R)} between Df/2 and Da/2 with psi from the involute function
        // (half tooth angle psi(R) = pi/(2z) + inv(alpha) - inv(acos(Rb/R)), radial below the base circle).
        // The flanks are arcs fitted within 5e-5 module, so the area agrees to about 1e-6.
        double m = 2 * Mm, alpha = alphaDeg * Math.PI / 180;
        var info = alphaDeg switch { 30 => (1.0, 1.5), 37.5 => (0.9, 1.4), _ => (0.8, 1.2) };
        double ra = m * (z + info.Item1) / 2, rf = m * (z - info.Item2) / 2, rb = m * z / 2 * Math.Cos(alpha);
        static double Inv(double x) => Math.Tan(x) - x;
        double Psi(double rr) => Math.PI / (2 * z) + Inv(alpha) - (rr <= rb ? 0 : Inv(Math.Acos(rb / rr)));
        // integral of 2 psi(R) R dR by composite Simpson on 20000 intervals (the integrand is smooth except at Rb: split there)
        double Simpson(double lo, double hi)
        {
            if (hi <= lo) return 0;
            int n = 20000; double hh = (hi - lo) / n, sum = 0;
            for (int i = 0; i <= n; i++) { double rr = lo + i * hh; sum += (i == 0 || i == n ? 1 : i % 2 == 1 ? 4 : 2) * 2 * Psi(rr) * rr; }
            return sum * hh / 3;
        }
        double toothArea = Simpson(rf, Math.Max(rf, Math.Min(rb, ra))) + Simpson(Math.Max(rf, rb), ra);
        double expected = Math.PI * rf * rf + z * toothArea;
        var p = P(string.Create(System.Globalization.CultureInfo.InvariantCulture, $"involute:m=2,z={z},alpha={alphaDeg},r=0"));
        Tol.Rel(expected, p.Area, 1e-6, "polar integral of the involute tooth");
        Tol.Rel(p.Ixx, p.Iyy, 1e-9);
        // The default root fillet r = 0.2 m adds, in each of the 2z root corners, the area a fillet adds to a corner of
        // straight sides meeting at the gap angle beta: r^2 (cot(beta/2) - (pi - beta)/2) (plane geometry). The flank
        // leaves the root circle at the involute's pressure angle there, alpha_f = acos(Rb / Rf) (radial below the base
        // circle), so beta = 90 deg + alpha_f. Both sides are curved (the core of radius Rf, the involute of radius of
        // curvature Rb tan(alpha_f)), which changes the area by a fraction of order r over those radii: within 12 %.
        double r = 0.2 * m;
        double alphaF = rf > rb ? Math.Acos(rb / rf) : 0, beta = Math.PI / 2 + alphaF;
        double corner = r * r * (1 / Math.Tan(beta / 2) - (Math.PI - beta) / 2);
        var filleted = P(string.Create(System.Globalization.CultureInfo.InvariantCulture, $"involute:m=2,z={z},alpha={alphaDeg}"));
        Tol.Rel(2 * z * corner, filleted.Area - p.Area, 0.12, "fillet in a straight-sided corner of the gap angle");
    }
}
