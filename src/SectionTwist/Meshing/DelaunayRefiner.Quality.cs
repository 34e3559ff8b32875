using SectionTwist.Geometry;

namespace SectionTwist.Meshing;

/// <summary>The refinement loop (Shewchuk 2002, section 3, Ruppert's algorithm; section 4, concentric shells).</summary>
internal sealed partial class DelaunayRefiner
{
    private const double SharpCorner = Math.PI / 3; // input angles below 60 degrees get the small-angle treatment
    private readonly Queue<int> _segQ = new();
    private readonly PriorityQueue<(int T, int A, int B, int C), double> _triQ = new();
    private readonly List<int> _cavity = [];
    private readonly List<int> _encroached = [];
    private int[] _mark = [];
    private int _stamp;
    private double _sin2Min;

    /// <summary>Triangles left with an angle below the target because of a small input angle.</summary>
    public int AcceptedSkinny { get; private set; }

    private readonly List<int> _offCurve = [];

    /// <summary>Vertices that could not be moved onto their curve (left on the chord).</summary>
    public int OffCurveVertices => _offCurve.Count;

    internal IReadOnlyList<int> OffCurveList => _offCurve;
    internal (int Curve, double T) VertexCurve(int v) => (_vCurve[v], _vT[v]);

    /// <summary>
    /// Retries moving boundary vertices left on their chord onto the curve: refinement around them has usually
    /// opened their star by now. Refines again after each successful round.
    /// </summary>
    private void RetryOffCurve()
    {
        for (int round = 0; round < 8 && _offCurve.Count > 0; round++)
        {
            var moved = new List<int>();
            foreach (int v in _offCurve)
            {
                Point2 p = Curve[_vCurve[v]].PointAt(_vT[v]);
                if (T.TryMove(v, p.X, p.Y, _scratch)) moved.Add(v);
            }
            if (moved.Count == 0) return;
            _offCurve.RemoveAll(moved.Contains);
            foreach (int v in moved) AfterInsert(v);
            RunQueues();
        }
    }

    private void Refine()
    {
        double theta = _opt.MinAngleDegrees;
        if (!(theta > 0 && theta <= 34))
            throw new SectionTwistException("bad-mesh-option", $"mesh: minimum angle {theta} degrees is outside (0, 34]; Delaunay refinement terminates only up to about 34 degrees");
        double s = Math.Sin(theta * Math.PI / 180);
        _sin2Min = s * s;
        for (int c = 0; c < ChordCount; c++) if (Encroached(c)) _segQ.Enqueue(c);
        for (int t = 0; t < T.TriangleCount; t++) if (T.Reg[t] >= 0) EnqueueIfBad(t);
        RunQueues();
    }

    /// <summary>Continues refinement after chords were split from outside (Jacobian repair).</summary>
    internal void ResumeRefinement()
    {
        RunQueues();
        RetryOffCurve();
    }

    private void RunQueues()
    {
        int iter = 0;
        while (true)
        {
            if ((++iter & 1023) == 0)
            {
                _ct.ThrowIfCancellationRequested();
                if (T.TriangleCount > 2L * _opt.MaxTriangles + 1000)
                    throw new SectionTwistException("mesh-too-large", $"{_profile.Name}: the mesh exceeds {_opt.MaxTriangles} triangles; ask for a coarser accuracy (--accuracy) or a larger memory budget (--memory-budget MB)");
            }
            if (_segQ.Count > 0)
            {
                int c = _segQ.Dequeue();
                if (Encroached(c) && ChordLength(c) > 2 * _floor) SplitChord(c);
                continue;
            }
            if (_triQ.Count > 0)
            {
                var (t, a, b, cc) = _triQ.Dequeue();
                if (T.V[3 * t] != a || T.V[3 * t + 1] != b || T.V[3 * t + 2] != cc) continue;
                if (IsBad(t, out bool skinnyOnly) && !(skinnyOnly && FromSmallInputAngle(t))) SplitTriangle(t);
                continue;
            }
            break;
        }
    }

    internal double ChordLength(int c) => Point2.Distance(T.Node(ChA[c]), T.Node(ChB[c]));

    /// <summary>True when a domain vertex facing chord c sees it under an angle of more than 90 degrees (lies inside its diametral circle).</summary>
    private bool Encroached(int c)
    {
        int e = T.FindEdge(ChA[c], ChB[c]);
        if (e < 0) return false;
        return EncroachedFrom(e) || EncroachedFrom(T.N[e]);
    }

