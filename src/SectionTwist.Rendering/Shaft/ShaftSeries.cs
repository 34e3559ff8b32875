namespace SectionTwist.Rendering.Shaft;

/// <summary>A plotted point: axial position (m) and value (plot unit).</summary>
/// <param name="X">Axial position, m.</param>
/// <param name="Y">Value in the plot's unit.</param>
internal readonly record struct PlotPoint(double X, double Y);

/// <summary>
/// The polylines the three shaft plots draw, in axis order: internal torque (display torque unit; a vertical step at each
/// station where the torque jumps, linear within a segment), station rotations (degrees), shear stress (display stress
/// unit) per segment.
/// </summary>
internal static class ShaftSeries
{
    public static IReadOnlyList<DiagramSegment> Ordered(ShaftDiagramData d) =>
        d.Segments.OrderBy(s => Math.Min(s.From, s.To)).ToArray();

    /// <summary>Internal torque: each segment contributes its start and end points, so jumps appear as vertical steps.</summary>
    public static IReadOnlyList<PlotPoint> Torque(ShaftDiagramData d)
    {
        var t = d.DisplayUnits.Torque;
        var pts = new List<PlotPoint>();
        double? lastX = null;
        foreach (var s in Ordered(d))
        {
            // a gap between segments (no shaft there) breaks the line at zero
            if (lastX is { } lx && s.From > lx + 1e-12) { pts.Add(new(lx, 0)); pts.Add(new(s.From, 0)); }
            else if (lastX is null) pts.Add(new(s.From, 0));
            pts.Add(new(s.From, t.FromSi(s.TorqueStart)));
            pts.Add(new(s.To, t.FromSi(s.TorqueEnd)));
            lastX = s.To;
        }
        if (lastX is { } end) pts.Add(new(end, 0));
        return pts;
    }

    /// <summary>Rotation of each station, degrees, by position.</summary>
    public static IReadOnlyList<PlotPoint> Rotation(ShaftDiagramData d) =>
        d.Stations.OrderBy(s => s.Position).Select(s => new PlotPoint(s.Position, s.RotationDeg)).ToArray();

    /// <summary>
    /// Shear stress in the display stress unit, one polyline per segment (start, end, and zero where a distributed torque
    /// changes sign).
    /// </summary>
    public static IReadOnlyList<IReadOnlyList<PlotPoint>> Shear(ShaftDiagramData d)
    {
        var u = d.DisplayUnits.Stress;
        var list = new List<IReadOnlyList<PlotPoint>>();
        foreach (var s in Ordered(d))
        {
            var pts = new List<PlotPoint> { new(s.From, u.FromSi(s.ShearStart)) };
            if (s.TorqueStart * s.TorqueEnd < 0)
            {
                double t = s.TorqueStart / (s.TorqueStart - s.TorqueEnd);
                pts.Add(new(s.From + t * (s.To - s.From), 0));
            }
            pts.Add(new(s.To, u.FromSi(s.ShearEnd)));
            list.Add(pts);
        }
        return list;
    }
}
