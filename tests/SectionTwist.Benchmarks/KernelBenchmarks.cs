using BenchmarkDotNet.Attributes;
using BenchmarkDotNet.Engines;
using BenchmarkDotNet.Jobs;
using SectionTwist.Meshing;
using SectionTwist.Profiles;
using SectionTwist.Sparse;
using SectionTwist.Torsion;

namespace SectionTwist.Benchmarks;

/// <summary>
/// The kernels of one analysis pass on the keyed 40 mm shaft (0.4 mm fillets) at the fine accuracy's mesh size, each
/// alone: numeric Cholesky factorization (symbolic analysis reused), CG with the multigrid preconditioner, element
/// assembly, uniform mesh refinement, and the whole fine solve direct (baseline) against CG with the two-grid cycle. A short job (3 warm-ups,
/// 5 iterations) so the whole class runs in a few minutes: <c>dotnet run -c Release -- --filter *KernelBenchmarks*</c>.
/// </summary>
[MemoryDiagnoser]
[SimpleJob(RunStrategy.Throughput, launchCount: 1, warmupCount: 3, iterationCount: 5)]
public class KernelBenchmarks
{
    private Mesh _coarse = null!, _fine = null!;
    private double[] _holeArea = [];
    private CscMatrix _k = null!;
    private SymbolicCholesky _symbolic = null!;
    private double[] _b = [], _x = [];
    private TorsionSolution _coarseSolution = null!;

    [GlobalSetup]
    public void Setup()
    {
        var profile = ProfileTemplates.Create("keyed:d=40,r=0.4");
        _holeArea = profile.Regions.SelectMany(r => r.Loops).Select(l => Math.Abs(l.SignedArea)).ToArray();
        _coarse = Mesher.Generate(profile, new MeshOptions { MaxEdgeLength = 0.0007, MaxArcAngleDegrees = 15 });
        _fine = MeshRefinement.Uniform(_coarse);
        _k = FineMatrix(_fine, out _b);
        _symbolic = SymbolicCholesky.Analyze(_k, FillOrdering.Auto, null, default);
        _x = new double[_k.N];
        _coarseSolution = TorsionSolver.Solve(_coarse, _holeArea, default, 1e-11, keepFactor: true);
    }

    /// <summary>The fine system: stiffness and load of the stress-function problem, by a solve's own assembly path.</summary>
    private static CscMatrix FineMatrix(Mesh mesh, out double[] load)
    {
        var dof = new int[mesh.NodeCount];
        int n = 0;
        for (int i = 0; i < mesh.NodeCount; i++) dof[i] = mesh.NodeLoop[i] < 0 ? n++ : -1;
        var trip = new TripletMatrix(n, mesh.ElementCount * 36);
        Span<double> ke = stackalloc double[36], fe = stackalloc double[6], xe = stackalloc double[6], ye = stackalloc double[6];
        load = new double[n];
        for (int e = 0; e < mesh.ElementCount; e++)
        {
            TorsionSolver.Gather(mesh, e, xe, ye);
            TorsionSolver.ElementMatrices(xe, ye, ke, fe);
            for (int a = 0; a < 6; a++)
            {
                int da = dof[mesh.Elements[6 * e + a]];
                if (da < 0) continue;
                load[da] += fe[a];
                for (int c = 0; c < 6; c++) { int db = dof[mesh.Elements[6 * e + c]]; if (db >= 0) trip.Add(da, db, ke[6 * a + c]); }
            }
        }
        return trip.ToCsc();
    }

    [Benchmark]
    public int Assembly() => FineMatrix(_fine, out _).NonZeros;

    [Benchmark]
    public void CholeskyNumeric() => SpdSolver.Factorize(_symbolic, _k).Solve(_b, _x);

    [Benchmark]
    public void AmgCg() => AmgCgSolver.Create(_k, 1e-10).Solve(_b, _x);

    /// <summary>The whole fine solve (assembly, direct solve, flux recovery) as before the two-grid path.</summary>
    [Benchmark(Baseline = true)]
    public double FineSolveDirect() => TorsionSolver.Solve(_fine, _holeArea, default, 1e-10).J;

    /// <summary>The same solve by CG with the two-grid cycle from the coarse solution (coarse factorization reused).</summary>
    [Benchmark]
    public double FineSolveTwoGrid()
    {
        _coarseSolution.Factor ??= TorsionSolver.Solve(_coarse, _holeArea, default, 1e-11, keepFactor: true).Factor;
        return TorsionSolver.Solve(_fine, _holeArea, default, 1e-10, parent: _coarseSolution).J;
    }

    [Benchmark]
    public int UniformRefinement() => MeshRefinement.Uniform(_coarse).ElementCount;
}
