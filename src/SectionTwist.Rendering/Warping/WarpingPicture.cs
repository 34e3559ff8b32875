using SectionTwist.Rendering.Drawing;
using SectionTwist.Rendering.Section;
using SectionTwist.Torsion;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Rendering.Warping;

/// <summary>
/// Draws the normalized warping function omega of a section (the axial warping displacement per unit twist rate,
/// w = theta omega, taken about the shear centre): filled bands of omega in a diverging palette with zero in the middle,
/// the zero line, the outline, the shear centre and the centroid, the place of the largest |omega|, axes in the
/// section's length unit and a colour bar in that unit squared.
/// </summary>
public static class WarpingPicture
{
    /// <summary>Picture width and height, px.</summary>
    internal const int Width = 900, Height = 680;

    /// <summary>Colour bands on each side of zero (the band width is rounded, so the count may differ by one or two).</summary>
    private const int BandsPerSide = 6;

    /// <summary>Draws the picture and returns the PNG or SVG file bytes.</summary>
    /// <param name="result">A section analysed with <see cref="AnalysisOptions.Warping"/> on.</param>
    /// <param name="format">PNG or SVG.</param>
    /// <param name="title">Heading, e.g. the section's name.</param>
    /// <param name="units">Display units (lengths of the axes and of omega); null: the section's own.</param>
    public static byte[] Render(SectionResult result, ImageFormat format, string title, UnitSystem? units = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        var warping = result.Warping ?? throw new SectionTwistException("no-warping",
            "the warping picture needs the warping solve; analyse with warping on (section --warping)");
        var data = SectionPlotData.From(result, title);
        var layout = SectionLayout.Create(data, Width, Height);
        var unit = SectionPicture.AxisUnit(data, new SectionPlotOptions { Units = units });
        double toDisplay = 1 / (unit.Metres * unit.Metres);
        double top = 0;
        foreach (double w in warping.Omega) top = Math.Max(top, Math.Abs(w) * toDisplay);
        var (perSide, width) = SectionPicture.BandScale(top > 0 ? top : 1, BandsPerSide);
        return CanvasTarget.Render(format, Width, Height, c =>
        {
            c.Clear(SKColors.White);
            Ink.Label(c, title, layout.Plot.Left, 22, 17, Ink.Text);
            Ink.Label(c, $"Iw = {NiceScale.Sig(warping.WarpingConstant / Math.Pow(unit.Metres, 6), 4)} {unit.Symbol}⁶,  |ω| max = {NiceScale.Sig(warping.MaxSectorialCoordinate * toDisplay, 4)} {unit.Symbol}²,  axial warping w = θ ω per twist rate θ",
                layout.Plot.Left, 40, 11, Ink.Text);
            SectionAxes.Draw(c, layout, unit);
            c.Save();
            c.ClipRect(layout.Plot);
            FillBands(c, result.Field, warping.Omega, layout, perSide, width, toDisplay, format == ImageFormat.Svg);
            DrawZeroLine(c, result.Field, warping.Omega, layout);
            DrawOutline(c, result.Field, layout);
            SectionPicture.DrawCentres(c, data, layout);
            DrawMaximum(c, layout.ToPixel(warping.MaxSectorialCoordinateLocation));
            c.Restore();
            SectionAxes.DrawScaleBar(c, layout, unit, result.Field.Boundaries);
            DrawColourBar(c, layout, perSide, width, unit.Symbol);
        });
    }

    /// <summary>Writes the picture to <paramref name="path"/> through a temporary file; the format follows the extension (.png or .svg).</summary>
    /// <param name="result">A section analysed with the warping solve.</param>
    /// <param name="path">The picture file.</param>
    /// <param name="title">Heading, e.g. the section's name.</param>
    /// <param name="units">Display units; null: the section's own.</param>
    public static void Save(SectionResult result, string path, string title, UnitSystem? units = null)
    {
        var bytes = Render(result, ImageFormats.FromPath(path), title, units);
        AtomicFile.Write(path, s => s.Write(bytes));
    }

    /// <summary>Colour of band <paramref name="k"/> of 2 <paramref name="perSide"/> (band 0 is the most negative).</summary>
    internal static SKColor BandColour(int k, int perSide) => Diverging.Sample((k + 0.5) / (2.0 * perSide));

