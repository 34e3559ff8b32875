using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>HATCH boundary paths as outline curves (used when the section is taken from the hatching of a section view).</summary>
internal sealed partial class DxfGeometryBuilder
{
    /// <summary>
    /// Reads the boundary paths of a HATCH (DXF reference, HATCH group codes and "Boundary Path Data"): 91 paths; per
    /// path 92 type flags (bit 2 = polyline path: 72 has-bulge, 73 closed, 93 vertices of 10/20 and 42; otherwise 93
    /// edges, each 72 = 1 line 10/20 11/21, 2 circular arc 10/20 40 50 51 73, 3 elliptic arc 10/20 11/21 40 50 51 73,
    /// 4 spline 94 73 74 95 96 40.. 10/20(42).. [97 11/21.. 12/22 13/23]), then 97 source objects with their 330
    /// handles. Coordinates are in the hatch's object coordinate system (elevation 30, extrusion 210/220/230).
    /// Clockwise arc edges (73 = 0) store their angles measured clockwise; because writers differ, the reading whose end
    /// points meet the neighbouring edges is taken.
    /// </summary>
    private void Hatch(DxfEntity e, Affine2 m, string src, string layer)
    {
        var c = new HatchCursor(e, File, src);
        if (!c.Seek(91)) throw c.Bad("no boundary path count (code 91)");
        int paths = c.Int(91);
        if (paths is < 0 or > 100_000) throw c.Bad($"{paths} boundary paths");
        var map = OcsMap(e, m, e.Z(10));
        for (int k = 0; k < paths; k++)
        {
            int flags = c.Int(92);
            string where = $"{src} path {k + 1}";
            var edges = (flags & 2) != 0 ? PolylinePath(c) : EdgePath(c, where);
            foreach (var seg in edges)
            {
                if (seg.Segment is { } s) { if (s.Length > 0) Add(Conics.Map(s, map), where, layer); }
                else Curves.Add(new SourcedCurve(null, seg.Spline!.Transformed(map), where, layer));
            }
            if (c.PeekCode == 97)
            {
                int sources = c.Int(97);
                for (int j = 0; j < sources && c.PeekCode == 330; j++) c.Skip();
            }
        }
    }

    private static List<SourcedCurve> PolylinePath(HatchCursor c)
    {
        bool bulges = c.Int(72) != 0;
        c.Int(73);
        int n = c.Int(93);
        if (n is < 0 or > 1_000_000) throw c.Bad($"{n} polyline vertices");
        var v = new List<(Point2 P, double Bulge)>(n);
        for (int i = 0; i < n; i++)
        {
            var p = new Point2(c.Dbl(10), c.Dbl(20));
            double b = bulges && c.PeekCode == 42 ? c.Dbl(42) : 0;
            v.Add((p, b));
        }
        if (v.Count > 1 && v[^1].P == v[0].P) v.RemoveAt(v.Count - 1);
        var list = new List<SourcedCurve>();
        for (int i = 0; i < v.Count && v.Count > 1; i++)
        {
            Point2 a = v[i].P, b = v[(i + 1) % v.Count].P;
            if (a == b) continue;
            Segment s = Math.Abs(v[i].Bulge) < 1e-12 ? new LineSegment(a, b) : ArcSegment.FromBulge(a, b, Math.Clamp(v[i].Bulge, -1e6, 1e6));
            list.Add(new SourcedCurve(s, null, "", ""));
        }
        return list;
    }

    private static List<SourcedCurve> EdgePath(HatchCursor c, string where)
    {
        int n = c.Int(93);
        if (n is < 0 or > 1_000_000) throw c.Bad($"{n} edges");
        var raw = new List<SourcedCurve[]>(n);
        for (int i = 0; i < n; i++)
        {
            int type = c.Int(72);
            switch (type)
            {
                case 1:
                    {
                        var a = new Point2(c.Dbl(10), c.Dbl(20));
                        var b = new Point2(c.Dbl(11), c.Dbl(21));
                        raw.Add(a == b ? [] : [new SourcedCurve(new LineSegment(a, b), null, "", "")]);
                        break;
                    }
                case 2:
                    {
                        var ctr = new Point2(c.Dbl(10), c.Dbl(20));
                        double r = c.Dbl(40), a0 = c.Dbl(50), a1 = c.Dbl(51);
                        bool ccw = c.PeekCode != 73 || c.Int(73) != 0;
                        if (!(r > 0)) throw c.Bad($"arc edge {i + 1} with radius {r}");
                        raw.Add(ArcCandidates(ctr, new Point2(r, 0), new Point2(0, r), a0, a1, ccw));
                        break;
                    }
                case 3:
                    {
                        var ctr = new Point2(c.Dbl(10), c.Dbl(20));
                        var major = new Point2(c.Dbl(11), c.Dbl(21));
                        double ratio = c.Dbl(40), a0 = c.Dbl(50), a1 = c.Dbl(51);
                        bool ccw = c.PeekCode != 73 || c.Int(73) != 0;
                        if (major.Length == 0 || !(ratio >= 1e-3 && ratio <= 1)) throw c.Bad($"elliptic edge {i + 1} with axis ratio {ratio}");
                        raw.Add(ArcCandidates(ctr, major, new Point2(-major.Y, major.X) * ratio, a0, a1, ccw));
                        break;
                    }
                case 4:
                    raw.Add([new SourcedCurve(null, HatchSpline(c, i), "", "")]);
                    break;
                default:
                    throw c.Bad($"edge {i + 1} has unknown type {type}");
            }
        }
        return ChooseByNeighbours(raw);
    }

