using SectionTwist.Geometry;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Rendering.Section;

/// <summary>Frame, ticks in the display length unit, and the scale bar of a section picture.</summary>
internal static class SectionAxes
{
    public static void Draw(SKCanvas c, SectionLayout L, LengthUnit unit)
    {
        var r = L.Plot;
        using (var frame = Ink.Stroke(new SKColor(0x88, 0x88, 0x88), 1f)) c.DrawRect(r, frame);
        var lo = L.ToWorld(r.Left, r.Bottom);
        var hi = L.ToWorld(r.Right, r.Top);
        double u = unit.Metres;
        using var tick = Ink.Stroke(Ink.Text, 1f);
        var (sx, xs) = NiceScale.Ticks(lo.X / u, hi.X / u, Math.Max(3, (int)(r.Width / 90)));
        foreach (double t in xs)
        {
            float px = L.ToPixel(t * u, 0).X;
            if (px < r.Left - 0.5f || px > r.Right + 0.5f) continue;
            c.DrawLine(px, r.Bottom, px, r.Bottom + 5, tick);
            Ink.Label(c, NiceScale.Format(t, sx), px, r.Bottom + 18, 11, Ink.Text, SKTextAlign.Center);
        }
        var (sy, ys) = NiceScale.Ticks(lo.Y / u, hi.Y / u, Math.Max(3, (int)(r.Height / 70)));
        foreach (double t in ys)
        {
            float py = L.ToPixel(0, t * u).Y;
            if (py < r.Top - 0.5f || py > r.Bottom + 0.5f) continue;
            c.DrawLine(r.Left - 5, py, r.Left, py, tick);
            Ink.Label(c, NiceScale.Format(t, sy), r.Left - 8, py + 4, 11, Ink.Text, SKTextAlign.Right);
        }
        Ink.Label(c, $"x, {unit.Symbol}", r.MidX, r.Bottom + 36, 12, Ink.Text, SKTextAlign.Center);
        Ink.LabelVertical(c, $"y, {unit.Symbol}", r.Left - 50, r.MidY, 12, Ink.Text);
    }

    /// <summary>
    /// A bar of a round length (about a fifth of the plot width, or a half or a fifth of that) in a corner of the plot that the
    /// outline does not pass through (lower right first), so its backing never hides part of the outline; above the plot,
    /// right-aligned, when every corner is taken.
    /// </summary>
    public static void DrawScaleBar(SKCanvas c, SectionLayout L, LengthUnit unit, IReadOnlyList<IReadOnlyList<Point2>> outline)
    {
        var r = L.Plot;
        double u = unit.Metres;
        double target = 0.2 * r.Width / L.PixelsPerMetre / u;
        double len = NiceScale.NiceNumber(target, true);
        if (len * u * L.PixelsPerMetre > 0.35 * r.Width) len /= 2;
        var pixels = outline.Select(loop => loop.Select(L.ToPixel).ToArray()).ToArray();
        float px = 0, x1 = r.Right, y = r.Top - 10;
        bool inside = false;
        // a full bar, then half and a fifth of it, in each corner in turn (lower right first)
        double full = len;
        foreach (double f in new[] { 1.0, 0.5, 0.2 })
        {
            double l = f == 1 ? full : NiceScale.NiceNumber(full * f, true);
            float w = (float)(l * u * L.PixelsPerMetre);
            foreach (var (cx, cy) in new[] { (r.Right - 14, r.Bottom - 14), (r.Left + 14 + w, r.Bottom - 14), (r.Right - 14, r.Top + 30), (r.Left + 14 + w, r.Top + 30) })
            {
                // the backing spans x1 - w - 6 .. x1 + 6, y - 22 .. y + 6; keep 2 px more clear of the outline's stroke
                var box = new SKRect(cx - w - 8, cy - 24, cx + 8, cy + 8);
                if (pixels.Any(loop => Crosses(loop, box)) || Inside(pixels, new SKPoint(box.MidX, box.MidY))) continue;
                (px, x1, y, inside, len) = (w, cx, cy, true, l);
                break;
            }
            if (inside) break;
        }
        if (!inside) px = (float)(len * u * L.PixelsPerMetre); // above the plot, right-aligned: clear of the outline and the title
        float x0 = x1 - px;
        if (inside)
            using (var bg = Ink.Fill(new SKColor(255, 255, 255, 200)))
                c.DrawRect(new SKRect(x0 - 6, y - 22, x1 + 6, y + 6), bg);
        using var bar = Ink.Stroke(SKColors.Black, 2.5f);
        c.DrawLine(x0, y, x1, y, bar);
        c.DrawLine(x0, y - 5, x0, y + 3, bar);
        c.DrawLine(x1, y - 5, x1, y + 3, bar);
        Ink.Label(c, $"{NiceScale.Sig(len, 3)} {unit.Symbol}", 0.5f * (x0 + x1), y - 8, 11, Ink.Text, SKTextAlign.Center);
    }

    /// <summary>Even-odd point-in-outline test over all loops (inside the material, not in a hole).</summary>
    private static bool Inside(SKPoint[][] loops, SKPoint p)
    {
        bool inside = false;
        foreach (var loop in loops)
            for (int i = 0, j = loop.Length - 1; i < loop.Length; j = i++)
                if ((loop[i].Y > p.Y) != (loop[j].Y > p.Y) && p.X < loop[j].X + (p.Y - loop[j].Y) * (loop[i].X - loop[j].X) / (loop[i].Y - loop[j].Y))
                    inside = !inside;
        return inside;
    }

    /// <summary>True when the closed polyline enters <paramref name="box"/> (a vertex inside, or an edge crossing it).</summary>
    private static bool Crosses(SKPoint[] loop, SKRect box)
    {
        for (int i = 0; i < loop.Length; i++)
        {
            var a = loop[i];
            var b = loop[(i + 1) % loop.Length];
            if (box.Contains(a)) return true;
            // Liang-Barsky clipping of the edge a-b against the box
            float t0 = 0, t1 = 1, dx = b.X - a.X, dy = b.Y - a.Y;
            bool hit = true;
            foreach (var (pp, q) in new[] { (-dx, a.X - box.Left), (dx, box.Right - a.X), (-dy, a.Y - box.Top), (dy, box.Bottom - a.Y) })
            {
                if (pp == 0) { if (q < 0) { hit = false; break; } continue; }
                float t = q / pp;
                if (pp < 0) t0 = Math.Max(t0, t); else t1 = Math.Min(t1, t);
                if (t0 > t1) { hit = false; break; }
            }
            if (hit) return true;
        }
        return false;
    }
}
