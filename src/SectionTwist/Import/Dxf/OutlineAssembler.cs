using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>
/// Builds closed loops from loose outline pieces: flattens splines, snaps end points that lie within a tolerance
/// (uniform-grid spatial hash with cell size = tolerance, union-find clusters, so near ends join transitively), moves
/// line ends onto the cluster point (arcs are re-fitted through their mid point), drops degenerate, duplicate and
/// overlapping pieces, removes pieces with a free end (repeatedly: they cannot belong to a closed outline), and chains
/// the rest into loops by walking node adjacency. Groups where an odd number of ends (three or more) meet are set
/// aside as junctions. Nothing here refuses a drawing: the reader decides what the loose pieces and junctions mean.
/// </summary>
internal sealed partial class OutlineAssembler(string file, double snapTol, double splineRel, double diag, CancellationToken ct = default)
{
    /// <summary>Largest distance an end point was moved by snapping (drawing units).</summary>
    public double LargestGap { get; private set; }
    public int DuplicatesDropped { get; private set; }
    public int DegenerateDropped { get; private set; }
    /// <summary>Largest tolerance used where a curve was replaced by arcs (splines, bent ellipses), drawing units; 0 when none.</summary>
    public double CurveTolerance { get; private set; }
    public List<Loop> Loops { get; } = [];
    /// <summary>Layers that each loop's pieces came from.</summary>
    public List<string[]> LoopLayers { get; } = [];
    /// <summary>For each loop, the entity of each of its segments (in loop order).</summary>
    public List<string[]> LoopSources { get; } = [];
    /// <summary>Pieces that do not close (free ends, removed repeatedly), in connected groups.</summary>
    public List<LooseGroup> Loose { get; } = [];
    /// <summary>Groups of pieces where three or more ends meet, so that no unique loop runs through them.</summary>
    public List<Junction> Junctions { get; } = [];

    private readonly List<OutlinePiece> _pieces = [];
    private List<Point2> _nodes = [];

    public void Run(IEnumerable<SourcedCurve> curves)
    {
        foreach (var c in curves)
        {
            if (c.Segment is not null) { _pieces.Add(new OutlinePiece(c.Segment, c.Source, c.Layer)); continue; }
            ct.ThrowIfCancellationRequested();
            // splines become tangent-near arcs within a tolerance relative to their own size (negligible for J)
            double tol = splineRel * Math.Min(diag, Math.Max(c.Spline!.ControlBounds.Diagonal, 1e-300));
            CurveTolerance = Math.Max(CurveTolerance, tol);
            foreach (var s in SplineArcs.Fit(c.Spline!, tol)) _pieces.Add(new OutlinePiece(s, c.Source, c.Layer));
            if (_pieces.Count > Limits.InputLimits.MaxDxfPieces)
                throw new SectionTwistException("dxf-too-large", $"{file}: the splines become more than {Limits.InputLimits.MaxDxfPieces} pieces; export only the section outline or simplify the splines");
        }
        var closed = _pieces.Where(p => p.IsClosedCurve).ToList();
        _pieces.RemoveAll(p => p.IsClosedCurve);
        Snap();
        ct.ThrowIfCancellationRequested();
        Rebuild();
        ct.ThrowIfCancellationRequested();
        DropDuplicates();
        ct.ThrowIfCancellationRequested();
        AddClosedCurves(closed);
        Chain();
        ct.ThrowIfCancellationRequested();
        // the limit on loops analysed together (Limits.InputLimits.MaxLoops) applies to the chosen section: DxfSelection
    }

    /// <summary>Full circles and ellipses are loops by themselves; a copy lying on an earlier one is dropped (sweep over boxes sorted by their left edge).</summary>
    private void AddClosedCurves(List<OutlinePiece> closed)
    {
        var boxes = closed.Select(c => c.Segment.Bounds).ToArray();
        var order = Enumerable.Range(0, closed.Count).OrderBy(i => boxes[i].MinX).ThenBy(i => i).ToArray();
        var dropped = new bool[closed.Count];
        double tol = Math.Max(snapTol, 1e-12 * diag);
        for (int oi = 0; oi < order.Length; oi++)
        {
            int i = order[oi];
            if (dropped[i]) continue;
            for (int oj = oi + 1; oj < order.Length && boxes[order[oj]].MinX <= boxes[i].MinX + tol; oj++)
            {
                int j = order[oj];
                if (!dropped[j] && boxes[i].Intersects(boxes[j], tol) && Covers(closed[i].Segment, closed[j].Segment)) dropped[j] = true;
            }
        }
        for (int i = 0; i < closed.Count; i++)
        {
            if ((i & 255) == 0) ct.ThrowIfCancellationRequested();
            if (dropped[i]) { DuplicatesDropped++; continue; }
            Loops.Add(new Loop([closed[i].Segment]));
            LoopLayers.Add([closed[i].Layer]);
            LoopSources.Add([closed[i].Source]);
        }
    }

