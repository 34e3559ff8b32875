using System.Globalization;
using SectionTwist.Composite;
using SectionTwist.Geometry;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Torsion;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Rendering.Section;

/// <summary>
/// Draws a composite section: each material in its own colour, shaded in bands of the shear-stress magnitude from light
/// (low) to dark (high) on one scale for all materials; the bonded interfaces dashed, the outline solid, the peak shear
/// of each material marked with its value, and a legend with the material names, shear moduli and peaks. The caution
/// about perfect bonding is printed under the picture.
/// </summary>
public static class CompositePicture
{
    private const int Bands = 8;

    // one hue per material (blue, orange, green, purple, red, brown, then again)
    private static readonly SKColor[] Hues =
    [
        new(0x1F, 0x5F, 0xA8), new(0xD9, 0x6B, 0x0B), new(0x2E, 0x8B, 0x3E), new(0x7B, 0x3F, 0xA0), new(0xB8, 0x2A, 0x2A), new(0x8A, 0x5A, 0x2B),
    ];

    /// <summary>Draws the picture and returns the PNG or SVG file bytes.</summary>
    /// <param name="result">An analysed composite section.</param>
    /// <param name="format">PNG or SVG.</param>
    /// <param name="title">The title above the picture.</param>
    /// <param name="options">Size, torque (stresses at that torque instead of per unit torque) and display units; bands and lines are not used.</param>
    public static byte[] Render(CompositeResult result, ImageFormat format, string title, SectionPlotOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        options ??= new SectionPlotOptions();
        if (result.Solution is null)
            throw new SectionTwistException("plot-data", $"{result.Section.Name}: the composite result carries no field to draw; analyse it with CompositeAnalyzer.Analyze");
        int width = options.Width, height = options.Height;
        return CanvasTarget.Render(format, width, height, c => Draw(c, result, result.Solution, title, options, width, height));
    }

    /// <summary>Writes the picture to <paramref name="path"/>; the format follows the extension (.png or .svg).</summary>
    public static void Save(CompositeResult result, string path, string title, SectionPlotOptions? options = null)
    {
        var bytes = Render(result, ImageFormats.FromPath(path), title, options);
        AtomicFile.Write(path, s => s.Write(bytes));
    }

    /// <summary>Colour of band <paramref name="k"/> (0 = lowest shear) of material <paramref name="m"/>: from a light tint to a dark shade of its hue.</summary>
    internal static SKColor BandColour(int m, int k)
    {
        var h = Hues[m % Hues.Length];
        double s = (k + 0.5) / Bands;
        // light tint (85 % white) at zero shear to a shade (35 % black) at the top
        double w = 0.85 * (1 - s), d = 0.35 * s;
        byte Mix(byte v) => (byte)Math.Round(((1 - w) * v + w * 255) * (1 - d));
        return new SKColor(Mix(h.Red), Mix(h.Green), Mix(h.Blue));
    }

