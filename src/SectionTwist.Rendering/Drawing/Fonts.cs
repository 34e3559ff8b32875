using SkiaSharp;

namespace SectionTwist.Rendering.Drawing;

/// <summary>
/// The bundled font: DejaVu Sans (Bitstream Vera licence with public-domain DejaVu changes; redistribution permitted,
/// licence text shipped as licenses/DejaVuSans-LICENSE.txt). Loaded from an embedded resource with
/// <see cref="SKTypeface.FromStream(Stream, int)"/> so text looks the same on a machine without installed fonts.
/// </summary>
internal static class Fonts
{
    private const string ResourceName = "SectionTwist.Rendering.Fonts.DejaVuSans.ttf";

    /// <summary>The family name written into SVG text elements.</summary>
    public const string SvgFamily = "DejaVu Sans, Verdana, Arial, sans-serif";

    private static readonly Lazy<SKTypeface> Lazy = new(Load, LazyThreadSafetyMode.ExecutionAndPublication);

    /// <summary>The bundled typeface.</summary>
    public static SKTypeface Typeface => Lazy.Value;

    /// <summary>A font of the bundled typeface at <paramref name="size"/> pixels.</summary>
    /// <remarks>
    /// Slight hinting snaps horizontal strokes to whole pixels, so thin bars such as those of '=' stay one pixel thick
    /// instead of smearing over two rows (which made the '=' look bold).
    /// </remarks>
    public static SKFont Font(float size) => new(Typeface, size) { Subpixel = true, Edging = SKFontEdging.Antialias, Hinting = SKFontHinting.Slight };

    private static SKTypeface Load()
    {
        using var s = typeof(Fonts).Assembly.GetManifestResourceStream(ResourceName)
            ?? throw new InvalidOperationException($"embedded font {ResourceName} is missing from the assembly");
        var ms = new MemoryStream();
        s.CopyTo(ms);
        ms.Position = 0;
        return SKTypeface.FromStream(ms) ?? throw new InvalidOperationException("the embedded font could not be loaded");
    }
}
