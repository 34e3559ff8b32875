using SectionTwist.Torsion;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Rendering.Section;

/// <summary>
/// Draws a cross-section: filled bands of the shear-stress magnitude (viridis colours, linear interpolation of the nodal
/// values on the linear sub-triangles), contour lines of the Prandtl stress function, the outline, optionally the mesh,
/// the peak marker with its value, axes in the profile's length unit, a scale bar and a labelled colour bar.
/// </summary>
public static class SectionPicture
{
    /// <summary>Draws the picture and returns the PNG or SVG file bytes.</summary>
    public static byte[] Render(SectionPlotData data, ImageFormat format, SectionPlotOptions? options = null)
    {
        ArgumentNullException.ThrowIfNull(data);
        options ??= new SectionPlotOptions();
        Validate(options);
        var layout = SectionLayout.Create(data, options.Width, options.Height);
        return CanvasTarget.Render(format, options.Width, options.Height, c => Draw(c, data, options, layout, format == ImageFormat.Svg));
    }

    /// <summary>Writes the picture to <paramref name="path"/>; the format follows the extension (.png or .svg).</summary>
    public static void Save(SectionPlotData data, string path, SectionPlotOptions? options = null)
    {
        var bytes = Render(data, ImageFormats.FromPath(path), options);
        AtomicFile.Write(path, s => s.Write(bytes));
    }

    /// <summary>The layout the picture uses (for tests and for placing annotations).</summary>
    internal static SectionLayout Layout(SectionPlotData data, SectionPlotOptions options) =>
        SectionLayout.Create(data, options.Width, options.Height);

    /// <summary>
    /// The stress scale: display value = per-unit-torque value (1/m^3) times Factor; the unit of the colour bar and the
    /// caption under it, in the display units (<see cref="SectionPlotOptions.Units"/>, else the section's own system).
    /// </summary>
    internal static (double Factor, string Unit, string Caption) StressScale(SectionPlotOptions options, LengthUnit sectionUnit)
    {
        var u = options.Units ?? UnitSystem.For(sectionUnit);
        if (options.Torque is { } t) return (t / u.Stress.SiPerUnit, u.Stress.Symbol, $"at T = {u.Torque.Text(t, 4)}");
        // "MPa per kN·m": the stress unit on the bar, "per kN·m" under it
        string symbol = u.ShearPerTorque.Symbol;
        int per = symbol.IndexOf(" per ", StringComparison.Ordinal);
        return (1 / u.ShearPerTorque.SiPerUnit, per > 0 ? symbol[..per] : symbol, per > 0 ? $"{symbol[(per + 1)..]} of torque" : "per unit torque");
    }

    /// <summary>The length unit of the axes: that of <see cref="SectionPlotOptions.Units"/>, else the section's.</summary>
    internal static LengthUnit AxisUnit(SectionPlotData data, SectionPlotOptions options) =>
        options.Units is { } u && Math.Abs(u.Length.SiPerUnit - data.Unit.Metres) > 1e-15 * data.Unit.Metres
            ? new LengthUnit(u.Length.Symbol, u.Length.Symbol, u.Length.SiPerUnit) : data.Unit;

    private static void Validate(SectionPlotOptions o)
    {
        if (o.Bands is < 2 or > 24)
            throw new SectionTwistException("plot-bands", $"colour bands = {o.Bands}; use 2 to 24");
        if (o.PhiLines is < 0 or > 50)
            throw new SectionTwistException("plot-lines", $"stress-function lines = {o.PhiLines}; use 0 to 50");
        if (o.Torque is { } t && !(double.IsFinite(t) && t != 0))
            throw new SectionTwistException("plot-torque", "the plot torque must be a finite, non-zero number of N·m");
    }

    /// <summary>The value range of the colour bands in display units: 0 to the larger of the peak and the nodal maximum.</summary>
    internal static double TopValue(SectionPlotData data, SectionPlotOptions options)
    {
        var f = data.Field;
        double max = Math.Abs(data.PeakShearPerTorque);
        for (int i = 0; i < f.X.Count; i++) max = Math.Max(max, f.ShearMagnitude(i));
        double top = max * Math.Abs(StressScale(options, data.Unit).Factor);
        return top > 0 ? top : 1;
    }

