using SectionTwist.Geometry;

namespace SectionTwist.Import.Dxf;

/// <summary>One candidate region: a closed loop with the loops directly inside it as holes (drawing units).</summary>
/// <param name="Loop">Index of the outer loop.</param>
/// <param name="Holes">Indices of the hole loops.</param>
/// <param name="Area">Net area.</param>
/// <param name="Bounds">Bounding box of the outer loop.</param>
/// <param name="Depth">Nesting depth with frames left out (0 = outermost).</param>
/// <param name="Layers">Layers of its loops.</param>
/// <param name="Entity">The entity of the outer loop's first piece.</param>
/// <param name="Inside">A point inside its material.</param>
internal sealed record Face(int Loop, int[] Holes, double Area, Box2 Bounds, int Depth, string[] Layers, string Entity, Point2 Inside);

/// <summary>
/// Nests the closed loops of a drawing and offers the regions in it. A loop's region is the loop with the loops
/// directly inside it as holes. A loop whose region holds text, junctions or open curves and that encloses other loops
/// is read as a sheet frame (a border or title-block cell) and offers no region; the regions offered are those at even
/// depth when frames are left out (an outline, its holes, an island in a hole ...), numbered by area, largest first
/// (ties: lower-left corner, x then y). <see cref="At"/> picks the region of the innermost loop around a point,
/// frames included.
/// </summary>
internal sealed class DrawingRegions
{
    private readonly List<Loop> _loops;
    private readonly List<string[]> _layers;
    private readonly List<string[]> _sources;
    private readonly double[] _area;
    private readonly Box2[] _box;
    private readonly IReadOnlyList<Point2>?[] _poly;
    private readonly int[] _parent;
    private readonly List<int>[] _children;
    private readonly LoopGrid _grid;
    private readonly int[] _depth;

    public DrawingRegions(List<Loop> loops, List<string[]> layers, List<string[]> sources, IEnumerable<(Point2 Where, string Source)> stuff)
    {
        _loops = loops; _layers = layers; _sources = sources;
        int n = loops.Count;
        _area = loops.Select(l => Math.Abs(l.SignedArea)).ToArray();
        _box = loops.Select(l => l.Bounds).ToArray();
        _poly = new IReadOnlyList<Point2>?[n];
        _parent = new int[n];
        _children = Enumerable.Range(0, n).Select(_ => new List<int>()).ToArray();
        _grid = new LoopGrid(_box);
        for (int i = 0; i < n; i++)
        {
            _parent[i] = Innermost(loops[i].Segments[0].PointAt(0.5), i);
            if (_parent[i] >= 0) _children[_parent[i]].Add(i);
        }
        FindFrames(stuff);
        var depth = _depth = new int[n];
        for (int i = 0; i < n; i++)
            for (int p = _parent[i]; p >= 0; p = _parent[p]) if (!IsFrame[p]) depth[i]++;
        MaxDepth = n == 0 ? 0 : Enumerable.Range(0, n).Where(i => !IsFrame[i]).Select(i => depth[i]).DefaultIfEmpty(0).Max();
        Parts = Enumerable.Range(0, n).Where(i => !IsFrame[i] && depth[i] % 2 == 0).Select(i => MakeFace(i, depth[i]))
            .OrderByDescending(f => f.Area).ThenBy(f => f.Bounds.MinX).ThenBy(f => f.Bounds.MinY).ToList();
    }

    /// <summary>The regions offered, largest first.</summary>
    public List<Face> Parts { get; }

    /// <summary>For each loop, true when it is read as a sheet frame.</summary>
    public bool[] IsFrame { get; private set; } = [];

    /// <summary>What made each frame a frame ("TEXT (line 9) lies inside"), by loop.</summary>
    public Dictionary<int, string> FrameReason { get; } = [];

    /// <summary>Deepest nesting with frames left out (2 or more: an island inside a hole).</summary>
    public int MaxDepth { get; }

    /// <summary>The entity loop <paramref name="i"/> starts with ("LWPOLYLINE (line 40)", without a segment number).</summary>
    public string Entity(int i) => Plain(_sources[i][0]);

    /// <summary>True when loop <paramref name="i"/> is a plain hole: at odd depth (frames left out) with nothing inside.</summary>
    public bool IsHole(int i) => _depth[i] % 2 == 1 && _children[i].Count == 0;

    /// <summary>The region loop <paramref name="i"/> is a hole of (its nearest enclosing loop that is not a frame), or null.</summary>
    public Face? Around(int i)
    {
        int p = _parent[i];
        while (p >= 0 && IsFrame[p]) p = _parent[p];
        return p < 0 ? null : MakeFace(p, _depth[p]);
    }

    private static string Plain(string source)
    {
        int k = source.LastIndexOf(" segment ", StringComparison.Ordinal);
        return k > 0 && source[(k + 9)..].All(char.IsAsciiDigit) ? source[..k] : source;
    }

    public Loop LoopAt(int i) => _loops[i];

    /// <summary>The region of the innermost loop around <paramref name="p"/>, or null when no loop holds it.</summary>
    public Face? At(Point2 p)
    {
        int i = Innermost(p, -1);
        return i < 0 ? null : MakeFace(i, 0);
    }

    /// <summary>True when <paramref name="p"/> lies in the material of <paramref name="f"/> (inside its loop, outside its holes).</summary>
    public bool InMaterial(Face f, Point2 p) => Inside(f.Loop, p) && !f.Holes.Any(h => Inside(h, p));

