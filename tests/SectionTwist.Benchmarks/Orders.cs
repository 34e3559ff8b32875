using System.Globalization;
using SectionTwist.Import;
using SectionTwist.Meshing;
using SectionTwist.Torsion;

namespace SectionTwist.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/SectionTwist.Benchmarks -- orders [h]</c>: observed convergence orders of
/// J and of the peak shear from four uniformly refined meshes (first mesh with edges of h times the square root of the
/// area, default 0.15), next to the order the corner rule assumes (<see cref="CornerAnalysis.Order(double)"/>), and the
/// Richardson estimate of each refined J (<see cref="RichardsonEstimate"/>, before the safety factor) over its true
/// error against the extrapolated limit of the sequence. Prints a Markdown table.
/// </summary>
public static class Orders
{
    public static void Run(double hFrac, IReadOnlyList<string>? specs = null)
    {
        var inv = CultureInfo.InvariantCulture;
        Console.WriteLine("| section | corners (deg) | rule order | observed J order (0-1-2, 1-2-3) | estimate / true error of J1, J2 | observed peak-shear order |");
        Console.WriteLine("|---|---|---|---|---|---|");
        foreach (var (name, spec) in specs?.Select(s => (s, s)) ?? Family())
        {
            var profile = ProfileSources.Load(spec);
            var holeArea = profile.Regions.SelectMany(r => r.Loops).Select(l => Math.Abs(l.SignedArea)).ToArray();
            double h = hFrac * Math.Sqrt(profile.Properties.Area);
            var meshes = new List<Mesh> { Mesher.Generate(profile, new MeshOptions { MaxEdgeLength = h, MaxArcAngleDegrees = 15 }) };
            for (int k = 0; k < 3; k++) meshes.Add(MeshRefinement.Uniform(meshes[^1]));
            var s = meshes.Select(m => TorsionSolver.Solve(m, holeArea)).ToArray();
            double[] j = s.Select(x => x.J).ToArray();
            double[] t = s.Select(x => x.MaxGradient / x.J).ToArray();
            double p1 = Math.Log2((j[1] - j[0]) / (j[2] - j[1])), p2 = Math.Log2((j[2] - j[1]) / (j[3] - j[2]));
            double q1 = Math.Log2(Math.Abs(t[1] - t[0]) / Math.Abs(t[2] - t[1])), q2 = Math.Log2(Math.Abs(t[2] - t[1]) / Math.Abs(t[3] - t[2]));
            var corners = CornerAnalysis.Corners(profile);
            double jRef = j[3] + (j[3] - j[2]) / (Math.Pow(2, p2) - 1);
            var e01 = RichardsonEstimate.Compute(s[0], s[1], corners);
            var e12 = RichardsonEstimate.Compute(s[1], s[2], corners);
            string angles = string.Join(" ", corners.Where(c => !c.CurvatureJump).Select(c => Math.Round(c.InteriorAngle * 180 / Math.PI)).Distinct().Order().Select(a => a.ToString(inv)))
                + (corners.Any(c => c.CurvatureJump) ? " tangent joints" : "");
            Console.WriteLine(string.Create(inv,
                $"| {name} | {angles} | {CornerAnalysis.LowestOrder(corners):F2} | {p1:F2}, {p2:F2} | {e01.FineError / (jRef - j[1]):F2}, {e12.FineError / (jRef - j[2]):F2} | {q1:F1}, {q2:F1} |"));
        }
    }

    private static IEnumerable<(string Name, string Spec)> Family()
    {
        string Regular(int n) => "polygon:" + string.Join(" ", Enumerable.Range(0, n).SelectMany(k => new[] { 20 * Math.Cos(2 * Math.PI * k / n), 20 * Math.Sin(2 * Math.PI * k / n) }).Select(v => v.ToString("R", CultureInfo.InvariantCulture)));
        yield return ("equilateral triangle", "triangle:a=30");
        yield return ("square", "square:s=20");
        yield return ("rectangle 4:1", "rect:b=40,h=10");
        foreach (int n in new[] { 5, 6, 8, 12, 18, 36, 72 }) yield return ($"regular {n}-gon", Regular(n));
        yield return ("rhombus 60/120", "polygon:0 0 30 0 45 25.98076211353316 15 25.98076211353316");
        yield return ("trapezoid 45/135", "polygon:0 0 40 0 30 10 10 10");
        yield return ("parallelogram 87/93", "polygon:0 0 10 0 10.5 10 0.5 10");
        yield return ("issue 20 pentagon", "polygon:0 0 40 0 40 10 20 25 0 10");
        yield return ("circle", "circle:d=40");
        yield return ("ellipse 4:1", "ellipse:a=20,b=5");
        yield return ("tube 40/30", "tube:D=40,d=30");
        yield return ("two flats", "flats:D=40,h=4,n=2");
        yield return ("keyed, r = 0.4", "keyed:d=40,r=0.4");
        yield return ("keyed, sharp", "keyed:d=40,r=0");
        yield return ("shs 80x5", "shs:B=80,t=5");
    }
}
