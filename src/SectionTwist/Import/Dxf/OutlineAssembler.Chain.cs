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
            foreach (int node in (ReadOnlySpan<int>)[p.A, p.B])
            {
                if (!at.TryGetValue(node, out var l)) at[node] = l = [];
                l.Add(p);
            }
        var pruned = Prune(live, at);
        var kept = live.Where(p => !pruned.Contains(p)).ToList();
        var keptNodes = new HashSet<int>(kept.SelectMany(p => new[] { p.A, p.B }));
        GroupLoose(pruned, at, keptNodes);
        foreach (var comp in Components(kept, []))
        {
            var odd = comp.SelectMany(p => new[] { p.A, p.B }).Distinct().Where(n => Degree(at[n], pruned) % 2 == 1).ToList();
            if (odd.Count > 0) { Junctions.Add(MakeJunction(comp, odd, at, pruned)); continue; }
            ChainComponent(comp, at, pruned);
        }
    }

    private static int Degree(List<OutlinePiece> atNode, HashSet<OutlinePiece> pruned) => atNode.Count(p => !pruned.Contains(p));

    /// <summary>Removes pieces with a free end, repeatedly (construction lines, stray ends, open outlines).</summary>
    private static HashSet<OutlinePiece> Prune(List<OutlinePiece> live, Dictionary<int, List<OutlinePiece>> at)
    {
        var pruned = new HashSet<OutlinePiece>();
        var deg = at.ToDictionary(kv => kv.Key, kv => kv.Value.Count);
        var queue = new Queue<int>(deg.Where(kv => kv.Value == 1).Select(kv => kv.Key));
        while (queue.Count > 0)
        {
            int node = queue.Dequeue();
            var piece = at[node].FirstOrDefault(p => !pruned.Contains(p));
            if (piece is null) continue;
            pruned.Add(piece);
            foreach (int n in (ReadOnlySpan<int>)[piece.A, piece.B])
                if (--deg[n] == 1) queue.Enqueue(n);
        }
        return pruned;
    }

    /// <summary>Connected groups of pieces (sharing a node other than the <paramref name="barrier"/> nodes); union-find over node ids.</summary>
    private List<List<OutlinePiece>> Components(List<OutlinePiece> pieces, HashSet<int> barrier)
    {
        int nn = _nodes.Count;
        var parent = new int[nn + 2 * pieces.Count];
        for (int i = 0; i < parent.Length; i++) parent[i] = i;
        int Find(int x)
        {
            while (parent[x] != x) { parent[x] = parent[parent[x]]; x = parent[x]; }
            return x;
        }
        // a barrier node joins nothing: each piece end there gets a private id
        int Id(int i, int node, int side) => barrier.Contains(node) ? nn + 2 * i + side : node;
        for (int i = 0; i < pieces.Count; i++)
        {
            int a = Find(Id(i, pieces[i].A, 0)), b = Find(Id(i, pieces[i].B, 1));
            if (a != b) parent[a] = b;
        }
        var groups = new Dictionary<int, List<OutlinePiece>>();
        var result = new List<List<OutlinePiece>>();
        for (int i = 0; i < pieces.Count; i++)
        {
            int r = Find(Id(i, pieces[i].A, 0));
            if (!groups.TryGetValue(r, out var g)) { groups[r] = g = []; result.Add(g); }
            g.Add(pieces[i]);
        }
        return result;
    }

    private void GroupLoose(HashSet<OutlinePiece> pruned, Dictionary<int, List<OutlinePiece>> at, HashSet<int> keptNodes)
    {
        foreach (var comp in Components(pruned.ToList(), keptNodes))
        {
            if (comp.Count == 1)
            {
                // the common case on sheets: one loose piece (a centre line, a leader, a table line)
                var q = comp[0];
                var ends = new List<(Point2, string)>(2);
                if (at[q.A].Count == 1) ends.Add((_nodes[q.A], q.Source));
                if (at[q.B].Count == 1) ends.Add((_nodes[q.B], q.Source));
                Loose.Add(new LooseGroup([q.Source], [q.Layer], [.. ends], q.Segment.Bounds, q.Segment is LineSegment, [q.Segment]));
                continue;
            }
            var free = comp.SelectMany(p => new[] { p.A, p.B }).Distinct().Where(n => at[n].Count == 1).ToList();
            var box = Box2.Empty;
            foreach (var p in comp) box = box.Union(p.Segment.Bounds);
            Loose.Add(new LooseGroup(comp.Select(p => p.Source).Distinct().ToArray(), comp.Select(p => p.Layer).Distinct(StringComparer.OrdinalIgnoreCase).ToArray(),
                free.Select(n => (_nodes[n], at[n][0].Source)).ToArray(), box, IsStraight(comp), comp.Select(p => p.Segment).ToArray()));
        }
    }

    private bool IsStraight(List<OutlinePiece> comp)
    {
        if (comp.Any(p => p.Segment is not LineSegment)) return false;
        var longest = comp.MaxBy(p => p.Segment.Length)!.Segment;
        double len = longest.Length;
        if (len == 0) return false;
        Point2 u = (1 / len) * (longest.End - longest.Start);
        double tol = Math.Max(snapTol, 1e-9 * diag);
        return comp.All(p => Math.Abs(Point2.Cross(u, p.Segment.Start - longest.Start)) <= tol && Math.Abs(Point2.Cross(u, p.Segment.End - longest.Start)) <= tol);
    }

    private Junction MakeJunction(List<OutlinePiece> comp, List<int> odd, Dictionary<int, List<OutlinePiece>> at, HashSet<OutlinePiece> pruned)
    {
        int node = odd.MaxBy(n => Degree(at[n], pruned));
        var box = Box2.Empty;
        foreach (var p in comp) box = box.Union(p.Segment.Bounds);
        var here = at[node].Where(p => !pruned.Contains(p)).ToList();
        return new Junction(_nodes[node], here.Count, here.Take(4).Select(p => p.Source).ToArray(), box, comp.Count,
            comp.Select(p => p.Layer).Distinct(StringComparer.OrdinalIgnoreCase).ToArray());
    }

    private void ChainComponent(List<OutlinePiece> comp, Dictionary<int, List<OutlinePiece>> at, HashSet<OutlinePiece> pruned)
    {
        var used = new HashSet<OutlinePiece>();
        foreach (var first in comp)
        {
            if (!used.Add(first)) continue;
            var segs = new List<Segment> { first.Segment };
            var sources = new List<string> { first.Source };
            var layers = new SortedSet<string>(StringComparer.OrdinalIgnoreCase) { first.Layer };
            int start = first.A, cur = first.B;
            while (cur != start)
            {
                var next = at[cur].First(q => !used.Contains(q) && !pruned.Contains(q));
                used.Add(next);
                layers.Add(next.Layer);
                sources.Add(next.Source);
                if (next.A == cur) { segs.Add(next.Segment); cur = next.B; }
                else { segs.Add(next.Segment.Reversed()); cur = next.A; }
            }
            Loops.Add(new Loop(segs));
            LoopLayers.Add(layers.ToArray());
            LoopSources.Add(sources.ToArray());
        }
    }
}
