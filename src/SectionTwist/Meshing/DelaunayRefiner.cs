using SectionTwist.Geometry;

namespace SectionTwist.Meshing;

/// <summary>
/// Constrained Delaunay triangulation of a profile and its quality refinement, after J. R. Shewchuk,
/// "Delaunay Refinement Algorithms for Triangular Mesh Generation", Computational Geometry 22, 2002 (Ruppert's
/// algorithm, section 3, with concentric-shell segment splitting, section 4). This file builds the boundary model
/// (curves split into chords that remember curve, t0, t1), the initial triangulation, segment recovery and the
/// region classification; <c>DelaunayRefiner.Quality.cs</c> holds the refinement loop.
/// </summary>
internal sealed partial class DelaunayRefiner
{
    private readonly Profile _profile;
    private readonly MeshOptions _opt;
    private readonly CancellationToken _ct;
    internal readonly Triangulation T;
    internal SizeFunction Size = null!;
    private readonly double _floor;
    private readonly double _diag;
    private readonly List<int> _scratch = [];

    // curves: every Segment of every loop, loops numbered region by region (outer, then holes)
    internal Segment[] Curve = [];
    private int[] _curveLoop = [], _curveNext = [], _curvePrev = [], _curveStartVertex = [];
    private double[] _cornerAngle = [], _curveLen = [], _curveS0 = [], _loopLen = [];
    private bool[] _curveStraight = [];
    internal MeshLoop[] Loops = [];

    // chords (constrained subsegments): A -> B along the loop, material on the left
    internal int[] ChA = new int[64], ChB = new int[64], ChCurve = new int[64];
    internal double[] ChT0 = new double[64], ChT1 = new double[64];
    internal int ChordCount;

    // per vertex: curve and parameter for boundary vertices (-1 inside), corner = curve starting there (-1 if none)
    private int[] _vCurve = new int[64], _vCorner = new int[64];
    private double[] _vT = new double[64];

    // interface curves inside the domain (composite sections): constrained in the mesh, material on both sides
    private readonly IReadOnlyList<(Segment Curve, int Region)> _interfaces;
    private int[] _curveEndVertex = [];

    public DelaunayRefiner(Profile profile, MeshOptions options, CancellationToken ct, IReadOnlyList<(Segment Curve, int Region)>? interfaces = null)
    {
        _profile = profile; _opt = options; _ct = ct;
        _interfaces = interfaces ?? [];
        _diag = profile.Bounds.Diagonal;
        _floor = 1e-7 * _diag;
        T = new Triangulation(profile.Bounds);
        for (int i = 0; i < 3; i++) SetVertexInfo(i, -1, 0, -1);
    }

    private int NewVertex(Point2 p, int curve, double t, int corner)
    {
        int v = T.AddVertex(p.X, p.Y);
        SetVertexInfo(v, curve, t, corner);
        return v;
    }

    private void SetVertexInfo(int v, int curve, double t, int corner)
    {
        if (v >= _vCurve.Length)
        {
            int n = Math.Max(2 * _vCurve.Length, v + 1);
            Array.Resize(ref _vCurve, n); Array.Resize(ref _vCorner, n); Array.Resize(ref _vT, n);
        }
        _vCurve[v] = curve; _vT[v] = t; _vCorner[v] = corner;
    }

    internal int NewChord(int a, int b, int curve, double t0, double t1)
    {
        if (ChordCount == ChA.Length)
        {
            int n = 2 * ChA.Length;
            Array.Resize(ref ChA, n); Array.Resize(ref ChB, n); Array.Resize(ref ChCurve, n);
            Array.Resize(ref ChT0, n); Array.Resize(ref ChT1, n);
        }
        ChA[ChordCount] = a; ChB[ChordCount] = b; ChCurve[ChordCount] = curve; ChT0[ChordCount] = t0; ChT1[ChordCount] = t1;
        return ChordCount++;
    }

    internal int LoopOfChord(int c) => _curveLoop[ChCurve[c]];

    private double _arcSagRatio;

