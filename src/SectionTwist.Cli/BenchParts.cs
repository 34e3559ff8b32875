using System.Diagnostics;
using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Import.Dxf;
using SectionTwist.Profiles;
using SectionTwist.Torsion;

namespace SectionTwist.Cli;

/// <summary>
/// <c>bench --startup</c> (whole-process time of the tool on a drawing, min and median over N runs) and
/// <c>bench --batch</c> (a batch of template variants serial against parallel in the same process, and the ratio).
/// Timings are wall times of this machine as it is: on a shared or loaded machine they vary from run to run.
/// </summary>
internal static class BenchParts
{
    /// <summary>The drawing of the start-up bench: the keyed 40 mm shaft (12 x 5 keyseat, 0.4 mm fillets) of the demo.</summary>
    internal const string StartupSpec = "keyed:d=40,r=0.4";

    /// <summary>Spawns the tool <paramref name="runs"/> times on the drawing and on a template spec; prints min and median.</summary>
    public static void Startup(TextWriter w, int runs, string? tool)
    {
        var inv = CultureInfo.InvariantCulture;
        var (file, prefix) = Tool(tool);
        string dir = Directory.CreateTempSubdirectory("sectiontwist-startup").FullName;
        try
        {
            string dxf = Path.Combine(dir, "keyed-shaft.dxf");
            var profile = ProfileTemplates.Create(StartupSpec);
            AtomicFile.Write(dxf, s => DxfWriter.Write(profile, s, new DxfWriteOptions()));
            w.WriteLine($"start-up: whole process (spawn to exit) of {file}{(prefix.Length > 0 ? " " + prefix : "")}, {runs} runs each, {Environment.ProcessorCount} cores");
            w.WriteLine("  command                                    min       median    max");
            foreach (var argv in new[] { new[] { "--version" }, new[] { "section", dxf, "--unit", "mm" }, new[] { "section", "circle:d=40" } })
            {
                var times = new List<double>();
                Spawn(file, prefix, argv); // first run: disk cache
                for (int i = 0; i < runs; i++) times.Add(Spawn(file, prefix, argv));
                times.Sort();
                string shown = string.Join(' ', argv.Select(a => a == dxf ? "keyed-shaft.dxf" : a));
                w.WriteLine(string.Create(inv, $"  {shown,-40} {times[0],7:F3} s  {times[times.Count / 2],7:F3} s  {times[^1],7:F3} s"));
            }
        }
        finally { Directory.Delete(dir, recursive: true); }
    }

    /// <summary>The command to spawn: the given path, else this process's own executable (the tool itself, or dotnet with the tool's dll).</summary>
    private static (string File, string Prefix) Tool(string? tool)
    {
        if (tool is not null)
        {
            if (!File.Exists(tool)) throw new UsageException($"--tool: '{tool}' is not a file; give the path of the installed sectiontwist");
            return tool.EndsWith(".dll", StringComparison.OrdinalIgnoreCase) ? ("dotnet", tool) : (tool, "");
        }
        string self = Environment.ProcessPath ?? "dotnet";
        if (Path.GetFileNameWithoutExtension(self).Equals("dotnet", StringComparison.OrdinalIgnoreCase))
            return (self, Path.Combine(AppContext.BaseDirectory, "sectiontwist.dll"));
        return (self, "");
    }

    private static double Spawn(string file, string prefix, string[] argv)
    {
        var psi = new ProcessStartInfo(file) { RedirectStandardOutput = true, RedirectStandardError = true, UseShellExecute = false };
        if (prefix.Length > 0) psi.ArgumentList.Add(prefix);
        foreach (var a in argv) psi.ArgumentList.Add(a);
        var sw = Stopwatch.StartNew();
        using var p = Process.Start(psi) ?? throw new UsageException($"could not start {file}");
        p.StandardOutput.ReadToEnd();
        string err = p.StandardError.ReadToEnd();
        p.WaitForExit();
        double t = sw.Elapsed.TotalSeconds;
        if (p.ExitCode != 0) throw new SectionTwistException("bench-failed", $"{file} {string.Join(' ', argv)} exited {p.ExitCode}: {err.Trim()}");
        return t;
    }

    /// <summary>The batch variants: keyed shafts of 200 diameters from 20 to 79.7 mm (keys from the standard table).</summary>
    internal static IReadOnlyList<Profile> Variants(int count) =>
        Enumerable.Range(0, count).Select(i => ProfileTemplates.Create(string.Create(CultureInfo.InvariantCulture, $"keyed:d={20 + 60.0 * i / count:0.###}"))).ToList();

