using SkiaSharp;

namespace SectionTwist.Rendering.Drawing;

/// <summary>Paint and text helpers shared by the pictures (bundled font, antialiased).</summary>
internal static class Ink
{
    /// <summary>Dark grey for text and axes.</summary>
    public static readonly SKColor Text = new(0x22, 0x22, 0x22);
    /// <summary>Marker colour of peaks and exceedances (not part of viridis).</summary>
    public static readonly SKColor Alert = new(0xE0, 0x10, 0x30);

    public static SKPaint Fill(SKColor c) => new() { Color = c, Style = SKPaintStyle.Fill, IsAntialias = true };

    public static SKPaint Stroke(SKColor c, float width, float[]? dash = null)
    {
        var p = new SKPaint { Color = c, Style = SKPaintStyle.Stroke, StrokeWidth = width, IsAntialias = true };
        if (dash is not null) p.PathEffect = SKPathEffect.CreateDash(dash, 0);
        return p;
    }

    public static float Width(string s, float size)
    {
        using var f = Fonts.Font(size);
        return f.MeasureText(s);
    }

    /// <summary>Draws text with its baseline at y (rounded to a whole pixel, so hinted strokes land on the pixel grid).</summary>
    public static void Label(SKCanvas c, string s, float x, float y, float size, SKColor color, SKTextAlign align = SKTextAlign.Left)
    {
        using var f = Fonts.Font(size);
        using var p = new SKPaint { Color = color, IsAntialias = true };
        c.DrawText(s, x, MathF.Round(y), align, f, p);
    }

    /// <summary>Draws text rotated 90 degrees counter-clockwise, centred on (x, y).</summary>
    public static void LabelVertical(SKCanvas c, string s, float x, float y, float size, SKColor color)
    {
        c.Save();
        c.Translate(x, y);
        c.RotateDegrees(-90);
        Label(c, s, 0, size * 0.35f, size, color, SKTextAlign.Center);
        c.Restore();
    }

    /// <summary>Text on a white rounded box (for labels over coloured fills).</summary>
    public static SKRect BoxedLabel(SKCanvas c, string s, float x, float y, float size, SKColor color, SKTextAlign align = SKTextAlign.Left)
    {
        float w = Width(s, size);
        float left = align switch { SKTextAlign.Center => x - w / 2, SKTextAlign.Right => x - w, _ => x };
        var r = new SKRect(left - 4, y - size, left + w + 4, y + size * 0.35f);
        using (var bg = Fill(new SKColor(255, 255, 255, 225))) c.DrawRoundRect(r, 3, 3, bg);
        using (var border = Stroke(new SKColor(0x55, 0x55, 0x55), 0.8f)) c.DrawRoundRect(r, 3, 3, border);
        Label(c, s, x, y, size, color, align);
        return r;
    }
}
