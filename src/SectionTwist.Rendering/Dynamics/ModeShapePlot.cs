using SectionTwist.Dynamics;
using SectionTwist.Rendering.Drawing;
using SectionTwist.Units;
using SkiaSharp;

namespace SectionTwist.Rendering.Dynamics;

/// <summary>
/// Mode shapes: for each elastic mode, the rotation of every station referred to the reference shaft (largest = 1), stations
/// in file order along the horizontal axis, one panel per mode; bars under the panel give each part's strain-energy share.
/// </summary>
public static class ModeShapePlot
{
    /// <summary>Draws up to <paramref name="maxModes"/> elastic modes as PNG or SVG, frequencies in the unit of <paramref name="units"/> (null: Hz).</summary>
    public static byte[] Render(ModalResult modes, ImageFormat format, int maxModes = 6, int width = 900, UnitSystem? units = null)
    {
        ArgumentNullException.ThrowIfNull(modes);
        var frequency = (units ?? UnitSystem.SiMillimetre).Frequency;
        var list = modes.ElasticModes.Take(maxModes).ToList();
        int panel = 170, height = Math.Max(1, list.Count) * panel + 50;
        return CanvasTarget.Render(format, width, height, c => Draw(c, modes, list, width, panel, frequency));
    }

    private static void Draw(SKCanvas c, ModalResult modes, List<TorsionalMode> list, int width, int panel, DisplayUnit frequency)
    {
        int ns = modes.Stations.Count;
        float left = 80, right = width - 30;
        float X(int i) => ns == 1 ? (left + right) / 2 : left + i * (right - left) / (ns - 1);
        using var axis = Ink.Stroke(Ink.Text, 1f);
        using var grid = Ink.Stroke(new SKColor(0xcc, 0xcc, 0xcc), 0.8f, [4, 4]);
        using var line = Ink.Stroke(new SKColor(0x1f, 0x77, 0xb4), 2.2f);
        using var dot = Ink.Fill(new SKColor(0x1f, 0x77, 0xb4));
        using var shaftSep = Ink.Stroke(new SKColor(0x99, 0x99, 0x99), 1f, [2, 3]);
        if (list.Count == 0) { Ink.Label(c, "no elastic mode", left, 30, 13, Ink.Text); return; }
        for (int q = 0; q < list.Count; q++)
        {
            var m = list[q];
            float top = 20 + q * panel, mid = top + (panel - 40) / 2f, amp = (panel - 50) / 2f;
            Ink.Label(c, $"mode {m.Number}: {frequency.Text(m.Frequency, 4)} ({NumberText.Fixed(m.CyclesPerMinute, 0)} 1/min)", left, top + 4, 13, Ink.Text);
            c.DrawLine(left, mid, right, mid, grid);
            c.DrawLine(left - 6, mid - amp, left - 6, mid + amp, axis);
            Ink.Label(c, "+1", left - 10, mid - amp + 4, 10, Ink.Text, SKTextAlign.Right);
            Ink.Label(c, "-1", left - 10, mid + amp + 4, 10, Ink.Text, SKTextAlign.Right);
            using var path = new SKPath();
            for (int i = 0; i < ns; i++)
            {
                float y = mid - (float)m.Stations[i].ReferredRotation * amp;
                if (i > 0 && modes.Stations[i].Shaft != modes.Stations[i - 1].Shaft)
                {
                    c.DrawLine((X(i) + X(i - 1)) / 2, top + 10, (X(i) + X(i - 1)) / 2, top + panel - 30, shaftSep);
                    path.MoveTo(X(i), y);
                }
                else if (i == 0) path.MoveTo(X(i), y);
                else path.LineTo(X(i), y);
                c.DrawCircle(X(i), y, 3.5f, dot);
                if (q == list.Count - 1 || ns <= 12) Ink.Label(c, modes.Stations[i].Name, X(i), top + panel - 22, 10, Ink.Text, SKTextAlign.Center);
            }
            c.DrawPath(path, line);
        }
    }
}