    /// <summary>Runs the whole pipeline up to a refined constrained Delaunay triangulation.</summary>
    public void Run()
    {
        // sagitta / chord of an arc piece spanning the largest allowed angle: tan(angle / 4) / 2
        _arcSagRatio = 0.5 * Math.Tan(Math.Clamp(_opt.MaxArcAngleDegrees, 1, 90) * Math.PI / 180 / 4);
        BuildCurves();
        double hmax = _opt.MaxEdgeLength ?? _diag / 20;
        if (!(hmax > 0) || double.IsInfinity(hmax))
            throw new SectionTwistException("bad-mesh-option", $"mesh: maximum edge length {hmax} must be positive and finite; give a positive size");
        Size = new SizeFunction(hmax, 1.4, _opt.SizeField, _profile.Bounds);
        if (_opt.Grade) AddCornerSources();
        Size.Build();
        var param = SubdivideCurves();
        if (_opt.Grade)
        {
            AddChordSources(param);
            Size.Build();
            param = SubdivideCurves(param);
        }
        CreateBoundaryVertices(param);
        InsertBoundaryVertices();
        RecoverChords();
        ClassifyRegions();
        if (_opt.Grade) { AddThinWallSources(); Size.Build(); }
        Refine();
    }

    private void BuildCurves()
    {
        var curves = new List<Segment>();
        var loops = new List<MeshLoop>();
        var loopSegs = new List<IReadOnlyList<Segment>>();
        var curveLoop = new List<int>();
        for (int r = 0; r < _profile.Regions.Count; r++)
        {
            var reg = _profile.Regions[r];
            loops.Add(new MeshLoop(r, -1, reg.Outer));
            loopSegs.Add(reg.Outer.Segments);
            for (int h = 0; h < reg.Holes.Count; h++) { loops.Add(new MeshLoop(r, h, reg.Holes[h])); loopSegs.Add(reg.Holes[h].Segments); }
        }
        // interface chains last: the flood of ClassifyRegions fills both of their sides with their region
        foreach (var (segs, region, open) in InterfaceChains.Build(_profile, _interfaces, _floor))
        {
            var geometry = new Loop(open ? segs.Concat(Enumerable.Reverse(segs).Select(x => x.Reversed())) : segs);
            loops.Add(new MeshLoop(region, -1, geometry) { IsInterface = true, IsOpen = open });
            loopSegs.Add(segs);
        }
        Loops = loops.ToArray();
        var next = new List<int>(); var prev = new List<int>();
        _loopLen = new double[Loops.Length];
        for (int l = 0; l < Loops.Length; l++)
        {
            var segs = loopSegs[l];
            bool open = Loops[l].IsOpen;
            int first = curves.Count;
            for (int i = 0; i < segs.Count; i++)
            {
                curves.Add(segs[i]); curveLoop.Add(l);
                next.Add(open && i + 1 == segs.Count ? -1 : first + (i + 1) % segs.Count);
                prev.Add(open && i == 0 ? -1 : first + (i + segs.Count - 1) % segs.Count);
            }
        }
        Curve = curves.ToArray();
        _curveLoop = curveLoop.ToArray(); _curveNext = next.ToArray(); _curvePrev = prev.ToArray();
        int n = Curve.Length;
        _curveLen = new double[n]; _curveS0 = new double[n]; _cornerAngle = new double[n]; _curveStraight = new bool[n];
        _curveStartVertex = new int[n];
        _curveEndVertex = new int[n];
        for (int c = 0; c < n; c++)
        {
            _curveLen[c] = Curve[c].Length;
            _curveStraight[c] = Curve[c] is LineSegment;
            int l = _curveLoop[c];
            _curveS0[c] = _loopLen[l];
            _loopLen[l] += _curveLen[c];
            if (_curvePrev[c] < 0) { _cornerAngle[c] = Math.PI; continue; } // the end of an open interface chain
            Point2 din = Curve[_curvePrev[c]].DerivativeAt(1), dout = Curve[c].DerivativeAt(0);
            double turn = Math.Atan2(Point2.Cross(din, dout), Point2.Dot(din, dout));
            _cornerAngle[c] = Math.PI - turn;
        }
    }

    private void AddCornerSources()
    {
        for (int c = 0; c < Curve.Length; c++)
        {
            // a corner of an interface loop is re-entrant for the material on one side or the other
            // so is the end of an open interface chain: where it meets the outline or two other interfaces
            bool iface = Loops[_curveLoop[c]].IsInterface && (Math.Abs(_cornerAngle[c] - Math.PI) > 0.05 || _curvePrev[c] < 0);
            if (Loops[_curveLoop[c]].IsInterface && _curveNext[c] < 0)
            {
                Point2 e = Curve[c].End;
                Size.AddSource(e.X, e.Y, 0.125 * Size.At(e.X, e.Y));
            }
            if (_cornerAngle[c] <= Math.PI + 0.05 && !iface) continue;
            Point2 p = Curve[c].Start;
            Size.AddSource(p.X, p.Y, 0.125 * Size.At(p.X, p.Y));
        }
    }

