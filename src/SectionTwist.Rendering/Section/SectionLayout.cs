using SectionTwist.Geometry;
using SectionTwist.Torsion;
using SkiaSharp;

namespace SectionTwist.Rendering.Section;

/// <summary>
/// Where things go in a section picture: the plot area, the colour bar, and the world-to-pixel map (equal scale on both
/// axes; world coordinates in metres, y up).
/// </summary>
/// <param name="Width">Picture width, px.</param>
/// <param name="Height">Picture height, px.</param>
/// <param name="Plot">Plot area, px.</param>
/// <param name="ColourBar">Colour bar rectangle, px.</param>
/// <param name="PixelsPerMetre">Scale, px per m, the same in x and y.</param>
/// <param name="OriginX">Pixel x of world x = 0.</param>
/// <param name="OriginY">Pixel y of world y = 0.</param>
internal readonly record struct SectionLayout(int Width, int Height, SKRect Plot, SKRect ColourBar, double PixelsPerMetre,
    double OriginX, double OriginY)
{
    /// <summary>Pixel position of a world point (m).</summary>
    public SKPoint ToPixel(Point2 p) => ToPixel(p.X, p.Y);

    /// <summary>Pixel position of a world point (m).</summary>
    public SKPoint ToPixel(double x, double y) => new((float)(OriginX + x * PixelsPerMetre), (float)(OriginY - y * PixelsPerMetre));

    /// <summary>
    /// The pixel corners of the field's triangle starting at <paramref name="t"/> (an index into
    /// <see cref="SectionField.Triangles"/>) and the value of each corner node; returns the values' range.
    /// </summary>
    public (double Min, double Max) Corners(SectionField f, int t, Func<int, double> value, Span<double> x, Span<double> y, Span<double> v)
    {
        double vmin = double.PositiveInfinity, vmax = double.NegativeInfinity;
        for (int j = 0; j < 3; j++)
        {
            int n = f.Triangles[t + j];
            var p = ToPixel(f.X[n], f.Y[n]);
            x[j] = p.X; y[j] = p.Y; v[j] = value(n);
            vmin = Math.Min(vmin, v[j]); vmax = Math.Max(vmax, v[j]);
        }
        return (vmin, vmax);
    }

    /// <summary>World point (m) at a pixel.</summary>
    public Point2 ToWorld(float px, float py) => new((px - OriginX) / PixelsPerMetre, (OriginY - py) / PixelsPerMetre);

    /// <summary>Lays out a picture of the given size around the field's outline.</summary>
    public static SectionLayout Create(SectionPlotData data, int width, int height)
    {
        const float top = 46, bottom = 58, left = 70, right = 150;
        var plot = new SKRect(left, top, Math.Max(left + 10, width - right), Math.Max(top + 10, height - bottom));
        var bar = new SKRect(plot.Right + 34, plot.Top + 34, plot.Right + 56, plot.Bottom);

        double minX = double.PositiveInfinity, minY = double.PositiveInfinity, maxX = double.NegativeInfinity, maxY = double.NegativeInfinity;
        void Add(double x, double y)
        {
            minX = Math.Min(minX, x); maxX = Math.Max(maxX, x); minY = Math.Min(minY, y); maxY = Math.Max(maxY, y);
        }
        foreach (var loop in data.Field.Boundaries) foreach (var p in loop) Add(p.X, p.Y);
        if (!double.IsFinite(minX)) for (int i = 0; i < data.Field.X.Count; i++) Add(data.Field.X[i], data.Field.Y[i]);
        if (!double.IsFinite(minX)) { minX = minY = -1; maxX = maxY = 1; }
        double w = Math.Max(maxX - minX, 1e-12), h = Math.Max(maxY - minY, 1e-12);
        double pad = 0.07 * Math.Max(w, h);
        double scale = Math.Min(plot.Width / (w + 2 * pad), plot.Height / (h + 2 * pad));
        double cx = 0.5 * (minX + maxX), cy = 0.5 * (minY + maxY);
        double ox = plot.MidX - cx * scale, oy = plot.MidY + cy * scale;
        return new SectionLayout(width, height, plot, bar, scale, ox, oy);
    }
}
