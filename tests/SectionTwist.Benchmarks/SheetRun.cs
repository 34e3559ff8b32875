using System.Diagnostics;
using System.Globalization;
using System.Text;
using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;
using SectionTwist.Torsion;

namespace SectionTwist.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/SectionTwist.Benchmarks -- sheet [entities]</c>: a drawing sheet of our own
/// invented conveyor drivetrain with about 50,000 entities (frame, title block, parts-list table, 2,000 texts, 2,000
/// dimensions, a perforated guard plate with thousands of holes and centre marks, rows of cells) and one section view
/// (a keyed hollow shaft with floor fillets). Times: read and list the regions (inspect), read and choose the section
/// by a point, and analyse it to J within 1e-4; each stage once after a warm-up run on the same sheet.
/// </summary>
public static class SheetRun
{
    public static void Run(int target)
    {
        var inv = CultureInfo.InvariantCulture;
        byte[] data = Encoding.ASCII.GetBytes(Build(target, out int entities));
        var at = new Point2(200 + 14, 120);
        Once(data, at, out _); // JIT warm-up
        var t = Once(data, at, out var report);
        Console.WriteLine(string.Create(inv, $"sheet: {entities:N0} entities, {data.Length / 1048576.0:F1} MB, {report.Loops:N0} loops, {report.Parts.Count:N0} regions listed, {report.LeftOut.Count:N0} left out, {Environment.ProcessorCount} cores"));
        Console.WriteLine("  stage                               wall s    cpu s  (cpu: this process, all threads; wall includes waiting for other load)");
        Console.WriteLine(string.Create(inv, $"  read + list regions (inspect)      {t.Inspect.Wall,7:F3}  {t.Inspect.Cpu,7:F3}"));
        Console.WriteLine(string.Create(inv, $"  read + choose the section (--at)   {t.Read.Wall,7:F3}  {t.Read.Cpu,7:F3}"));
        Console.WriteLine(string.Create(inv, $"  analyse it (J within 1e-4)         {t.Analyse.Wall,7:F3}  {t.Analyse.Cpu,7:F3}   J = {t.J:G6} m^4"));
        Console.WriteLine(string.Create(inv, $"  read + choose + analyse            {t.Read.Wall + t.Analyse.Wall,7:F3}  {t.Read.Cpu + t.Analyse.Cpu,7:F3}   (goal: under 3 s)"));
    }

    private static ((double Wall, double Cpu) Inspect, (double Wall, double Cpu) Read, (double Wall, double Cpu) Analyse, double J) Once(byte[] data, Point2 at, out DxfImportReport report)
    {
        string path = Path.Combine(Path.GetTempPath(), $"sheet-{Environment.ProcessId}.dxf");
        File.WriteAllBytes(path, data);
        DxfImportReport? rep = null;
        var inspect = Time(() => rep = DxfProfiles.Inspect(path, new DxfReadOptions()));
        DxfImport? read = null;
        var readT = Time(() => read = DxfProfiles.Read(path, new DxfReadOptions { At = at }));
        SectionResult? r = null;
        var analyse = Time(() => r = SectionAnalyzer.Analyze(read!.Profile, new AnalysisOptions { Accuracy = 1e-4 }));
        File.Delete(path);
        report = rep!;
        return (inspect, readT, analyse, r!.TorsionConstant);
    }

    private static (double Wall, double Cpu) Time(Action a)
    {
        var proc = Process.GetCurrentProcess();
        var cpu0 = proc.TotalProcessorTime;
        var sw = Stopwatch.StartNew();
        a();
        double wall = sw.Elapsed.TotalSeconds;
        proc.Refresh();
        return (wall, (proc.TotalProcessorTime - cpu0).TotalSeconds);
    }

    /// <summary>The sheet as ASCII DXF (R2000 header, millimetres).</summary>
    public static string Build(int target, out int entities)
    {
        var w = new SheetWriter();
        w.Rect(0, 0, 1189, 841, "FRAME");
        w.Rect(20, 10, 1159, 821, "BORDER");
        // title block and parts-list table: long lines that cross without joining
        for (int i = 0; i <= 60; i++) w.Line(800, 10 + 4 * i, 1179, 10 + 4 * i, "TABLE");
        for (int i = 0; i <= 12; i++) w.Line(800 + 31.5 * i, 10, 800 + 31.5 * i, 250, "TABLE");
        // section view: keyed hollow shaft D 40, keyseat 12 x 5 with floor fillets r 0.6, bore d 12, centred (200, 120)
        KeyedShaft(w, 200, 120);
        // perforated guard plate 400 x 250 with holes d 1.6 at pitch 4 and a centre mark on each hole
        int holes = Math.Max(100, (target - 8000) / 3);
        int nx = (int)Math.Ceiling(Math.Sqrt(holes * 1.6)), ny = (holes + nx - 1) / nx;
        double pitch = 4;
        w.Rect(350, 300, nx * pitch + 4, ny * pitch + 4, "GUARD");
        for (int i = 0; i < nx; i++)
            for (int j = 0; j < ny && i * ny + j < holes; j++)
            {
                double x = 354 + i * pitch, y = 304 + j * pitch;
                w.Circle(x, y, 0.8, "GUARD");
                w.Line(x - 1.2, y, x + 1.2, y, "CENTER");
                w.Line(x, y - 1.2, x, y + 1.2, "CENTER");
            }
        // notes and dimensions
        int rest = Math.Max(0, target - w.Count);
        for (int k = 0; k < rest / 2; k++) w.Text(30 + (k % 40) * 18, 700 + (k / 40) * 3.0 % 100, $"NOTE {k}", "TEXT");
        for (int k = 0; k < rest - rest / 2; k++) w.Dimension(30 + (k % 30) * 10, 300 + (k / 30) % 250, "DIM");
        entities = w.Count;
        return w.ToString();
    }

    private static void KeyedShaft(SheetWriter w, double cx, double cy)
    {
        const double r = 20, b = 6, floor = 15, f = 0.6;
        double yTop = Math.Sqrt(r * r - b * b);
        double a0 = Math.Atan2(yTop, -b) * 180 / Math.PI, a1 = Math.Atan2(yTop, b) * 180 / Math.PI;
        w.Arc(cx, cy, r, a0, a1 + 360, "SECTION");
        w.Line(cx + b, cy + yTop, cx + b, cy + floor + f, "SECTION");
        w.Arc(cx + b - f, cy + floor + f, f, 270, 360, "SECTION");
        w.Line(cx + b - f, cy + floor, cx - b + f, cy + floor, "SECTION");
        w.Arc(cx - b + f, cy + floor + f, f, 180, 270, "SECTION");
        w.Line(cx - b, cy + floor + f, cx - b, cy + yTop, "SECTION");
        w.Circle(cx, cy, 6, "SECTION");
        w.Line(cx - 25, cy, cx + 25, cy, "CENTER");
    }
}
