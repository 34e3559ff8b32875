using SectionTwist.Geometry;

namespace SectionTwist.Plastic;

/// <summary>
/// Euclidean distance from a point to one boundary loop, from the exact segments (lines, arcs, other curves through
/// their own nearest-point routine). Segments whose bounding box lies farther than the best distance so far are
/// skipped, so the cost per point stays close to the number of nearby segments.
/// </summary>
internal sealed class LoopDistance
{
    private readonly Segment[] _segments;
    private readonly Box2[] _boxes;

    public LoopDistance(Loop loop)
    {
        _segments = loop.Segments.ToArray();
        _boxes = _segments.Select(s => s.Bounds).ToArray();
    }

    /// <summary>Distance from <paramref name="p"/> to the loop, m.</summary>
    public double To(Point2 p)
    {
        double best = double.PositiveInfinity;
        for (int i = 0; i < _segments.Length; i++)
        {
            var b = _boxes[i];
            double dx = Math.Max(0, Math.Max(b.MinX - p.X, p.X - b.MaxX));
            double dy = Math.Max(0, Math.Max(b.MinY - p.Y, p.Y - b.MaxY));
            if (dx * dx + dy * dy >= best * best) continue;
            double d = Point2.Distance(p, _segments[i].Closest(p).Point);
            if (d < best) best = d;
        }
        return best;
    }
}
