using System.Diagnostics;

namespace SectionTwist.Sparse;

/// <summary>Which solver a benchmark run uses.</summary>
internal enum BenchSolver
{
    /// <summary>What <see cref="SpdSolver.Create(CscMatrix, CancellationToken)"/> picks for the size.</summary>
    Auto,
    /// <summary>Sparse Cholesky.</summary>
    Direct,
    /// <summary>Multigrid-preconditioned conjugate gradients.</summary>
    AmgCg,
}

/// <summary>Timings of one run of the reference problem (seconds, bytes).</summary>
internal sealed record BenchResult(int M, int Unknowns, long NonZeros, string Method, double Assembly, double Setup,
    double Factor, double Solve, double RelativeResidual, long AllocatedBytes, long PeakWorkingSet, string Detail)
{
    /// <summary>Set-up + factor + solve (assembly excluded).</summary>
    public double SolveTotal => Setup + Factor + Solve;
}

/// <summary>
/// Runs the fixed reference problem of issue 3 (<see cref="ReferenceProblems.P2Laplacian"/>) with right-hand side
/// b = A 1 (so the exact solution is known) and times assembly, ordering or hierarchy set-up, numeric factorization,
/// and solve.
/// </summary>
internal static class ReferenceBenchmark
{
    /// <summary>Runs one size.</summary>
    public static BenchResult Run(int m, BenchSolver solver, CancellationToken ct = default)
    {
        long alloc0 = GC.GetTotalAllocatedBytes(true);
        var sw = Stopwatch.StartNew();
        var a = ReferenceProblems.P2Laplacian(m, out var coords);
        double tAsm = sw.Elapsed.TotalSeconds;
        int n = a.N;
        var ones = new double[n];
        Array.Fill(ones, 1.0);
        var b = new double[n];
        a.Multiply(ones, b);
        var x = new double[n];
        if (solver == BenchSolver.Auto) solver = n > SpdSolver.IterativeThreshold ? BenchSolver.AmgCg : BenchSolver.Direct;
        double tSetup, tFactor, tSolve;
        string method, detail;
        if (solver == BenchSolver.Direct)
        {
            sw.Restart();
            var s = SymbolicCholesky.Analyze(a, FillOrdering.Auto, coords, ct);
            tSetup = sw.Elapsed.TotalSeconds;
            sw.Restart();
            var f = SpdSolver.Factorize(s, a, ct);
            tFactor = sw.Elapsed.TotalSeconds;
            sw.Restart();
            f.Solve(b, x);
            tSolve = sw.Elapsed.TotalSeconds;
            method = "cholesky";
            detail = $"nnz(L) {s.NonZerosL:N0}, flops {Units.NumberText.Exponent(s.Flops, 3)}";
        }
        else
        {
            sw.Restart();
            var cg = AmgCgSolver.Create(a, 1e-10, ct);
            tSetup = sw.Elapsed.TotalSeconds;
            tFactor = 0;
            sw.Restart();
            cg.Solve(b, x);
            tSolve = sw.Elapsed.TotalSeconds;
            method = "amg-cg";
            detail = $"{cg.Hierarchy.Levels.Count} levels, operator complexity {cg.Hierarchy.OperatorComplexity:F2}, {cg.LastIterations} iterations";
        }
        double res = a.RelativeResidual(x, b);
        long alloc = GC.GetTotalAllocatedBytes(true) - alloc0;
        using var proc = Process.GetCurrentProcess();
        proc.Refresh();
        return new BenchResult(m, n, a.NonZeros, method, tAsm, tSetup, tFactor, tSolve, res, alloc, proc.PeakWorkingSet64, detail);
    }
}