    private static void Draw(SKCanvas c, CompositeResult r, CompositeSolution sol, string title, SectionPlotOptions o, int width, int height)
    {
        var section = r.Section;
        var unit = section.Envelope.Unit;
        var (factor, stressUnit, caption) = SectionPicture.StressScale(o, unit);
        factor = Math.Abs(factor);
        var mesh = sol.Mesh;
        var shear = ElementShear(sol); // per unit torque, 1/m^3
        double top = Math.Max(shear.DefaultIfEmpty(0).Max(), r.Materials.Max(m => m.MaxShearPerTorque));
        if (!(top > 0)) top = 1;
        var L = Layout(section.Envelope.Bounds, width, height);
        c.Clear(SKColors.White);
        Ink.Label(c, title, L.Plot.Left, 28, 17, Ink.Text);
        var axisUnit = o.Units is { } u && Math.Abs(u.Length.SiPerUnit - unit.Metres) > 1e-15 * unit.Metres
            ? new LengthUnit(u.Length.Symbol, u.Length.Symbol, u.Length.SiPerUnit) : unit;
        SectionAxes.Draw(c, L, axisUnit);
        c.Save();
        c.ClipRect(L.Plot);
        int materials = section.Materials.Count;
        var paths = new SKPath[materials * Bands];
        for (int i = 0; i < paths.Length; i++) paths[i] = new SKPath();
        // each quadratic element as four linear triangles through its mid-side nodes (curved edges followed)
        ReadOnlySpan<int> sub = [0, 3, 5, 3, 1, 4, 5, 4, 2, 3, 4, 5];
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            int m = sol.ZoneMaterial[mesh.ElementZone[e]];
            int k = Math.Clamp((int)(shear[e] / top * Bands), 0, Bands - 1);
            var path = paths[m * Bands + k];
            for (int t = 0; t < 12; t += 3)
            {
                path.MoveTo(L.ToPixel(mesh.Node(mesh.Elements[6 * e + sub[t]])));
                path.LineTo(L.ToPixel(mesh.Node(mesh.Elements[6 * e + sub[t + 1]])));
                path.LineTo(L.ToPixel(mesh.Node(mesh.Elements[6 * e + sub[t + 2]])));
                path.Close();
            }
        }
        for (int i = 0; i < paths.Length; i++)
        {
            using var paint = new SKPaint { Color = BandColour(i / Bands, i % Bands), Style = SKPaintStyle.StrokeAndFill, StrokeWidth = 0.5f, IsAntialias = true };
            c.DrawPath(paths[i], paint);
            paths[i].Dispose();
        }
        double sag = 2e-4 * section.Envelope.Bounds.Diagonal;
        using (var iface = new SKPath())
        {
            foreach (var i in section.Interfaces) AddCurve(iface, i.Curve.Flatten(sag), L);
            using var halo = Ink.Stroke(SKColors.White, 3.2f);
            using var ink = Ink.Stroke(new SKColor(0x11, 0x11, 0x11), 1.6f, [7f, 4f]);
            c.DrawPath(iface, halo);
            c.DrawPath(iface, ink);
        }
        using (var outline = new SKPath())
        {
            foreach (var reg in section.Envelope.Regions) foreach (var loop in reg.Loops) foreach (var s in loop.Segments) AddCurve(outline, s.Flatten(sag), L);
            using var ink = Ink.Stroke(SKColors.Black, 1.4f);
            c.DrawPath(outline, ink);
        }
        c.Restore();
        // per unit torque the unit reads "MPa per kN·m"
        string peakUnit = o.Torque is null ? $"{stressUnit} {caption.Replace(" of torque", "", StringComparison.Ordinal)}" : stressUnit;
        for (int m = 0; m < materials; m++) DrawPeak(c, L, r.Materials[m], m, factor, peakUnit);
        SectionAxes.DrawScaleBar(c, L, axisUnit, section.Envelope.Regions.SelectMany(g => g.Loops).Select(l => l.Flatten(sag)).ToList());
        DrawLegend(c, L, r, top * factor, factor, stressUnit, caption);
        Ink.Label(c, "Perfect bonding assumed (an idealisation): interface slip and residual stresses are not modelled.", L.Plot.Left, height - 12, 11, Ink.Text);
    }

    /// <summary>The magnitude of grad psi / J at each element's centroid: the shear stress per unit torque.</summary>
    private static double[] ElementShear(CompositeSolution sol)
    {
        var mesh = sol.Mesh;
        var result = new double[mesh.ElementCount];
        Span<double> dr = stackalloc double[6], ds = stackalloc double[6];
        P2Triangle.ShapeDerivatives(1.0 / 3, 1.0 / 3, dr, ds);
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            double xr = 0, xs = 0, yr = 0, ys = 0, pr = 0, ps = 0;
            for (int a = 0; a < 6; a++)
            {
                int n = mesh.Elements[6 * e + a];
                xr += dr[a] * mesh.X[n]; xs += ds[a] * mesh.X[n]; yr += dr[a] * mesh.Y[n]; ys += ds[a] * mesh.Y[n];
                pr += dr[a] * sol.Psi[n]; ps += ds[a] * sol.Psi[n];
            }
            double d = xr * ys - xs * yr;
            double gx = (ys * pr - yr * ps) / d, gy = (-xs * pr + xr * ps) / d;
            result[e] = Math.Sqrt(gx * gx + gy * gy) / sol.J;
        }
        return result;
    }

    internal static SectionLayout Layout(Box2 b, int width, int height)
    {
        const float top = 46, bottom = 64, left = 70, right = 330;
        var plot = new SKRect(left, top, Math.Max(left + 10, width - right), Math.Max(top + 10, height - bottom));
        double w = Math.Max(b.Width, 1e-12), h = Math.Max(b.Height, 1e-12);
        double pad = 0.07 * Math.Max(w, h);
        double scale = Math.Min(plot.Width / (w + 2 * pad), plot.Height / (h + 2 * pad));
        double cx = 0.5 * (b.MinX + b.MaxX), cy = 0.5 * (b.MinY + b.MaxY);
        return new SectionLayout(width, height, plot, new SKRect(plot.Right + 30, plot.Top, width - 10, plot.Bottom), scale, plot.MidX - cx * scale, plot.MidY + cy * scale);
    }

    private static void AddCurve(SKPath path, IReadOnlyList<Point2> pts, SectionLayout L)
    {
        path.MoveTo(L.ToPixel(pts[0]));
        for (int i = 1; i < pts.Count; i++) path.LineTo(L.ToPixel(pts[i]));
    }

    private static void DrawPeak(SKCanvas c, SectionLayout L, CompositeMaterialResult m, int index, double factor, string unit)
    {
        if (!(m.MaxShearPerTorque > 0)) return;
        var p = L.ToPixel(m.MaxShearLocation);
        var dark = BandColour(index, Bands - 1);
        using (var halo = Ink.Stroke(SKColors.White, 4f)) c.DrawCircle(p, 7f, halo);
        using (var fill = Ink.Fill(dark)) c.DrawCircle(p, 7f, fill);
        using (var ink = Ink.Stroke(Ink.Alert, 2f)) c.DrawCircle(p, 7f, ink);
        string text = $"peak in {Short(m.Material.Name, 28)}: {Format(m.MaxShearPerTorque * factor)} {unit}";
        float tw = Ink.Width(text, 12);
        // the label beside the marker on the side with room, kept inside the plot, stacked by material so that two
        // peaks at one point stay readable
        float lx = p.X + 12 + tw < L.Plot.Right - 4 ? p.X + 12 : p.X - 12 - tw;
        lx = Math.Clamp(lx, L.Plot.Left + 6, Math.Max(L.Plot.Left + 6, L.Plot.Right - tw - 6));
        float ly = Math.Clamp(p.Y - 10 + 18 * index, L.Plot.Top + 14, L.Plot.Bottom - 4);
        if (lx < p.X + 12 && lx + tw > p.X - 12) ly = p.Y + 30 + 18 * index < L.Plot.Bottom - 4 ? p.Y + 30 + 18 * index : p.Y - 14 - 18 * index;
        Ink.BoxedLabel(c, text, lx, ly, 12, Ink.Text);
    }

    private static void DrawLegend(SKCanvas c, SectionLayout L, CompositeResult r, double topDisplay, double factor, string unit, string caption)
    {
        float x = L.ColourBar.Left, y = L.Plot.Top + 8;
        Ink.Label(c, "Materials", x, y, 14, Ink.Text);
        Ink.Label(c, $"shade: shear stress |τ| from 0 (light)", x, y + 16, 10, Ink.Text);
        Ink.Label(c, $"to {Format(topDisplay)} {unit} (dark), {caption}", x, y + 29, 10, Ink.Text);
        y += 50;
        for (int m = 0; m < r.Materials.Count; m++)
        {
            var mr = r.Materials[m];
            for (int k = 0; k < Bands; k++)
            {
                var box = new SKRect(x + 14 * k, y, x + 14 * k + 14, y + 14);
                using var fill = Ink.Fill(BandColour(m, k));
                c.DrawRect(box, fill);
            }
            using (var frame = Ink.Stroke(Ink.Text, 0.8f)) c.DrawRect(new SKRect(x, y, x + 14 * Bands, y + 14), frame);
            Ink.Label(c, Short(mr.Material.Name, 22), x + 14 * Bands + 8, y + 12, 13, Ink.Text);
            string g = (mr.Material.ShearModulus / 1e9).ToString("0.#", CultureInfo.InvariantCulture);
            Ink.Label(c, Short($"G = {g} GPa; parts {string.Join(", ", mr.Parts)}", 44), x, y + 30, 11, Ink.Text);
            Ink.Label(c, $"peak {Format(mr.MaxShearPerTorque * factor)} {unit}, torque share {(mr.TorqueShare * 100).ToString("0.#", CultureInfo.InvariantCulture)} %", x, y + 45, 11, Ink.Text);
            y += 66;
        }
        using (var halo = Ink.Stroke(SKColors.White, 3.2f)) c.DrawLine(x, y, x + 40, y, halo);
        using (var ink = Ink.Stroke(new SKColor(0x11, 0x11, 0x11), 1.6f, [7f, 4f])) c.DrawLine(x, y, x + 40, y, ink);
        Ink.Label(c, "bonded interface", x + 48, y + 4, 11, Ink.Text);
        y += 20;
        using (var fill = Ink.Fill(BandColour(0, Bands - 1))) c.DrawCircle(x + 20, y, 6f, fill);
        using (var ink = Ink.Stroke(Ink.Alert, 2f)) c.DrawCircle(x + 20, y, 6f, ink);
        Ink.Label(c, "peak shear of a material", x + 48, y + 4, 11, Ink.Text);
    }

    private static string Short(string s, int n) => s.Length <= n ? s : s[..(n - 1)] + "…";

    private static string Format(double v) => v.ToString(Math.Abs(v) >= 100 ? "0" : Math.Abs(v) >= 10 ? "0.0" : "0.00", CultureInfo.InvariantCulture);
}
