using System.Globalization;
using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>Duplicate removal and chaining into loops.</summary>
internal sealed partial class OutlineAssembler
{
    /// <summary>True when <paramref name="inner"/> lies on <paramref name="outer"/> (its ends and quarter points within the snap tolerance).</summary>
    private bool Covers(Segment outer, Segment inner)
    {
        double tol = Math.Max(snapTol, 1e-12 * diag);
        foreach (double t in (ReadOnlySpan<double>)[0, 0.25, 0.5, 0.75, 1])
        {
            var p = inner.PointAt(t);
            if (Point2.Distance(outer.Closest(p).Point, p) > tol) return false;
        }
        return true;
    }

    /// <summary>
    /// Drops pieces lying on another piece (exact or contained duplicates) and merges collinear lines that overlap by
    /// more than the tolerance into one line. Candidates come from a sweep over boxes sorted by their left edge.
    /// </summary>
    private void DropDuplicates()
    {
        double tol = Math.Max(snapTol, 1e-12 * diag);
        for (int pass = 0; pass < 8; pass++)
        {
            bool changed = false;
            var alive = _pieces.Where(p => !p.Dead).ToList();
            var boxes = alive.Select(p => p.Segment.Bounds).ToArray();
            var order = Enumerable.Range(0, alive.Count).OrderBy(i => boxes[i].MinX).ToArray();
            for (int oi = 0; oi < order.Length; oi++)
            {
                if ((oi & 255) == 0) ct.ThrowIfCancellationRequested();
                int i = order[oi];
                if (alive[i].Dead) continue;
                for (int oj = oi + 1; oj < order.Length && boxes[order[oj]].MinX <= boxes[i].MaxX + tol; oj++)
                {
                    int j = order[oj];
                    var pi = alive[i];
                    var pj = alive[j];
                    if (pj.Dead || !boxes[i].Intersects(boxes[j], tol)) continue;
                    if (Covers(pi.Segment, pj.Segment)) { pj.Dead = true; DuplicatesDropped++; changed = true; continue; }
                    if (Covers(pj.Segment, pi.Segment)) { pi.Dead = true; DuplicatesDropped++; changed = true; break; }
                    if (pi.Segment is LineSegment li && pj.Segment is LineSegment lj && TryMerge(pi, li, pj, lj, tol))
                    {
                        pj.Dead = true; DuplicatesDropped++; changed = true;
                        boxes[i] = pi.Segment.Bounds;
                    }
                }
            }
            if (!changed) break;
        }
    }

    /// <summary>Merges two collinear lines overlapping by more than <paramref name="tol"/> into the first one.</summary>
    private bool TryMerge(OutlinePiece pi, LineSegment li, OutlinePiece pj, LineSegment lj, double tol)
    {
        Point2 d = li.End - li.Start;
        double len = d.Length;
        if (len == 0) return false;
        Point2 u = (1 / len) * d;
        double Off(Point2 p) => Math.Abs(Point2.Cross(u, p - li.Start));
        if (Off(lj.Start) > tol || Off(lj.End) > tol) return false;
        double s0 = 0, s1 = len, t0 = Point2.Dot(lj.Start - li.Start, u), t1 = Point2.Dot(lj.End - li.Start, u);
        double overlap = Math.Min(s1, Math.Max(t0, t1)) - Math.Max(s0, Math.Min(t0, t1));
        if (overlap <= tol) return false;
        var cand = new (double S, int Node)[] { (s0, pi.A), (s1, pi.B), (t0, pj.A), (t1, pj.B) };
        var lo = cand.MinBy(c => c.S);
        var hi = cand.MaxBy(c => c.S);
        pi.A = lo.Node; pi.B = hi.Node;
        pi.Segment = new LineSegment(_nodes[lo.Node], _nodes[hi.Node]);
        return true;
    }

    private void Chain()
    {
        var live = _pieces.Where(p => !p.Dead).ToList();
        var at = new Dictionary<int, List<OutlinePiece>>();
        foreach (var p in live)
        {
            foreach (int node in (ReadOnlySpan<int>)[p.A, p.B])
            {
                if (!at.TryGetValue(node, out var l)) at[node] = l = [];
                l.Add(p);
            }
        }
        var odd = at.Where(kv => kv.Value.Count % 2 == 1).Select(kv => kv.Key).ToList();
        if (odd.Count > 0) throw OpenError(odd, at);
        var used = new HashSet<OutlinePiece>();
        foreach (var first in live)
        {
            if (!used.Add(first)) continue;
            var segs = new List<Segment> { first.Segment };
            var layers = new SortedSet<string>(StringComparer.OrdinalIgnoreCase) { first.Layer };
            int start = first.A, cur = first.B;
            while (cur != start)
            {
                var next = at[cur].FirstOrDefault(q => !used.Contains(q));
                if (next is null) throw OpenError([cur], at);
                used.Add(next);
                layers.Add(next.Layer);
                if (next.A == cur) { segs.Add(next.Segment); cur = next.B; }
                else { segs.Add(next.Segment.Reversed()); cur = next.A; }
            }
            Loops.Add(new Loop(segs));
            LoopLayers.Add(layers.ToArray());
        }
    }

    private SectionTwistException OpenError(List<int> odd, Dictionary<int, List<OutlinePiece>> at)
    {
        string F(double v) => v.ToString("G6", CultureInfo.InvariantCulture);
        string P(Point2 p) => $"({F(p.X)}, {F(p.Y)})";
        int branch = -1;
        foreach (var kv in at) if (kv.Value.Count >= 3 && (branch < 0 || kv.Value.Count % 2 == 1)) branch = kv.Key;
        if (branch >= 0)
        {
            var who = string.Join(", ", at[branch].Take(4).Select(p => p.Source));
            return new SectionTwistException("dxf-branch",
                $"{file}: {at[branch].Count} outline ends meet at {P(_nodes[branch])} ({who}); remove stray or construction lines there, or pick the outline layer with --layer");
        }
        // the closest pair of dangling ends is most likely the gap that should have been closed
        var ends = odd.Take(2000).ToList();
        double bestD = double.PositiveInfinity;
        int ba = ends[0], bb = -1;
        for (int i = 0; i < ends.Count; i++)
            for (int j = i + 1; j < ends.Count; j++)
            {
                double d = Point2.Distance(_nodes[ends[i]], _nodes[ends[j]]);
                if (d < bestD) { bestD = d; ba = ends[i]; bb = ends[j]; }
            }
        string ra = at[ba][0].Source;
        if (bb < 0)
            return new SectionTwistException("open-loop", $"{file}: open outline: {ra} ends at {P(_nodes[ba])} with nothing joined to it; close the outline in CAD");
        string rb = at[bb][0].Source;
        string widen = diag > 0 ? $" or widen the snap tolerance to more than {F(bestD / diag * 1.5)} of the part size (now {F(snapTol / diag)})" : "";
        return new SectionTwistException("open-loop",
            $"{file}: open outline: gap of {F(bestD)} drawing units between the end of {ra} at {P(_nodes[ba])} and the end of {rb} at {P(_nodes[bb])} " +
            $"({odd.Count} loose ends in all); close the outline in CAD, pick the outline layer with --layer,{widen}");
    }
}
