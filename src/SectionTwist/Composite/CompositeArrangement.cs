using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Composite;

/// <summary>
/// How the parts of a composite section fit together. Every boundary segment of every part is split at the vertices of
/// the other parts that lie on it (within 1e-7 of the section size), so that two parts meeting along part of a segment,
/// along collinear overlapping pieces or along a shared arc produce identical pieces. A piece drawn by two parts, run in
/// opposite directions (material on both sides), is an interface; the pieces drawn once are chained into the loops of
/// the envelope (the union of the parts), which may have holes bounded by several parts. Refused, with a one-line
/// message naming the parts and the remedy: parts that overlap, parts that touch only at a point, an edge drawn by
/// three parts, and parts that share no edge with the others (a gap). Common practice of planar arrangements (a
/// doubly connected edge list without the faces), no source.
/// </summary>
internal sealed class CompositeArrangement
{
    private readonly IReadOnlyList<CompositePart> _parts;
    private readonly string _name;
    private readonly double _tol;
    private readonly List<Point2> _vertex = [];
    private readonly Dictionary<(long, long), List<int>> _grid = [];
    private readonly double _cell;
    private readonly int[] _byX = [];
    private readonly double[] _xs = [];

    private sealed record Piece(int Part, Segment Curve, int A, int B, Point2 Mid);

    /// <summary>Splits and matches the parts' boundaries; throws a <see cref="SectionTwistException"/> for parts that do not fit.</summary>
    public CompositeArrangement(IReadOnlyList<CompositePart> parts, string name)
    {
        _parts = parts; _name = name;
        double diag = parts.Select(p => p.Shape.Bounds).Aggregate((a, b) => a.Union(b)).Diagonal;
        _tol = 1e-7 * diag;
        _cell = 4 * _tol;
        var segs = new List<(int Part, Segment Curve)>();
        for (int i = 0; i < parts.Count; i++)
            foreach (var r in parts[i].Shape.Regions)
            {
                // material on the left: outer loops counter-clockwise, holes clockwise
                foreach (var s in r.Outer.Oriented(counterClockwise: true).Segments) segs.Add((i, s));
                foreach (var h in r.Holes) foreach (var s in h.Oriented(counterClockwise: false).Segments) segs.Add((i, s));
            }
        foreach (var (_, s) in segs) { Canonical(s.Start); Canonical(s.End); }
        _byX = Enumerable.Range(0, _vertex.Count).OrderBy(v => _vertex[v].X).ToArray();
        _xs = _byX.Select(v => _vertex[v].X).ToArray();
        var pieces = new List<Piece>();
        foreach (var (part, s) in segs) Split(part, s, pieces);
        var shared = Match(pieces, out var single);
        Loops = Chain(pieces, single);
        Interfaces = shared;
    }

    /// <summary>The envelope's loops (outer loops and holes, unordered), drawn once by one part each.</summary>
    public IReadOnlyList<Loop> Loops { get; }

    /// <summary>The shared pieces (their region is filled in by <see cref="WithRegions"/>).</summary>
    public IReadOnlyList<CompositeInterface> Interfaces { get; private set; }

    /// <summary>Sets the envelope region of each interface piece (the region whose outline contains its midpoint).</summary>
    public void WithRegions(Profile envelope)
    {
        Interfaces = Interfaces.Select(i =>
        {
            var p = i.Curve.PointAt(0.5);
            int region = 0;
            for (int r = 0; r < envelope.Regions.Count; r++)
                if (envelope.Regions[r].Outer.Contains(p)) { region = r; break; }
            return i with { Region = region };
        }).ToList();
    }

    /// <summary>A point for messages, in the parts' display unit (the drawing's or template's), round-off shown as 0.</summary>
    private string At(Point2 p)
    {
        var unit = _parts[0].Shape.Unit;
        string C(double v) => LengthUnit.Inv(Math.Abs(v) <= _tol ? 0 : unit.FromMetres(v));
        return $"({C(p.X)}, {C(p.Y)}) {unit.Symbol}";
    }

    private int Canonical(Point2 p)
    {
        long cx = (long)Math.Floor(p.X / _cell), cy = (long)Math.Floor(p.Y / _cell);
        for (long i = cx - 1; i <= cx + 1; i++)
            for (long k = cy - 1; k <= cy + 1; k++)
                if (_grid.TryGetValue((i, k), out var list))
                    foreach (int v in list)
                        if (Point2.Distance(_vertex[v], p) <= _tol) return v;
        _vertex.Add(p);
        if (!_grid.TryGetValue((cx, cy), out var l)) _grid[(cx, cy)] = l = [];
        l.Add(_vertex.Count - 1);
        return _vertex.Count - 1;
    }

