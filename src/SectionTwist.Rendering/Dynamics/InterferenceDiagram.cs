using SectionTwist.Dynamics;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Rendering.Dynamics;

/// <summary>
/// The interference (Campbell) diagram: frequency against the speed of the range's shaft; the natural frequencies are
/// horizontal lines, each excitation order a ray from the origin, the operating range a shaded band with the two separation
/// bands beside it; crossings are marked by their status.
/// </summary>
public static class InterferenceDiagram
{
    private static readonly SKColor[] OrderColors = [new(0x1f, 0x77, 0xb4), new(0x2c, 0xa0, 0x2c), new(0x94, 0x67, 0xbd), new(0x8c, 0x56, 0x4b), new(0xe3, 0x77, 0xc2), new(0x17, 0xbe, 0xcf)];

    /// <summary>Draws the diagram as PNG or SVG.</summary>
    /// <param name="modes">The modal result.</param>
    /// <param name="check">The interference check.</param>
    /// <param name="format">PNG or SVG.</param>
    /// <param name="width">Width, px.</param>
    /// <param name="height">Height, px.</param>
    /// <param name="units">Units of the speed and frequency axes; null: <see cref="UnitSystem.SiMillimetre"/> (rpm, Hz).</param>
    public static byte[] Render(ModalResult modes, ResonanceResult check, ImageFormat format, int width = 900, int height = 560, UnitSystem? units = null)
    {
        ArgumentNullException.ThrowIfNull(modes);
        ArgumentNullException.ThrowIfNull(check);
        var u = units ?? UnitSystem.SiMillimetre;
        return CanvasTarget.Render(format, width, height, c => Draw(c, modes, check, width, height, u.Speed, u.Frequency));
    }

    private static void Draw(SKCanvas c, ModalResult modes, ResonanceResult check, int width, int height, DisplayUnit speed, DisplayUnit frequency)
    {
        var range = check.Spec.Range;
        double toRpm = 1 / speed.SiPerUnit; // rad/s to the speed unit shown (rpm by default)
        double perRev = speed.SiPerUnit / (2 * Math.PI); // revolutions per second in one speed unit (1/60 for rpm)
        double rangeRatio = ResonanceCheck.ShaftRatio(modes, range.Shaft, "range");
        double xMax = range.Maximum * (1 + check.Spec.OuterBand) * 1.15 * toRpm;
        var freqs = modes.ElasticModes.Select(m => m.Frequency).ToList();
        double excTop = check.Spec.Orders.Max(o => o.Order * ResonanceCheck.ShaftRatio(modes, o.Shaft, o.Name)) / rangeRatio * xMax * perRev;
        double yMax = Math.Max(freqs.DefaultIfEmpty(1).Max() * 1.1, Math.Min(excTop, freqs.DefaultIfEmpty(1).Max() * 1.6));
        var (xLo, xHi, xStep) = NiceScale.Range(0, xMax);
        var (yLo, yHi, yStep) = NiceScale.Range(0, yMax);
        float left = 80, right = width - 170, top = 30, bottom = height - 60;
        float X(double rpm) => left + (float)((rpm - xLo) / (xHi - xLo)) * (right - left);
        float Y(double hz) => bottom - (float)((hz - yLo) / (yHi - yLo)) * (bottom - top);

        // operating range and bands
        double lo = range.Minimum * toRpm, hi = range.Maximum * toRpm, ob = check.Spec.OuterBand, ib = check.Spec.InnerBand;
        using (var p = Ink.Fill(new SKColor(0xff, 0xf0, 0xc0))) c.DrawRect(SKRect.Create(X(lo * (1 - ob)), top, X(hi * (1 + ob)) - X(lo * (1 - ob)), bottom - top), p);
        using (var p = Ink.Fill(new SKColor(0xff, 0xd8, 0x90))) c.DrawRect(SKRect.Create(X(lo * (1 - ib)), top, X(hi * (1 + ib)) - X(lo * (1 - ib)), bottom - top), p);
        using (var p = Ink.Fill(new SKColor(0xff, 0xb0, 0xa0))) c.DrawRect(SKRect.Create(X(lo), top, Math.Max(1, X(hi) - X(lo)), bottom - top), p);

        using var axis = Ink.Stroke(Ink.Text, 1.2f);
        using var grid = Ink.Stroke(new SKColor(0xdd, 0xdd, 0xdd), 0.8f);
        for (double x = xLo; x <= xHi + 1e-9 * xStep; x += xStep)
        {
            c.DrawLine(X(x), top, X(x), bottom, grid);
            Ink.Label(c, NiceScale.Format(x, xStep), X(x), bottom + 18, 12, Ink.Text, SKTextAlign.Center);
        }
        for (double y = yLo; y <= yHi + 1e-9 * yStep; y += yStep)
        {
            c.DrawLine(left, Y(y), right, Y(y), grid);
            Ink.Label(c, NiceScale.Format(y, yStep), left - 6, Y(y) + 4, 12, Ink.Text, SKTextAlign.Right);
        }
        c.DrawRect(SKRect.Create(left, top, right - left, bottom - top), axis);
        Ink.Label(c, $"speed of '{range.Shaft}' [{speed.Symbol}]", (left + right) / 2, height - 18, 13, Ink.Text, SKTextAlign.Center);
        Ink.LabelVertical(c, $"frequency [{frequency.Symbol}]", 22, (top + bottom) / 2, 13, Ink.Text);

        c.Save();
        c.ClipRect(SKRect.Create(left, top, right - left, bottom - top));
        using (var modeLine = Ink.Stroke(Ink.Text, 1.6f, [8, 4]))
            foreach (var m in modes.ElasticModes) c.DrawLine(left, Y(m.Frequency), right, Y(m.Frequency), modeLine);
        for (int i = 0; i < check.Spec.Orders.Count; i++)
        {
            var o = check.Spec.Orders[i];
            double hzPerRpm = o.Order * ResonanceCheck.ShaftRatio(modes, o.Shaft, o.Name) / rangeRatio * perRev;
            using var ray = Ink.Stroke(OrderColors[i % OrderColors.Length], 2f);
            c.DrawLine(X(0), Y(0), X(xHi), Y(xHi * hzPerRpm), ray);
        }
        foreach (var x in check.Crossings)
        {
            var color = x.Status switch { CrossingStatus.Resonance or CrossingStatus.Avoid => Ink.Alert, CrossingStatus.Check => new SKColor(0xe0, 0x80, 0x00), _ => new SKColor(0x55, 0x55, 0x55) };
            using var dot = Ink.Fill(color);
            c.DrawCircle(X(x.CrossingSpeed * toRpm), Y(x.Frequency), x.Status == CrossingStatus.Clear ? 3.5f : 6f, dot);
        }
        c.Restore();

        float ly;
        foreach (var m in modes.ElasticModes)
        {
            if (Y(m.Frequency) < top || Y(m.Frequency) > bottom) continue;
            Ink.Label(c, $"mode {m.Number}: {frequency.Text(m.Frequency, 4)}", right + 6, Y(m.Frequency) + 4, 11, Ink.Text);
        }
        ly = top + 12;
        for (int i = 0; i < check.Spec.Orders.Count; i++, ly += 14)
        {
            using var p = Ink.Stroke(OrderColors[i % OrderColors.Length], 3f);
            c.DrawLine(right + 6, ly - 4, right + 22, ly - 4, p);
            Ink.Label(c, check.Spec.Orders[i].Name, right + 26, ly, 11, Ink.Text);
        }
    }
}