    private void Snap()
    {
        int n = _pieces.Count * 2;
        var pts = new Point2[n];
        for (int i = 0; i < _pieces.Count; i++) { pts[2 * i] = _pieces[i].Segment.Start; pts[2 * i + 1] = _pieces[i].Segment.End; }
        var parent = new int[n];
        for (int i = 0; i < n; i++) parent[i] = i;
        int Find(int x) { while (parent[x] != x) { parent[x] = parent[parent[x]]; x = parent[x]; } return x; }
        double cell = snapTol > 0 ? snapTol : Math.Max(diag, 1) * 1e-15;
        var grid = new Dictionary<(long, long), List<int>>();
        // exact copies (stacked duplicate entities) join their first occurrence directly: the grid sees each point once,
        // so a crowd of coincident ends costs O(n), not O(n^2)
        var exact = new Dictionary<Point2, int>();
        for (int i = 0; i < n; i++)
        {
            if ((i & 4095) == 0) ct.ThrowIfCancellationRequested();
            if (exact.TryGetValue(pts[i], out int first)) { parent[Find(i)] = Find(first); continue; }
            exact[pts[i]] = i;
            long cx = (long)Math.Floor(pts[i].X / cell), cy = (long)Math.Floor(pts[i].Y / cell);
            for (long dx = -1; dx <= 1; dx++)
                for (long dy = -1; dy <= 1; dy++)
                    if (grid.TryGetValue((cx + dx, cy + dy), out var list))
                        foreach (int j in list)
                            if (Point2.Distance(pts[i], pts[j]) <= snapTol || pts[i] == pts[j])
                            {
                                int ri = Find(i), rj = Find(j);
                                if (ri != rj) parent[ri] = rj;
                            }
            if (!grid.TryGetValue((cx, cy), out var own)) grid[(cx, cy)] = own = [];
            own.Add(i);
        }
        // one node per cluster, placed at the end of the most exact curve in it
        var nodeOf = new Dictionary<int, int>();
        var nodes = new List<Point2>();
        var best = new List<int>();
        for (int i = 0; i < n; i++)
        {
            int r = Find(i);
            int pr = _pieces[i / 2].Priority;
            if (!nodeOf.TryGetValue(r, out int node)) { nodeOf[r] = node = nodes.Count; nodes.Add(pts[i]); best.Add(pr); }
            else if (pr > best[node]) { nodes[node] = pts[i]; best[node] = pr; }
            if (i % 2 == 0) _pieces[i / 2].A = node; else _pieces[i / 2].B = node;
        }
        _nodes = nodes;
        for (int i = 0; i < n; i++)
        {
            int node = i % 2 == 0 ? _pieces[i / 2].A : _pieces[i / 2].B;
            LargestGap = Math.Max(LargestGap, Point2.Distance(pts[i], _nodes[node]));
        }
    }

    private void Rebuild()
    {
        foreach (var p in _pieces)
        {
            if (p.A == p.B) { p.Dead = true; DegenerateDropped++; continue; }
            Point2 a = _nodes[p.A], b = _nodes[p.B];
            var s = p.Segment;
            if (s.Start == a && s.End == b) continue;
            switch (s)
            {
                case LineSegment: p.Segment = new LineSegment(a, b); break;
                case ArcSegment arc:
                    try { p.Segment = ArcSegment.ThroughThreePoints(a, arc.PointAt(0.5), b); }
                    catch (SectionTwistException) { p.Segment = new LineSegment(a, b); }
                    break;
                default:
                    if (Point2.Distance(s.Start, a) > 1e-10 * diag || Point2.Distance(s.End, b) > 1e-10 * diag)
                    {
                        // an elliptical arc whose ends must move: replace it by arcs within the spline tolerance, ends moved
                        double tol = splineRel * Math.Min(diag, s.Bounds.Diagonal);
                        CurveTolerance = Math.Max(CurveTolerance, tol);
                        var fit = SplineArcs.Fit(s, tol);
                        fit[0] = MoveEnds(fit[0], a, fit.Count == 1 ? b : fit[0].End);
                        if (fit.Count > 1) fit[^1] = MoveEnds(fit[^1], fit[^1].Start, b);
                        var ids = new int[fit.Count + 1];
                        ids[0] = p.A; ids[^1] = p.B;
                        for (int i = 1; i < fit.Count; i++) { ids[i] = _nodes.Count; _nodes.Add(fit[i].Start); }
                        p.Segment = fit[0];
                        p.B = ids[1];
                        for (int i = 1; i < fit.Count; i++)
                            _extra.Add(new OutlinePiece(fit[i], p.Source, p.Layer) { A = ids[i], B = ids[i + 1] });
                    }
                    break;
            }
        }
        _pieces.AddRange(_extra);
        _extra.Clear();
    }

    private readonly List<OutlinePiece> _extra = [];

    /// <summary>The segment with its ends moved to <paramref name="a"/> and <paramref name="b"/> (an arc keeps its middle point).</summary>
    private static Segment MoveEnds(Segment s, Point2 a, Point2 b)
    {
        if (s.Start == a && s.End == b) return s;
        if (s is ArcSegment arc)
            try { return ArcSegment.ThroughThreePoints(a, arc.PointAt(0.5), b); }
            catch (SectionTwistException) { }
        return new LineSegment(a, b);
    }
}