    /// <summary>
    /// The colour bands: a round band width (1, 2 or 5 times a power of ten) near TopValue / Bands, and as many bands as
    /// reach the top value, so every tick of the colour bar falls on a round number.
    /// </summary>
    internal static (int Bands, double Width) BandScale(double top, int requested)
    {
        double width = NiceScale.NiceNumber(top / requested, true);
        int bands = Math.Max(1, (int)Math.Ceiling(top / width - 1e-9));
        while (bands > 24) { width = NiceScale.NiceNumber(width * 1.5, false); bands = Math.Max(1, (int)Math.Ceiling(top / width - 1e-9)); }
        return (bands, width);
    }

    /// <summary>Colour of band <paramref name="k"/> of <paramref name="bands"/> (band 0 at zero stress).</summary>
    internal static SKColor BandColour(int k, int bands) => Viridis.Sample((k + 0.5) / bands);

    private static void Draw(SKCanvas c, SectionPlotData data, SectionPlotOptions o, SectionLayout L, bool vector)
    {
        var (factor, unit, caption) = StressScale(o, data.Unit);
        var (bands, width) = BandScale(TopValue(data, o), o.Bands);
        var axisUnit = AxisUnit(data, o);
        Ink.Label(c, data.Title, L.Plot.Left, 28, 17, Ink.Text);

        SectionAxes.Draw(c, L, axisUnit);
        c.Save();
        c.ClipRect(L.Plot);
        FillBands(c, data, L, bands, bands * width, Math.Abs(factor), vector);
        if (o.ShowMesh) DrawMesh(c, data, L);
        if (o.PhiLines > 0) DrawPhiLines(c, data, L, o.PhiLines);
        DrawOutline(c, data, L);
        DrawCentres(c, data, L);
        c.Restore();
        SectionAxes.DrawScaleBar(c, L, axisUnit, data.Field.Boundaries);
        DrawPeak(c, data, L, Math.Abs(data.PeakShearPerTorque * factor), unit, o.Torque is null ? " " + caption.Replace(" of torque", "", StringComparison.Ordinal) : "");
        DrawColourBar(c, L, bands, width, unit, caption);
    }

    private static void FillBands(SKCanvas c, SectionPlotData data, SectionLayout L, int bands, double top, double factor, bool vector)
    {
        var f = data.Field;
        var tri = f.Triangles;
        var paths = new SKPath[bands];
        for (int k = 0; k < bands; k++) paths[k] = new SKPath { FillType = SKPathFillType.Winding };
        Span<double> x = stackalloc double[3], y = stackalloc double[3], v = stackalloc double[3];
        Span<double> px = stackalloc double[6], py = stackalloc double[6];
        double width = top / bands;
        for (int t = 0; t + 2 < tri.Count; t += 3)
        {
            var (vmin, vmax) = L.Corners(f, t, n => f.ShearMagnitude(n) * factor, x, y, v);
            int k0 = Math.Clamp((int)Math.Floor(vmin / width), 0, bands - 1);
            int k1 = Math.Clamp((int)Math.Floor(vmax / width), 0, bands - 1);
            for (int k = k0; k <= k1; k++)
            {
                double lo = k == 0 ? double.NegativeInfinity : k * width;
                double hi = k == bands - 1 ? double.PositiveInfinity : (k + 1) * width;
                int m = k0 == k1 ? CopyTriangle(x, y, px, py) : ContourGeometry.ClipBand(x, y, v, lo, hi, px, py);
                if (m < 3) continue;
                paths[k].MoveTo((float)px[0], (float)py[0]);
                for (int i = 1; i < m; i++) paths[k].LineTo((float)px[i], (float)py[i]);
                paths[k].Close();
            }
        }
        for (int k = 0; k < bands; k++)
        {
            // fill plus a thin line of the same colour, which hides the antialiasing seams between neighbouring bands. On a
            // raster a hairline does it at a fraction of the cost of stroking every small triangle (3 s -> 0.5 s for
            // 40 000 elements); an SVG viewer needs a line of real width (a zero width draws nothing there).
            if (paths[k].IsEmpty) { paths[k].Dispose(); continue; }
            var colour = BandColour(k, bands);
            if (vector)
            {
                using var both = new SKPaint { Color = colour, Style = SKPaintStyle.StrokeAndFill, StrokeWidth = 0.7f, IsAntialias = true, StrokeJoin = SKStrokeJoin.Round };
                c.DrawPath(paths[k], both);
            }
            else
            {
                using var hair = new SKPaint { Color = colour, Style = SKPaintStyle.Stroke, StrokeWidth = 0, IsAntialias = true };
                using var fill = new SKPaint { Color = colour, Style = SKPaintStyle.Fill, IsAntialias = true };
                c.DrawPath(paths[k], hair);
                c.DrawPath(paths[k], fill);
            }
            paths[k].Dispose();
        }
    }

