using BenchmarkDotNet.Attributes;
using SectionTwist.Sparse;

namespace SectionTwist.Benchmarks;

/// <summary>Set-up plus solve of the reference P2 Laplacian (assembly excluded) for each solver and size.</summary>
[MemoryDiagnoser]
public class SolverBenchmarks
{
    private CscMatrix _a = null!;
    private double[] _coords = [];
    private double[] _b = [];
    private double[] _x = [];

    /// <summary>Grid size: 50, 158, 500 give 9,801, 99,225 and 998,001 unknowns.</summary>
    [Params(50, 158, 500)]
    public int M { get; set; }

    [GlobalSetup]
    public void Setup()
    {
        _a = ReferenceProblems.P2Laplacian(M, out _coords);
        var ones = new double[_a.N];
        Array.Fill(ones, 1.0);
        _b = new double[_a.N];
        _a.Multiply(ones, _b);
        _x = new double[_a.N];
    }

    [Benchmark(Baseline = true)]
    public void AmgCg() => AmgCgSolver.Create(_a, 1e-10).Solve(_b, _x);

    [Benchmark]
    public void Cholesky()
    {
        if (M > 200) return; // direct factorization is for the small and mid sizes
        SpdSolver.CreateDirect(_a, default, _coords).Solve(_b, _x);
    }

    [Benchmark]
    public void MathNetBiCgStabIlu0()
    {
        if (M > 200) return; // the baseline takes minutes at 1e6 unknowns
        MathNetBaseline.Solve(_a, _b, 1e-11, stockIlu0: false);
    }
}

/// <summary>Assembly of the reference problem (triplets to compressed columns).</summary>
[MemoryDiagnoser]
public class AssemblyBenchmarks
{
    [Params(158, 500)]
    public int M { get; set; }

    [Benchmark]
    public int Assemble() => ReferenceProblems.P2Laplacian(M, out _).NonZeros;
}
