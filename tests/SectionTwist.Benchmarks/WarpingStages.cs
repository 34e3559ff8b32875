using System.Diagnostics;
using System.Globalization;
using SectionTwist.Import;
using SectionTwist.Meshing;
using SectionTwist.Sparse;
using SectionTwist.Torsion;
using SectionTwist.Warping;

namespace SectionTwist.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/SectionTwist.Benchmarks -- warping-stages [accuracy] [repeats] [specs...]</c>:
/// where the warping extra of <see cref="WarpingRun"/> goes, stage by stage (stopwatch, best of the repeats), on the
/// first-pass mesh pair of each section (the pair the analysis ends on when one pass meets the accuracy, as at 1e-4 for
/// the open sections of <see cref="WarpingRun"/>): the stress-function solves without and with the shared matrix, the
/// whole warping step (both meshes), and on each mesh the parts of the warping solve: the symbolic analysis of the
/// Neumann system read through the map, the supernode partition, the numeric factorization, one solve and the whole
/// solve with its integration and warping-shear passes.
/// </summary>
public static class WarpingStages
{
    private static readonly string[] DefaultSpecs = ["upn:100", "channel:h=120,b=50,tw=4,tf=6,r=6"];

    public static void Run(double accuracy, int repeats, string[] specs)
    {
        var inv = CultureInfo.InvariantCulture;
        if (specs.Length == 0) specs = DefaultSpecs;
        Console.WriteLine(string.Create(inv, $"warping stages at accuracy {accuracy:G2}, best of {repeats} (stopwatch, ms)"));
        foreach (string spec in specs)
        {
            var profile = ProfileSources.Load(spec);
            double size = Math.Sqrt(profile.Properties.Area);
            // the first pass's mesh as SectionAnalysis sizes it (no singular corner on these sections)
            double h = Math.Min(SectionAnalysis.FirstMeshFactor(accuracy) * size * Math.Pow(accuracy, 0.25), profile.Bounds.Diagonal / 8);
            double arc = Math.Clamp(30 * Math.Pow(accuracy / 1e-4, 0.125), 10, AdaptiveSizing.PeakEdgeTurn * 180 / Math.PI);
            var coarseMesh = Mesher.Generate(profile, new MeshOptions { MaxEdgeLength = h, MaxArcAngleDegrees = arc });
            var fineMesh = MeshRefinement.Uniform(coarseMesh);
            var holes = profile.Regions.SelectMany(r => r.Loops).Select(l => Math.Abs(l.SignedArea)).ToArray();
            double tol = SectionAnalysis.SolverTolerance(accuracy);
            var best = new Dictionary<string, double>();
            var sw = new Stopwatch();
            void Lap(string stage)
            {
                best[stage] = Math.Min(best.GetValueOrDefault(stage, double.MaxValue), sw.Elapsed.TotalMilliseconds);
                sw.Restart();
            }
            for (int r = 0; r < repeats + 1; r++) // the first round JIT-compiles
            {
                GC.Collect();
                sw.Restart();
                var pc = TorsionSolver.Solve(coarseMesh, holes, default, tol, keepFactor: true);
                Lap("stress function, coarse, own matrix");
                TorsionSolver.Solve(fineMesh, holes, default, tol, parent: pc);
                Lap("stress function, fine, own matrix");
                var sc = TorsionSolver.Solve(coarseMesh, holes, default, tol, shareLaplacian: true, keepFactor: true);
                Lap("stress function, coarse, shared matrix");
                var sf = TorsionSolver.Solve(fineMesh, holes, default, tol, shareLaplacian: true, parent: sc);
                Lap("stress function, fine, shared matrix");
                WarpingProperties.Compute(sc, sf, profile.Properties, sf.J, false, default);
                Lap("warping step, both meshes");
                foreach (var (name, s) in new[] { ("coarse", sc), ("fine", sf) })
                {
                    var lap = s.Laplacian!;
                    int nodes = s.Mesh.NodeCount, n = nodes - 1, fixedNode = lap.LastNode(default);
                    var map = new int[nodes];
                    for (int i = 0; i < nodes; i++) map[i] = i < fixedNode ? i : i - 1;
                    map[fixedNode] = -1;
                    GC.Collect();
                    sw.Restart();
                    var symbolic = SymbolicCholesky.AnalyzeRestricted(lap.Matrix, map, n, CscRestriction.RestrictOrder(lap.Order(default), map, n));
                    Lap($"{name}: Neumann symbolic analysis");
                    _ = symbolic.Supernodes;
                    Lap($"{name}: Neumann supernodes");
                    var solver = SpdSolver.Factorize(symbolic, lap.Matrix);
                    Lap($"{name}: Neumann numeric ({(solver is SupernodalCholesky ? "supernodal" : "simplicial")})");
                    var b = new double[n];
                    b[0] = 1;
                    solver.Solve(b, new double[n]);
                    Lap($"{name}: one solve");
                    WarpingShear.Solve(s.Mesh, map, solver, new double[nodes], default);
                    Lap($"{name}: warping shear (solve and gradient pass)");
                    GC.Collect();
                    sw.Restart();
                    WarpingSolver.Solve(s.Mesh, profile.Properties.Centroid, default, lap);
                    Lap($"{name}: whole warping solve");
                }
            }
            Console.WriteLine(string.Create(inv, $"{spec}: coarse {coarseMesh.NodeCount:N0} nodes, fine {fineMesh.NodeCount:N0} nodes"));
            foreach (var (stage, ms) in best) Console.WriteLine(string.Create(inv, $"  {stage,-52} {ms,7:F2}"));
        }
    }
}
