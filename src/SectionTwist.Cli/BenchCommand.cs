using System.Globalization;
using SectionTwist.Sparse;
using SectionTwist.Units;

namespace SectionTwist.Cli;

/// <summary>
/// <c>sectiontwist bench</c>: quick timings of the sparse solver on the fixed reference problem (P2 Laplacian on the
/// unit square). The Math.NET baseline and BenchmarkDotNet runs live in tests/SectionTwist.Benchmarks so the shipped
/// tool carries no benchmark-only dependency.
/// </summary>
internal sealed class BenchCommand : ICommand
{
    public string Name => "bench";

    public string Summary => "time the sparse solver on the reference P2 Laplacian (1e4 to 1e6 unknowns)";

    public string Usage => """
        sectiontwist bench [--m 50,158,500] [--solver auto|direct|amg] [--sections only|skip]
          Assembles the P2 Laplacian on the unit square (m x m squares, two triangles each, Dirichlet boundary
          removed: (2m-1)^2 unknowns), solves A x = A 1 and prints assembly, set-up, factor and solve times, the
          relative residual, allocated bytes and the peak working set, then the growth exponent between sizes.
          --m       grid sizes, comma separated (default 50,158,500: 9,801 / 99,225 / 998,001 unknowns)
          --solver  auto (Cholesky up to 2e5 unknowns, multigrid-CG above), direct or amg (default auto)
          --sections  also time the whole analysis to J within 1e-4 for keyed, square hollow and splined sections
                      and check the error against a 1e-6 reference solve, whose time is shown too (default:
                      included; 'only' skips the reference problem, 'skip' skips the sections)
          The last line accounts for the wall time: timed runs, warm-up (compiling the kernels) and reference solves.
        """;

    public int Run(Args args, CliContext context)
    {
        string ms = args.Option("m") ?? "50,158,500";
        string solverName = args.Option("solver") ?? "auto";
        string sections = args.Option("sections") ?? "yes";
        args.EnsureAllUsed();
        if (sections is not ("yes" or "only" or "skip")) throw new UsageException($"--sections: '{sections}' is not one of only, skip");
        if (sections == "only") { SectionBench.Run(context.Out, context); return 0; }
        var solver = solverName switch
        {
            "auto" => BenchSolver.Auto,
            "direct" => BenchSolver.Direct,
            "amg" => BenchSolver.AmgCg,
            _ => throw new UsageException($"--solver: '{solverName}' is not one of auto, direct, amg"),
        };
        var sizes = new List<int>();
        foreach (var part in ms.Split(',', StringSplitOptions.RemoveEmptyEntries | StringSplitOptions.TrimEntries))
        {
            if (!int.TryParse(part, NumberStyles.Integer, CultureInfo.InvariantCulture, out int m) || m < 2 || m > 1200)
                throw new UsageException($"--m: '{part}' is not a grid size between 2 and 1200");
            sizes.Add(m);
        }
        var w = context.Out;
        var inv = CultureInfo.InvariantCulture;
        w.WriteLine(string.Create(inv, $"reference problem: P2 Laplacian, unit square, {Environment.ProcessorCount} cores, {System.Numerics.Vector<double>.Count}-wide SIMD"));
        w.WriteLine("       m   unknowns        nnz  method     assembly    set-up    factor     solve  set-up+solve  rel.resid  alloc MB  peak WS MB");
        var wall = System.Diagnostics.Stopwatch.StartNew();
        var ct = context.Cancellation;
        ReferenceBenchmark.Run(12, BenchSolver.Direct, ct); // compile the kernels before timing
        ReferenceBenchmark.Run(40, BenchSolver.AmgCg, ct);
        double warmUp = wall.Elapsed.TotalSeconds;
        var results = new List<BenchResult>();
        using var progress = new ProgressLine(context, "bench reference problem");
        foreach (int m in sizes)
        {
            ct.ThrowIfCancellationRequested();
            progress.Report((double)results.Count / sizes.Count, $"m = {m}");
            var r = ReferenceBenchmark.Run(m, solver, ct);
            progress.Clear();
            results.Add(r);
            w.WriteLine(string.Create(inv,
                $"{r.M,8} {r.Unknowns,10:N0} {r.NonZeros,10:N0}  {r.Method,-8} {r.Assembly,9:F3}s {r.Setup,8:F3}s {r.Factor,8:F3}s {r.Solve,8:F3}s {r.SolveTotal,12:F3}s  {NumberText.Exponent(r.RelativeResidual),9} {r.AllocatedBytes / 1048576.0,9:F0} {r.PeakWorkingSet / 1048576.0,11:F0}"));
            w.WriteLine($"         {r.Detail}");
        }
        for (int i = 1; i < results.Count; i++)
        {
            var (p, q) = (results[i - 1], results[i]);
            double e = Math.Log(q.SolveTotal / p.SolveTotal) / Math.Log((double)q.Unknowns / p.Unknowns);
            w.WriteLine(string.Create(inv, $"growth {p.Unknowns:N0} -> {q.Unknowns:N0} unknowns: time ~ N^{e:F2}"));
        }
        if (results.Count > 2)
        {
            var (p, q) = (results[0], results[^1]);
            double e = Math.Log(q.SolveTotal / p.SolveTotal) / Math.Log((double)q.Unknowns / p.Unknowns);
            w.WriteLine(string.Create(inv, $"growth {p.Unknowns:N0} -> {q.Unknowns:N0} unknowns: time ~ N^{e:F2}"));
        }
        double problem = wall.Elapsed.TotalSeconds;
        w.WriteLine(string.Create(inv, $"wall time {problem:F1} s: timed runs {results.Sum(r => r.Assembly + r.Setup + r.Factor + r.Solve):F1} s, warm-up {warmUp:F1} s, residual checks and set-up of each size {Math.Max(0, problem - warmUp - results.Sum(r => r.Assembly + r.Setup + r.Factor + r.Solve)):F1} s"));
        if (sections == "yes") SectionBench.Run(w, context);
        return 0;
    }
}
