using SectionTwist.Rendering.Drawing;
using SkiaSharp;

namespace SectionTwist.Rendering.Shaft;

/// <summary>One plot panel of the shaft diagram: a value axis with nice ticks, a zero line and a title.</summary>
internal sealed class ShaftPanel
{
    private readonly SKRect _r;
    private readonly double _lo, _hi;

    public ShaftPanel(SKRect rect, double lo, double hi)
    {
        _r = rect;
        var (nlo, nhi, step) = NiceScale.Range(Math.Min(lo, 0), Math.Max(hi, 0), Math.Max(3, (int)(rect.Height / 34)));
        _lo = nlo; _hi = nhi; Step = step;
    }

    public double Step { get; }
    public SKRect Rect => _r;

    public float ToPixelY(double v) => (float)(_r.Bottom - (v - _lo) / (_hi - _lo) * _r.Height);

    public void DrawFrame(SKCanvas c, string title, string unit)
    {
        using (var bg = Ink.Fill(new SKColor(0xFA, 0xFA, 0xFA))) c.DrawRect(_r, bg);
        using var grid = Ink.Stroke(new SKColor(0xDD, 0xDD, 0xDD), 0.8f);
        using var tick = Ink.Stroke(Ink.Text, 1f);
        for (double t = _lo; t <= _hi + 1e-9 * Step; t += Step)
        {
            float y = ToPixelY(t);
            c.DrawLine(_r.Left, y, _r.Right, y, grid);
            c.DrawLine(_r.Left - 5, y, _r.Left, y, tick);
            Ink.Label(c, NiceScale.Format(t, Step), _r.Left - 8, y + 4, 11, Ink.Text, SKTextAlign.Right);
        }
        using (var zero = Ink.Stroke(new SKColor(0x55, 0x55, 0x55), 1.2f)) c.DrawLine(_r.Left, ToPixelY(0), _r.Right, ToPixelY(0), zero);
        using (var frame = Ink.Stroke(new SKColor(0x88, 0x88, 0x88), 1f)) c.DrawRect(_r, frame);
        Ink.Label(c, title, _r.Left + 6, _r.Top - 6, 13, Ink.Text);
        Ink.LabelVertical(c, unit, _r.Left - 70, _r.MidY, 11, Ink.Text);
    }
}