    /// <summary>Splits segment <paramref name="s"/> of part <paramref name="part"/> at every vertex lying on it.</summary>
    private void Split(int part, Segment s, List<Piece> pieces)
    {
        var box = s.Bounds;
        var cuts = new List<(double T, int V)> { (0, Canonical(s.Start)), (1, Canonical(s.End)) };
        // the vertices within the segment's box, found through the vertices sorted by x
        int lo = Array.BinarySearch(_xs, box.MinX - _tol);
        if (lo < 0) lo = ~lo;
        while (lo > 0 && _xs[lo - 1] >= box.MinX - _tol) lo--;
        for (int k = lo; k < _xs.Length && _xs[k] <= box.MaxX + _tol; k++)
        {
            int v = _byX[k];
            var p = _vertex[v];
            if (p.Y < box.MinY - _tol || p.Y > box.MaxY + _tol) continue;
            if (v == cuts[0].V || v == cuts[1].V) continue;
            var (q, t) = s.Closest(p);
            if (Point2.Distance(p, q) <= _tol && t > 0 && t < 1) cuts.Add((t, v));
        }
        cuts.Sort((a, b) => a.T.CompareTo(b.T));
        for (int i = 0; i + 1 < cuts.Count; i++)
        {
            var (t0, a) = cuts[i];
            var (t1, b) = cuts[i + 1];
            // two cuts snapped onto one vertex, or a segment shorter than the snap distance: nothing to keep
            if (a == b && (cuts.Count > 2 || s.Length <= 4 * _tol)) continue;
            var curve = SubCurve(part, s, t0, t1, _vertex[a], _vertex[b]);
            pieces.Add(new Piece(part, curve, a, b, curve.PointAt(0.5)));
        }
    }

    /// <summary>The part of <paramref name="s"/> between parameters t0 and t1, its ends moved onto the shared vertices.</summary>
    private Segment SubCurve(int part, Segment s, double t0, double t1, Point2 a, Point2 b)
    {
        bool whole = t0 == 0 && t1 == 1;
        switch (s)
        {
            case LineSegment:
                return new LineSegment(a, b);
            case ArcSegment arc:
                if (whole && (a == b || (arc.Start == a && arc.End == b))) return arc;
                if (a == b) return new ArcSegment(arc.Center, arc.Radius, arc.StartAngle + t0 * arc.Sweep, (t1 - t0) * arc.Sweep);
                return ArcSegment.ThroughThreePoints(a, arc.PointAt(0.5 * (t0 + t1)), b);
            case EllipticalArcSegment e:
                return whole ? e : new EllipticalArcSegment(e.Center, e.SemiMajor, e.SemiMinor, e.Rotation, e.StartParameter + t0 * e.Sweep, (t1 - t0) * e.Sweep);
            default:
                if (whole) return s;
                throw new SectionTwistException("composite-parts", $"{_name}: a {s.GetType().Name} of part '{_parts[part].Name}' would have to be split where another part meets it; redraw that curve as lines and arcs");
        }
    }

    /// <summary>Pairs pieces drawn by two parts; returns the interfaces and marks the pieces drawn once.</summary>
    private List<CompositeInterface> Match(List<Piece> pieces, out bool[] single)
    {
        single = new bool[pieces.Count];
        var byEnds = pieces.Select((p, i) => (p, i)).GroupBy(x => (Math.Min(x.p.A, x.p.B), Math.Max(x.p.A, x.p.B)));
        var result = new List<CompositeInterface>();
        foreach (var g in byEnds)
        {
            var left = g.ToList();
            while (left.Count > 0)
            {
                var (p, i) = left[0];
                var same = left.Where(x => Point2.Distance(x.p.Mid, p.Mid) <= 10 * _tol).ToList();
                left.RemoveAll(same.Contains);
                if (same.Count == 1) { single[i] = true; continue; }
                string names = string.Join(", ", same.Select(x => $"'{_parts[x.p.Part].Name}'").Distinct());
                if (same.Count > 2)
                    throw new SectionTwistException("composite-overlap",
                        $"{_name}: the edge near {At(p.Mid)} is drawn by {same.Count} parts ({names}), so parts overlap; each edge inside the section belongs to exactly two parts: remove the doubled outline");
                var q = same[1].p;
                bool opposite = Point2.Dot(p.Curve.DerivativeAt(0.5), q.Curve.DerivativeAt(0.5)) < 0;
                if (q.Part == p.Part || !opposite)
                    throw new SectionTwistException("composite-overlap",
                        $"{_name}: parts {names} lie on the same side of the edge near {At(p.Mid)}, so they overlap; draw each piece of the section in one part only, meeting its neighbours along shared edges");
                result.Add(new CompositeInterface(p.Curve, 0, p.Part, q.Part));
            }
        }
        return result;
    }

