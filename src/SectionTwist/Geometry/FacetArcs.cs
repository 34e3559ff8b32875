namespace SectionTwist.Geometry;

/// <summary>
/// Replaces the facet runs of a loop (<see cref="FacetRuns"/>) by circular arcs through the facet vertices: greedily,
/// each arc starts at a vertex and takes as many following vertices as stay within the tolerance of the circle through
/// the first, middle and last of them, in order along it and turning less than half a circle (a greedy variant of
/// fitting arc splines to point data). Vertices of the facets are kept as arc end
/// points, so the outline moves by at most the tolerance at the vertices and by the facets' own sagitta between them.
/// The greedy growth is common practice, no source.
/// </summary>
internal static class FacetArcs
{
    /// <summary>The loop with every facet run of at least <see cref="FacetRuns.MinFacets"/> facets fitted by arcs within <paramref name="tol"/>.</summary>
    public static Loop Fit(Loop loop, double tol, out int facetsReplaced, out int arcs)
    {
        facetsReplaced = 0; arcs = 0;
        var runs = FacetRuns.Find(loop);
        if (runs.Count == 0) return loop;
        var segs = loop.Segments;
        int n = segs.Count;
        var skip = new bool[n];
        var byStart = new Dictionary<int, List<Segment>>();
        foreach (var run in runs)
        {
            var pts = new List<Point2>(run.Count + 1);
            for (int k = 0; k < run.Count; k++) pts.Add(segs[(run.First + k) % n].Start);
            pts.Add(segs[(run.First + run.Count - 1) % n].End);
            var fitted = FitPoints(pts, tol);
            if (fitted.Count >= run.Count) continue;
            facetsReplaced += run.Count;
            arcs += fitted.Count(s => s is ArcSegment);
            for (int k = 0; k < run.Count; k++) skip[(run.First + k) % n] = true;
            byStart[run.First] = fitted;
        }
        if (facetsReplaced == 0) return loop;
        var result = new List<Segment>();
        for (int i = 0; i < n; i++)
        {
            if (byStart.TryGetValue(i, out var pieces)) result.AddRange(pieces);
            if (!skip[i]) result.Add(segs[i]);
        }
        return new Loop(result);
    }

    /// <summary>Arcs (and lines where no arc fits) through the points in order; consecutive pieces share points.</summary>
    public static List<Segment> FitPoints(IReadOnlyList<Point2> pts, double tol)
    {
        var list = new List<Segment>();
        int m = pts.Count - 1;
        int s = 0;
        while (s < m)
        {
            int best = s + 1;
            ArcSegment? bestArc = null;
            for (int e = s + 2; e <= m; e++)
            {
                var arc = TryArc(pts, s, e, tol);
                if (arc is null) break;
                best = e; bestArc = arc;
            }
            list.Add(bestArc is null ? new LineSegment(pts[s], pts[best]) : bestArc);
            s = best;
        }
        return list;
    }

    private static ArcSegment? TryArc(IReadOnlyList<Point2> pts, int s, int e, double tol)
    {
        if (pts[s] == pts[e]) return null;
        ArcSegment arc;
        try { arc = ArcSegment.ThroughThreePoints(pts[s], pts[(s + e) / 2], pts[e]); }
        catch (SectionTwistException) { return null; }
        if (!(Math.Abs(arc.Sweep) <= Math.PI) || !double.IsFinite(arc.Radius)) return null;
        double prevT = 0;
        for (int k = s + 1; k < e; k++)
        {
            var (q, t) = arc.Closest(pts[k]);
            if (Point2.Distance(q, pts[k]) > tol || t <= prevT || t >= 1) return null;
            prevT = t;
        }
        return arc;
    }
}
