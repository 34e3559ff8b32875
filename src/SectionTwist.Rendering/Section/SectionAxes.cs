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

    /// <summary>A bar of a round length (about a fifth of the plot width) in the lower right corner of the plot.</summary>
    public static void DrawScaleBar(SKCanvas c, SectionLayout L, LengthUnit unit)
    {
        var r = L.Plot;
        double u = unit.Metres;
        double target = 0.2 * r.Width / L.PixelsPerMetre / u;
        double len = NiceScale.NiceNumber(target, true);
        if (len * u * L.PixelsPerMetre > 0.35 * r.Width) len /= 2;
        float px = (float)(len * u * L.PixelsPerMetre);
        float x1 = r.Right - 14, x0 = x1 - px, y = r.Bottom - 14;
        using (var bg = Ink.Fill(new SKColor(255, 255, 255, 200)))
            c.DrawRect(new SKRect(x0 - 6, y - 22, x1 + 6, y + 6), bg);
        using var bar = Ink.Stroke(SKColors.Black, 2.5f);
        c.DrawLine(x0, y, x1, y, bar);
        c.DrawLine(x0, y - 5, x0, y + 3, bar);
        c.DrawLine(x1, y - 5, x1, y + 3, bar);
        Ink.Label(c, $"{NiceScale.Sig(len, 3)} {unit.Symbol}", 0.5f * (x0 + x1), y - 8, 11, Ink.Text, SKTextAlign.Center);
    }
}