    private static int CopyTriangle(ReadOnlySpan<double> x, ReadOnlySpan<double> y, Span<double> px, Span<double> py)
    {
        for (int i = 0; i < 3; i++) { px[i] = x[i]; py[i] = y[i]; }
        return 3;
    }

    private static void DrawMesh(SKCanvas c, SectionPlotData data, SectionLayout L)
    {
        var f = data.Field;
        var ec = f.ElementCorners;
        using var path = new SKPath();
        for (int e = 0; e + 2 < ec.Count; e += 3)
        {
            var a = L.ToPixel(f.X[ec[e]], f.Y[ec[e]]);
            path.MoveTo(a);
            path.LineTo(L.ToPixel(f.X[ec[e + 1]], f.Y[ec[e + 1]]));
            path.LineTo(L.ToPixel(f.X[ec[e + 2]], f.Y[ec[e + 2]]));
            path.Close();
        }
        using var paint = Ink.Stroke(new SKColor(255, 255, 255, 110), 0.5f);
        c.DrawPath(path, paint);
    }

    private static void DrawPhiLines(SKCanvas c, SectionPlotData data, SectionLayout L, int lines)
    {
        var f = data.Field;
        double pmin = double.PositiveInfinity, pmax = double.NegativeInfinity;
        for (int i = 0; i < f.Phi.Count; i++) { pmin = Math.Min(pmin, f.Phi[i]); pmax = Math.Max(pmax, f.Phi[i]); }
        if (!(pmax > pmin)) return;
        using var path = new SKPath();
        Span<double> x = stackalloc double[3], y = stackalloc double[3], v = stackalloc double[3];
        var tri = f.Triangles;
        for (int t = 0; t + 2 < tri.Count; t += 3)
        {
            var (vmin, vmax) = L.Corners(f, t, n => f.Phi[n], x, y, v);
            for (int l = 1; l <= lines; l++)
            {
                double level = pmin + (pmax - pmin) * l / (lines + 1);
                if (level < vmin || level > vmax) continue;
                if (!ContourGeometry.IsoSegment(x, y, v, level, out double x0, out double y0, out double x1, out double y1)) continue;
                path.MoveTo((float)x0, (float)y0);
                path.LineTo((float)x1, (float)y1);
            }
        }
        using var paint = Ink.Stroke(new SKColor(0, 0, 0, 120), 0.9f);
        c.DrawPath(path, paint);
    }

    private static void DrawOutline(SKCanvas c, SectionPlotData data, SectionLayout L) => DrawOutline(c, data.Field, L);

    /// <summary>The field's boundary loops as a black line (also the warping picture's outline).</summary>
    internal static void DrawOutline(SKCanvas c, SectionField f, SectionLayout L)
    {
        using var path = new SKPath();
        foreach (var loop in f.Boundaries)
        {
            if (loop.Count < 2) continue;
            path.MoveTo(L.ToPixel(loop[0]));
            for (int i = 1; i < loop.Count; i++) path.LineTo(L.ToPixel(loop[i]));
            path.Close();
        }
        using var paint = Ink.Stroke(SKColors.Black, 1.4f);
        paint.StrokeJoin = SKStrokeJoin.Round;
        c.DrawPath(path, paint);
    }

