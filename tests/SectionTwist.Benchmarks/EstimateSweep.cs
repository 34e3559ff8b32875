using System.Globalization;
using SectionTwist.Geometry;
using SectionTwist.Import;
using SectionTwist.Torsion;

namespace SectionTwist.Benchmarks;

/// <summary>
/// <c>dotnet run -c Release --project tests/SectionTwist.Benchmarks -- estimates</c>: the reported error estimates of J
/// and of the peak shear against the true errors, over polygons with corner angles from 30 to 170 deg and curved
/// sections, at accuracies 1e-3 to 1e-5 (or those given). The true error is taken against a closed form where one
/// exists (Timoshenko and Goodier, Theory of Elasticity, 3rd ed., ch. 10: circle, tube, ellipse, equilateral triangle;
/// the rectangle series of sec. 109), else against the same section solved at accuracy 1e-7 (or the one given), whose
/// own estimate is added: a pass needs estimate + reference estimate >= |value - reference|. Prints a Markdown table
/// and exits 1 if any estimate falls below its true error.
/// </summary>
public static class EstimateSweep
{
    private sealed record Case(string Name, string Spec, double? J = null, double? Tau = null);

    public static int Run(double[] accuracies, double referenceAccuracy, string? only)
    {
        var inv = CultureInfo.InvariantCulture;
        var cases = Cases().Where(c => only is null || c.Name.Contains(only, StringComparison.Ordinal)).ToList();
        Console.WriteLine("| section | corners (deg) | accuracy | J est. | J true | est./true | peak shear est. | peak shear true | est./true | elements |");
        Console.WriteLine("|---|---|---|---|---|---|---|---|---|---|");
        int fails = 0;
        foreach (var c in cases)
        {
            var profile = ProfileSources.Load(c.Spec);
            var corners = CornerAnalysis.Corners(profile);
            string angles = string.Join(" ", corners.Where(k => !k.CurvatureJump).Select(k => Math.Round(k.InteriorAngle * 180 / Math.PI)).Distinct().Order().Select(a => a.ToString(inv)))
                + (corners.Any(k => k.CurvatureJump) ? " tangent joints" : "");
            double jRef, tRef, jRefErr = 0, tRefErr = 0;
            if (c.J is { } jx && c.Tau is { } tx) { jRef = jx; tRef = tx; }
            else
            {
                var r = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = referenceAccuracy });
                jRef = r.TorsionConstant; tRef = r.MaxShearPerTorque;
                jRefErr = r.EstimatedRelativeError.TorsionConstant; tRefErr = r.EstimatedRelativeError.MaxShear;
            }
            foreach (double acc in accuracies)
            {
                var r = SectionAnalyzer.Analyze(profile, new AnalysisOptions { Accuracy = acc });
                double jt = Math.Abs(r.TorsionConstant - jRef) / jRef, tt = Math.Abs(r.MaxShearPerTorque - tRef) / tRef;
                double je = r.EstimatedRelativeError.TorsionConstant, te = r.EstimatedRelativeError.MaxShear;
                bool ok = je + jRefErr >= jt && (double.IsInfinity(te) || te + tRefErr >= tt);
                if (!ok) fails++;
                Console.WriteLine(string.Create(inv,
                    $"| {c.Name} | {angles} | {acc:0E0} | {je:0.0E0} | {jt:0.0E0} | {Ratio(je + jRefErr, jt)} | {te:0.0E0} | {tt:0.0E0} | {Ratio(te + tRefErr, tt)} | {r.Mesh.Elements:N0} |{(ok ? "" : " **below**")}"));
            }
        }
        Console.WriteLine(string.Create(inv, $"{fails} estimate(s) below the true error; reference accuracy {referenceAccuracy:0E0}"));
        return fails;
    }

    private static string Ratio(double est, double truth) =>
        double.IsInfinity(est) ? "unbounded" : truth < 1e-13 ? ">1e3" : (est / truth).ToString(est / truth >= 100 ? "F0" : "F1", CultureInfo.InvariantCulture);

    private static string Poly(params double[] xy) =>
        "polygon:" + string.Join(" ", xy.Select(v => v.ToString("R", CultureInfo.InvariantCulture)));

    private static string Regular(int n, double r) =>
        Poly(Enumerable.Range(0, n).SelectMany(k => new[] { r * Math.Cos(2 * Math.PI * k / n), r * Math.Sin(2 * Math.PI * k / n) }).ToArray());

    private static string Rhombus(double acuteDeg, double side)
    {
        double a = acuteDeg * Math.PI / 180;
        return Poly(0, 0, side, 0, side + side * Math.Cos(a), side * Math.Sin(a), side * Math.Cos(a), side * Math.Sin(a));
    }

    private static string Trapezoid(double baseAngleDeg, double bottom, double height)
    {
        double run = height / Math.Tan(baseAngleDeg * Math.PI / 180);
        return Poly(0, 0, bottom, 0, bottom - run, height, run, height);
    }

    private static IEnumerable<Case> Cases()
    {
        // exact J and peak shear per unit torque (Timoshenko and Goodier ch. 10), SI
        double d = 0.040;
        yield return new Case("circle d40", "circle:d=40", Math.PI * Math.Pow(d, 4) / 32, 16 / (Math.PI * d * d * d));
        double D = 0.050, di = 0.036;
        yield return new Case("tube 50/36", "tube:D=50,d=36", Math.PI * (Math.Pow(D, 4) - Math.Pow(di, 4)) / 32, 16 * D / (Math.PI * (Math.Pow(D, 4) - Math.Pow(di, 4))));
        foreach (double ratio in new[] { 2.0, 4.0 })
        {
            double a = 0.020, b = a / ratio;
            yield return new Case($"ellipse {ratio}:1", string.Create(CultureInfo.InvariantCulture, $"ellipse:a=20,b={20 / ratio}"),
                Math.PI * Math.Pow(a * b, 3) / (a * a + b * b), 2 / (Math.PI * a * b * b));
        }
        double s = 0.030;
        yield return new Case("triangle (60)", "triangle:a=30", Math.Sqrt(3) * Math.Pow(s, 4) / 80, 20 / (s * s * s));
        foreach (double ratio in new[] { 1.0, 2.0, 4.0 })
        {
            var (beta, alpha) = RectangleSeries(ratio);
            double b = 0.010, a = ratio * b;
            yield return new Case($"rectangle {ratio}:1 (90)", string.Create(CultureInfo.InvariantCulture, $"rect:b={10 * ratio},h=10"), beta * a * b * b * b, 1 / (alpha * a * b * b));
        }
        foreach (int n in new[] { 5, 6, 8, 12, 18, 36 })
            yield return new Case($"regular {n}-gon ({180.0 * (n - 2) / n:F0})", Regular(n, 20));
        foreach (double acute in new[] { 30.0, 45, 60, 75 })
            yield return new Case($"rhombus {acute:F0}/{180 - acute:F0}", Rhombus(acute, 30));
        foreach (double angle in new[] { 45.0, 60, 80 })
            yield return new Case($"trapezoid {angle:F0}/{180 - angle:F0}", Trapezoid(angle, 40, 10));
        yield return new Case("issue 20: hex:s=24", "hex:s=24");
        yield return new Case("issue 20: pentagon", "polygon:0 0 40 0 40 10 20 25 0 10");
        yield return new Case("issue 20: hexagon", "polygon:0 0 30 0 45 26 30 52 0 52 -15 26");
        yield return new Case("two flats D40 h4", "flats:D=40,h=4,n=2");
        yield return new Case("one flat D40 h6", "flats:D=40,h=6,n=1");
        yield return new Case("rect 60x20 r3", "rect:b=60,h=20,r=3");
        yield return new Case("keyed d40 (default r)", "keyed:d=40");
        yield return new Case("keyed d40 r=0 (J only)", "keyed:d=40,r=0");
        yield return new Case("iso14 8x32x36 (default r)", "iso14:8x32x36");
        yield return new Case("shs 80x5", "shs:B=80,t=5");
    }

    /// <summary>Rectangle a/b = ratio: J = beta a b^3, tau = T / (alpha a b^2) (Timoshenko and Goodier sec. 109).</summary>
    private static (double Beta, double Alpha) RectangleSeries(double ratio)
    {
        double sumT = 0, sumK = 0;
        for (int n = 1; n < 2001; n += 2)
        {
            double arg = n * Math.PI * ratio / 2;
            sumT += Math.Tanh(arg) / Math.Pow(n, 5);
            if (arg < 700) sumK += 1 / (n * (double)n * Math.Cosh(arg));
        }
        double beta = (1 - 192 / Math.Pow(Math.PI, 5) / ratio * sumT) / 3;
        return (beta, beta / (1 - 8 / (Math.PI * Math.PI) * sumK));
    }
}