    private bool EncroachedFrom(int code)
    {
        int t = code / 3;
        if (code < 0 || T.Reg[t] < 0) return false;
        int i = code % 3;
        int x = T.V[code], a = T.V[3 * t + Triangulation.Next(i)], b = T.V[3 * t + Triangulation.Prev(i)];
        return (T.X[a] - T.X[x]) * (T.X[b] - T.X[x]) + (T.Y[a] - T.Y[x]) * (T.Y[b] - T.Y[x]) < 0;
    }

    /// <summary>
    /// Queues a bad triangle: oversized ones first, most oversized first, then skinny ones, worst angle first
    /// (processing the worst first gives fewer vertices; cf. Shewchuk 2002, section 5).
    /// </summary>
    private void EnqueueIfBad(int t)
    {
        if (IsBad(t, out bool skinnyOnly, out double priority))
            _triQ.Enqueue((t, T.V[3 * t], T.V[3 * t + 1], T.V[3 * t + 2]), skinnyOnly ? priority : -priority);
    }

    private bool IsBad(int t, out bool skinnyOnly) => IsBad(t, out skinnyOnly, out _);

    private bool IsBad(int t, out bool skinnyOnly, out double priority)
    {
        skinnyOnly = false;
        priority = 0;
        int a = T.V[3 * t], b = T.V[3 * t + 1], c = T.V[3 * t + 2];
        double abx = T.X[b] - T.X[a], aby = T.Y[b] - T.Y[a], acx = T.X[c] - T.X[a], acy = T.Y[c] - T.Y[a];
        double bcx = T.X[c] - T.X[b], bcy = T.Y[c] - T.Y[b];
        double lab = abx * abx + aby * aby, lac = acx * acx + acy * acy, lbc = bcx * bcx + bcy * bcy;
        double lmin = Math.Min(lab, Math.Min(lac, lbc)), lmax = Math.Max(lab, Math.Max(lac, lbc));
        if (lmin < 4 * _floor * _floor) return false;
        double h = Size.At((T.X[a] + T.X[b] + T.X[c]) / 3, (T.Y[a] + T.Y[b] + T.Y[c]) / 3);
        if (lmax > h * h) { priority = lmax / (h * h); return true; }
        double area2 = abx * acy - aby * acx;
        // sin^2 of the smallest angle = (2A)^2 / (product of the squared lengths of the two edges beside it)
        double sin2 = area2 * area2 / (lab * lac * lbc / lmin);
        if (sin2 >= _sin2Min) return false;
        skinnyOnly = true;
        priority = sin2;
        return true;
    }

    /// <summary>
    /// Shewchuk 2002, section 4: a skinny triangle is left alone when its shortest edge joins two vertices lying on
    /// the two curves of a small input angle (below 60 degrees) and either its apex is that input vertex or the two
    /// vertices lie on the same concentric shell (equal distance from the apex), as shell splitting produces.
    /// </summary>
    private bool FromSmallInputAngle(int t)
    {
        int k = ShortestEdge(t);
        int u = T.V[3 * t + Triangulation.Next(k)], v = T.V[3 * t + Triangulation.Prev(k)], w = T.V[3 * t + k];
        int cu = _vCurve[u], cv = _vCurve[v];
        if (cu < 0 || cv < 0 || cu == cv) return false;
        // the input vertex shared by the two curves (two curves of a two-curve loop share both ends: take the nearer)
        int corner = -1;
        double dbest = double.PositiveInfinity;
        foreach (int cand in (ReadOnlySpan<int>)[_curveNext[cu] == cv ? cv : -1, _curveNext[cv] == cu ? cu : -1])
        {
            if (cand < 0 || _cornerAngle[cand] >= SharpCorner) continue;
            double dk = Point2.Distance(T.Node(u), T.Node(_curveStartVertex[cand]));
            if (dk < dbest) { dbest = dk; corner = cand; }
        }
        if (corner < 0) return false;
        int kv = _curveStartVertex[corner];
        bool accept = w == kv;
        if (!accept)
        {
            double du = Point2.Distance(T.Node(u), T.Node(kv)), dv = Point2.Distance(T.Node(v), T.Node(kv));
            accept = Math.Abs(du - dv) <= 0.02 * Math.Max(du, dv);
        }
        if (accept) AcceptedSkinny++;
        return accept;
    }

