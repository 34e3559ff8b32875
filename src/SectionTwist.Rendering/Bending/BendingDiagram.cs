using SectionTwist.Bending;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Shaft;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Rendering.Bending;

/// <summary>
/// Draws the bending side of a shaft on one axial scale: bending moment in plane Y, plane Z and their resultant; deflection
/// (both planes and magnitude); the combined von Mises stress of the worst boundary point with the yield strength dashed;
/// and the unnotched fatigue factor of safety with the line at 1. Bearings are marked on every panel.
/// </summary>
public static class BendingDiagram
{
    private static readonly SKColor PlaneY = new(0x3B, 0x52, 0x8B), PlaneZ = new(0x21, 0x91, 0x8C), Resultant = new(0x22, 0x22, 0x22);

    /// <summary>Default size, px.</summary>
    public const int DefaultWidth = 1000, DefaultHeight = 980;

    /// <summary>Draws the diagram and returns the PNG or SVG bytes.</summary>
    /// <param name="result">The bending result.</param>
    /// <param name="yieldStrength">Yield strength to draw on the stress panel, Pa, or null.</param>
    /// <param name="title">Heading.</param>
    /// <param name="unit">Length unit of the axis.</param>
    /// <param name="format">PNG or SVG.</param>
    /// <param name="width">Width, px.</param>
    /// <param name="height">Height, px.</param>
    /// <param name="units">Units of the axes (moment, deflection, stress, position); null: the standard system of <paramref name="unit"/>.</param>
    public static byte[] Render(BendingResult result, double? yieldStrength, string title, LengthUnit unit, ImageFormat format, int width = DefaultWidth, int height = DefaultHeight,
        UnitSystem? units = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        ArgumentNullException.ThrowIfNull(unit);
        var u = units ?? UnitSystem.For(unit);
        return CanvasTarget.Render(format, width, height, c => Draw(c, result, yieldStrength, title, u, width, height));
    }

    private static void Draw(SKCanvas c, BendingResult r, double? sy, string title, UnitSystem u, int width, int height)
    {
        var unit = u.Length;
        double M(double si) => u.Torque.FromSi(si);
        double D(double si) => u.Length.FromSi(si);
        double S(double si) => u.Stress.FromSi(si);
        c.Clear(SKColors.White);
        Ink.Label(c, title, 70, 24, 17, Ink.Text);
        var s = r.Samples;
        double x0 = s.Min(p => p.Position), x1 = s.Max(p => p.Position);
        float left = 90, right = width - 30, top = 50, gap = 46;
        float ph = (height - top - 60 - 3 * gap) / 4;
        float X(double x) => (float)(left + (x - x0) / Math.Max(x1 - x0, 1e-12) * (right - left));
        SKRect Rect(int i) => new(left, top + i * (ph + gap), right, top + i * (ph + gap) + ph);

        var mp = new ShaftPanel(Rect(0), M(s.Min(p => Math.Min(p.MomentY, p.MomentZ))), M(s.Max(p => Math.Max(p.Moment, Math.Max(p.MomentY, p.MomentZ)))));
        mp.DrawFrame(c, "bending moment: plane Y (blue), plane Z (green), resultant (black)", $"M, {u.Torque.Symbol}");
        Line(c, s, X, mp, p => M(p.MomentY), PlaneY); Line(c, s, X, mp, p => M(p.MomentZ), PlaneZ); Line(c, s, X, mp, p => M(p.Moment), Resultant);

        var dp = new ShaftPanel(Rect(1), D(s.Min(p => Math.Min(p.DeflectionY, p.DeflectionZ))), D(s.Max(p => Math.Max(p.Deflection, Math.Max(p.DeflectionY, p.DeflectionZ)))));
        dp.DrawFrame(c, "deflection: along Y (blue), along Z (green), magnitude (black)", $"δ, {u.Length.Symbol}");
        Line(c, s, X, dp, p => D(p.DeflectionY), PlaneY); Line(c, s, X, dp, p => D(p.DeflectionZ), PlaneZ); Line(c, s, X, dp, p => D(p.Deflection), Resultant);

        double vmMax = S(s.Max(p => p.Stress.VonMises));
        var sp = new ShaftPanel(Rect(2), 0, Math.Max(vmMax, S(sy ?? 0)) * 1.08);
        sp.DrawFrame(c, "combined stress (von Mises) at the worst boundary point" + (sy is null ? "" : "; yield dashed"), $"σv, {u.Stress.Symbol}");
        Line(c, s, X, sp, p => S(p.Stress.VonMises), Resultant);
        if (sy is { } y)
            using (var dash = Ink.Stroke(Ink.Alert, 1.4f, [6, 4])) c.DrawLine(left, sp.ToPixelY(S(y)), right, sp.ToPixelY(S(y)), dash);

        var fs = s.Where(p => p.FatigueSafetyFactor is { } f && double.IsFinite(f)).ToList();
        var fp = new ShaftPanel(Rect(3), 0, Math.Min(10, Math.Max(2, fs.Count == 0 ? 2 : fs.Max(p => p.FatigueSafetyFactor!.Value))));
        fp.DrawFrame(c, fs.Count == 0 ? "fatigue factor of safety: no fatigue check" : "fatigue factor of safety, unnotched (Kf = 1; notches in the tables); 1 dashed", "n");
        if (fs.Count > 0)
        {
            Line(c, fs, X, fp, p => Math.Min(p.FatigueSafetyFactor!.Value, 10), PlaneZ);
            using var dash = Ink.Stroke(Ink.Alert, 1.4f, [6, 4]);
            c.DrawLine(left, fp.ToPixelY(1), right, fp.ToPixelY(1), dash);
        }

        using (var guide = Ink.Stroke(new SKColor(0x99, 0x99, 0x99), 1f, [2, 3]))
            foreach (var b in r.Bearings)
            {
                float x = X(b.Position);
                c.DrawLine(x, top, x, Rect(3).Bottom, guide);
                var align = x > right - 60 ? SKTextAlign.Right : x < left + 60 ? SKTextAlign.Left : SKTextAlign.Center;
                Ink.Label(c, b.Label, x, Rect(3).Bottom + 32, 11, Ink.Text, align);
            }
        var (step, ticks) = NiceScale.Ticks(unit.FromSi(x0), unit.FromSi(x1), Math.Max(3, (int)((right - left) / 90)));
        foreach (double t in ticks)
        {
            float x = X(unit.ToSi(t));
            if (x < left - 0.5f || x > right + 0.5f) continue;
            Ink.Label(c, NiceScale.Format(t, step), x, Rect(3).Bottom + 16, 11, Ink.Text, SKTextAlign.Center);
        }
        Ink.Label(c, $"axial position, {unit.Symbol}", right, Rect(3).Bottom + 48, 12, Ink.Text, SKTextAlign.Right);
    }

    private static void Line(SKCanvas c, IReadOnlyList<BendingSample> s, Func<double, float> x, ShaftPanel panel, Func<BendingSample, double> value, SKColor colour)
    {
        using var path = new SKPath();
        for (int i = 0; i < s.Count; i++)
        {
            var pt = new SKPoint(x(s[i].Position), panel.ToPixelY(value(s[i])));
            if (i == 0) path.MoveTo(pt); else path.LineTo(pt);
        }
        using var pen = Ink.Stroke(colour, 1.8f);
        c.DrawPath(path, pen);
    }
}