    /// <summary>The arc as stated (counter-clockwise), or for a clockwise edge the two readings of its angles.</summary>
    private static SourcedCurve[] ArcCandidates(Point2 ctr, Point2 p, Point2 q, double a0, double a1, bool ccw)
    {
        double s = a0 * (Math.PI / 180), t = a1 * (Math.PI / 180);
        double Sweep(double from, double to)
        {
            double d = (to - from) % (2 * Math.PI);
            if (d <= 1e-12) d += 2 * Math.PI;
            return d;
        }
        SourcedCurve Arc(double u0, double sweep) => new(Conics.Arc(ctr, p, q, u0, sweep), null, "", "");
        if (ccw) return [Arc(s, Sweep(s, t))];
        // clockwise: angles measured clockwise (from -s to -t), or the clockwise arc from s to t
        return [Arc(-s, -Sweep(-t, -s)), Arc(s, -Sweep(t, s))];
    }

    private static List<SourcedCurve> ChooseByNeighbours(List<SourcedCurve[]> raw)
    {
        var list = new List<SourcedCurve>();
        for (int i = 0; i < raw.Count; i++)
        {
            var options = raw[i];
            if (options.Length == 0) continue;
            if (options.Length == 1) { list.Add(options[0]); continue; }
            var near = new List<Point2>();
            foreach (int j in (ReadOnlySpan<int>)[i - 1, i + 1])
            {
                var nb = raw[((j % raw.Count) + raw.Count) % raw.Count];
                foreach (var o in nb) { near.Add(Ends(o).A); near.Add(Ends(o).B); }
            }
            double Miss(SourcedCurve o)
            {
                var (a, b) = Ends(o);
                return near.Count == 0 ? 0 : near.Min(x => Point2.Distance(x, a)) + near.Min(x => Point2.Distance(x, b));
            }
            list.Add(options.MinBy(Miss)!);
        }
        return list;
    }

    private static (Point2 A, Point2 B) Ends(SourcedCurve c) =>
        c.Segment is { } s ? (s.Start, s.End) : (c.Spline!.Evaluate(c.Spline.Start), c.Spline.Evaluate(c.Spline.End));

    private static NurbsCurve HatchSpline(HatchCursor c, int edge)
    {
        int degree = c.Int(94);
        bool rational = c.Int(73) != 0;
        c.Int(74);
        int nk = c.Int(95), nc = c.Int(96);
        if (nk is < 0 or > 1_000_000 || nc is < 0 or > 1_000_000) throw c.Bad($"spline edge {edge + 1} with {nk} knots and {nc} control points");
        var knots = new double[nk];
        for (int i = 0; i < nk; i++) knots[i] = c.Dbl(40);
        var ctrl = new Point2[nc];
        var w = rational ? new double[nc] : null;
        for (int i = 0; i < nc; i++)
        {
            ctrl[i] = new Point2(c.Dbl(10), c.Dbl(20));
            if (w is not null) w[i] = c.PeekCode == 42 ? c.Dbl(42) : 1;
        }
        var fit = new List<Point2>();
        if (c.PeekCode == 97 && c.PeekAfter is 11 or 12 or 13)
        {
            int nf = c.Int(97);
            for (int i = 0; i < nf && c.PeekCode == 11; i++) fit.Add(new Point2(c.Dbl(11), c.Dbl(21)));
            if (c.PeekCode == 12) { c.Dbl(12); c.Dbl(22); }
            if (c.PeekCode == 13) { c.Dbl(13); c.Dbl(23); }
        }
        if (nc > 0 && NurbsCurve.Check(degree, knots, nc, w) is null) return new NurbsCurve(degree, knots, ctrl, w);
        if (fit.Count >= 2) return SplineInterpolation.Interpolate(fit, degree is >= 1 and <= 5 ? degree : 3);
        throw c.Bad($"spline edge {edge + 1} has neither valid control data nor fit points");
    }
}