    /// <summary>Analyses <paramref name="count"/> variants serially and on all cores at the default accuracy; prints both times and the ratio.</summary>
    public static void Batch(TextWriter w, int count)
    {
        var inv = CultureInfo.InvariantCulture;
        var profiles = Variants(count);
        SectionBatch.Analyze(profiles.Take(2 * Environment.ProcessorCount).ToList(), null); // compile before timing
        var me = Process.GetCurrentProcess();
        var gc0 = GcFigures.Now();
        double cpu0 = me.TotalProcessorTime.TotalSeconds;
        var sw = Stopwatch.StartNew();
        // the one-core baseline: one worker, and its factorization kept to one thread too
        var serial = Sparse.KernelThreads.OneThread(() => SectionBatch.Analyze(profiles, null, maxParallelism: 1));
        double ts = sw.Elapsed.TotalSeconds;
        me.Refresh();
        double cpu1 = me.TotalProcessorTime.TotalSeconds;
        var gc1 = GcFigures.Now();
        sw.Restart();
        var parallel = SectionBatch.Analyze(profiles, null);
        double tp = sw.Elapsed.TotalSeconds;
        me.Refresh();
        double cpu2 = me.TotalProcessorTime.TotalSeconds;
        var gc2 = GcFigures.Now();
        for (int i = 0; i < count; i++)
            if (serial[i].Result?.TorsionConstant != parallel[i].Result?.TorsionConstant)
                throw new SectionTwistException("bench-failed", $"batch item {i} differs between the serial and the parallel run");
        w.WriteLine(string.Create(inv, $"batch: {count} keyed-shaft variants (keyed:d=20..80) at the default accuracy, same process"));
        w.WriteLine(string.Create(inv, $"  serial (1 thread)       {ts,7:F2} s wall  {cpu1 - cpu0,7:F2} s CPU"));
        w.WriteLine(string.Create(inv, $"  parallel ({Environment.ProcessorCount} workers)    {tp,7:F2} s wall  {cpu2 - cpu1,7:F2} s CPU"));
        w.WriteLine(string.Create(inv, $"  speed-up                {ts / tp,7:F2}x wall (results identical); CPU parallel/serial {(cpu2 - cpu1) / (cpu1 - cpu0):F2}"));
        w.WriteLine($"  garbage collection      serial {gc1 - gc0}; parallel {gc2 - gc1}");
        double machine = MachineScaling();
        w.WriteLine(string.Create(inv, $"  machine reference       {machine,7:F2}x: the same in-cache arithmetic loop on {Environment.ProcessorCount} threads against one, just after (no memory traffic, no"));
        w.WriteLine("                          allocation: what the cores give at best at this moment; a batch ratio near it is as good as the machine allows)");
        w.WriteLine("  (a speed-up near the worker count needs idle cores: on a loaded machine the wall ratio shows the load, the CPU ratio the overhead)");
    }

    /// <summary>
    /// The machine's own parallel speed-up at this moment: a fixed amount of floating-point work in registers and the
    /// first-level cache (a recurrence per thread, no allocation, no shared data), done by one thread, then split
    /// over all cores; wall time of the one against the other. Shared hosts, frequency boost of a lone core and
    /// neighbours' load all show in it.
    /// </summary>
    private static double MachineScaling()
    {
        int threads = Environment.ProcessorCount;
        const long total = 400_000_000;
        static double Work(long steps)
        {
            double a = 1.0000001, b = 0.9999999, c = 0.5, d = 0.25;
            for (long i = 0; i < steps; i++)
            {
                a = a * b + 1e-9; b = b * c + 0.5; c = c * d + 0.4; d = d * a + 1e-3;
            }
            return a + b + c + d;
        }
        Work(1_000_000);
        var sw = Stopwatch.StartNew();
        double sink = Work(total);
        double one = sw.Elapsed.TotalSeconds;
        sw.Restart();
        var parts = new Thread[threads];
        var sums = new double[threads];
        for (int t = 0; t < threads; t++)
        {
            int k = t;
            parts[t] = new Thread(() => sums[k] = Work(total / threads));
            parts[t].Start();
        }
        foreach (var t in parts) t.Join();
        double all = sw.Elapsed.TotalSeconds;
        return double.IsNaN(sink + sums.Sum()) ? double.NaN : one / all;
    }

    /// <summary>Collections per generation, bytes allocated and time paused by the collector, to compare two runs.</summary>
    private readonly record struct GcFigures(int Gen0, int Gen1, int Gen2, long Allocated, TimeSpan Paused)
    {
        public static GcFigures Now() => new(GC.CollectionCount(0), GC.CollectionCount(1), GC.CollectionCount(2), GC.GetTotalAllocatedBytes(), GC.GetTotalPauseDuration());

        public static GcFigures operator -(GcFigures a, GcFigures b) => new(a.Gen0 - b.Gen0, a.Gen1 - b.Gen1, a.Gen2 - b.Gen2, a.Allocated - b.Allocated, a.Paused - b.Paused);

        public override string ToString() => string.Create(CultureInfo.InvariantCulture,
            $"{Allocated / 1048576.0:F0} MB allocated, collections {Gen0}/{Gen1}/{Gen2} (gen 0/1/2), paused {Paused.TotalSeconds:F2} s");
    }
}