    private int ShortestEdge(int t)
    {
        int best = 0; double bl = double.PositiveInfinity;
        for (int i = 0; i < 3; i++)
        {
            int a = T.V[3 * t + Triangulation.Next(i)], b = T.V[3 * t + Triangulation.Prev(i)];
            double dx = T.X[a] - T.X[b], dy = T.Y[a] - T.Y[b], l = dx * dx + dy * dy;
            if (l < bl) { bl = l; best = i; }
        }
        return best;
    }

    private bool TouchesSharpCorner(int c)
    {
        int curve = ChCurve[c];
        return _cornerAngle[curve] < SharpCorner || (_curveNext[curve] >= 0 && _cornerAngle[_curveNext[curve]] < SharpCorner);
    }

    /// <summary>Inserts the circumcentre of bad triangle t, or splits the chords it would encroach instead.</summary>
    private void SplitTriangle(int t)
    {
        int a = T.V[3 * t], b = T.V[3 * t + 1], c = T.V[3 * t + 2];
        double ax = T.X[a], ay = T.Y[a];
        double bx = T.X[b] - ax, by = T.Y[b] - ay, cx = T.X[c] - ax, cy = T.Y[c] - ay;
        double d = 2 * (bx * cy - by * cx);
        double b2 = bx * bx + by * by, c2 = cx * cx + cy * cy;
        double px = ax + (cy * b2 - by * c2) / d, py = ay + (bx * c2 - cx * b2) / d;
        int k = ShortestEdge(t);
        double shortest = Point2.Distance(T.Node(T.V[3 * t + Triangulation.Next(k)]), T.Node(T.V[3 * t + Triangulation.Prev(k)]));

        int tc = WalkTo(t, px, py, out int blocked);
        _encroached.Clear();
        if (blocked >= 0) _encroached.Add(blocked);
        else CollectEncroached(tc, px, py);
        if (_encroached.Count > 0)
        {
            bool any = false;
            foreach (int s in _encroached)
            {
                if (ChordLength(s) <= 2 * _floor) continue;
                if (TouchesSharpCorner(s) && ChordLength(s) < shortest) continue; // would only chase the small angle
                SplitChord(s);
                any = true;
            }
            if (any) EnqueueIfBad(t);
            else AcceptedSkinny++;
            return;
        }
        var (tri, edge, same) = T.Locate(px, py, tc);
        if (same >= 0) return;
        int m = NewVertex(new Point2(px, py), -1, 0, -1);
        if (edge >= 0) T.SplitEdge(tri, edge, m, -1, -1); else T.SplitTriangle(tri, m);
        T.Legalize();
        AfterInsert(m);
    }

    /// <summary>
    /// Walks the straight line from t's centroid to (px, py); returns the triangle containing the point, or sets
    /// <paramref name="blocked"/> to the first chord the line crosses.
    /// </summary>
    private int WalkTo(int t, double px, double py, out int blocked)
    {
        blocked = -1;
        int a = T.V[3 * t], b = T.V[3 * t + 1], c = T.V[3 * t + 2];
        double gx = (T.X[a] + T.X[b] + T.X[c]) / 3, gy = (T.Y[a] + T.Y[b] + T.Y[c]) / 3;
        for (int steps = 0; steps < T.TriangleCount + 10; steps++)
        {
            int exit = -1;
            for (int i = 0; i < 3; i++)
            {
                int u = T.V[3 * t + Triangulation.Next(i)], w = T.V[3 * t + Triangulation.Prev(i)];
                if (T.Orient(u, w, px, py) >= 0) continue;
                if (Predicates.Orient2D(gx, gy, px, py, T.X[u], T.Y[u]) <= 0 && Predicates.Orient2D(gx, gy, px, py, T.X[w], T.Y[w]) >= 0)
                { exit = i; break; }
            }
            if (exit < 0) return t;
            int code = 3 * t + exit;
            if (T.Seg[code] >= 0 || T.N[code] < 0) { blocked = T.Seg[code]; return t; }
            t = T.N[code] / 3;
        }
        return t;
    }

