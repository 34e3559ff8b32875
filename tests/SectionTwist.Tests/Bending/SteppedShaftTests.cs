using SectionTwist.Bending;
using SectionTwist.Shaft;
using static SectionTwist.Tests.Bending.BendingTestModels;

namespace SectionTwist.Tests.Bending;

public class SteppedShaftTests
{
    /// <summary>
    /// Unit-load method (virtual work, common practice): deflection at x0 of a simply supported beam of span l under P at a is
    /// integral(M(x) m(x) / EI(x) dx), M the real moment and m that of a unit load at x0; integrated here by the composite
    /// Simpson rule on 20000 intervals per piece.
    /// </summary>
    private static double UnitLoadDeflection(double l, double a, double p, double x0, Func<double, double> ei, double[] breaks)
    {
        double M(double x) => x <= a ? p * (l - a) * x / l : p * a * (l - x) / l;
        double m(double x) => x <= x0 ? (l - x0) * x / l : x0 * (l - x) / l;
        var pts = breaks.Concat([a, x0]).Append(0).Append(l).Distinct().OrderBy(v => v).ToArray();
        double sum = 0;
        for (int k = 0; k + 1 < pts.Length; k++)
        {
            int n = 20000;
            double h = (pts[k + 1] - pts[k]) / n;
            for (int i = 0; i <= n; i++)
            {
                double x = pts[k] + i * h, w = i == 0 || i == n ? 1 : i % 2 == 1 ? 4 : 2;
                sum += w * h / 3 * M(x) * m(x) / ei(Math.Clamp(x, pts[k] + 1e-9, pts[k + 1] - 1e-9));   // EI of this piece at a step
            }
        }
        return sum;
    }

    [Fact]
    public void Stepped_shaft_deflection_matches_numerical_integration()
    {
        double[] x = [0, 0.12, 0.30, 0.52, 0.64];
        double[] d = [0.035, 0.045, 0.05, 0.035];
        double p = 4000;
        var b = new BendingModel { Bearings = [new Bearing("S0"), new Bearing("S4")], Loads = [new PointForce("S2", 0, -p)] };
        var r = ShaftSolver.Solve(MakeShaft(x, d, b)).Bending!;
        double ei(double s) { int i = Math.Min(Array.FindLastIndex(x, v => v <= s), 3); return E * I(d[i]); }
        foreach (double x0 in new[] { 0.12, 0.30, 0.52 })
            Tol.Rel(-UnitLoadDeflection(0.64, 0.30, p, x0, ei, x), At(r, x0).DeflectionZ, 1e-7, "unit-load integral");
    }

    [Fact]
    public void Tapered_segment_deflection_matches_numerical_integration()
    {
        double l = 0.6, p = 2000, d0 = 0.04, d1 = 0.06;
        var model = new ShaftModel
        {
            Stations = [new Station("A", 0), new Station("B", 0.3), new Station("C", l)],
            Segments =
            [
                new ShaftSegment("A", "B", new RoundTaper(d0, d1), Steel),
                new ShaftSegment("B", "C", SectionStiffness.Round(d1), Steel),
            ],
            Bending = new BendingModel { Bearings = [new Bearing("A"), new Bearing("C")], Loads = [new PointForce("B", 0, -p)] },
        };
        var r = ShaftSolver.Solve(model).Bending!;
        double ei(double s) => E * I(s < 0.3 ? d0 + (d1 - d0) * s / 0.3 : d1);
        Tol.Rel(-UnitLoadDeflection(l, 0.3, p, 0.3, ei, [0.3]), At(r, 0.3).DeflectionZ, 1e-7, "unit-load integral over the taper");
        Tol.Rel(-UnitLoadDeflection(l, 0.3, p, 0.15, ei, [0.3]), At(r, 0.15).DeflectionZ, 1e-7, "inside the taper");
    }
}
