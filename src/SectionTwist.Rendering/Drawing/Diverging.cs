using SkiaSharp;

namespace SectionTwist.Rendering.Drawing;

/// <summary>
/// A diverging colour map for signed fields: dark blue (most negative) through near-white (zero) to dark red (most
/// positive), linear in RGB between five anchor colours of our own choosing. Both ends stay distinguishable in grey
/// scale from the white middle, so the sign change (the zero line) is where the colour fades out.
/// </summary>
internal static class Diverging
{
    private static readonly (double At, byte R, byte G, byte B)[] Anchors =
    [
        (0.00, 0x1F, 0x3F, 0x8F),
        (0.25, 0x6E, 0x9C, 0xD2),
        (0.50, 0xF5, 0xF5, 0xF2),
        (0.75, 0xE3, 0x8A, 0x6A),
        (1.00, 0x9E, 0x1B, 0x26),
    ];

    /// <summary>The colour for a fraction t in [0, 1] (clamped; 0.5 is zero, near-white).</summary>
    public static SKColor Sample(double t)
    {
        if (double.IsNaN(t)) t = 0.5;
        t = Math.Clamp(t, 0, 1);
        int k = 0;
        while (k < Anchors.Length - 2 && t > Anchors[k + 1].At) k++;
        var (a, b) = (Anchors[k], Anchors[k + 1]);
        double s = (t - a.At) / (b.At - a.At);
        byte Mix(byte x, byte y) => (byte)Math.Round(x + s * (y - x));
        return new SKColor(Mix(a.R, b.R), Mix(a.G, b.G), Mix(a.B, b.B));
    }
}
