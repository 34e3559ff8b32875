namespace SectionTwist.Geometry;

/// <summary>
/// Checks a profile before meshing: no zero-area loop, no crossing or touching boundaries (within a loop or between
/// loops), every hole inside its region's outer loop and outside its other holes, and no overlapping regions.
/// Crossings are found on a fine polygon (chord deviation 1e-7 of the part size) with a uniform grid of buckets.
/// </summary>
public static class ProfileValidator
{
    /// <summary>Throws a <see cref="SectionTwistException"/> describing the first problem found.</summary>
    public static void Validate(Profile profile)
    {
        double diag = profile.Bounds.Diagonal;
        if (!(diag > 0) || double.IsInfinity(diag))
            throw new SectionTwistException("zero-area", $"{profile.Name}: the outline has no extent; check the drawing units and geometry");
        var loops = new List<(Loop Loop, int Region, int Hole)>();
        for (int r = 0; r < profile.Regions.Count; r++)
        {
            var reg = profile.Regions[r];
            loops.Add((reg.Outer, r, -1));
            for (int h = 0; h < reg.Holes.Count; h++) loops.Add((reg.Holes[h], r, h));
        }
        CheckCrossings(profile, loops, diag);
        foreach (var (loop, r, h) in loops)
        {
            if (Math.Abs(loop.SignedArea) <= 1e-12 * diag * diag)
                throw new SectionTwistException("zero-area",
                    $"{profile.Name}: {Describe(r, h)} near {loop.Segments[0].Start} encloses no area; remove the degenerate loop");
        }
        // Holes inside their outer loop, outside each other; regions not inside one another.
        for (int r = 0; r < profile.Regions.Count; r++)
        {
            var reg = profile.Regions[r];
            for (int h = 0; h < reg.Holes.Count; h++)
            {
                var p = reg.Holes[h].Segments[0].Start;
                if (!reg.Outer.Contains(reg.Holes[h].InteriorPoint()) || !reg.Outer.Contains(p))
                    throw new SectionTwistException("hole-outside",
                        $"{profile.Name}: hole {h + 1} of region {r + 1} (near {p}) lies outside its outer boundary; move it inside or make it a separate region");
                for (int k = 0; k < reg.Holes.Count; k++)
                    if (k != h && reg.Holes[k].Contains(p))
                        throw new SectionTwistException("hole-in-hole",
                            $"{profile.Name}: hole {h + 1} of region {r + 1} (near {p}) lies inside hole {k + 1}; an island inside a hole must be its own region");
            }
            for (int s = 0; s < profile.Regions.Count; s++)
            {
                if (s == r) continue;
                var p = profile.Regions[s].Outer.Segments[0].Start;
                if (reg.Outer.Contains(p) && !reg.Holes.Any(hl => hl.Contains(p)))
                    throw new SectionTwistException("overlapping-regions",
                        $"{profile.Name}: region {s + 1} (near {p}) overlaps region {r + 1}; merge them into one outline or separate them");
            }
        }
    }

    private static string Describe(int region, int hole) => hole < 0 ? $"outer loop of region {region + 1}" : $"hole {hole + 1} of region {region + 1}";

