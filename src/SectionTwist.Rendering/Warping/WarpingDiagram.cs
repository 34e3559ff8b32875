using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Report;
using SectionTwist.Rendering.Shaft;
using SectionTwist.Shaft;
using SectionTwist.Units;
using SectionTwist.WarpingTorsion;
using SkiaSharp;

namespace SectionTwist.Rendering.Warping;

/// <summary>
/// Member diagrams of non-uniform torsion on one axial scale: rotation; Saint-Venant and warping torque (their sum is the
/// internal torque); bimoment; warping normal stress E |omega|max |phi''|; and the shear (Saint-Venant, warping and their
/// sum). Stations with a warping restraint or spring are marked on every panel. Units from the shaft's unit system.
/// </summary>
internal static class WarpingDiagram
{
    private static readonly SKColor Blue = new(0x3B, 0x52, 0x8B), Green = new(0x21, 0x91, 0x8C), Black = new(0x22, 0x22, 0x22);

    /// <summary>Size, px.</summary>
    public const int Width = 1000, Height = 1100;

    /// <summary>The report figure of <paramref name="m"/>.</summary>
    public static IReadOnlyList<ReportFigure> Figures(ShaftDocument doc, WarpingMemberResult m)
    {
        if (m.Segments.Count == 0) return [];
        byte[] png = Render(m, doc.Units, ImageFormat.Png);
        return [new ReportFigure("Restrained warping along the member: rotation, Saint-Venant and warping torque, bimoment, warping normal stress and shear " +
            "(restrained and spring stations dashed)", ImageFormat.Png, png)];
    }

    /// <summary>Draws the diagram and returns the PNG or SVG bytes.</summary>
    public static byte[] Render(WarpingMemberResult m, UnitSystem units, ImageFormat format, int width = Width, int height = Height)
        => CanvasTarget.Render(format, width, height, c => Draw(c, m, units, width, height));

    private static void Draw(SKCanvas c, WarpingMemberResult m, UnitSystem u, int width, int height)
    {
        c.Clear(SKColors.White);
        Ink.Label(c, "non-uniform torsion (restrained warping)", 70, 24, 17, Ink.Text);
        var pts = m.Segments.SelectMany(s => s.Points).OrderBy(p => p.Position).ToArray();
        double x0 = pts[0].Position, x1 = pts[^1].Position;
        float left = 90, right = width - 30, top = 50, gap = 46;
        const int panels = 5;
        float ph = (height - top - 60 - (panels - 1) * gap) / panels;
        float X(double x) => (float)(left + (x - x0) / Math.Max(x1 - x0, 1e-12) * (right - left));
        SKRect Rect(int i) => new(left, top + i * (ph + gap), right, top + i * (ph + gap) + ph);
        bool unbounded = m.Segments.Any(s => s.ShearUnbounded);

        Panel(c, m, Rect(0), X, u.Angle, "rotation", [(p => p.Rotation, Black)]);
        Panel(c, m, Rect(1), X, u.Torque, "Saint-Venant torque G J φ' (blue), warping torque −E Iw φ''' (green), internal torque (black)",
            [(p => p.SaintVenantTorque, Blue), (p => p.WarpingTorque, Green), (p => p.SaintVenantTorque + p.WarpingTorque, Black)]);
        Panel(c, m, Rect(2), X, u.Bimoment, "bimoment B = −E Iw φ''", [(p => p.Bimoment, Black)]);
        Panel(c, m, Rect(3), X, u.Stress, "warping normal stress E |ω|max |φ''|", [(p => p.WarpingNormalStress, Black)]);
        Panel(c, m, Rect(4), X, u.Stress, unbounded
                ? "shear on the analysis mesh (a sharp corner makes the peaks unbounded): Saint-Venant (blue), warping (green), combined (black)"
                : "shear: Saint-Venant (blue), warping (green), combined bound (black)",
            [(p => p.SaintVenantShear, Blue), (p => p.WarpingShear, Green), (p => p.CombinedShear, Black)]);

        using (var guide = Ink.Stroke(new SKColor(0x99, 0x99, 0x99), 1f, [2, 3]))
            foreach (var s in m.Stations.Where(s => Math.Abs(s.ReactionBimoment) > 0 || Math.Abs(s.RateOfTwist) == 0))
            {
                float x = X(s.Position);
                c.DrawLine(x, top, x, Rect(panels - 1).Bottom, guide);
                var align = x > right - 60 ? SKTextAlign.Right : x < left + 60 ? SKTextAlign.Left : SKTextAlign.Center;
                Ink.Label(c, s.Name, x, Rect(panels - 1).Bottom + 32, 11, Ink.Text, align);
            }
        var len = u.Length;
        var (step, ticks) = NiceScale.Ticks(len.FromSi(x0), len.FromSi(x1), Math.Max(3, (int)((right - left) / 90)));
        foreach (double t in ticks)
        {
            float x = X(t * len.SiPerUnit);
            if (x < left - 0.5f || x > right + 0.5f) continue;
            Ink.Label(c, NiceScale.Format(t, step), x, Rect(panels - 1).Bottom + 16, 11, Ink.Text, SKTextAlign.Center);
        }
        Ink.Label(c, $"axial position, {len.Symbol}", right, Rect(panels - 1).Bottom + 48, 12, Ink.Text, SKTextAlign.Right);
    }

    private static void Panel(SKCanvas c, WarpingMemberResult m, SKRect rect, Func<double, float> x, DisplayUnit unit, string title,
        (Func<WarpingPoint, double> Value, SKColor Colour)[] lines)
    {
        double lo = 0, hi = 0;
        foreach (var s in m.Segments)
            foreach (var p in s.Points)
                foreach (var (v, _) in lines) { double d = unit.FromSi(v(p)); lo = Math.Min(lo, d); hi = Math.Max(hi, d); }
        if (hi - lo <= 0) hi = lo + 1;
        var panel = new ShaftPanel(rect, lo, hi);
        panel.DrawFrame(c, title, unit.Symbol);
        foreach (var (v, colour) in lines)
            foreach (var s in m.Segments)
            {
                using var path = new SKPath();
                for (int i = 0; i < s.Points.Count; i++)
                {
                    var pt = new SKPoint(x(s.Points[i].Position), panel.ToPixelY(unit.FromSi(v(s.Points[i]))));
                    if (i == 0) path.MoveTo(pt); else path.LineTo(pt);
                }
                using var pen = Ink.Stroke(colour, 1.8f);
                c.DrawPath(path, pen);
            }
    }
}
