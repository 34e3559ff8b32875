using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Import;
using SectionTwist.Meshing;
using SectionTwist.Torsion;

namespace SectionTwist.Benchmarks;

/// <summary>scratch: observed orders from three uniformly refined meshes.</summary>
public static class Orders
{
    public static void Run(string[] specs, double hFrac)
    {
        var inv = CultureInfo.InvariantCulture;
        foreach (var spec in specs)
        {
            var profile = ProfileSources.Load(spec);
            var holeArea = profile.Regions.SelectMany(r => r.Loops).Select(l => Math.Abs(l.SignedArea)).ToArray();
            double h = hFrac * Math.Sqrt(profile.Properties.Area);
            var m0 = Mesher.Generate(profile, new MeshOptions { MaxEdgeLength = h, MaxArcAngleDegrees = 30 });
            var m1 = MeshRefinement.Uniform(m0);
            var m2 = MeshRefinement.Uniform(m1);
            var m3 = MeshRefinement.Uniform(m2);
            var s = new[] { m0, m1, m2, m3 }.Select(m => TorsionSolver.Solve(m, holeArea)).ToArray();
            double[] j = s.Select(x => x.J).ToArray();
            double[] t = s.Select(x => x.MaxGradient / x.J).ToArray();
            double p1 = Math.Log2((j[1] - j[0]) / (j[2] - j[1])), p2 = Math.Log2((j[2] - j[1]) / (j[3] - j[2]));
            double q1 = Math.Log2(Math.Abs(t[1] - t[0]) / Math.Abs(t[2] - t[1])), q2 = Math.Log2(Math.Abs(t[2] - t[1]) / Math.Abs(t[3] - t[2]));
            var corners = CornerAnalysis.Corners(profile);
            double pObs = p2;
            double jRef = j[3] + (j[3] - j[2]) / (Math.Pow(2, pObs) - 1);
            var e01 = RichardsonEstimate.Compute(s[0], s[1], corners);
            var e12 = RichardsonEstimate.Compute(s[1], s[2], corners);
            Console.WriteLine(string.Create(inv, $"   est/true fine(1) {e01.FineError / (jRef - j[1]):F2}  fine(2) {e12.FineError / (jRef - j[2]):F2}   extrap err {(j[1] + e01.Correction - jRef) / jRef:E1} {(j[2] + e12.Correction - jRef) / jRef:E1}  peff {e01.EffectiveOrder:F2} {e12.EffectiveOrder:F2} min {CornerAnalysis.LowestOrder(corners):F2}"));
            string angles = string.Join(" ", corners.Select(c => (c.InteriorAngle * 180 / Math.PI).ToString("F0", inv)).Distinct());
            Console.WriteLine(string.Create(inv, $"{(spec.Length > 40 ? spec[..40] : spec),-40} el {m0.ElementCount,6} J orders {p1,5:F2} {p2,5:F2}  dJ {(j[1]-j[0])/j[3]:E1} {(j[2]-j[1])/j[3]:E1} {(j[3]-j[2])/j[3]:E1} | tau orders {q1,5:F2} {q2,5:F2} dt {(t[1]-t[0])/t[3]:E1} {(t[2]-t[1])/t[3]:E1} {(t[3]-t[2])/t[3]:E1} | corners {angles}"));
        }
    }
}
