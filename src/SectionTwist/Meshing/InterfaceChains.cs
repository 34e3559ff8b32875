using SectionTwist.Geometry;

namespace SectionTwist.Meshing;

/// <summary>
/// Joins the interface curves of a composite section into chains for the mesher: curves meeting end to end at a point
/// where no other curve ends (and that is not a vertex of the outline) belong to one chain, turned to run the same way.
/// A chain either closes on itself (a core's outline) or runs between two junctions: vertices of the outline or points
/// where three or more interface curves end. Along a chain the mesher measures distances for its thin-wall test and
/// treats corners as it treats the outline's corners.
/// </summary>
internal static class InterfaceChains
{
    /// <summary>The chains: their curves in order, the region they lie in, and whether they are open (end at junctions).</summary>
    /// <param name="profile">The outline.</param>
    /// <param name="interfaces">The interface curves, in any order and direction.</param>
    /// <param name="snap">Distance within which two curve ends are one point.</param>
    public static List<(List<Segment> Curves, int Region, bool Open)> Build(Profile profile, IReadOnlyList<(Segment Curve, int Region)> interfaces, double snap)
    {
        var result = new List<(List<Segment>, int, bool)>();
        int n = interfaces.Count;
        if (n == 0) return result;
        var points = new List<Point2>();
        var grid = new Dictionary<(long, long), List<int>>();
        double cell = 4 * snap;
        int Key(Point2 p)
        {
            long cx = (long)Math.Floor(p.X / cell), cy = (long)Math.Floor(p.Y / cell);
            for (long i = cx - 1; i <= cx + 1; i++)
                for (long k = cy - 1; k <= cy + 1; k++)
                    if (grid.TryGetValue((i, k), out var list))
                        foreach (int u in list)
                            if (Point2.Distance(points[u], p) <= snap) return u;
            points.Add(p);
            if (!grid.TryGetValue((cx, cy), out var l)) grid[(cx, cy)] = l = [];
            l.Add(points.Count - 1);
            return points.Count - 1;
        }
        foreach (var r in profile.Regions) foreach (var loop in r.Loops) foreach (var s in loop.Segments) Key(s.Start);
        int outline = points.Count;
        var ks = new int[n]; var ke = new int[n];
        var ends = new Dictionary<int, List<int>>();
        void AddEnd(int key, int curve) { if (!ends.TryGetValue(key, out var l)) ends[key] = l = []; l.Add(curve); }
        for (int i = 0; i < n; i++)
        {
            ks[i] = Key(interfaces[i].Curve.Start); ke[i] = Key(interfaces[i].Curve.End);
            AddEnd(ks[i], i);
            if (ke[i] != ks[i]) AddEnd(ke[i], i); else AddEnd(ks[i], i);
        }
        bool Junction(int key) => key < outline || ends[key].Count != 2;
        var used = new bool[n];
        // open chains first, each started at a junction; what is left closes on itself
        for (int pass = 0; pass < 2; pass++)
            for (int i = 0; i < n; i++)
            {
                if (used[i]) continue;
                bool forward = Junction(ks[i]);
                if (pass == 0 && !forward && !Junction(ke[i])) continue;
                int start = forward || pass == 1 ? ks[i] : ke[i];
                var chain = new List<Segment>();
                int c = i, at = start;
                while (true)
                {
                    used[c] = true;
                    bool fwd = ks[c] == at;
                    chain.Add(fwd ? interfaces[c].Curve : interfaces[c].Curve.Reversed());
                    at = fwd ? ke[c] : ks[c];
                    if (at == start || Junction(at)) break;
                    int nextCurve = ends[at].FirstOrDefault(x => !used[x], -1);
                    if (nextCurve < 0) break;
                    c = nextCurve;
                }
                result.Add((chain, interfaces[i].Region, pass == 0 || at != start));
            }
        return result;
    }
}
