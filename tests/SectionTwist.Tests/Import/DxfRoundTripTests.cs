using FsCheck;
using FsCheck.Fluent;
using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;
using SectionTwist.Units;

namespace SectionTwist.Tests.Import;

/// <summary>Write then read: the loops come back (same areas, moments and segment kinds).</summary>
public class DxfRoundTripTests
{
    private static Profile Sample()
    {
        // a 60 x 40 plate with rounded corners (r 5), a circular hole and an elliptical hole, in millimetres
        double m = 1e-3;
        var outer = new LoopBuilder(5 * m, 0).LineTo(55 * m, 0).ArcTo(new Point2(60 * m, 5 * m), new Point2(55 * m, 5 * m), true)
            .LineTo(60 * m, 35 * m).ArcTo(new Point2(55 * m, 40 * m), new Point2(55 * m, 35 * m), true)
            .LineTo(5 * m, 40 * m).ArcTo(new Point2(0, 35 * m), new Point2(5 * m, 35 * m), true)
            .LineTo(0, 5 * m).ArcTo(new Point2(5 * m, 0), new Point2(5 * m, 5 * m), true).Close();
        var hole = LoopBuilder.Circle(new Point2(15 * m, 20 * m), 6 * m);
        var ell = new Loop([EllipticalArcSegment.Full(new Point2(40 * m, 20 * m), 10 * m, 5 * m, 0.3)]);
        return Profile.FromLoops([outer, hole, ell], LengthUnit.Millimetre, "plate");
    }

    private static DxfImport RoundTrip(Profile p, DxfWriteOptions o, DxfReadOptions? r = null)
    {
        using var ms = new MemoryStream();
        DxfProfiles.Write(p, ms, o);
        return DxfProfiles.Read(ms.ToArray(), "rt.dxf", r);
    }

    [Theory]
    [InlineData(DxfVersion.R12)]
    [InlineData(DxfVersion.R2000)]
    public void Plate_round_trips(DxfVersion v)
    {
        var p = Sample();
        var back = RoundTrip(p, new DxfWriteOptions { Version = v });
        Assert.Equal(LengthUnit.Millimetre, back.Profile.Unit);
        Assert.Equal(3, back.Report.Loops);
        // R12 has no ELLIPSE: the elliptical hole goes out as chords within 1e-5 of the size; a chord of sagitta s and
        // length c cuts off at most (2/3) s c of area, so the area changes by at most (2/3) 1e-5 size x perimeter, about
        // 1e-5 of the plate's area here (the ellipse's perimeter is about 48 mm, the plate about 2100 mm^2)
        double tol = v == DxfVersion.R12 ? 1.5e-5 : 1e-12;
        Tol.Rel(p.Properties.Area, back.Profile.Properties.Area, tol, "same profile");
        Tol.Rel(p.Properties.Ixx, back.Profile.Properties.Ixx, tol);
        Tol.Rel(p.Properties.Iyy, back.Profile.Properties.Iyy, tol);
        int arcs = back.Profile.Loops.SelectMany(l => l.Segments).Count(s => s is ArcSegment);
        Assert.Equal(5, arcs); // four fillets and the circle stay exact arcs
        if (v == DxfVersion.R2000) Assert.Single(back.Profile.Loops.SelectMany(l => l.Segments), s => s is EllipticalArcSegment);
    }

    [Fact]
    public void Extra_polylines_go_on_their_own_layers_and_the_profile_layer_reads_back()
    {
        var p = Sample();
        var contour = new DxfPolyline("CONTOUR_1", [new Point2(0.01, 0.01), new Point2(0.02, 0.01), new Point2(0.02, 0.02)], false);
        var back = RoundTrip(p, new DxfWriteOptions { Version = DxfVersion.R2000, Polylines = [contour] }, new DxfReadOptions { Layer = "PROFILE" });
        Tol.Rel(p.Properties.Area, back.Profile.Properties.Area, 1e-12);
        Assert.Contains("CONTOUR_1", back.Report.Layers);
    }

