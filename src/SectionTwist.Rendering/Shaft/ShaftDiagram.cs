using SectionTwist.Rendering.Drawing;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Rendering.Shaft;

/// <summary>
/// Draws a shaft: the schematic to scale (segments, supports, torques) above three plots on the same axial scale:
/// internal torque, rotation of each station (degrees) and peak shear stress with the allowable as a dashed line,
/// exceedances shaded red and unbounded peaks (sharp corners) dashed and labelled; lengths, torques and stresses in the
/// data's display units (<see cref="ShaftDiagramData.Units"/>).
/// </summary>
public static class ShaftDiagram
{
    private static readonly SKColor TorqueColour = new(0x1F, 0x4E, 0x79);
    private static readonly SKColor RotationColour = new(0x3B, 0x52, 0x8B);
    private static readonly SKColor ShearColour = new(0x21, 0x91, 0x8C);

    /// <summary>Default picture width, px.</summary>
    public const int DefaultWidth = 1000;
    /// <summary>Default picture height, px.</summary>
    public const int DefaultHeight = 900;

    /// <summary>Draws the diagram and returns the PNG or SVG file bytes.</summary>
    public static byte[] Render(ShaftDiagramData data, ImageFormat format, int width = DefaultWidth, int height = DefaultHeight)
    {
        ArgumentNullException.ThrowIfNull(data);
        if (data.Segments.Count == 0) throw new SectionTwistException("shaft-empty", "the shaft has no segments to draw; add at least one segment");
        return CanvasTarget.Render(format, width, height, c => Draw(c, data, Layout(data, width, height)));
    }

    /// <summary>Writes the diagram to <paramref name="path"/>; the format follows the extension (.png or .svg).</summary>
    public static void Save(ShaftDiagramData data, string path, int width = DefaultWidth, int height = DefaultHeight)
    {
        var bytes = Render(data, ImageFormats.FromPath(path), width, height);
        AtomicFile.Write(path, s => s.Write(bytes));
    }

    internal static ShaftDiagramLayout Layout(ShaftDiagramData data, int width, int height) => ShaftDiagramLayout.Create(data, width, height);

    /// <summary>The panel scales used for the three plots (for tests).</summary>
    internal static (ShaftPanel Torque, ShaftPanel Rotation, ShaftPanel Shear) Panels(ShaftDiagramData d, ShaftDiagramLayout L)
    {
        var tq = ShaftSeries.Torque(d);
        var rot = ShaftSeries.Rotation(d);
        var sh = ShaftSeries.Shear(d).SelectMany(p => p).ToList();
        var stress = d.DisplayUnits.Stress;
        double allow = d.Segments.Where(s => s.Allowable is not null).Select(s => stress.FromSi(s.Allowable!.Value)).DefaultIfEmpty(0).Max();
        return (new ShaftPanel(L.TorquePanel, tq.Min(p => p.Y), tq.Max(p => p.Y)),
            new ShaftPanel(L.RotationPanel, rot.Count == 0 ? 0 : rot.Min(p => p.Y), rot.Count == 0 ? 1 : rot.Max(p => p.Y)),
            new ShaftPanel(L.ShearPanel, 0, Math.Max(sh.Count == 0 ? 0 : sh.Max(p => p.Y), allow) * 1.08));
    }

    private static void Draw(SKCanvas c, ShaftDiagramData d, ShaftDiagramLayout L)
    {
        var u = d.DisplayUnits;
        Ink.Label(c, d.Title, L.Schematic.Left, 24, 17, Ink.Text);
        var (tp, rp, sp) = Panels(d, L);
        ShaftSchematic.Draw(c, d, L, new SKPoint(L.Schematic.Left, L.Schematic.Top + 6));
        tp.DrawFrame(c, "internal torque", $"T, {u.Torque.Symbol}");
        rp.DrawFrame(c, "rotation of the stations", "φ, deg");
        sp.DrawFrame(c, "peak shear stress", $"τ, {u.Stress.Symbol}");
        StationGuides(c, d, L);

        DrawTorque(c, d, L, tp);
        DrawRotation(c, d, L, rp);
        DrawShear(c, d, L, sp);

        // axial axis labels under the last panel
        double lu = u.Length.SiPerUnit;
        var (step, ticks) = NiceScale.Ticks(L.X0 / lu, (L.X0 + L.ShearPanel.Width / L.PixelsPerMetre) / lu,
            Math.Max(3, (int)(L.ShearPanel.Width / 90)));
        using var tick = Ink.Stroke(Ink.Text, 1f);
        foreach (double t in ticks)
        {
            float x = L.ToPixelX(t * lu);
            if (x < L.ShearPanel.Left - 0.5f || x > L.ShearPanel.Right + 0.5f) continue;
            c.DrawLine(x, L.ShearPanel.Bottom, x, L.ShearPanel.Bottom + 5, tick);
            Ink.Label(c, NiceScale.Format(t, step), x, L.ShearPanel.Bottom + 18, 11, Ink.Text, SKTextAlign.Center);
        }
        Ink.Label(c, $"axial position, {u.Length.Symbol}", L.ShearPanel.Right, L.ShearPanel.Bottom + 34, 12, Ink.Text, SKTextAlign.Right);
    }