    private static void CheckCrossings(Profile profile, List<(Loop Loop, int Region, int Hole)> loops, double diag)
    {
        double sag = 1e-7 * diag;
        var edges = new List<(Point2 A, Point2 B, int Loop, int Seg, int Index, int Count)>();
        var loopEdgeCount = new int[loops.Count];
        for (int li = 0; li < loops.Count; li++)
        {
            var loop = loops[li].Loop;
            int start = edges.Count;
            for (int s = 0; s < loop.Segments.Count; s++)
            {
                var pts = loop.Segments[s].Flatten(sag, double.PositiveInfinity);
                // a degenerate curve (an ellipse with a 1e-104 axis, say) can trace to NaN points, which all fall into one
                // cell of the crossing grid and make the check quadratic: refuse it at once
                foreach (var q in pts)
                    if (!double.IsFinite(q.X) || !double.IsFinite(q.Y))
                        throw new SectionTwistException("bad-geometry",
                            $"{profile.Name}: {Describe(loops[li].Region, loops[li].Hole)} segment {s + 1} traces to a point that is not a finite number (a degenerate ellipse, arc or spline?); remove or redraw that curve");
                for (int i = 0; i + 1 < pts.Count; i++) edges.Add((pts[i], pts[i + 1], li, s, edges.Count - start, 0));
                if (edges.Count > Limits.InputLimits.MaxOutlineEdges)
                    throw new SectionTwistException("profile-too-complex",
                        $"{profile.Name}: the outline has more than {Limits.InputLimits.MaxOutlineEdges} straight pieces to check for crossings (stacked or repeated curves?); remove the duplicates or simplify the outline");
            }
            loopEdgeCount[li] = edges.Count - start;
        }
        // Bucket edges into a grid of about sqrt(E) x sqrt(E) cells.
        var box = profile.Bounds;
        int nc = Math.Clamp((int)Math.Sqrt(edges.Count), 1, 512);
        double cw = Math.Max(box.Width, 1e-300) / nc, ch = Math.Max(box.Height, 1e-300) / nc;
        var cells = new Dictionary<int, List<int>>();
        int Cx(double x) => Math.Clamp((int)((x - box.MinX) / cw), 0, nc - 1);
        int Cy(double y) => Math.Clamp((int)((y - box.MinY) / ch), 0, nc - 1);
        double tol = 1e-10 * diag;
        // edges crowded into a few cells (stacked copies, a curve far smaller than the part) make the check quadratic:
        // a budget on pair tests keeps it to seconds whatever the input
        long pairs = 0, pairBudget = Limits.InputLimits.MaxCrossingPairTests;
        for (int e = 0; e < edges.Count; e++)
        {
            var (a, b, _, _, _, _) = edges[e];
            for (int ix = Cx(Math.Min(a.X, b.X) - tol); ix <= Cx(Math.Max(a.X, b.X) + tol); ix++)
                for (int iy = Cy(Math.Min(a.Y, b.Y) - tol); iy <= Cy(Math.Max(a.Y, b.Y) + tol); iy++)
                {
                    int key = ix * nc + iy;
                    if (!cells.TryGetValue(key, out var list)) cells[key] = list = [];
                    pairs += list.Count;
                    if (pairs > pairBudget)
                        throw new SectionTwistException("profile-too-complex",
                            $"{profile.Name}: {Describe(loops[edges[e].Loop].Region, loops[edges[e].Loop].Hole)} near {edges[e].A} has too many boundary pieces crowded together to check for crossings (stacked copies or a curve far smaller than the part?); remove the duplicates or the tiny curve");
                    foreach (int f in list)
                    {
                        var ef = edges[f];
                        var ee = edges[e];
                        if (ef.Loop == ee.Loop)
                        {
                            int n = loopEdgeCount[ee.Loop];
                            int d = Math.Abs(ef.Index - ee.Index);
                            if (d == 1 || d == n - 1) continue; // neighbours share an end point
                        }
                        if (SegmentsIntersect(ee.A, ee.B, ef.A, ef.B, tol, out var where))
                        {
                            var l1 = loops[ee.Loop]; var l2 = loops[ef.Loop];
                            string what = ee.Loop == ef.Loop ? $"{Describe(l1.Region, l1.Hole)} crosses itself" :
                                $"{Describe(l1.Region, l1.Hole)} touches or crosses {Describe(l2.Region, l2.Hole)}";
                            throw new SectionTwistException("self-intersection",
                                $"{profile.Name}: {what} at {where} (segments {ee.Seg + 1} and {ef.Seg + 1}); fix the outline so boundaries neither cross nor touch");
                        }
                    }
                    list.Add(e);
                }
        }
    }

    private static bool SegmentsIntersect(Point2 a, Point2 b, Point2 c, Point2 d, double tol, out Point2 where)
    {
        where = default;
        if (Math.Max(a.X, b.X) + tol < Math.Min(c.X, d.X) || Math.Max(c.X, d.X) + tol < Math.Min(a.X, b.X) ||
            Math.Max(a.Y, b.Y) + tol < Math.Min(c.Y, d.Y) || Math.Max(c.Y, d.Y) + tol < Math.Min(a.Y, b.Y)) return false;
        Point2 r = b - a, s = d - c;
        double den = Point2.Cross(r, s);
        double lr = r.Length, ls = s.Length;
        if (Math.Abs(den) > 1e-12 * lr * ls)
        {
            double t = Point2.Cross(c - a, s) / den, u = Point2.Cross(c - a, r) / den;
            double et = tol / Math.Max(lr, 1e-300), eu = tol / Math.Max(ls, 1e-300);
            if (t >= -et && t <= 1 + et && u >= -eu && u <= 1 + eu) { where = a + t * r; return true; }
            return false;
        }
        // parallel: overlapping if collinear and projections overlap
        if (Math.Abs(Point2.Cross(c - a, r)) > tol * lr) return false;
        double t0 = Point2.Dot(c - a, r) / (lr * lr), t1 = Point2.Dot(d - a, r) / (lr * lr);
        if (Math.Max(t0, t1) < 0 || Math.Min(t0, t1) > 1) return false;
        where = a + Math.Clamp(Math.Max(Math.Min(t0, t1), 0), 0, 1) * r;
        return true;
    }
}
