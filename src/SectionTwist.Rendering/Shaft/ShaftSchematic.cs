using SectionTwist.Rendering.Drawing;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Rendering.Shaft;

/// <summary>
/// The side view of the shaft: segments as rectangles (trapezoids for tapers) of their outer diameter, bores dashed,
/// fixed supports as hatched walls, bearings as triangles, applied torques and support reactions as double-headed
/// vectors (right-hand rule) with their values, station names below.
/// </summary>
internal static class ShaftSchematic
{
    private static readonly SKColor Steel = new(0xC9, 0xCE, 0xD6);
    private static readonly SKColor Reaction = new(0x70, 0x70, 0x70);
    private static readonly SKColor Load = new(0x1F, 0x4E, 0x79);

    /// <summary>Vertical scale, px per m of diameter: the axial scale when the shaft fits, otherwise compressed.</summary>
    public static double DiameterScale(ShaftDiagramData d, ShaftDiagramLayout L, out bool trueScale)
    {
        double dmax = d.Segments.Count == 0 ? 0 : d.Segments.Max(s => Math.Max(s.OuterStart, s.OuterEnd));
        double limit = 0.42 * L.Schematic.Height;
        trueScale = dmax * L.PixelsPerMetre <= limit;
        return trueScale || dmax <= 0 ? L.PixelsPerMetre : limit / dmax;
    }

    public static void Draw(SKCanvas c, ShaftDiagramData d, ShaftDiagramLayout L, SKPoint titlePos)
    {
        var r = L.Schematic;
        float y0 = r.MidY + 6;
        double vs = DiameterScale(d, L, out bool trueScale);
        Ink.Label(c, trueScale ? "shaft, to scale" : "shaft (diameters enlarged for legibility)", titlePos.X, titlePos.Y, 12, new SKColor(0x55, 0x55, 0x55));
        using (var axis = Ink.Stroke(new SKColor(0x66, 0x66, 0x66), 0.8f, [10, 3, 2, 3]))
            c.DrawLine(r.Left, y0, r.Right, y0, axis);

        float maxHalf = 0;
        foreach (var s in ShaftSeries.Ordered(d))
        {
            float x0 = L.ToPixelX(s.From), x1 = L.ToPixelX(s.To);
            float h0 = (float)(0.5 * s.OuterStart * vs), h1 = (float)(0.5 * s.OuterEnd * vs);
            maxHalf = Math.Max(maxHalf, Math.Max(h0, h1));
            using var path = new SKPath();
            path.MoveTo(x0, y0 - h0); path.LineTo(x1, y0 - h1); path.LineTo(x1, y0 + h1); path.LineTo(x0, y0 + h0); path.Close();
            using (var fill = Ink.Fill(s.Exceeds ? new SKColor(0xF6, 0xC4, 0xC4) : Steel)) c.DrawPath(path, fill);
            using (var edge = Ink.Stroke(s.Exceeds ? Ink.Alert : new SKColor(0x33, 0x33, 0x33), s.Exceeds ? 2.2f : 1.2f)) c.DrawPath(path, edge);
            if (s.Inner > 0)
            {
                float hi = (float)(0.5 * s.Inner * vs);
                using var bore = Ink.Stroke(new SKColor(0x33, 0x33, 0x33), 0.9f, [5, 3]);
                c.DrawLine(x0, y0 - hi, x1, y0 - hi, bore);
                c.DrawLine(x0, y0 + hi, x1, y0 + hi, bore);
            }
        }
        float mid = 0.5f * (r.Left + r.Right);
        foreach (var st in d.Stations.OrderBy(s => s.Position))
        {
            float x = L.ToPixelX(st.Position);
            float half = HalfAt(d, st.Position, vs);
            if (st.Support == SupportKind.Fixed) Wall(c, x, y0, Math.Max(half, 10) + 12, x < mid ? -1 : 1);
            else if (st.Support == SupportKind.Bearing) Bearing(c, x, y0 + half);
            float ay = y0 - Math.Max(maxHalf, 8) - 22;
            if (st.AppliedTorque != 0) Vector(c, x, ay, st.AppliedTorque, Load, $"{Signed(d.DisplayUnits.Torque.FromSi(st.AppliedTorque))} {d.DisplayUnits.Torque.Symbol}");
            // the reaction takes the applied torque's row when the station has none (the usual fixed end), so that it stays
            // clear of the heading when the shaft fills the band
            if (st.Support == SupportKind.Fixed && st.Reaction != 0)
                Vector(c, x, st.AppliedTorque != 0 ? ay - 30 : ay, st.Reaction, Reaction, $"R {Signed(d.DisplayUnits.Torque.FromSi(st.Reaction))} {d.DisplayUnits.Torque.Symbol}");
        }
        float by = y0 - Math.Max(maxHalf, 8) - 22;
        foreach (var dt in d.DistributedTorques.Where(t => t.Total != 0)) Spread(c, L.ToPixelX(Math.Min(dt.From, dt.To)), L.ToPixelX(Math.Max(dt.From, dt.To)), by, dt, d.DisplayUnits.Torque);
        // stations at the same place (e.g. the two halves of a coupling) share one label instead of overprinting
        foreach (var group in d.Stations.GroupBy(s => s.Position).OrderBy(g => g.Key))
            Ink.Label(c, string.Join(", ", group.Select(s => s.Name)), L.ToPixelX(group.Key), y0 + maxHalf + 30, 11, Ink.Text, SKTextAlign.Center);
    }