    [Fact]
    public void Inch_profile_writes_insunits_1()
    {
        var p = Profile.FromLoops([LoopBuilder.Polygon([new(0, 0), new(0.0254, 0), new(0.0254, 0.0508)])], LengthUnit.Inch);
        using var ms = new MemoryStream();
        DxfProfiles.Write(p, ms);
        string text = System.Text.Encoding.Latin1.GetString(ms.ToArray());
        Assert.Contains("$INSUNITS\r\n 70\r\n1\r\n", text);
        var back = DxfProfiles.Read(ms.ToArray(), "in.dxf");
        Tol.Rel(p.Properties.Area, back.Profile.Properties.Area, 1e-12);
    }

    /// <summary>
    /// Random convex polygons with random arcs (bulges) on some edges and an optional circular hole: the written file
    /// reads back to the same area and centroid (property test; FsCheck generates the shapes).
    /// </summary>
    [FsCheck.Xunit.Property(MaxTest = 60)]
    public Property Random_profiles_round_trip()
    {
        var gen = from n in Gen.Choose(3, 9)
                  from seeds in Gen.ArrayOf(Gen.Choose(0, 1_000_000), n)
                  from bulges in Gen.ArrayOf(Gen.Choose(-40, 40), n)
                  from hole in Gen.Elements(true, false)
                  from r12 in Gen.Elements(true, false)
                  from scale in Gen.Elements(1e-3, 1.0, 25.4e-3, 1e-6)
                  select (seeds, bulges, hole, r12, scale);
        return Prop.ForAll(gen.ToArbitrary(), t =>
        {
            var p = MakeProfile(t.seeds, t.bulges, t.hole, t.scale);
            var back = RoundTrip(p, new DxfWriteOptions { Version = t.r12 ? DxfVersion.R12 : DxfVersion.R2000 });
            double d = p.Bounds.Diagonal;
            return Tol.RelErr(p.Properties.Area, back.Profile.Properties.Area) < 1e-11
                && Point2.Distance(p.Properties.Centroid, back.Profile.Properties.Centroid) < 1e-11 * d
                && back.Report.Loops == p.Loops.Count();
        });
    }

    private static Profile MakeProfile(int[] seeds, int[] bulges, bool hole, double scale)
    {
        // vertices on a circle of radius 50 at sorted random angles (convex); outward bulges only (|b| <= 0.4) keep it simple
        int n = seeds.Length;
        var ang = seeds.Select(s => 2 * Math.PI * s / 1_000_000.0).Order().ToArray();
        for (int i = 1; i < n; i++) if (ang[i] - ang[i - 1] < 0.05) ang[i] = ang[i - 1] + 0.05;
        if (ang[^1] - ang[0] > 2 * Math.PI - 0.05) return MakeProfile([0, 333_333, 666_666], bulges, hole, scale);
        var pts = ang.Select(a => new Point2(50 * Math.Cos(a) * scale, 50 * Math.Sin(a) * scale)).ToArray();
        var b = new LoopBuilder(pts[0]);
        for (int i = 0; i < n; i++)
        {
            var next = pts[(i + 1) % n];
            double bulge = Math.Abs(bulges[i]) / 100.0;
            if (bulges[i] % 3 == 0) b.LineTo(next); else b.BulgeTo(next, bulge);
        }
        var loops = new List<Loop> { b.Close() };
        // a hole small enough to sit inside the inscribed region of any such polygon around the centroid of its vertices
        if (hole)
        {
            var c = new Point2(pts.Average(p => p.X), pts.Average(p => p.Y));
            double inr = Enumerable.Range(0, n).Min(i => DistToLine(c, pts[i], pts[(i + 1) % n]));
            if (inr > 2 * scale && loops[0].Contains(c)) loops.Add(LoopBuilder.Circle(c, 0.5 * inr));
        }
        return Profile.FromLoops(loops, LengthUnit.Millimetre, "random");
    }

    private static double DistToLine(Point2 p, Point2 a, Point2 b) => Math.Abs(Point2.Cross(b - a, p - a)) / (b - a).Length;
}
