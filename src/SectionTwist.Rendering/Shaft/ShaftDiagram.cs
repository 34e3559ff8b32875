using SectionTwist.Rendering.Drawing;
using SkiaSharp;

namespace SectionTwist.Rendering.Shaft;

/// <summary>
/// Draws a shaft: the schematic to scale (segments, supports, torques) above three plots on the same axial scale:
/// internal torque (N·m), rotation of each station (degrees) and peak shear stress (MPa) with the allowable as a dashed
/// line and exceedances shaded red.
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
        double allow = d.Segments.Where(s => s.Allowable is not null).Select(s => s.Allowable!.Value * 1e-6).DefaultIfEmpty(0).Max();
        return (new ShaftPanel(L.TorquePanel, tq.Min(p => p.Y), tq.Max(p => p.Y)),
            new ShaftPanel(L.RotationPanel, rot.Count == 0 ? 0 : rot.Min(p => p.Y), rot.Count == 0 ? 1 : rot.Max(p => p.Y)),
            new ShaftPanel(L.ShearPanel, 0, Math.Max(sh.Count == 0 ? 0 : sh.Max(p => p.Y), allow) * 1.08));
    }

    private static void Draw(SKCanvas c, ShaftDiagramData d, ShaftDiagramLayout L)
    {
        Ink.Label(c, d.Title, L.Schematic.Left, 24, 17, Ink.Text);
        var (tp, rp, sp) = Panels(d, L);
        ShaftSchematic.Draw(c, d, L, new SKPoint(L.Schematic.Left, L.Schematic.Top + 6));
        tp.DrawFrame(c, "internal torque", "T, N·m");
        rp.DrawFrame(c, "rotation of the stations", "φ, deg");
        sp.DrawFrame(c, "peak shear stress", "τ, MPa");
        StationGuides(c, d, L);

        DrawTorque(c, d, L, tp);
        DrawRotation(c, d, L, rp);
        DrawShear(c, d, L, sp);

        // axial axis labels under the last panel
        var (step, ticks) = NiceScale.Ticks(L.X0 / d.Unit.Metres, (L.X0 + L.ShearPanel.Width / L.PixelsPerMetre) / d.Unit.Metres,
            Math.Max(3, (int)(L.ShearPanel.Width / 90)));
        using var tick = Ink.Stroke(Ink.Text, 1f);
        foreach (double t in ticks)
        {
            float x = L.ToPixelX(t * d.Unit.Metres);
            if (x < L.ShearPanel.Left - 0.5f || x > L.ShearPanel.Right + 0.5f) continue;
            c.DrawLine(x, L.ShearPanel.Bottom, x, L.ShearPanel.Bottom + 5, tick);
            Ink.Label(c, NiceScale.Format(t, step), x, L.ShearPanel.Bottom + 18, 11, Ink.Text, SKTextAlign.Center);
        }
        Ink.Label(c, $"axial position, {d.Unit.Symbol}", L.ShearPanel.Right, L.ShearPanel.Bottom + 34, 12, Ink.Text, SKTextAlign.Right);
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
        foreach (var s in ShaftSeries.Ordered(d))
        {
            double tm = 0.5 * (s.TorqueStart + s.TorqueEnd);
            float x = L.ToPixelX(0.5 * (s.From + s.To));
            float y = p.ToPixelY(tm) + (tm >= 0 ? -6 : 15);
            y = Math.Clamp(y, p.Rect.Top + 12, p.Rect.Bottom - 4);
            Ink.Label(c, ShaftSchematic.Signed(tm), x, y, 11, TorqueColour, SKTextAlign.Center);
        }
    }

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
            Ink.Label(c, NiceScale.Sig(q.Y, 3) + "°", x + 5, y - 7, 10, RotationColour);
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
                using var area = Ink.Fill(s.Exceeds ? Ink.Alert.WithAlpha(110) : ShearColour.WithAlpha(55));
                c.DrawPath(closed, area);
            }
            using (var line = Ink.Stroke(s.Exceeds ? Ink.Alert : ShearColour, 2f)) c.DrawPath(path, line);
            if (s.Allowable is { } a)
            {
                float y = p.ToPixelY(a * 1e-6);
                using var allow = Ink.Stroke(Ink.Alert, 1.5f, [7, 4]);
                c.DrawLine(L.ToPixelX(s.From), y, L.ToPixelX(s.To), y, allow);
            }
            if (s.Exceeds)
            {
                float x = L.ToPixelX(0.5 * (s.From + s.To));
                Ink.BoxedLabel(c, "over allowable", x, p.Rect.Top + 16, 11, Ink.Alert, SKTextAlign.Center);
            }
        }
        var allowables = segs.Where(s => s.Allowable is not null).ToList();
        if (allowables.Count > 0)
            Ink.Label(c, "- - allowable", p.Rect.Right - 4, p.Rect.Top - 6, 11, Ink.Alert, SKTextAlign.Right);
    }
}
