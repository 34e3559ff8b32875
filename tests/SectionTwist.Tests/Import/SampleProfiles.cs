using System.Globalization;

namespace SectionTwist.Tests.Import;

/// <summary>
/// The generator of sample-profiles/*.dxf (our winch-drive scenario). Run the tests with SECTIONTWIST_WRITE_SAMPLES=1
/// to rewrite the files; otherwise a test checks the committed files equal this output.
/// </summary>
internal static class SampleProfiles
{
    public static IReadOnlyList<(string File, Func<string> Make)> All { get; } =
    [
        ("winch-input-shaft-keyed.dxf", KeyedShaft),
        ("winch-output-shaft-splined.dxf", SplinedShaft),
        ("winch-drum-tube.dxf", DrumTube),
        ("winch-hex-drive-bar.dxf", HexBar),
        ("winch-frame-shs-inch.dxf", FrameShsInch),
        ("winch-brake-lever-mirrored.dxf", BrakeLever),
        ("winch-crank-grip-spline.dxf", CrankGrip),
        ("composite/winch-clad-strip.dxf", CladStrip),
    ];

    // brass-clad steel strip (a composite section): steel 60 x 2.5 mm on layer CORE, brass 60 x 1.5 mm on layer SKIN,
    // bonded along the long edge; the layers share that edge from the outline to the outline
    public const double CladB = 60, CladCore = 2.5, CladSkin = 1.5;

    public static string CladStrip() =>
        new DxfText().Header(4).Entities().Rect(0, 0, CladB, CladCore, "CORE").Rect(0, CladCore, CladB, CladSkin, "SKIN").End().ToString();

    // keyed input shaft: d = 40 mm, keyseat 12 wide, 5 deep (for a 12 x 8 key); R12 LINE/ARC, plus a title TEXT
    public const double KeyR = 20, KeyHalfW = 6, KeyFloor = 15;

    public static string KeyedShaft()
    {
        double yc = Math.Sqrt(KeyR * KeyR - KeyHalfW * KeyHalfW);
        double a = Math.Atan2(yc, KeyHalfW) * 180 / Math.PI;
        var d = new DxfText { NewLine = "\r\n" }.Header(4, "AC1009").Entities()
            .Arc(0, 0, KeyR, 180 - a, a, "SHAFT")
            .Line(KeyHalfW, yc, KeyHalfW, KeyFloor, "SHAFT").Line(KeyHalfW, KeyFloor, -KeyHalfW, KeyFloor, "SHAFT")
            .Line(-KeyHalfW, KeyFloor, -KeyHalfW, yc, "SHAFT")
            .P(0, "TEXT").P(8, "NOTES").P(10, -20.0).P(20, -30.0).P(30, 0.0).P(40, 3.5).P(1, "WINCH INPUT SHAFT D40 KEY 12x8");
        return d.End().ToString();
    }

    // straight-sided spline 8 x 36 x 42, tooth width 7: one closed LWPOLYLINE with bulges (AC1015)
    public const int SplineN = 8;
    public const double SplineRi = 18, SplineRo = 21, SplineHalfB = 3.5;

    public static List<(double X, double Y, double Bulge)> SplineVertices()
    {
        double uo = Math.Sqrt(SplineRo * SplineRo - SplineHalfB * SplineHalfB), ui = Math.Sqrt(SplineRi * SplineRi - SplineHalfB * SplineHalfB);
        double top = 2 * Math.Asin(SplineHalfB / SplineRo), root = 2 * Math.PI / SplineN - 2 * Math.Asin(SplineHalfB / SplineRi);
        var v = new List<(double, double, double)>();
        for (int k = 0; k < SplineN; k++)
        {
            double t = 2 * Math.PI * k / SplineN, c = Math.Cos(t), s = Math.Sin(t);
            (double, double) R(double u, double w) => (c * u - s * w, s * u + c * w);
            var p0 = R(ui, -SplineHalfB); var p1 = R(uo, -SplineHalfB); var p2 = R(uo, SplineHalfB); var p3 = R(ui, SplineHalfB);
            v.Add((p0.Item1, p0.Item2, 0));
            v.Add((p1.Item1, p1.Item2, Math.Tan(top / 4)));
            v.Add((p2.Item1, p2.Item2, 0));
            v.Add((p3.Item1, p3.Item2, Math.Tan(root / 4)));
        }
        return v;
    }

    public static string SplinedShaft()
    {
        var v = SplineVertices();
        var d = new DxfText().Header(4, "AC1015").Entities();
        d.P(0, "LWPOLYLINE").P(5, "2A").P(100, "AcDbEntity").P(8, "SPLINE_SHAFT").P(100, "AcDbPolyline").P(90, v.Count).P(70, 1).P(43, 0.0);
        foreach (var (x, y, b) in v) { d.P(10, x).P(20, y); if (b != 0) d.P(42, b); }
        return d.End().ToString();
    }

    // drum tube 219.1 x 8 (EN 10210 size): two CIRCLEs, AC1018 with handles and subclass markers
    public const double DrumD = 219.1, DrumT = 8;