    /// <summary>Centroid as a ringed cross, shear centre as a filled square, each with a short label.</summary>
    internal static void DrawCentres(SKCanvas c, SectionPlotData data, SectionLayout L)
    {
        if (data.Centroid is { } g)
        {
            var p = L.ToPixel(g);
            using (var halo = Ink.Stroke(SKColors.White, 4f)) { c.DrawCircle(p, 6f, halo); c.DrawLine(p.X - 9, p.Y, p.X + 9, p.Y, halo); c.DrawLine(p.X, p.Y - 9, p.X, p.Y + 9, halo); }
            using (var ink = Ink.Stroke(SKColors.Black, 1.5f)) { c.DrawCircle(p, 6f, ink); c.DrawLine(p.X - 9, p.Y, p.X + 9, p.Y, ink); c.DrawLine(p.X, p.Y - 9, p.X, p.Y + 9, ink); }
            Ink.BoxedLabel(c, "centroid", p.X + 10, p.Y - 10, 11, Ink.Text);
        }
        if (data.ShearCentre is { } sc)
        {
            var p = L.ToPixel(sc);
            var box = new SKRect(p.X - 5, p.Y - 5, p.X + 5, p.Y + 5);
            using (var halo = Ink.Stroke(SKColors.White, 3f)) c.DrawRect(box, halo);
            using (var fill = Ink.Fill(SKColors.Black)) c.DrawRect(box, fill);
            Ink.BoxedLabel(c, "shear centre", p.X + 10, p.Y + 16, 11, Ink.Text);
        }
    }

    /// <summary>
    /// The peak: an arrow from a boxed label that stops short of the hot spot (so the colours there stay visible), the label
    /// placed towards the middle of the plot. At a sharp corner the label says the peak is unbounded.
    /// </summary>
    private static void DrawPeak(SKCanvas c, SectionPlotData data, SectionLayout L, double peak, string unit, string suffix)
    {
        var p = L.ToPixel(data.PeakLocation);
        string text = data.PeakShearUnbounded
            ? $"τ max unbounded (sharp corner); {NiceScale.Sig(peak, 3)} {unit}{suffix} on this mesh"
            : $"τ max = {NiceScale.Sig(peak, 4)} {unit}{suffix}";
        float tw = Ink.Width(text, 13);
        bool leftSide = p.X > L.Plot.MidX;
        bool below = p.Y < L.Plot.MidY;
        float lx = leftSide ? p.X - 40 - tw : p.X + 40;
        float ly = below ? p.Y + 48 : p.Y - 36;
        lx = Math.Clamp(lx, L.Plot.Left + 4, Math.Max(L.Plot.Left + 4, L.Plot.Right - tw - 4));
        ly = Math.Clamp(ly, L.Plot.Top + 16, L.Plot.Bottom - 6);
        // the arrow runs from the label's near corner to 7 px before the spot
        var from = new SKPoint(leftSide ? lx + tw + 2 : lx - 2, below ? ly - 13 : ly + 3);
        float dx = p.X - from.X, dy = p.Y - from.Y, len = MathF.Max(1e-3f, MathF.Sqrt(dx * dx + dy * dy));
        float ux = dx / len, uy = dy / len;
        var tip = new SKPoint(p.X - 7 * ux, p.Y - 7 * uy);
        using (var halo = Ink.Stroke(SKColors.White, 4f)) c.DrawLine(from, tip, halo);
        using (var lead = Ink.Stroke(Ink.Alert, 1.8f)) c.DrawLine(from, tip, lead);
        using (var head = new SKPath())
        {
            head.MoveTo(tip);
            head.LineTo(tip.X - 9 * ux + 4 * uy, tip.Y - 9 * uy - 4 * ux);
            head.LineTo(tip.X - 9 * ux - 4 * uy, tip.Y - 9 * uy + 4 * ux);
            head.Close();
            using var fill = Ink.Fill(Ink.Alert);
            using var edge = Ink.Stroke(SKColors.White, 1f);
            c.DrawPath(head, edge);
            c.DrawPath(head, fill);
        }
        Ink.BoxedLabel(c, text, lx, ly, 13, data.PeakShearUnbounded ? Ink.Alert : Ink.Text);
    }

    /// <summary>The colour bar: one box per band, ticks at every band boundary (round numbers), title and caption above, clear of the top tick.</summary>
    private static void DrawColourBar(SKCanvas c, SectionLayout L, int bands, double width, string unit, string caption) =>
        ColourBar.Draw(c, L.ColourBar, bands, k => BandColour(k, bands), (k, every) => k % every == 0 || k == bands, // the top tick is always labelled
            k => NiceScale.Format(k * width, width), $"|τ|, {unit}", caption);
}