    private static void StationGuides(SKCanvas c, ShaftDiagramData d, ShaftDiagramLayout L)
    {
        using var guide = Ink.Stroke(new SKColor(0x99, 0x99, 0x99), 0.8f, [3, 3]);
        foreach (var st in d.Stations)
        {
            float x = L.ToPixelX(st.Position);
            c.DrawLine(x, L.TorquePanel.Top, x, L.ShearPanel.Bottom, guide);
        }
    }

    private static SKPath Polyline(IReadOnlyList<PlotPoint> pts, ShaftDiagramLayout L, ShaftPanel p)
    {
        var path = new SKPath();
        for (int i = 0; i < pts.Count; i++)
        {
            var q = new SKPoint(L.ToPixelX(pts[i].X), p.ToPixelY(pts[i].Y));
            if (i == 0) path.MoveTo(q); else path.LineTo(q);
        }
        return path;
    }

    private static void DrawTorque(SKCanvas c, ShaftDiagramData d, ShaftDiagramLayout L, ShaftPanel p)
    {
        var pts = ShaftSeries.Torque(d);
        using var path = Polyline(pts, L, p);
        using (var area = Ink.Fill(TorqueColour.WithAlpha(60))) { using var closed = new SKPath(path); closed.Close(); c.DrawPath(closed, area); }
        using (var line = Ink.Stroke(TorqueColour, 2f)) c.DrawPath(path, line);
        var unit = d.DisplayUnits.Torque;
        foreach (var s in ShaftSeries.Ordered(d))
        {
            double t0 = unit.FromSi(s.TorqueStart), t1 = unit.FromSi(s.TorqueEnd), tm = 0.5 * (t0 + t1);
            float x = L.ToPixelX(0.5 * (s.From + s.To));
            if (Math.Abs(t1 - t0) <= 1e-9 * Math.Max(Math.Abs(t0), Math.Abs(t1)))
            {
                Ink.Label(c, ShaftSchematic.Signed(tm), x, FlatLabelY(p.ToPixelY(tm), tm >= 0, p.Rect), 11, TorqueColour, SKTextAlign.Center);
            }
            else
            {
                // a sloped line would strike through a label at its middle: the value (at mid-length) goes on a white box
                // beside the line, halfway between its middle and zero
                string text = ShaftSchematic.Signed(tm);
                var box = SlopedLabelBox(new SKPoint(L.ToPixelX(s.From), p.ToPixelY(t0)), new SKPoint(L.ToPixelX(s.To), p.ToPixelY(t1)),
                    p.ToPixelY(0), Ink.Width(text, 11), 11);
                Ink.BoxedLabel(c, text, box.MidX, box.Top + 11, 11, TorqueColour, SKTextAlign.Center);
            }
        }
    }

    /// <summary>
    /// Where the label of a sloped line from <paramref name="a"/> to <paramref name="b"/> goes: centred halfway between the
    /// line's middle and the zero line, horizontally clear of the line over the label's whole height, inside the shaded
    /// area (the side of the end further from zero) when it fits between the segment's ends, else on the other side.
    /// Returns the label's box as <see cref="Ink.BoxedLabel"/> draws it (4 px padding).
    /// </summary>
    internal static SKRect SlopedLabelBox(SKPoint a, SKPoint b, float yZero, float textWidth, float size)
    {
        float y = 0.5f * (0.5f * (a.Y + b.Y) + yZero);
        float top = y - 0.5f * (1.35f * size) - 3, bottom = y + 0.5f * (1.35f * size) + 3; // the box's height and 3 px air
        float XAt(float yy) => Math.Abs(b.Y - a.Y) < 1e-6f ? 0.5f * (a.X + b.X) : a.X + Math.Clamp((yy - a.Y) / (b.Y - a.Y), 0, 1) * (b.X - a.X);
        float lo = Math.Min(XAt(top), XAt(bottom)), hi = Math.Max(XAt(top), XAt(bottom));
        float half = 0.5f * textWidth + 4, gap = 4;
        bool areaLeft = Math.Abs(a.Y - yZero) > Math.Abs(b.Y - yZero);
        float left = lo - gap - half, right = hi + gap + half;
        float inside = areaLeft ? left : right, outside = areaLeft ? right : left;
        bool fits = inside - half >= Math.Min(a.X, b.X) && inside + half <= Math.Max(a.X, b.X);
        float cx = fits ? inside : outside;
        float h = 1.35f * size;
        return new SKRect(cx - half, y - 0.5f * h, cx + half, y + 0.5f * h);
    }

