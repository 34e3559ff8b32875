using System.Diagnostics;
using System.Globalization;
using SectionTwist.Sparse;

namespace SectionTwist.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/SectionTwist.Benchmarks -- native [m] [runs] [driver]</c>: our sparse
/// Cholesky against CHOLMOD's supernodal factorization with AMD and OpenBLAS (2 threads) on the reference problem,
/// side by side: the matrix is written as a Matrix Market file, then native and ours run alternately <c>runs</c> times
/// (default 3) in this one process and its child, so both see the same machine load. Each run is analyse + factorize
/// + solve of A x = A 1; the best wall time of each is compared (processor time is printed too: the native run's
/// includes both BLAS threads). The driver is <c>native/cholmod_bench</c> (built by <c>native/build.sh</c>).
/// </summary>
public static class NativeRun
{
    public static void Run(int m, int runs, string? driver)
    {
        var inv = CultureInfo.InvariantCulture;
        driver ??= FindDriver();
        var a = ReferenceProblems.P2Laplacian(m, out var coords);
        string file = Path.Combine(Path.GetTempPath(), $"sectiontwist-p2-m{m}.mtx");
        MatrixMarket.WriteSymmetric(a, file);
        var ones = new double[a.N];
        Array.Fill(ones, 1.0);
        var b = new double[a.N];
        a.Multiply(ones, b);
        Console.WriteLine(string.Create(inv, $"P2 Laplacian m = {m}: {a.N:N0} unknowns, {a.NonZeros:N0} nonzeros; native driver {driver}; {file}"));
        Console.WriteLine($"load: {LoadAverage()}");
        Ours(a, coords, b, FillOrdering.Amd); // JIT warm-up at full size
        var best = new Dictionary<string, (double Wall, double Cpu)>();
        for (int r = 0; r < runs; r++)
        {
            var (nw, nc, nline) = Native(driver, file);
            Console.WriteLine($"  native   run {r + 1}: {nline}");
            Keep(best, "native", nw, nc);
            foreach (var ord in new[] { FillOrdering.Amd, FillOrdering.Auto })
            {
                var (w, c, line) = Ours(a, coords, b, ord);
                Console.WriteLine($"  ours {(ord == FillOrdering.Amd ? "amd" : "auto"),-4}run {r + 1}: {line}");
                Keep(best, ord == FillOrdering.Amd ? "ours amd" : "ours auto", w, c);
            }
        }
        Console.WriteLine($"load: {LoadAverage()}");
        var n0 = best["native"];
        foreach (var (k, v) in best)
            Console.WriteLine(string.Create(inv, $"  best {k,-10} wall {v.Wall:F3} s  cpu {v.Cpu:F3} s  ratio to native: wall {v.Wall / n0.Wall:F2}, cpu {v.Cpu / n0.Cpu:F2}"));
    }

    private static void Keep(Dictionary<string, (double Wall, double Cpu)> best, string key, double wall, double cpu)
        => best[key] = best.TryGetValue(key, out var v) ? (Math.Min(v.Wall, wall), Math.Min(v.Cpu, cpu)) : (wall, cpu);

    private static (double Wall, double Cpu, string Line) Ours(CscMatrix a, double[] coords, double[] b, FillOrdering ordering)
    {
        var inv = CultureInfo.InvariantCulture;
        var x = new double[a.N];
        using var proc = Process.GetCurrentProcess();
        var cpu0 = proc.TotalProcessorTime;
        var sw = Stopwatch.StartNew();
        var s = SymbolicCholesky.Analyze(a, ordering, coords);
        _ = s.Supernodes;
        double tA = sw.Elapsed.TotalSeconds;
        var f = SpdSolver.Factorize(s, a);
        double tF = sw.Elapsed.TotalSeconds;
        f.Solve(b, x);
        double tS = sw.Elapsed.TotalSeconds;
        proc.Refresh();
        double cpu = (proc.TotalProcessorTime - cpu0).TotalSeconds;
        double res = a.RelativeResidual(x, b);
        return (tS, cpu, string.Create(inv,
            $"analyze {tA:F4} factorize {tF - tA:F4} solve {tS - tF:F4} total {tS:F4} cpu {cpu:F4} residual {res:E2} nnzL {s.NonZerosL} flops {s.Flops:E3}"));
    }

    private static (double Wall, double Cpu, string Line) Native(string driver, string file)
    {
        var psi = new ProcessStartInfo(driver, [file, "1"]) { RedirectStandardOutput = true, UseShellExecute = false };
        psi.Environment["OPENBLAS_NUM_THREADS"] = "2";
        using var p = Process.Start(psi) ?? throw new InvalidOperationException($"cannot start {driver}");
        string output = p.StandardOutput.ReadToEnd();
        p.WaitForExit();
        if (p.ExitCode != 0) throw new InvalidOperationException($"{driver} exited with {p.ExitCode}");
        string line = output.Split('\n').First(l => l.StartsWith("run ", StringComparison.Ordinal));
        var parts = line.Split(' ');
        double Field(string name) => double.Parse(parts[Array.IndexOf(parts, name) + 1], CultureInfo.InvariantCulture);
        return (Field("total"), Field("cpu"), line[(line.IndexOf(' ', 4) + 1)..]);
    }

    private static string FindDriver()
    {
        for (var d = new DirectoryInfo(AppContext.BaseDirectory); d is not null; d = d.Parent)
        {
            string p = Path.Combine(d.FullName, "native", "cholmod_bench");
            if (File.Exists(p)) return p;
            p = Path.Combine(d.FullName, "tests", "SectionTwist.Benchmarks", "native", "cholmod_bench");
            if (File.Exists(p)) return p;
        }
        throw new FileNotFoundException("native/cholmod_bench not found: run tests/SectionTwist.Benchmarks/native/build.sh");
    }

    private static string LoadAverage()
        => File.Exists("/proc/loadavg") ? File.ReadAllText("/proc/loadavg").Trim() : "unknown";
}
