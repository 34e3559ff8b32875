using System.Globalization;
using SectionTwist.Sparse;

namespace SectionTwist.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/SectionTwist.Benchmarks -- quick [m]</c>: one pass over the reference
/// problem at m = 158 (99,225 unknowns, or the given m) with our solvers and with Math.NET BiCgStab + ILU0, each
/// solved to a 2-norm relative residual of at most 1e-10, and the ratio. <c>quick m stock</c> uses Math.NET's own
/// ILU0Preconditioner (quadratic in n: small m only).
/// </summary>
public static class QuickRun
{
    public static void Run(int m, bool stock)
    {
        var inv = CultureInfo.InvariantCulture;
        ReferenceBenchmark.Run(12, BenchSolver.Direct); // JIT warm-up
        ReferenceBenchmark.Run(12, BenchSolver.AmgCg);
        var direct = ReferenceBenchmark.Run(m, BenchSolver.Direct);
        var amg = ReferenceBenchmark.Run(m, BenchSolver.AmgCg);
        var a = ReferenceProblems.P2Laplacian(m, out _);
        var ones = new double[a.N];
        Array.Fill(ones, 1.0);
        var b = new double[a.N];
        a.Multiply(ones, b);
        // Math.NET's criterion is ||r||_inf <= tol ||b||_inf; tighten until the 2-norm relative residual is <= 1e-10.
        double tol = 1e-10;
        var mn = MathNetBaseline.Solve(a, b, tol, stock);
        while (mn.Residual > 1e-10 && tol > 1e-14) { tol /= 10; mn = MathNetBaseline.Solve(a, b, tol, stock); }
        Console.WriteLine(string.Create(inv, $"P2 Laplacian m = {m}: {a.N:N0} unknowns, {a.NonZeros:N0} nonzeros"));
        foreach (var r in new[] { direct, amg })
            Console.WriteLine(string.Create(inv, $"  {r.Method,-10} set-up {r.Setup:F3} s  factor {r.Factor:F3} s  solve {r.Solve:F3} s  total {r.SolveTotal:F3} s  residual {r.RelativeResidual:E1}  ({r.Detail})"));
        double mnTotal = mn.Setup + mn.Solve;
        Console.WriteLine(string.Create(inv, $"  math.net   BiCgStab+{(stock ? "stock ILU0" : "CSR ILU0")} set-up {mn.Setup:F3} s  solve {mn.Solve:F3} s  total {mnTotal:F3} s  residual {mn.Residual:E1}  ({mn.Iterations} iterations, criterion {tol:E0})"));
        double best = Math.Min(direct.SolveTotal, amg.SolveTotal);
        Console.WriteLine(string.Create(inv, $"  ratio math.net / cholesky = {mnTotal / direct.SolveTotal:F1}, math.net / amg-cg = {mnTotal / amg.SolveTotal:F1}, math.net / best = {mnTotal / best:F1}"));
    }
}
