using System.Text;
using System.Text.RegularExpressions;
using SkiaSharp;

namespace SectionTwist.Rendering.Drawing;

/// <summary>
/// Runs one drawing routine against a raster surface (PNG) or Skia's SVG canvas, so both formats share the same code.
/// </summary>
internal static partial class CanvasTarget
{
    [GeneratedRegex("\\b(x|y)=\"([^\"]*?)[,\\s]+\"")]
    private static partial Regex TrailingSeparator();

    /// <summary>Draws a <paramref name="width"/> x <paramref name="height"/> picture and returns the encoded file bytes.</summary>
    public static byte[] Render(ImageFormat format, int width, int height, Action<SKCanvas> draw)
    {
        if (width < 16 || height < 16 || width > 16384 || height > 16384)
            throw new SectionTwistException("picture-size", $"picture size {width} x {height} px is out of range; use 16 to 16384 px per side");
        return format == ImageFormat.Svg ? RenderSvg(width, height, draw) : RenderPng(width, height, draw);
    }

    /// <summary>Draws into a bitmap (for tests and PNG encoding).</summary>
    public static SKBitmap RenderBitmap(int width, int height, Action<SKCanvas> draw)
    {
        var bmp = new SKBitmap(new SKImageInfo(width, height, SKColorType.Rgba8888, SKAlphaType.Premul));
        using var canvas = new SKCanvas(bmp);
        canvas.Clear(SKColors.White);
        draw(canvas);
        canvas.Flush();
        return bmp;
    }

    private static byte[] RenderPng(int width, int height, Action<SKCanvas> draw)
    {
        using var bmp = RenderBitmap(width, height, draw);
        using var image = SKImage.FromBitmap(bmp);
        using var data = image.Encode(SKEncodedImageFormat.Png, 100);
        return data.ToArray();
    }

    private static byte[] RenderSvg(int width, int height, Action<SKCanvas> draw)
    {
        using var ms = new MemoryStream();
        using (var managed = new SKManagedWStream(ms))
        {
            using (var canvas = SKSvgCanvas.Create(SKRect.Create(width, height), managed))
            {
                using (var bg = new SKPaint { Color = SKColors.White, Style = SKPaintStyle.Fill })
                    canvas.DrawRect(SKRect.Create(width, height), bg);
                draw(canvas);
            }
            managed.Flush();
        }
        string svg = Encoding.UTF8.GetString(ms.ToArray());
        // Skia writes the typeface's own family name; add generic fall-backs for viewers without DejaVu Sans.
        svg = svg.Replace("font-family=\"DejaVu Sans\"", $"font-family=\"{Fonts.SvgFamily}\"", StringComparison.Ordinal);
        // Skia ends glyph position lists with ", " (x="1, 2, "); SVG number lists must not end with a separator
        svg = TrailingSeparator().Replace(svg, "$1=\"$2\"");
        return Encoding.UTF8.GetBytes(svg);
    }
}