    /// <summary>
    /// Parameters of the boundary vertices on each curve: the curve's own subdivision, then bisection in the
    /// parameter until each chord is no longer than the local size and its sagitta is within the chord tolerance
    /// (default: the sagitta of an arc piece of MeshOptions.MaxArcAngleDegrees, so curved 6-node edges follow the curve).
    /// </summary>
    private List<double>[] SubdivideCurves(List<double>[]? start = null)
    {
        var result = new List<double>[Curve.Length];
        double sagAbs = _opt.ChordTolerance ?? double.PositiveInfinity;
        for (int c = 0; c < Curve.Length; c++)
        {
            var seg = Curve[c];
            IReadOnlyList<double> ts = start is null ? seg.Subdivide(sagAbs, Size.MaxSize) : start[c];
            var list = new List<double> { 0 };
            for (int i = 0; i + 1 < ts.Count; i++) Bisect(c, ts[i], ts[i + 1], 0, list);
            result[c] = list;
        }
        return result;
    }

    private void Bisect(int c, double t0, double t1, int depth, List<double> output)
    {
        var seg = Curve[c];
        Point2 p0 = CurvePoint(c, t0), p1 = CurvePoint(c, t1);
        double len = Point2.Distance(p0, p1);
        bool split = false;
        if (len > 2 * _floor && depth < 48)
        {
            Point2 m = Point2.Mid(p0, p1);
            split = len > Size.At(m.X, m.Y) * 1.0001;
            if (!split && !_curveStraight[c] && t1 - t0 < 1)
            {
                Point2 pm = seg.PointAt(0.5 * (t0 + t1));
                double sag = Math.Abs(Point2.Cross(p1 - p0, pm - p0)) / len;
                split = _opt.ChordTolerance is double tol ? sag > tol : sag > _arcSagRatio * len;
            }
            if (t1 - t0 >= 1 && !_curveStraight[c]) split = true; // a closed curve needs interior points
        }
        if (split)
        {
            double tm = 0.5 * (t0 + t1);
            Bisect(c, t0, tm, depth + 1, output);
            Bisect(c, tm, t1, depth + 1, output);
        }
        else output.Add(t1);
    }

    private Point2 CurvePoint(int c, double t) => t == 0 ? Curve[c].Start : t == 1 ? Curve[c].End : Curve[c].PointAt(t);

    private void AddChordSources(List<double>[] param)
    {
        for (int c = 0; c < Curve.Length; c++)
        {
            var ts = param[c];
            for (int i = 0; i + 1 < ts.Count; i++)
            {
                Point2 p0 = CurvePoint(c, ts[i]), p1 = CurvePoint(c, ts[i + 1]);
                double len = Point2.Distance(p0, p1);
                Point2 m = Point2.Mid(p0, p1);
                if (len < 0.7 * Size.At(m.X, m.Y)) Size.AddSource(m.X, m.Y, len);
            }
        }
    }

    private void CreateBoundaryVertices(List<double>[] param)
    {
        // outline corners first; interface curves then start and end on them where they meet the outline, and on each
        // other's ends at junctions inside (snapped within the floor length)
        var snap = new Dictionary<(long, long), List<int>>();
        double cell = 4 * _floor;
        int Corner(Point2 p, int curve, bool find = true)
        {
            long cx = (long)Math.Floor(p.X / cell), cy = (long)Math.Floor(p.Y / cell);
            for (long i = cx - 1; i <= cx + 1 && find; i++)
                for (long k = cy - 1; k <= cy + 1; k++)
                    if (snap.TryGetValue((i, k), out var list))
                        foreach (int u in list)
                            if (Point2.Distance(T.Node(u), p) <= _floor) return u;
            int v = NewVertex(p, -1, 0, curve);
            if (!snap.TryGetValue((cx, cy), out var l)) snap[(cx, cy)] = l = [];
            l.Add(v);
            return v;
        }
        for (int c = 0; c < Curve.Length; c++)
            _curveStartVertex[c] = Loops[_curveLoop[c]].IsInterface ? -1 : Corner(Curve[c].Start, c, find: false);
        for (int c = 0; c < Curve.Length; c++)
            if (Loops[_curveLoop[c]].IsInterface) _curveStartVertex[c] = Corner(Curve[c].Start, c);
        for (int c = 0; c < Curve.Length; c++)
            _curveEndVertex[c] = _curveNext[c] >= 0 ? _curveStartVertex[_curveNext[c]] : Corner(Curve[c].End, c);
        for (int c = 0; c < Curve.Length; c++)
        {
            var ts = param[c];
            int prevV = _curveStartVertex[c];
            for (int i = 1; i < ts.Count; i++)
            {
                int v = i == ts.Count - 1 ? _curveEndVertex[c] : NewVertex(Curve[c].PointAt(ts[i]), c, ts[i], -1);
                NewChord(prevV, v, c, ts[i - 1], ts[i]);
                prevV = v;
            }
        }
    }

