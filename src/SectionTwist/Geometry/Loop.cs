namespace SectionTwist.Geometry;

/// <summary>
/// A closed boundary curve made of lines and arcs; segment i ends where segment i+1 starts.
/// </summary>
public sealed class Loop
{
    private double? _signedArea;

    /// <summary>
    /// Creates a loop. Consecutive segments must meet within 1e-9 of the loop size; the last must end at the first's start.
    /// Throws <see cref="SectionTwistException"/> (code <c>open-loop</c>) naming the gap otherwise.
    /// </summary>
    public Loop(IEnumerable<Segment> segments)
    {
        Segments = segments.ToArray();
        if (Segments.Count == 0) throw new SectionTwistException("empty-loop", "a loop needs at least one segment");
        var box = Box2.Empty;
        foreach (var s in Segments) box = box.Union(s.Bounds);
        Bounds = box;
        double tol = 1e-9 * Math.Max(box.Diagonal, double.Epsilon);
        for (int i = 0; i < Segments.Count; i++)
        {
            var a = Segments[i];
            var b = Segments[(i + 1) % Segments.Count];
            double gap = Point2.Distance(a.End, b.Start);
            if (gap > tol)
                throw new SectionTwistException("open-loop",
                    $"open loop: gap of {gap:G4} between the end {a.End} of segment {i + 1} ({a}) and the start {b.Start} of segment {(i + 1) % Segments.Count + 1}; close the outline or widen the snap tolerance");
        }
    }

    /// <summary>The segments in order.</summary>
    public IReadOnlyList<Segment> Segments { get; }

    /// <summary>Bounding box.</summary>
    public Box2 Bounds { get; }

    /// <summary>Enclosed area, positive when the loop runs counter-clockwise.</summary>
    public double SignedArea => _signedArea ??= Moments(Bounds.Center).A;

    /// <summary>True when the loop runs counter-clockwise.</summary>
    public bool IsCounterClockwise => SignedArea > 0;

    /// <summary>Total length of the loop.</summary>
    public double Perimeter => Segments.Sum(s => s.Length);

    /// <summary>The loop run the other way.</summary>
    public Loop Reversed() => new(Segments.Reverse().Select(s => s.Reversed()));

    /// <summary>The loop with the requested orientation.</summary>
    public Loop Oriented(bool counterClockwise) => IsCounterClockwise == counterClockwise ? this : Reversed();

    /// <summary>The loop moved by a similarity transform.</summary>
    public Loop Transformed(Similarity2 t) => new(Segments.Select(s => s.Transformed(t)));

    internal AreaMoments Moments(Point2 origin)
    {
        var m = new AreaMoments();
        foreach (var s in Segments) s.Accumulate(ref m, origin);
        return m;
    }

    /// <summary>A polygon through the loop with arcs split so that chords deviate at most <paramref name="sagitta"/>; the closing point is not repeated.</summary>
    public IReadOnlyList<Point2> Flatten(double sagitta)
    {
        var pts = new List<Point2>();
        foreach (var s in Segments)
        {
            var f = s.Flatten(sagitta);
            for (int i = 0; i < f.Count - 1; i++) pts.Add(f[i]);
            // stacked or repeated curves could flatten to tens of millions of points: refuse before memory runs out
            if (pts.Count > Limits.InputLimits.MaxOutlineEdges)
                throw new SectionTwistException("profile-too-complex",
                    $"a loop near {Segments[0].Start} has more than {Limits.InputLimits.MaxOutlineEdges} straight pieces when its curves are traced (stacked or repeated curves?); remove the duplicates or simplify the outline");
        }
        return pts;
    }

    /// <summary>
    /// Winding number of the loop about <paramref name="p"/> on a fine polygon (1e-7 of the size); +1 inside a counter-clockwise loop.
    /// </summary>
    public int WindingNumber(Point2 p) => WindingNumber(Flatten(1e-7 * Math.Max(Bounds.Diagonal, double.Epsilon)), p);

    /// <summary>True when <paramref name="p"/> is strictly inside (either orientation).</summary>
    public bool Contains(Point2 p) => WindingNumber(p) != 0;

    internal static int WindingNumber(IReadOnlyList<Point2> poly, Point2 p)
    {
        int wn = 0;
        for (int i = 0; i < poly.Count; i++)
        {
            Point2 a = poly[i], b = poly[(i + 1) % poly.Count];
            double cross = (b.X - a.X) * (p.Y - a.Y) - (p.X - a.X) * (b.Y - a.Y);
            if (a.Y <= p.Y) { if (b.Y > p.Y && cross > 0) wn++; }
            else if (b.Y <= p.Y && cross < 0) wn--;
        }
        return wn;
    }

    /// <summary>A point strictly inside the loop's enclosed area (used to test nesting).</summary>
    public Point2 InteriorPoint()
    {
        var poly = Flatten(1e-6 * Bounds.Diagonal);
        // Cast a horizontal line through the middle of the box and take the midpoint of the widest inside span.
        for (int attempt = 0; attempt < 7; attempt++)
        {
            double y = Bounds.MinY + Bounds.Height * (0.5 + 0.137 * (attempt % 2 == 0 ? attempt / 2 : -(attempt + 1) / 2) * 0.9);
            var xs = new List<double>();
            for (int i = 0; i < poly.Count; i++)
            {
                Point2 a = poly[i], b = poly[(i + 1) % poly.Count];
                if ((a.Y <= y) != (b.Y <= y)) xs.Add(a.X + (y - a.Y) * (b.X - a.X) / (b.Y - a.Y));
            }
            xs.Sort();
            double best = -1; Point2 bestP = default;
            for (int i = 0; i + 1 < xs.Count; i += 2)
                if (xs[i + 1] - xs[i] > best) { best = xs[i + 1] - xs[i]; bestP = new Point2(0.5 * (xs[i] + xs[i + 1]), y); }
            if (best > 0) return bestP;
        }
        return poly[0];
    }
}
