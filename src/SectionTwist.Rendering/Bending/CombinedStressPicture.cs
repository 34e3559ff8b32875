using SectionTwist.Bending;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Rendering.Bending;

/// <summary>
/// Draws a section's boundary with the combined (von Mises) stress of every boundary sample as a coloured dot (viridis,
/// zero to the largest value), the worst point ringed and labelled, the section axes (x = Y, y = Z) and a colour bar.
/// </summary>
public static class CombinedStressPicture
{
    /// <summary>Draws the picture (PNG or SVG bytes).</summary>
    /// <param name="section">The section.</param>
    /// <param name="stresses">Combined stress at each boundary sample (<see cref="CombinedStress.AtBoundary"/>).</param>
    /// <param name="title">Heading.</param>
    /// <param name="format">PNG or SVG.</param>
    /// <param name="width">Width, px.</param>
    /// <param name="height">Height, px.</param>
    /// <param name="units">Units of the stress labels; null: <see cref="UnitSystem.SiMillimetre"/> (MPa).</param>
    public static byte[] Render(BendingSection section, IReadOnlyList<CombinedStressPoint> stresses, string title, ImageFormat format, int width = 760, int height = 600,
        UnitSystem? units = null)
    {
        var stress = (units ?? UnitSystem.SiMillimetre).Stress;
        ArgumentNullException.ThrowIfNull(section);
        ArgumentNullException.ThrowIfNull(stresses);
        if (stresses.Count == 0) throw new SectionTwistException("plot-empty", "no boundary stresses to draw");
        return CanvasTarget.Render(format, width, height, c => Draw(c, stresses, title, width, height, stress));
    }

    private static void Draw(SKCanvas c, IReadOnlyList<CombinedStressPoint> s, string title, int width, int height, DisplayUnit stress)
    {
        c.Clear(SKColors.White);
        Ink.Label(c, title, 20, 26, 15, Ink.Text);
        double ext = s.Max(p => Math.Max(Math.Abs(p.X), Math.Abs(p.Y)));
        float cx = (width - 120) / 2f, cy = height / 2f + 10, scale = (float)(Math.Min(width - 160, height - 110) / 2.0 / Math.Max(ext, 1e-12));
        SKPoint P(CombinedStressPoint p) => new(cx + (float)p.X * scale, cy - (float)p.Y * scale);
        using (var axis = Ink.Stroke(new SKColor(0xAA, 0xAA, 0xAA), 1f, [4, 3]))
        {
            c.DrawLine(cx - scale * (float)ext * 1.1f, cy, cx + scale * (float)ext * 1.1f, cy, axis);
            c.DrawLine(cx, cy + scale * (float)ext * 1.1f, cx, cy - scale * (float)ext * 1.1f, axis);
        }
        Ink.Label(c, "Y (section x)", cx + scale * (float)ext * 1.1f, cy + 16, 11, Ink.Text, SKTextAlign.Right);
        Ink.Label(c, "Z (section y)", cx + 6, cy - scale * (float)ext * 1.1f, 11, Ink.Text);
        double top = s.Max(p => p.VonMises);
        foreach (var p in s)
            using (var dot = Ink.Fill(Viridis.Sample(top > 0 ? p.VonMises / top : 0))) c.DrawCircle(P(p), 3.2f, dot);
        var worst = s.MaxBy(p => p.VonMises)!;
        using (var ring = Ink.Stroke(Ink.Alert, 2f)) c.DrawCircle(P(worst), 9, ring);
        var wp = P(worst);
        Ink.BoxedLabel(c, $"{stress.Text(worst.VonMises, 4)} ({worst.Dominant})", wp.X + 12, wp.Y - 10, 12, Ink.Text);
        // colour bar
        float bx = width - 70, by0 = 60, by1 = height - 60;
        for (int k = 0; k < 100; k++)
            using (var f = Ink.Fill(Viridis.Sample(k / 99.0))) c.DrawRect(bx, by1 - (by1 - by0) * (k + 1) / 100f, 18, (by1 - by0) / 100f + 0.5f, f);
        Ink.Label(c, "0", bx + 24, by1 + 4, 11, Ink.Text);
        Ink.Label(c, stress.Format(top, 4), bx + 24, by0 + 4, 11, Ink.Text);
        Ink.Label(c, $"σv, {stress.Symbol}", bx - 4, by0 - 14, 11, Ink.Text);
    }
}
