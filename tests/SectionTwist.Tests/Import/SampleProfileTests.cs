using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;
using SectionTwist.Units;
using static SectionTwist.Tests.Import.SampleProfiles;

namespace SectionTwist.Tests.Import;

/// <summary>The sample drawings: committed files equal the generator, and each reads to its exact area (elementary geometry).</summary>
public class SampleProfileTests
{
    internal static string SampleDir()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "SectionTwist.sln"))) dir = dir.Parent;
        return Path.Combine(dir?.FullName ?? throw new InvalidOperationException("repository root not found"), "sample-profiles");
    }

    [Fact]
    public void Committed_samples_equal_the_generator()
    {
        string dir = SampleDir();
        bool write = Environment.GetEnvironmentVariable("SECTIONTWIST_WRITE_SAMPLES") == "1";
        foreach (var (file, make) in All)
        {
            string path = Path.Combine(dir, file);
            string text = make();
            if (write) { Directory.CreateDirectory(Path.GetDirectoryName(path)!); File.WriteAllText(path, text); }
            Assert.True(File.Exists(path), $"{file} missing: run the tests with SECTIONTWIST_WRITE_SAMPLES=1");
            Assert.Equal(text, File.ReadAllText(path));
        }
    }

    private static DxfImport ReadSample(string file, DxfReadOptions? o = null) => DxfProfiles.Read(Path.Combine(SampleDir(), file), o);

    [Fact]
    public void Keyed_shaft_area()
    {
        // circle minus the circular cap above the keyseat floor: pi R^2 - integral_{-w}^{w} (sqrt(R^2 - x^2) - f) dx
        double w = KeyHalfW, R = KeyR;
        double cap = w * Math.Sqrt(R * R - w * w) + R * R * Math.Asin(w / R) - 2 * w * KeyFloor;
        var r = ReadSample("winch-input-shaft-keyed.dxf");
        Tol.Rel((Math.PI * R * R - cap) * 1e-6, r.Profile.Properties.Area, 1e-12, "circle minus keyseat (elementary integral)");
        Assert.Contains("TEXT", r.Report.SkippedTypes);
        Assert.Equal("AC1009", r.Report.Version);
    }

    [Fact]
    public void Splined_shaft_area()
    {
        // shoelace over the vertices plus a circular segment r^2 (theta - sin theta) / 2 for every bulge (CCW, outward)
        var v = SplineVertices();
        double a = 0;
        for (int i = 0; i < v.Count; i++)
        {
            var (x0, y0, b) = v[i];
            var (x1, y1, _) = v[(i + 1) % v.Count];
            a += 0.5 * (x0 * y1 - x1 * y0);
            if (b != 0)
            {
                double th = 4 * Math.Atan(b), chord = Math.Sqrt((x1 - x0) * (x1 - x0) + (y1 - y0) * (y1 - y0));
                double rad = chord / (2 * Math.Sin(th / 2));
                a += 0.5 * rad * rad * (th - Math.Sin(th));
            }
        }
        var r = ReadSample("winch-output-shaft-splined.dxf");
        Tol.Rel(a * 1e-6, r.Profile.Properties.Area, 1e-12, "polygon plus circular segments");
        Assert.Equal(16, r.Profile.Regions[0].Outer.Segments.Count(s => s is ArcSegment));
    }

    [Fact]
    public void Drum_tube_area()
    {
        double ro = DrumD / 2, ri = ro - DrumT;
        var r = ReadSample("winch-drum-tube.dxf");
        Tol.Rel(Math.PI * (ro * ro - ri * ri) * 1e-6, r.Profile.Properties.Area, 1e-12, "annulus");
        Assert.Single(r.Profile.Regions[0].Holes);
        Assert.Contains("CENTRE", r.Report.Layers);
    }

    [Fact]
    public void Hex_bar_area_and_rotation()
    {
        var r = ReadSample("winch-hex-drive-bar.dxf");
        Tol.Rel(Math.Sqrt(3) / 2 * HexAf * HexAf * 1e-6, r.Profile.Properties.Area, 1e-12, "hexagon sqrt(3)/2 s^2 (s across flats)");
        Tol.Abs(0.120, r.Profile.Properties.Centroid.X, 1e-12);
        Tol.Abs(0.080, r.Profile.Properties.Centroid.Y, 1e-12);
        // rotated 15 deg: a flat normal at 15 deg, so the corner farthest in x lies at angle 15 + 30 = 45 deg
        double circum = HexAf / Math.Sqrt(3) * 1e-3;
        Tol.Rel(0.120 + circum * Math.Cos(Math.PI / 12), r.Profile.Bounds.MaxX, 1e-12);
    }

    [Fact]
    public void Frame_member_reads_in_inches()
    {
        double Sq(double b, double rc) => b * b - (4 - Math.PI) * rc * rc;
        var r = ReadSample("winch-frame-shs-inch.dxf");
        Assert.Equal(LengthUnit.Inch, r.Profile.Unit);
        double inch2 = 0.0254 * 0.0254;
        Tol.Rel((Sq(ShsB, ShsRo) - Sq(ShsB - 2 * ShsT, ShsRi)) * inch2, r.Profile.Properties.Area, 1e-12, "rounded square minus rounded square");
    }

    [Fact]
    public void Brake_lever_mirrored_arcs()
    {
        double rr = LeverW / 2;
        var r = ReadSample("winch-brake-lever-mirrored.dxf");
        Tol.Rel(((LeverL - LeverW) * LeverW + Math.PI * rr * rr) * 1e-6, r.Profile.Properties.Area, 1e-12, "obround");
        Tol.Abs(-0.020, r.Profile.Bounds.MinX, 1e-15); Tol.Abs(0.020, r.Profile.Bounds.MaxX, 1e-15);
    }

    [Fact]
    public void Crank_grip_spline_area()
    {
        // reference: Green's theorem on the same B-spline evaluated at 200 000 points (independent of the flattening)
        var curve = new NurbsCurve(3, GripKnots, GripCtrl.Select(p => new Point2(p.X, p.Y)).ToArray(), null);
        double a = 0;
        Point2 prev = curve.Evaluate(0);
        for (int i = 1; i <= 200_000; i++) { var p = curve.Evaluate(i / 200_000.0); a += 0.5 * Point2.Cross(prev, p); prev = p; }
        var r = ReadSample("winch-crank-grip-spline.dxf");
        // chords cut off at most (2/3) sagitta x length: (2/3)(1e-5 x 63 mm)(80 mm) / 913 mm^2 = 3.7e-5 (parabolic segment area)
        Tol.Rel(Math.Abs(a) * 1e-6, r.Profile.Properties.Area, 4e-5, "spline area by fine sampling; chord tolerance 1e-5 of the size");
        var fine = ReadSample("winch-crank-grip-spline.dxf", new DxfReadOptions { SplineTolerance = 1e-9 });
        Tol.Rel(Math.Abs(a) * 1e-6, fine.Profile.Properties.Area, 1e-8, "a tighter spline tolerance converges");
    }
}