    /// <summary>Chords on the boundary of the insertion cavity of (px, py) whose diametral circle contains the point.</summary>
    private void CollectEncroached(int t0, double px, double py)
    {
        if (_mark.Length < T.TriangleCount) _mark = new int[Math.Max(T.TriangleCount * 2, 1024)];
        _stamp++;
        _cavity.Clear();
        _cavity.Add(t0); _mark[t0] = _stamp;
        for (int n = 0; n < _cavity.Count; n++)
        {
            int t = _cavity[n];
            for (int i = 0; i < 3; i++)
            {
                int code = 3 * t + i;
                int u = T.V[3 * t + Triangulation.Next(i)], w = T.V[3 * t + Triangulation.Prev(i)];
                if (T.Seg[code] >= 0)
                {
                    if ((T.X[u] - px) * (T.X[w] - px) + (T.Y[u] - py) * (T.Y[w] - py) < 0 && !_encroached.Contains(T.Seg[code]))
                        _encroached.Add(T.Seg[code]);
                    continue;
                }
                int nb = T.N[code];
                if (nb < 0) continue;
                int y = nb / 3;
                if (_mark[y] == _stamp) continue;
                int j = nb % 3;
                int d = T.V[nb];
                // y is in the cavity when the point lies inside its circumcircle
                int p0 = T.V[3 * y + Triangulation.Next(j)], p1 = T.V[3 * y + Triangulation.Prev(j)];
                if (Predicates.InCircle(T.X[d], T.Y[d], T.X[p0], T.Y[p0], T.X[p1], T.Y[p1], px, py) > 0)
                {
                    _mark[y] = _stamp;
                    _cavity.Add(y);
                }
            }
        }
    }

    /// <summary>
    /// Splits chord c. The split parameter is the midpoint, except on a chord touching a curve end (an input
    /// vertex), where the new vertex sits at a power-of-two arc length from that end (concentric shells). The new
    /// vertex is first put on the chord, then moved onto the curve when its star allows.
    /// </summary>
    internal int SplitChord(int c)
    {
        int a = ChA[c], b = ChB[c], curve = ChCurve[c];
        double t0 = ChT0[c], t1 = ChT1[c];
        double tm = 0.5 * (t0 + t1);
        bool atStart = t0 == 0, atEnd = t1 == 1;
        if (atStart != atEnd)
        {
            // concentric shells: the new vertex at a power-of-two (Euclidean) distance from the input vertex
            Point2 corner = atStart ? Curve[curve].Start : Curve[curve].End;
            double full = Point2.Distance(corner, atStart ? T.Node(b) : T.Node(a));
            double dist = Math.Pow(2, Math.Round(Math.Log2(0.5 * full)));
            if (dist > 0.2 * full && dist < 0.8 * full) tm = ParameterAtDistance(curve, corner, dist, t0, t1, atStart);
        }
        int e = T.FindEdge(a, b);
        if (e < 0) throw Degenerate(a, "internal: a boundary chord was lost");
        Point2 p = Curve[curve].PointAt(tm);
        double s = (tm - t0) / (t1 - t0);
        Point2 q = _curveStraight[curve] ? p : new Point2(T.X[a] + s * (T.X[b] - T.X[a]), T.Y[a] + s * (T.Y[b] - T.Y[a]));
        int m = NewVertex(q, curve, tm, -1);
        int c2 = NewChord(m, b, curve, tm, t1);
        ChB[c] = m; ChT1[c] = tm;
        T.SplitEdge(e / 3, e % 3, m, c, c2);
        T.Legalize();
        if (!_curveStraight[curve] && !T.TryMove(m, p.X, p.Y, _scratch)) _offCurve.Add(m);
        AfterInsert(m);
        return m;
    }

    /// <summary>
    /// The parameter in [t0, t1] whose curve point lies at <paramref name="dist"/> from <paramref name="corner"/>
    /// (bisection; the distance grows monotonically away from the curve end on a chord-sized piece).
    /// </summary>
    private double ParameterAtDistance(int curve, Point2 corner, double dist, double t0, double t1, bool fromStart)
    {
        double lo = t0, hi = t1;
        for (int i = 0; i < 60; i++)
        {
            double mid = 0.5 * (lo + hi);
            bool inside = Point2.Distance(Curve[curve].PointAt(mid), corner) < dist;
            if (inside == fromStart) lo = mid; else hi = mid;
        }
        return 0.5 * (lo + hi);
    }

    private void AfterInsert(int m)
    {
        T.Star(m, _scratch);
        foreach (int t in _scratch)
        {
            if (T.Reg[t] >= 0) EnqueueIfBad(t);
            for (int i = 0; i < 3; i++)
            {
                int s = T.Seg[3 * t + i];
                if (s >= 0 && Encroached(s)) _segQ.Enqueue(s);
            }
        }
    }
}