    private void InsertBoundaryVertices()
    {
        int n = T.VertexCount - 3;
        var order = new int[n];
        var keys = new uint[n];
        var b = _profile.Bounds;
        double size = Math.Max(b.Width, b.Height);
        for (int i = 0; i < n; i++)
        {
            order[i] = i + 3;
            keys[i] = HilbertCurve.Key(T.X[i + 3], T.Y[i + 3], b.MinX, b.MinY, size);
        }
        Array.Sort(keys, order);
        int start = 0;
        foreach (int v in order)
        {
            var (t, e, same) = T.Locate(T.X[v], T.Y[v], start);
            if (same >= 0) throw Degenerate(v, "two boundary points coincide (loops touch or a segment has zero length)");
            if (e >= 0) T.SplitEdge(t, e, v, -1, -1); else T.SplitTriangle(t, v);
            T.Legalize();
            start = T.VTri[v];
        }
    }

    private SectionTwistException Degenerate(int v, string what) =>
        new("mesh-failed", $"{_profile.Name}: cannot mesh near ({T.X[v]:G6}, {T.Y[v]:G6}) m: {what}; separate the outlines there or simplify the geometry");

    /// <summary>Makes every chord an edge: present edges are marked constrained, missing ones are split at the curve's parameter midpoint.</summary>
    private void RecoverChords()
    {
        var stack = new Stack<int>();
        for (int c = ChordCount - 1; c >= 0; c--) stack.Push(c);
        int splits = 0;
        while (stack.Count > 0)
        {
            int c = stack.Pop();
            int a = ChA[c], b = ChB[c];
            int e = T.FindEdge(a, b);
            if (e >= 0)
            {
                T.Seg[e] = c; T.Seg[T.N[e]] = c;
                continue;
            }
            if (++splits > 1_000_000) throw Degenerate(a, "boundary segments could not be recovered");
            _ct.ThrowIfCancellationRequested();
            double tm = 0.5 * (ChT0[c] + ChT1[c]);
            Point2 p = Curve[ChCurve[c]].PointAt(tm);
            if (Point2.Distance(p, T.Node(a)) < _floor) throw Degenerate(a, "boundary segments overlap or cross");
            int m = NewVertex(p, ChCurve[c], tm, -1);
            var (t, edge, same) = T.Locate(p.X, p.Y, T.VTri[a]);
            if (same >= 0) throw Degenerate(same, "boundary segments overlap");
            if (edge >= 0)
            {
                if (T.Seg[3 * t + edge] >= 0) throw Degenerate(m, "boundary segments overlap or cross");
                T.SplitEdge(t, edge, m, -1, -1);
            }
            else T.SplitTriangle(t, m);
            T.Legalize();
            int c2 = NewChord(m, b, ChCurve[c], tm, ChT1[c]);
            ChB[c] = m; ChT1[c] = tm;
            stack.Push(c2); stack.Push(c);
        }
    }

    /// <summary>
    /// Region of every triangle: flood from the left side of each chord (the material side of outer loops run
    /// counter-clockwise and of holes run clockwise; both sides of an interface) without crossing chords; triangles
    /// never reached are outside or in holes (region -1).
    /// </summary>
    private void ClassifyRegions()
    {
        Array.Fill(T.Reg, -2, 0, T.TriangleCount);
        var stack = new Stack<int>();
        for (int c = 0; c < ChordCount; c++)
        {
            // an interface has material on both sides: flood from its right side too
            int e = T.FindEdge(ChA[c], ChB[c]);
            FloodFrom(e, c, stack);
            if (Loops[LoopOfChord(c)].IsInterface) FloodFrom(T.N[e], c, stack);
        }
        for (int t = 0; t < T.TriangleCount; t++)
        {
            if (T.Reg[t] == -2) T.Reg[t] = -1;
            else if (T.Reg[t] >= 0 && T.HasSuperVertex(t)) throw Degenerate(T.V[3 * t + 1], "the outline is not closed");
        }
    }

