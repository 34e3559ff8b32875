using SkiaSharp;

namespace SectionTwist.Rendering.Drawing;

/// <summary>
/// A banded colour bar beside a filled-contour picture: one box per band from the bottom up, a frame, ticks at the band
/// boundaries (every second one when there are more than 12 bands), and a title and caption above, clear of the top tick.
/// </summary>
internal static class ColourBar
{
    /// <summary>Draws the bar into <paramref name="r"/>.</summary>
    /// <param name="c">The canvas.</param>
    /// <param name="r">The bar's box.</param>
    /// <param name="bands">Number of bands.</param>
    /// <param name="bandColour">Colour of band k (0 at the bottom).</param>
    /// <param name="labelled">Whether boundary k (0 to <paramref name="bands"/>) gets a label, given the thinning step (1 or 2).</param>
    /// <param name="label">The label of boundary k.</param>
    /// <param name="title">The title line (quantity and unit).</param>
    /// <param name="caption">The caption line under the title.</param>
    public static void Draw(SKCanvas c, SKRect r, int bands, Func<int, SKColor> bandColour, Func<int, int, bool> labelled,
        Func<int, string> label, string title, string caption)
    {
        Ink.Label(c, title, r.Left - 6, r.Top - 30, 13, Ink.Text);
        Ink.Label(c, caption, r.Left - 6, r.Top - 15, 11, Ink.Text);
        float h = r.Height / bands;
        for (int k = 0; k < bands; k++)
        {
            var band = new SKRect(r.Left, r.Bottom - (k + 1) * h, r.Right, r.Bottom - k * h);
            using var paint = new SKPaint { Color = bandColour(k), Style = SKPaintStyle.StrokeAndFill, StrokeWidth = 0.5f };
            c.DrawRect(band, paint);
        }
        using (var frame = Ink.Stroke(Ink.Text, 1f)) c.DrawRect(r, frame);
        int every = bands > 12 ? 2 : 1;
        using var tick = Ink.Stroke(Ink.Text, 1f);
        for (int k = 0; k <= bands; k++)
        {
            if (!labelled(k, every)) continue;
            float y = r.Bottom - k * h;
            c.DrawLine(r.Right, y, r.Right + 4, y, tick);
            Ink.Label(c, label(k), r.Right + 7, y + 4, 11, Ink.Text);
        }
    }
}
