using System.Globalization;
using SectionTwist.Plastic;
using SectionTwist.Rendering.Drawing;
using SkiaSharp;

namespace SectionTwist.Rendering.Section;

/// <summary>
/// Draws how the plastic zone spreads: one panel per point of the torque-twist curve, the yielded part of the section
/// in red, the elastic part in grey, the outline in black, and the twist and torque ratios above each panel.
/// </summary>
public static class PlasticZonePicture
{
    private static readonly SKColor Elastic = new(0xD8, 0xDC, 0xE2);
    private static readonly SKColor Yielded = new(0xD6, 0x3A, 0x2F);

    /// <summary>Draws the picture and returns the PNG or SVG file bytes.</summary>
    public static byte[] Render(PlasticResult result, ImageFormat format, string title)
    {
        ArgumentNullException.ThrowIfNull(result);
        int n = Math.Max(1, result.Curve.Count);
        int cols = Math.Min(n, 4), rows = (n + cols - 1) / cols;
        int width = 1200, panelH = 300, height = 60 + rows * panelH;
        return CanvasTarget.Render(format, width, height, c =>
        {
            c.Clear(SKColors.White);
            Ink.Label(c, title, 20, 30, 17, Ink.Text);
            float pw = (width - 20f) / cols;
            for (int k = 0; k < result.Curve.Count; k++)
            {
                var rect = new SKRect(10 + (k % cols) * pw, 50 + (k / cols) * panelH, 10 + (k % cols + 1) * pw, 50 + (k / cols + 1) * panelH);
                DrawPanel(c, result, k, rect);
            }
        });
    }

    /// <summary>Writes the picture to <paramref name="path"/>; the format follows the extension (.png or .svg).</summary>
    public static void Save(PlasticResult result, string path, string title)
    {
        var bytes = Render(result, ImageFormats.FromPath(path), title);
        AtomicFile.Write(path, s => s.Write(bytes));
    }

    private static void DrawPanel(SKCanvas c, PlasticResult r, int k, SKRect rect)
    {
        var f = r.Field;
        var p = r.Curve[k];
        string F(double v) => v.ToString("0.##", CultureInfo.InvariantCulture);
        Ink.Label(c, $"twist {F(p.TwistRatio)} x first yield: T = {F(p.TorqueRatio)} T_y, {p.PlasticFraction * 100:F0} % yielded",
            rect.Left + 8, rect.Top + 16, 11, Ink.Text);
        double minX = f.X.Min(), maxX = f.X.Max(), minY = f.Y.Min(), maxY = f.Y.Max();
        float top = rect.Top + 28;
        double scale = Math.Min((rect.Width - 20) / Math.Max(maxX - minX, 1e-300), (rect.Bottom - top - 10) / Math.Max(maxY - minY, 1e-300));
        float ox = (float)(rect.MidX - 0.5 * scale * (minX + maxX)), oy = (float)(0.5 * (top + rect.Bottom) + 0.5 * scale * (minY + maxY));
        SKPoint P(double x, double y) => new(ox + (float)(scale * x), oy - (float)(scale * y));
        using var elastic = new SKPath();
        using var plastic = new SKPath();
        var yielded = f.Yielded[k];
        for (int t = 0; t + 2 < f.Triangles.Count; t += 3)
        {
            int a = f.Triangles[t], b = f.Triangles[t + 1], d = f.Triangles[t + 2];
            bool any = false, all = true;
            foreach (int i in (ReadOnlySpan<int>)[a, b, d])
            {
                if (!IsFree(f, i)) continue;
                any = true;
                all &= yielded[i];
            }
            var path = any && all ? plastic : elastic;
            path.MoveTo(P(f.X[a], f.Y[a])); path.LineTo(P(f.X[b], f.Y[b])); path.LineTo(P(f.X[d], f.Y[d])); path.Close();
        }
        using (var paint = new SKPaint { Color = Elastic, Style = SKPaintStyle.StrokeAndFill, StrokeWidth = 0.6f, IsAntialias = true }) c.DrawPath(elastic, paint);
        using (var paint = new SKPaint { Color = Yielded, Style = SKPaintStyle.StrokeAndFill, StrokeWidth = 0.6f, IsAntialias = true }) c.DrawPath(plastic, paint);
        using var outline = new SKPath();
        foreach (var loop in f.Boundaries)
        {
            outline.MoveTo(P(loop[0].X, loop[0].Y));
            for (int i = 1; i < loop.Count; i++) outline.LineTo(P(loop[i].X, loop[i].Y));
            outline.Close();
        }
        using var stroke = Ink.Stroke(SKColors.Black, 1.2f);
        c.DrawPath(outline, stroke);
    }

    /// <summary>Interior nodes carry the yield state; nodes on the boundary do not (they are fixed).</summary>
    private static bool IsFree(PlasticField f, int node) => f.Free[node];
}