    /// <summary>Chains the pieces drawn once into closed loops (material on the left).</summary>
    private List<Loop> Chain(List<Piece> pieces, bool[] single)
    {
        var outgoing = new Dictionary<int, List<int>>();
        for (int i = 0; i < pieces.Count; i++)
        {
            if (!single[i]) continue;
            if (!outgoing.TryGetValue(pieces[i].A, out var l)) outgoing[pieces[i].A] = l = [];
            l.Add(i);
        }
        foreach (var (v, list) in outgoing)
            if (list.Count > 1)
            {
                var names = list.Select(i => $"'{_parts[pieces[i].Part].Name}'").Distinct().ToList();
                string who = names.Count > 1 ? $"parts {string.Join(" and ", names)} touch" : $"part {names[0]} touches itself or another part";
                throw new SectionTwistException("composite-point-contact",
                    $"{_name}: {who} only at the point {At(_vertex[v])}, where nothing can carry shear between them; let them share an edge there or move them apart");
            }
        var used = new bool[pieces.Count];
        var loops = new List<Loop>();
        for (int i = 0; i < pieces.Count; i++)
        {
            if (!single[i] || used[i]) continue;
            var segs = new List<Segment>();
            int k = i;
            while (true)
            {
                used[k] = true;
                segs.Add(pieces[k].Curve);
                int end = pieces[k].B;
                if (end == pieces[i].A) break;
                if (!outgoing.TryGetValue(end, out var next) || used[next[0]])
                    throw new SectionTwistException("composite-gap",
                        $"{_name}: the outline of part '{_parts[pieces[k].Part].Name}' stops at {At(_vertex[end])}, where the parts leave a gap or overlap; close the gap so that neighbouring parts share their edges exactly");
                k = next[0];
            }
            loops.Add(new Loop(segs));
        }
        return loops;
    }

    /// <summary>Every part must share an edge with the others: a part standing apart or touching at a point only is refused.</summary>
    public void CheckConnected()
    {
        var shared = Interfaces;
        int n = _parts.Count;
        var root = Enumerable.Range(0, n).ToArray();
        int Find(int x) { while (root[x] != x) x = root[x] = root[root[x]]; return x; }
        foreach (var s in shared) root[Find(s.Left)] = Find(s.Right);
        for (int i = 1; i < n; i++)
            if (Find(i) != Find(0))
            {
                var group = Enumerable.Range(0, n).Where(k => Find(k) == Find(0)).ToList();
                double gap = Gap(i, group);
                string width = double.IsFinite(gap)
                    ? $"; their nearest boundaries are {LengthUnit.Inv(_parts[0].Shape.Unit.FromMetres(gap), "G3")} {_parts[0].Shape.Unit.Symbol} apart, and edges are shared only within {LengthUnit.Inv(_parts[0].Shape.Unit.FromMetres(_tol), "G2")} {_parts[0].Shape.Unit.Symbol}"
                    : "";
                throw new SectionTwistException("composite-gap",
                    $"{_name}: part '{_parts[i].Name}' shares no edge with part '{_parts[0].Name}' or the parts bonded to it (a gap, or contact at a point only){width}; draw neighbouring parts so that they share an edge (snap the drawing), or analyse the parts separately");
            }
    }

    /// <summary>
    /// The smallest distance from the corners of part <paramref name="part"/> to the boundary of the parts in
    /// <paramref name="group"/> and back, m; infinity when the parts have too many pieces to compare on an error path.
    /// </summary>
    private double Gap(int part, List<int> group)
    {
        static IEnumerable<Segment> Pieces(CompositePart p) => p.Shape.Regions.SelectMany(r => r.Holes.Prepend(r.Outer)).SelectMany(l => l.Segments);
        var a = Pieces(_parts[part]).ToList();
        var b = group.SelectMany(k => Pieces(_parts[k])).ToList();
        if ((double)a.Count * b.Count > 4e6) return double.PositiveInfinity;
        double best = double.PositiveInfinity;
        foreach (var (from, to) in new[] { (a, b), (b, a) })
            foreach (var s in from)
                foreach (var p in new[] { s.Start, s.PointAt(0.5) })
                    foreach (var t in to)
                        best = Math.Min(best, Point2.Distance(p, t.Closest(p).Point));
        return best;
    }
}