    private static void FillBands(SKCanvas c, SectionField f, IReadOnlyList<double> omega, SectionLayout L, int perSide, double width, double toDisplay, bool vector)
    {
        int bands = 2 * perSide;
        double bottom = -perSide * width;
        var paths = new SKPath[bands];
        for (int k = 0; k < bands; k++) paths[k] = new SKPath { FillType = SKPathFillType.Winding };
        Span<double> x = stackalloc double[3], y = stackalloc double[3], v = stackalloc double[3];
        Span<double> px = stackalloc double[6], py = stackalloc double[6];
        var tri = f.Triangles;
        for (int t = 0; t + 2 < tri.Count; t += 3)
        {
            var (vmin, vmax) = L.Corners(f, t, n => omega[n] * toDisplay, x, y, v);
            int k0 = Math.Clamp((int)Math.Floor((vmin - bottom) / width), 0, bands - 1);
            int k1 = Math.Clamp((int)Math.Floor((vmax - bottom) / width), 0, bands - 1);
            for (int k = k0; k <= k1; k++)
            {
                double lo = k == 0 ? double.NegativeInfinity : bottom + k * width;
                double hi = k == bands - 1 ? double.PositiveInfinity : bottom + (k + 1) * width;
                int m;
                if (k0 == k1) { for (int i = 0; i < 3; i++) { px[i] = x[i]; py[i] = y[i]; } m = 3; }
                else m = ContourGeometry.ClipBand(x, y, v, lo, hi, px, py);
                if (m < 3) continue;
                paths[k].MoveTo((float)px[0], (float)py[0]);
                for (int i = 1; i < m; i++) paths[k].LineTo((float)px[i], (float)py[i]);
                paths[k].Close();
            }
        }
        for (int k = 0; k < bands; k++)
        {
            // as in the section picture: a same-colour hairline (raster) or thin stroke (SVG) hides the seams between bands
            if (!paths[k].IsEmpty)
            {
                var colour = BandColour(k, perSide);
                using var fill = new SKPaint { Color = colour, Style = vector ? SKPaintStyle.StrokeAndFill : SKPaintStyle.Fill, StrokeWidth = 0.7f, IsAntialias = true, StrokeJoin = SKStrokeJoin.Round };
                if (!vector)
                {
                    using var hair = new SKPaint { Color = colour, Style = SKPaintStyle.Stroke, StrokeWidth = 0, IsAntialias = true };
                    c.DrawPath(paths[k], hair);
                }
                c.DrawPath(paths[k], fill);
            }
            paths[k].Dispose();
        }
    }

    /// <summary>The line omega = 0, dashed: where the section does not warp.</summary>
    private static void DrawZeroLine(SKCanvas c, SectionField f, IReadOnlyList<double> omega, SectionLayout L)
    {
        using var path = new SKPath();
        Span<double> x = stackalloc double[3], y = stackalloc double[3], v = stackalloc double[3];
        var tri = f.Triangles;
        for (int t = 0; t + 2 < tri.Count; t += 3)
        {
            L.Corners(f, t, n => omega[n], x, y, v);
            if (!ContourGeometry.IsoSegment(x, y, v, 0, out double x0, out double y0, out double x1, out double y1)) continue;
            path.MoveTo((float)x0, (float)y0);
            path.LineTo((float)x1, (float)y1);
        }
        using var paint = Ink.Stroke(new SKColor(0x30, 0x30, 0x30, 200), 1f, [5f, 3f]);
        c.DrawPath(path, paint);
    }

    private static void DrawOutline(SKCanvas c, SectionField f, SectionLayout L) => SectionPicture.DrawOutline(c, f, L);

    /// <summary>A small ring at the place of the largest |omega|.</summary>
    private static void DrawMaximum(SKCanvas c, SKPoint p)
    {
        using (var halo = Ink.Stroke(SKColors.White, 3.5f)) c.DrawCircle(p, 5f, halo);
        using (var ink = Ink.Stroke(Ink.Text, 1.5f)) c.DrawCircle(p, 5f, ink);
        Ink.BoxedLabel(c, "|ω| max", p.X + 8, p.Y - 8, 11, Ink.Text);
    }

    /// <summary>The colour bar: one box per band, zero in the middle, ticks at the band boundaries; title omega in length^2.</summary>
    private static void DrawColourBar(SKCanvas c, SectionLayout L, int perSide, double width, string unit) =>
        ColourBar.Draw(c, L.ColourBar, 2 * perSide, k => BandColour(k, perSide), (k, every) => (k - perSide) % every == 0, // zero is always labelled
            k => NiceScale.Format((k - perSide) * width, width), $"ω, {unit}²", "warping function");
}