    /// <summary>
    /// The baseline of the label of a horizontal torque line at <paramref name="y"/>: on the side away from the shaded area
    /// (above a positive torque, below a negative one) when the panel has room there, else on the other side; never on the line.
    /// </summary>
    internal static float FlatLabelY(float y, bool positive, SKRect panel)
    {
        float above = y - 6, below = y + 15; // 11 px text: its box is [baseline - 9, baseline + 3]
        bool aboveFits = above - 9 >= panel.Top + 2, belowFits = below + 3 <= panel.Bottom - 2;
        return positive ? (aboveFits || !belowFits ? above : below) : (belowFits || !aboveFits ? below : above);
    }

    /// <summary>The baseline of a station's rotation label: above the point, or below it near the panel's top edge (clear of the panel title).</summary>
    internal static float RotationLabelY(float y, SKRect panel) => y - 7 < panel.Top + 12 ? y + 15 : y - 7;

    private static void DrawRotation(SKCanvas c, ShaftDiagramData d, ShaftDiagramLayout L, ShaftPanel p)
    {
        var pts = ShaftSeries.Rotation(d);
        using (var path = Polyline(pts, L, p))
        using (var line = Ink.Stroke(RotationColour, 2f)) c.DrawPath(path, line);
        using var dot = Ink.Fill(RotationColour);
        foreach (var q in pts)
        {
            float x = L.ToPixelX(q.X), y = p.ToPixelY(q.Y);
            c.DrawCircle(x, y, 3.5f, dot);
            Ink.Label(c, NumberText.Format(q.Y, 3) + "°", x + 5, RotationLabelY(y, p.Rect), 10, RotationColour);
        }
    }

    private static void DrawShear(SKCanvas c, ShaftDiagramData d, ShaftDiagramLayout L, ShaftPanel p)
    {
        var segs = ShaftSeries.Ordered(d);
        var series = ShaftSeries.Shear(d);
        for (int i = 0; i < segs.Count; i++)
        {
            var s = segs[i];
            var pts = series[i];
            using var path = Polyline(pts, L, p);
            using (var closed = new SKPath(path))
            {
                closed.LineTo(L.ToPixelX(pts[^1].X), p.ToPixelY(0));
                closed.LineTo(L.ToPixelX(pts[0].X), p.ToPixelY(0));
                closed.Close();
                using var area = Ink.Fill(s.Exceeds || s.PeakShearUnbounded ? Ink.Alert.WithAlpha((byte)(s.PeakShearUnbounded ? 40 : 110)) : ShearColour.WithAlpha(55));
                c.DrawPath(closed, area);
            }
            using (var line = Ink.Stroke(s.Exceeds || s.PeakShearUnbounded ? Ink.Alert : ShearColour, 2f, s.PeakShearUnbounded ? [6, 4] : null)) c.DrawPath(path, line);
            if (s.Allowable is { } a)
            {
                float y = p.ToPixelY(d.DisplayUnits.Stress.FromSi(a));
                using var allow = Ink.Stroke(Ink.Alert, 1.5f, [7, 4]);
                c.DrawLine(L.ToPixelX(s.From), y, L.ToPixelX(s.To), y, allow);
            }
            if (s.Exceeds || s.PeakShearUnbounded)
            {
                float x = L.ToPixelX(0.5 * (s.From + s.To));
                Ink.BoxedLabel(c, s.PeakShearUnbounded ? "unbounded (sharp corner)" : "over allowable", x, p.Rect.Top + 16, 11, Ink.Alert, SKTextAlign.Center);
            }
        }
        var allowables = segs.Where(s => s.Allowable is not null).ToList();
        if (allowables.Count > 0)
            Ink.Label(c, "- - allowable", p.Rect.Right - 4, p.Rect.Top - 6, 11, Ink.Alert, SKTextAlign.Right);
    }
}