    public static string DrumTube()
    {
        var d = new DxfText().Header(4, "AC1018");
        d.P(0, "SECTION").P(2, "TABLES").P(0, "TABLE").P(2, "LAYER").P(70, 2)
            .P(0, "LAYER").P(2, "DRUM").P(70, 0).P(62, 3).P(6, "Continuous")
            .P(0, "LAYER").P(2, "CENTRE").P(70, 0).P(62, 1).P(6, "Center").P(0, "ENDTAB").P(0, "ENDSEC");
        d.Entities();
        foreach (var (h, r) in new[] { ("30", DrumD / 2), ("31", DrumD / 2 - DrumT) })
            d.P(0, "CIRCLE").P(5, h).P(330, "1F").P(100, "AcDbEntity").P(8, "DRUM").P(100, "AcDbCircle")
                .P(10, 0.0).P(20, 0.0).P(30, 0.0).P(40, r);
        return d.End().ToString();
    }

    // hex drive bar, 27 across flats: block FLAT (one side), block HEX (six FLAT inserts at 60 deg), placed rotated 15 deg
    public const double HexAf = 27;

    public static string HexBar()
    {
        double a = HexAf / 2, h = HexAf / Math.Sqrt(3) / 2;
        var d = new DxfText().Header(4, "AC1015");
        d.P(0, "SECTION").P(2, "BLOCKS")
            .P(0, "BLOCK").P(8, "0").P(2, "FLAT").P(70, 0).P(10, 0.0).P(20, 0.0).P(30, 0.0).P(3, "FLAT")
            .Line(a, -h, a, h).P(0, "ENDBLK").P(8, "0")
            .P(0, "BLOCK").P(8, "0").P(2, "HEX").P(70, 0).P(10, 0.0).P(20, 0.0).P(30, 0.0).P(3, "HEX");
        for (int k = 0; k < 6; k++) d.P(0, "INSERT").P(8, "0").P(2, "FLAT").P(10, 0.0).P(20, 0.0).P(30, 0.0).P(50, 60.0 * k);
        d.P(0, "ENDBLK").P(8, "0").P(0, "ENDSEC");
        d.Entities().P(0, "INSERT").P(8, "HEX_BAR").P(2, "HEX").P(10, 120.0).P(20, 80.0).P(30, 0.0).P(50, 15.0);
        return d.End().ToString();
    }

    // square hollow frame member 3 x 3 in, wall 1/4 in, corner radii 1/2 in outside, 1/4 in inside; R12 POLYLINE with bulges, $INSUNITS = 1
    public const double ShsB = 3, ShsT = 0.25, ShsRo = 0.5, ShsRi = 0.25;

    public static string FrameShsInch()
    {
        var d = new DxfText().Header(1, "AC1009").Entities();
        RoundedSquarePolyline(d, ShsB / 2, ShsRo);
        RoundedSquarePolyline(d, ShsB / 2 - ShsT, ShsRi);
        return d.End().ToString();
    }

    private static void RoundedSquarePolyline(DxfText d, double h, double r)
    {
        double t = Math.Tan(Math.PI / 8);
        var v = new (double, double, double)[]
        {
            (-h + r, -h, 0), (h - r, -h, t), (h, -h + r, 0), (h, h - r, t), (h - r, h, 0), (-h + r, h, t), (-h, h - r, 0), (-h, -h + r, t),
        };
        d.P(0, "POLYLINE").P(8, "FRAME").P(66, 1).P(10, 0.0).P(20, 0.0).P(30, 0.0).P(70, 1);
        foreach (var (x, y, b) in v)
        {
            d.P(0, "VERTEX").P(8, "FRAME").P(10, x).P(20, y).P(30, 0.0);
            if (b != 0) d.P(42, b);
        }
        d.P(0, "SEQEND").P(8, "FRAME");
    }

    // brake lever section: 40 x 16 obround; both end arcs written with extrusion (0, 0, -1), as mirrored CAD output does
    public const double LeverL = 40, LeverW = 16;

    public static string BrakeLever()
    {
        double r = LeverW / 2, c = LeverL / 2 - r;
        // world centre (+c, 0) is OCS (-c, 0); the right half circle (world angles -90..90) is OCS angles 90..270
        var d = new DxfText().Header(4, "AC1015").Entities()
            .Line(-c, -r, c, -r, "LEVER").Line(c, r, -c, r, "LEVER")
            .Arc(-c, 0, r, 90, 270, "LEVER", nz: -1)
            .Arc(c, 0, r, 270, 90, "LEVER", nz: -1);
        return d.End().ToString();
    }

    // crank grip: flat base and a cubic B-spline top (control points and knots), AC1015
    public static readonly (double X, double Y)[] GripCtrl = [(30, 0), (30, 14), (10, 18), (-10, 18), (-30, 14), (-30, 0)];
    public static readonly double[] GripKnots = [0, 0, 0, 0, 1.0 / 3, 2.0 / 3, 1, 1, 1, 1];

    public static string CrankGrip()
    {
        var d = new DxfText().Header(4, "AC1015").Entities()
            .P(0, "SPLINE").P(5, "40").P(100, "AcDbEntity").P(8, "GRIP").P(100, "AcDbSpline").P(210, 0.0).P(220, 0.0).P(230, 1.0)
            .P(70, 8).P(71, 3).P(72, GripKnots.Length).P(73, GripCtrl.Length).P(74, 0);
        foreach (var k in GripKnots) d.P(40, k);
        foreach (var (x, y) in GripCtrl) d.P(10, x).P(20, y).P(30, 0.0);
        d.Line(-30, 0, 30, 0, "GRIP");
        return d.End().ToString();
    }

    internal static string Inv(double v) => v.ToString("R", CultureInfo.InvariantCulture);
}