    internal static string Signed(double v) => (v > 0 ? "+" : "") + NumberText.Format(v, 4);

    private static float HalfAt(ShaftDiagramData d, double x, double vs)
    {
        double h = 0;
        foreach (var s in d.Segments)
            if (x >= Math.Min(s.From, s.To) - 1e-12 && x <= Math.Max(s.From, s.To) + 1e-12)
                h = Math.Max(h, 0.5 * Math.Max(s.OuterStart, s.OuterEnd) * vs);
        return (float)h;
    }

    private static void Wall(SKCanvas c, float x, float y0, float half, int side)
    {
        using var wall = Ink.Stroke(SKColors.Black, 2.5f);
        c.DrawLine(x, y0 - half, x, y0 + half, wall);
        using var hatch = Ink.Stroke(SKColors.Black, 1f);
        for (float y = y0 - half; y < y0 + half; y += 7)
            c.DrawLine(x, y + 7, x + side * 8, y, hatch);
    }

    private static void Bearing(SKCanvas c, float x, float yTop)
    {
        using var path = new SKPath();
        path.MoveTo(x, yTop); path.LineTo(x - 8, yTop + 13); path.LineTo(x + 8, yTop + 13); path.Close();
        using (var fill = Ink.Fill(SKColors.White)) c.DrawPath(path, fill);
        using var edge = Ink.Stroke(SKColors.Black, 1.3f);
        c.DrawPath(path, edge);
        c.DrawLine(x - 12, yTop + 13, x + 12, yTop + 13, edge);
        for (float h = x - 12; h < x + 12; h += 5) c.DrawLine(h, yTop + 18, h + 4, yTop + 13, edge);
    }

    /// <summary>A distributed torque: small double-headed vectors along the stretch under a bracket, with the total.</summary>
    private static void Spread(SKCanvas c, float x0, float x1, float y, DiagramDistributedTorque t, DisplayUnit torque)
    {
        float dir = t.Total > 0 ? 1 : -1;
        int n = Math.Clamp((int)((x1 - x0) / 26), 1, 12);
        using var line = Ink.Stroke(Load, 1.3f);
        using var head = Ink.Fill(Load);
        for (int i = 0; i < n; i++)
        {
            float x = x0 + (i + 0.5f) * (x1 - x0) / n, tip = x + dir * 8;
            c.DrawLine(x - dir * 8, y, tip, y, line);
            foreach (float off in new[] { 0f, -5f })
            {
                using var p = new SKPath();
                p.MoveTo(tip + dir * off, y); p.LineTo(tip + dir * (off - 5), y - 3); p.LineTo(tip + dir * (off - 5), y + 3); p.Close();
                c.DrawPath(p, head);
            }
        }
        c.DrawLine(x0, y - 7, x1, y - 7, line);
        c.DrawLine(x0, y - 7, x0, y - 3, line);
        c.DrawLine(x1, y - 7, x1, y - 3, line);
        Ink.Label(c, $"{Signed(torque.FromSi(t.Total))} {torque.Symbol} spread{(t.Label is null ? "" : $" ({t.Label})")}", 0.5f * (x0 + x1), y - 12, 11, Load, SKTextAlign.Center);
    }

    /// <summary>A double-headed axial vector (right-hand rule): points +x for a positive torque.</summary>
    private static void Vector(SKCanvas c, float x, float y, double value, SKColor colour, string label)
    {
        float dir = value > 0 ? 1 : -1, len = 34;
        float tip = x + dir * len / 2, tail = x - dir * len / 2;
        using var line = Ink.Stroke(colour, 2f);
        c.DrawLine(tail, y, tip, y, line);
        using var head = Ink.Fill(colour);
        foreach (float off in new[] { 0f, -9f })
        {
            float hx = tip + dir * off;
            using var p = new SKPath();
            p.MoveTo(hx, y); p.LineTo(hx - dir * 9, y - 5); p.LineTo(hx - dir * 9, y + 5); p.Close();
            c.DrawPath(p, head);
        }
        Ink.Label(c, label, x, y - 9, 11, colour, SKTextAlign.Center);
    }
}