    /// <summary>The profile region of a face.</summary>
    public Region ToRegion(Face f) => new(_loops[f.Loop], f.Holes.Select(h => _loops[h]));

    private Face MakeFace(int i, int depth)
    {
        var holes = _children[i].ToArray();
        var layers = new SortedSet<string>(StringComparer.OrdinalIgnoreCase);
        foreach (int k in holes.Prepend(i)) foreach (var l in _layers[k]) layers.Add(l);
        double area = _area[i] - holes.Sum(h => _area[h]);
        return new Face(i, holes, area, _box[i], depth, layers.ToArray(), Entity(i), InsidePoint(i, holes));
    }

    private void FindFrames(IEnumerable<(Point2 Where, string Source)> stuff)
    {
        int n = _loops.Count;
        IsFrame = new bool[n];
        foreach (var (p, src) in stuff)
        {
            int i = Innermost(p, -1);
            if (i < 0 || _children[i].Count == 0 || IsFrame[i]) continue;
            IsFrame[i] = true;
            FrameReason[i] = $"{Plain(src)} lies inside";
        }
        // a border around frames only (an outer trim line around the drawing border) is a frame too
        for (bool changed = true; changed;)
        {
            changed = false;
            for (int i = 0; i < n; i++)
                if (!IsFrame[i] && _children[i].Count > 0 && _children[i].All(c => IsFrame[c]))
                {
                    IsFrame[i] = true;
                    FrameReason[i] = $"it encloses the frame {Entity(_children[i][0])}";
                    changed = true;
                }
        }
    }

    /// <summary>The smallest loop (other than <paramref name="self"/>) larger than it whose inside holds <paramref name="p"/>.</summary>
    private int Innermost(Point2 p, int self)
    {
        int best = -1;
        foreach (int j in _grid.Candidates(p))
        {
            if (j == self || self >= 0 && !(_area[j] > _area[self] && _box[j].Contains(_box[self], 1e-9 * _box[j].Diagonal))) continue;
            if (best >= 0 && _area[j] >= _area[best]) continue;
            if (Inside(j, p)) best = j;
        }
        return best;
    }

    /// <summary>
    /// Point in loop: the winding number on a coarse polygon (chords within 1e-4 of the loop size), decided there
    /// unless the point lies within twice that of the polygon; then on a fine one (1e-7, as <see cref="Loop.Contains"/>).
    /// </summary>
    private bool Inside(int j, Point2 p)
    {
        var b = _box[j];
        if (p.X < b.MinX || p.X > b.MaxX || p.Y < b.MinY || p.Y > b.MaxY) return false;
        double size = Math.Max(b.Diagonal, double.Epsilon), sag = 1e-4 * size;
        var poly = _poly[j] ??= _loops[j].Flatten(sag);
        int wn = 0;
        double near = double.PositiveInfinity;
        for (int i = 0; i < poly.Count; i++)
        {
            Point2 a = poly[i], c = poly[(i + 1) % poly.Count];
            double cross = (c.X - a.X) * (p.Y - a.Y) - (p.X - a.X) * (c.Y - a.Y);
            if (a.Y <= p.Y) { if (c.Y > p.Y && cross > 0) wn++; }
            else if (c.Y <= p.Y && cross < 0) wn--;
            near = Math.Min(near, DistanceSquared(p, a, c));
        }
        if (near > 4 * sag * sag) return wn != 0;
        return Loop.WindingNumber(_loops[j].Flatten(1e-7 * size), p) != 0;
    }

    private static double DistanceSquared(Point2 p, Point2 a, Point2 c)
    {
        Point2 d = c - a, e = p - a;
        double l2 = Point2.Dot(d, d);
        double t = l2 > 0 ? Math.Clamp(Point2.Dot(e, d) / l2, 0, 1) : 0;
        Point2 q = e - t * d;
        return Point2.Dot(q, q);
    }

    /// <summary>The middle of the widest span of material on a few horizontal lines through the region.</summary>
    private Point2 InsidePoint(int outer, int[] holes)
    {
        var b = _box[outer];
        double bestW = -1;
        Point2 best = _loops[outer].InteriorPoint();
        foreach (double f in (ReadOnlySpan<double>)[0.5, 0.37, 0.63, 0.21, 0.79, 0.09, 0.91])
        {
            double y = b.MinY + f * b.Height;
            var xs = new List<double>();
            foreach (int k in holes.Prepend(outer))
            {
                if (_box[k].MinY > y || _box[k].MaxY < y) continue;
                var poly = _poly[k] ??= _loops[k].Flatten(1e-4 * Math.Max(_box[k].Diagonal, double.Epsilon));
                for (int i = 0; i < poly.Count; i++)
                {
                    Point2 a = poly[i], c = poly[(i + 1) % poly.Count];
                    if ((a.Y <= y) != (c.Y <= y)) xs.Add(a.X + (y - a.Y) * (c.X - a.X) / (c.Y - a.Y));
                }
            }
            xs.Sort();
            for (int i = 0; i + 1 < xs.Count; i += 2)
                if (xs[i + 1] - xs[i] > bestW) { bestW = xs[i + 1] - xs[i]; best = new Point2(0.5 * (xs[i] + xs[i + 1]), y); }
        }
        return best;
    }
}