    private void FloodFrom(int e, int c, Stack<int> stack)
    {
        if (e < 0) throw Degenerate(ChA[c], "an interface lies on the outline");
        int t = e / 3, r = Loops[LoopOfChord(c)].Region;
        if (T.Reg[t] == -2) { T.Reg[t] = r; stack.Push(t); }
        else if (T.Reg[t] != r) throw Degenerate(ChA[c], "outlines cross each other");
        while (stack.Count > 0)
        {
            int x = stack.Pop();
            for (int i = 0; i < 3; i++)
            {
                int code = 3 * x + i;
                if (T.Seg[code] >= 0 || T.N[code] < 0) continue;
                int y = T.N[code] / 3;
                if (T.Reg[y] == -2) { T.Reg[y] = r; stack.Push(y); }
                else if (T.Reg[y] != r) throw Degenerate(T.V[3 * y], "outlines cross each other or a loop is open");
            }
        }
    }

    private double LoopPosition(int v, out int loop)
    {
        int c = _vCurve[v] >= 0 ? _vCurve[v] : _vCorner[v];
        if (c < 0) { loop = -1; return 0; }
        loop = _curveLoop[c];
        return _vCurve[v] >= 0 ? _curveS0[c] + _vT[v] * _curveLen[c] : _curveS0[c];
    }

    /// <summary>
    /// Thin walls: for each boundary vertex, the distance to boundary points of its Delaunay neighbourhood that are
    /// far from it along the boundary (another loop, or more than twice as far along the loop as straight across)
    /// estimates the local feature size; a source of half that size keeps at least about two elements across.
    /// </summary>
    private void AddThinWallSources()
    {
        for (int v = 3; v < T.VertexCount; v++)
        {
            double sv = LoopPosition(v, out int lv);
            if (lv < 0) continue;
            T.Star(v, _scratch);
            double best = double.PositiveInfinity;
            foreach (int t in _scratch)
            {
                if (T.Reg[t] < 0) continue;
                int k = T.V[3 * t] == v ? 0 : T.V[3 * t + 1] == v ? 1 : 2;
                int x = T.V[3 * t + Triangulation.Next(k)], y = T.V[3 * t + Triangulation.Prev(k)];
                bool fx = FarAlong(v, sv, lv, x), fy = FarAlong(v, sv, lv, y);
                if (fx) best = Math.Min(best, Point2.Distance(T.Node(v), T.Node(x)));
                if (fy) best = Math.Min(best, Point2.Distance(T.Node(v), T.Node(y)));
                if (fx && fy && T.Seg[3 * t + k] >= 0) best = Math.Min(best, SegmentDistance(T.Node(v), T.Node(x), T.Node(y)));
            }
            if (best < double.PositiveInfinity) Size.AddSource(T.X[v], T.Y[v], 0.5 * best);
        }
    }

    private bool FarAlong(int v, double sv, int lv, int u)
    {
        double su = LoopPosition(u, out int lu);
        if (lu < 0) return false;
        double d = Point2.Distance(T.Node(v), T.Node(u));
        // near the end of an open interface chain (a junction) the outline and the interface meet: not a thin wall
        if (lu != lv) return d < 0.5 * JunctionDistance(sv, lv) && d < 0.5 * JunctionDistance(su, lu);
        double ds = Math.Abs(su - sv);
        if (!Loops[lv].IsOpen) ds = Math.Min(ds, _loopLen[lv] - ds);
        return d < 0.5 * ds;
    }

    /// <summary>Distance along an open interface chain to its nearer end; infinite on a closed loop.</summary>
    private double JunctionDistance(double s, int loop) =>
        Loops[loop].IsOpen ? Math.Min(s, _loopLen[loop] - s) : double.PositiveInfinity;

    private static double SegmentDistance(Point2 p, Point2 a, Point2 b)
    {
        Point2 d = b - a;
        double l2 = Point2.Dot(d, d);
        double t = l2 == 0 ? 0 : Math.Clamp(Point2.Dot(p - a, d) / l2, 0, 1);
        return Point2.Distance(p, a + t * d);
    }
}
