using SectionTwist.Shaft;
using static SectionTwist.Tests.Shaft.ShaftTestModels;

namespace SectionTwist.Tests.Shaft;

public class ShaftTaperTests
{
    // Linearly tapered solid round, torque T: phi = 32 T L (dA^2 + dA dB + dB^2) / (3 pi G dA^3 dB^3)
    // (Young and Budynas, Roark's Formulas for Stress and Strain, 7th ed., ch. 10; Gere and Goodno, Mechanics of Materials, nonuniform torsion example).
    [Theory]
    [InlineData(0.06, 0.03)]
    [InlineData(0.03, 0.06)]
    [InlineData(0.05, 0.05)]
    [InlineData(0.05, 0.0499999)]
    public void Tapered_cantilever_matches_closed_form(double dA, double dB)
    {
        double t = 700, l = 0.8, g = 79.3e9;
        var r = ShaftSolver.Solve(new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", l)),
            Segments = [new ShaftSegment("A", "B", new RoundTaper(dA, dB), Steel)],
            Loads = [new PointTorque("B", t)],
            FixedStations = ["A"],
        });
        double phi = 32 * t * l * (dA * dA + dA * dB + dB * dB) / (3 * Math.PI * g * Math.Pow(dA, 3) * Math.Pow(dB, 3));
        Tol.Rel(phi, Rotation(r, "B"), 1e-12, "tapered shaft closed form");
        double dMin = Math.Min(dA, dB);
        Tol.Rel(16 * t / (Math.PI * dMin * dMin * dMin), r.Segments[0].MaxShear, 1e-12, "peak shear at the small end, 16 T / (pi d^3)");
        Tol.Rel(t / (g * JRound(dMin)), r.Segments[0].MaxTwistRate, 1e-12);
    }

    [Fact]
    public void Tapered_segment_given_against_the_axis_is_the_same_shaft()
    {
        Station[] st = Stations(("A", 0), ("B", 0.5));
        var forward = new ShaftModel { Stations = st, Segments = [new ShaftSegment("A", "B", new RoundTaper(0.05, 0.02), Steel)], Loads = [new PointTorque("B", 50)], FixedStations = ["A"] };
        var backward = forward with { Segments = [new ShaftSegment("B", "A", new RoundTaper(0.02, 0.05), Steel)] };
        Tol.Rel(Rotation(ShaftSolver.Solve(forward), "B"), Rotation(ShaftSolver.Solve(backward), "B"), 1e-14);
    }

    // Distributed torque on a taper, fixed at both ends: the exact element against an independent numerical solution
    // (composite Simpson integration of the flexibility integrals of the force method, 20000 panels).
    [Fact]
    public void Distributed_torque_on_a_taper_matches_numerical_force_method()
    {
        double dA = 0.06, dB = 0.035, l = 0.9, q = 1200, g = 79.3e9;
        var r = ShaftSolver.Solve(new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", l)),
            Segments = [new ShaftSegment("A", "B", new RoundTaper(dA, dB), Steel)],
            Loads = [new DistributedTorque("A", "B", q)],
            FixedStations = ["A", "B"],
        });
        double GJ(double s) => g * JRound(dA + (dB - dA) * s / l);
        // Released at B: T0(s) = q (L - s) (torque of the load beyond s); redundant R at B adds T = R everywhere.
        double phi0 = Simpson(s => q * (l - s) / GJ(s), l), f = Simpson(s => 1 / GJ(s), l);
        double rB = -phi0 / f;
        Tol.Rel(rB, Reaction(r, "B"), 1e-9, "numerical force method");
        Tol.Rel(-(q * l + rB), Reaction(r, "A"), 1e-9);
        Tol.Rel(rB + q * l, r.Segments[0].TorqueAtFrom, 1e-9);
        Tol.Rel(rB, r.Segments[0].TorqueAtTo, 1e-9);
        // Peak shear by dense sampling of |T(s)| 16 / (pi d(s)^3).
        double peak = 0;
        for (int i = 0; i <= 20000; i++)
        {
            double s = l * i / 20000, d = dA + (dB - dA) * s / l;
            peak = Math.Max(peak, Math.Abs(rB + q * (l - s)) * 16 / (Math.PI * d * d * d));
        }
        Tol.Rel(peak, r.Segments[0].MaxShear, 1e-6, "sampled peak");
    }

    private static double Simpson(Func<double, double> f, double l, int n = 20000)
    {
        double h = l / n, sum = f(0) + f(l);
        for (int i = 1; i < n; i++) sum += f(i * h) * (i % 2 == 1 ? 4 : 2);
        return sum * h / 3;
    }
}
