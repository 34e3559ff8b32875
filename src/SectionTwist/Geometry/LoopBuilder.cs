namespace SectionTwist.Geometry;

/// <summary>Builds a loop step by step: lines and arcs from the current point, then <see cref="Close"/>.</summary>
public sealed class LoopBuilder
{
    private readonly List<Segment> _segments = [];
    private readonly Point2 _first;

    /// <summary>Starts a loop at <paramref name="start"/>.</summary>
    public LoopBuilder(Point2 start) { _first = start; Current = start; }

    /// <summary>Starts a loop at (x, y).</summary>
    public LoopBuilder(double x, double y) : this(new Point2(x, y)) { }

    /// <summary>The current end point.</summary>
    public Point2 Current { get; private set; }

    /// <summary>Adds a straight line to <paramref name="p"/>.</summary>
    public LoopBuilder LineTo(Point2 p) { _segments.Add(new LineSegment(Current, p)); Current = p; return this; }

    /// <summary>Adds a straight line to (x, y).</summary>
    public LoopBuilder LineTo(double x, double y) => LineTo(new Point2(x, y));

    /// <summary>Adds an arc about <paramref name="center"/> to <paramref name="end"/> (the end is projected onto the circle).</summary>
    public LoopBuilder ArcTo(Point2 end, Point2 center, bool counterClockwise)
    {
        var arc = ArcSegment.FromCenter(center, Current, end, counterClockwise);
        _segments.Add(arc); Current = arc.End; return this;
    }

    /// <summary>Adds an arc to <paramref name="end"/> with a DXF-style bulge.</summary>
    public LoopBuilder BulgeTo(Point2 end, double bulge)
    {
        if (bulge == 0) return LineTo(end);
        _segments.Add(ArcSegment.FromBulge(Current, end, bulge)); Current = end; return this;
    }

    /// <summary>Adds an arc through <paramref name="through"/> to <paramref name="end"/>.</summary>
    public LoopBuilder ArcThrough(Point2 through, Point2 end)
    {
        _segments.Add(ArcSegment.ThroughThreePoints(Current, through, end)); Current = end; return this;
    }

    /// <summary>Adds any segment that starts at the current point.</summary>
    public LoopBuilder Add(Segment s) { _segments.Add(s); Current = s.End; return this; }

    /// <summary>Closes the loop with a line back to the start if needed and returns it.</summary>
    public Loop Close()
    {
        if (Point2.Distance(Current, _first) > 1e-12 * Math.Max(1e-300, Math.Max(Math.Abs(_first.X), Math.Abs(_first.Y)) + Point2.Distance(Current, _first)))
            _segments.Add(new LineSegment(Current, _first));
        return new Loop(_segments);
    }

    /// <summary>A polygon loop through the given points.</summary>
    public static Loop Polygon(IEnumerable<Point2> points)
    {
        var pts = points.ToList();
        if (pts.Count < 3) throw new SectionTwistException("bad-polygon", "a polygon needs at least three points");
        var b = new LoopBuilder(pts[0]);
        foreach (var p in pts.Skip(1)) b.LineTo(p);
        return b.Close();
    }

    /// <summary>A full circle loop.</summary>
    public static Loop Circle(Point2 center, double radius) => new([ArcSegment.Circle(center, radius)]);
}
