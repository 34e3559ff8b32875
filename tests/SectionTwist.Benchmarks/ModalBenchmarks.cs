using System.Diagnostics;
using System.Globalization;
using BenchmarkDotNet.Attributes;
using SectionTwist.Dynamics;
using SectionTwist.Shaft;

namespace SectionTwist.Benchmarks;

/// <summary>
/// The lowest 10 torsional modes of a 200-station drivetrain (goal: under 50 ms of solve time): a 160-station main shaft
/// and two 20-station branches driven through gear stages, a disc at every station, one element per 0.1 m segment after
/// the automatic subdivision (benchmark data, invented).
/// <c>dotnet run -c Release --project tests/SectionTwist.Benchmarks -- --filter *ModalBenchmarks*</c>, or <c>modes</c> for a quick
/// stopwatch run.
/// </summary>
[MemoryDiagnoser]
public class ModalBenchmarks
{
    private DrivetrainModel _model = null!;

    [GlobalSetup]
    public void Setup() => _model = Train();

    [Benchmark]
    public ModalResult LowestTenModes() => ModalAnalysis.Solve(_model, new ModalOptions { ModeCount = 10 });

    /// <summary>The benchmark train: 200 stations.</summary>
    public static DrivetrainModel Train()
    {
        var steel = new Material("steel", 79.3e9, null, null, "benchmark") { Density = 7850 };
        ShaftBranch Chain(string name, int n, double d)
        {
            var st = Enumerable.Range(0, n).Select(i => new Station($"{name}{i}", 0.1 * i)).ToList();
            var seg = Enumerable.Range(0, n - 1).Select(i => new ShaftSegment(st[i].Name, st[i + 1].Name, SectionStiffness.Round(d), steel)).ToList();
            return new ShaftBranch(name, new ShaftModel { Stations = st, Segments = seg });
        }
        var shafts = new List<ShaftBranch> { Chain("m", 160, 0.06), Chain("a", 20, 0.05), Chain("b", 20, 0.04) };
        var inertias = shafts.SelectMany(s => s.Model.Stations).Select((s, i) => new PointInertia(s.Name, 0.03 + 0.002 * (i % 7))).ToList();
        return new DrivetrainModel
        {
            Shafts = shafts,
            Inertias = inertias,
            Stages = [new GearStage("m159", "a0", 2.5), new GearStage("m80", "b0", 1.8) { MeshStiffness = 4e5 }],
        };
    }

    /// <summary>A quick run: median of 30 solves after warm-up.</summary>
    public static void Quick()
    {
        var model = Train();
        var options = new ModalOptions { ModeCount = 10 };
        var r = ModalAnalysis.Solve(model, options);
        for (int i = 0; i < 5; i++) ModalAnalysis.Solve(model, options);
        var times = new List<double>();
        for (int i = 0; i < 30; i++)
        {
            var sw = Stopwatch.StartNew();
            ModalAnalysis.Solve(model, options);
            times.Add(sw.Elapsed.TotalMilliseconds);
        }
        times.Sort();
        var top = new DrivetrainTopology(model);
        var ne = Enumerable.Repeat(1, top.Segments.Count).ToArray();
        double tMat = 0, tEig = 0, minMat = double.MaxValue, minEig = double.MaxValue;
        for (int i = 0; i < 20; i++)
        {
            var sw = Stopwatch.StartNew();
            var mats = new TrainMatrices(top, ne);
            var (k, m) = mats.Assemble();
            double a = sw.Elapsed.TotalMilliseconds;
            tMat += a; minMat = Math.Min(minMat, a);
            sw.Restart();
            SymmetricDefiniteEigen.Solve(k, m, mats.Count, 11, _ => "");
            double b = sw.Elapsed.TotalMilliseconds;
            tEig += b; minEig = Math.Min(minEig, b);
        }
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  matrices {tMat / 20:F1} ms, eigen {tEig / 20:F1} ms (means); min {minMat:F1} ms and {minEig:F1} ms"));
        // the part of the eigen time that is the dense standard problem (Householder tridiagonalisation, bisection, inverse
        // iteration) on a symmetric matrix of the same size; the rest is the Cholesky reduction and the back-transformation
        int nn = top.Stations.Count - 1;
        var rnd = new Random(1);
        var sym = new double[nn * nn];
        for (int i = 0; i < nn; i++) for (int j = 0; j <= i; j++) sym[i * nn + j] = sym[j * nn + i] = rnd.NextDouble();
        var tStd = new List<double>();
        for (int i = 0; i < 20; i++)
        {
            var copy = (double[])sym.Clone();
            var sw = Stopwatch.StartNew();
            LowestEigenpairs.Solve(copy, nn, 11);
            tStd.Add(sw.Elapsed.TotalMilliseconds);
        }
        tStd.Sort();
        Console.WriteLine(string.Create(CultureInfo.InvariantCulture, $"  of which the dense standard problem ({nn} x {nn}, 11 pairs): median {tStd[10]:F1} ms, min {tStd[0]:F1} ms"));
        var inv = CultureInfo.InvariantCulture;
        Console.WriteLine(string.Create(inv, $"200-station drivetrain, lowest 10 modes: {r.Unknowns} unknowns, {r.RigidBodyModes} rigid-body mode(s), " +
            $"f = {r.ElasticModes.First().Frequency:G4} .. {r.Modes[^1].Frequency:G4} Hz, estimated error {r.EstimatedError:P3}"));
        Console.WriteLine(string.Create(inv, $"  solve time: median {times[15]:F1} ms, min {times[0]:F1} ms, max {times[^1]:F1} ms (30 runs)"));
    }
}
