using SkiaSharp;

namespace SectionTwist.Rendering.Shaft;

/// <summary>
/// Where the parts of a shaft diagram go: the schematic band on top and the three plot panels below, all sharing one
/// axial scale.
/// </summary>
/// <param name="Schematic">Band of the shaft schematic, px.</param>
/// <param name="TorquePanel">Internal-torque plot, px.</param>
/// <param name="RotationPanel">Rotation plot, px.</param>
/// <param name="ShearPanel">Shear-stress plot, px.</param>
/// <param name="X0">Smallest axial position shown, m.</param>
/// <param name="PixelsPerMetre">Axial scale, px per m.</param>
internal readonly record struct ShaftDiagramLayout(SKRect Schematic, SKRect TorquePanel, SKRect RotationPanel, SKRect ShearPanel,
    double X0, double PixelsPerMetre)
{
    /// <summary>Pixel x of an axial position.</summary>
    public float ToPixelX(double x) => (float)(Schematic.Left + (x - X0) * PixelsPerMetre);

    public static ShaftDiagramLayout Create(ShaftDiagramData d, int width, int height)
    {
        const float left = 92, right = 36, top = 40, bottom = 40, gap = 36;
        double lo = double.PositiveInfinity, hi = double.NegativeInfinity;
        foreach (var s in d.Stations) { lo = Math.Min(lo, s.Position); hi = Math.Max(hi, s.Position); }
        foreach (var s in d.Segments) { lo = Math.Min(lo, Math.Min(s.From, s.To)); hi = Math.Max(hi, Math.Max(s.From, s.To)); }
        if (!double.IsFinite(lo)) { lo = 0; hi = 1; }
        if (hi - lo < 1e-9) hi = lo + 1e-3;
        double pad = 0.04 * (hi - lo);
        float plotW = Math.Max(10, width - left - right);
        double scale = plotW / (hi - lo + 2 * pad);
        float avail = Math.Max(40, height - top - bottom - 3 * gap);
        float schematicH = 0.31f * avail, panelH = (avail - schematicH) / 3;
        float y = top;
        var sch = new SKRect(left, y, left + plotW, y + schematicH); y += schematicH + gap;
        var tq = new SKRect(left, y, left + plotW, y + panelH); y += panelH + gap;
        var rot = new SKRect(left, y, left + plotW, y + panelH); y += panelH + gap;
        var sh = new SKRect(left, y, left + plotW, y + panelH);
        return new ShaftDiagramLayout(sch, tq, rot, sh, lo - pad, scale);
    }
}
