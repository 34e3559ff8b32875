using SectionTwist.Shaft;
using SectionTwist.WarpingTorsion;

namespace SectionTwist.Tests.WarpingTorsion;

/// <summary>Non-uniform (Vlasov) torsion of members against closed forms of the differential equation E Iw phi'''' - G J phi'' = m.</summary>
public class WarpingMemberTests
{
    // Steel, E = 210 GPa, G = 81 GPa (common practice, no source); section values of the order of a 200 mm I-beam.
    private static readonly Material Steel = new("steel", 81e9, null, null, "test") { YoungsModulus = 210e9 };
    private const double J = 7e-8, Iw = 1.3e-8, Omega = 5e-3, Tau = 1.2e8;

    private const string Cantilever = "cantilever, warping restrained at the root and free at the tip: phi(L) = T/(GJ) (L - a tanh(L/a)), " +
        "root bimoment T a tanh(L/a) (Vlasov, Thin-Walled Elastic Beams, 2nd ed., ch. 5; the same case in Seaburg and Carter, " +
        "Torsional Analysis of Structural Steel Members, AISC Design Guide 9, 1997, from memory)";

    private static WarpingMember Member(double[] at, IReadOnlyList<ShaftLoad> loads, string[] fixedAt, Dictionary<string, WarpingEnd> warping, double iw = Iw)
    {
        var st = at.Select((x, i) => new Station(((char)('A' + i)).ToString(), x)).ToArray();
        var segs = Enumerable.Range(0, st.Length - 1).Select(i => new WarpingSegment(st[i].Name, st[i + 1].Name, new WarpingSection(J, iw, Omega, Tau), Steel)).ToArray();
        return new WarpingMember { Stations = st, Segments = segs, Loads = loads, FixedStations = fixedAt, Warping = warping };
    }

    [Theory]
    [InlineData(0.3)]
    [InlineData(2.0)]
    [InlineData(8.0)]
    public void Cantilever_with_restrained_root_matches_the_closed_form(double length)
    {
        double t = 1000, gj = 81e9 * J, a = Math.Sqrt(210e9 * Iw / gj);
        // two segments so that an interior station is crossed
        var r = WarpingMemberSolver.Solve(Member([0, 0.4 * length, length], [new PointTorque("C", t)], ["A"], new() { ["A"] = WarpingEnd.Restrained }));
        Tol.Rel(t / gj * (length - a * Math.Tanh(length / a)), r.Stations[2].Rotation, 1e-9, Cantilever);
        Tol.Rel(t * a * Math.Tanh(length / a), Math.Abs(r.Stations[0].ReactionBimoment), 1e-9, Cantilever);
        var root = r.Segments[0].Points[0];
        Tol.Abs(0, root.SaintVenantTorque, 1e-9 * t, Cantilever + ": no Saint-Venant torque where phi' = 0");
        Tol.Rel(t, root.WarpingTorque, 1e-9, Cantilever);
        Tol.Rel(t * a * Math.Tanh(length / a), Math.Abs(root.Bimoment), 1e-9, Cantilever);
        Tol.Rel(t * a * Math.Tanh(length / a) * Omega / Iw, root.WarpingNormalStress, 1e-9, Cantilever + ", sigma = B omega / Iw");
        Tol.Rel(-t, r.Stations[0].ReactionTorque, 1e-9, "equilibrium");
        foreach (var p in r.Segments.SelectMany(s => s.Points)) Tol.Rel(t, p.SaintVenantTorque + p.WarpingTorque, 1e-7, "the two parts carry the whole torque");
    }

    // Warping shear of the same cantilever: the warping torque -E Iw phi''' is T cosh((L - x)/a) / cosh(L/a) (Vlasov
    // ch. 5; AISC Design Guide 9, from memory), so tau_w = E |phi'''| q_w = T q_w / Iw at the root and
    // T q_w / (Iw cosh(L/a)) at the tip; the combined shear is the sum of the two peaks at each point (a bound; common
    // practice, no source).
    [Fact]
    public void Cantilever_warping_shear_follows_the_warping_torque()
    {
        double t = 1000, l = 2, qw = 1.2e-4, gj = 81e9 * J, a = Math.Sqrt(210e9 * Iw / gj);
        var st = new[] { new Station("A", 0), new Station("B", l) };
        var sec = new WarpingSection(J, Iw, Omega, Tau) { WarpingShearFactor = qw };
        var r = WarpingMemberSolver.Solve(new WarpingMember
        {
            Stations = st, Segments = [new WarpingSegment("A", "B", sec, Steel)], Loads = [new PointTorque("B", t)], FixedStations = ["A"],
            Warping = new Dictionary<string, WarpingEnd> { ["A"] = WarpingEnd.Restrained },
        });
        var s = r.Segments[0];
        Tol.Rel(t * qw / Iw, s.Points[0].WarpingShear, 1e-9, Cantilever + "; warping torque T at the root");
        Tol.Rel(t * qw / Iw / Math.Cosh(l / a), s.Points[^1].WarpingShear, 1e-7, Cantilever + "; warping torque T / cosh(L/a) at the tip");
        Tol.Rel(t * qw / Iw, s.MaxWarpingShear, 1e-9, Cantilever);
        foreach (var p in s.Points) Tol.Rel(p.SaintVenantShear + p.WarpingShear, p.CombinedShear, 1e-12, "sum of the peaks");
        Assert.DoesNotContain(r.Warnings, w => w.Contains("no warping shear factor", StringComparison.Ordinal));
        Assert.False(s.ShearUnbounded);
    }

    // Both ends fixed and warping-restrained, torque T at mid-span: by symmetry phi' = 0 at mid-span too, and each half
    // carries T/2: phi(L/2) = T/(2GJ) (L/2 - 2a tanh(L/(4a))) (solution of the differential equation, Vlasov ch. 5;
    // the same case in AISC Design Guide 9, from memory).
    [Theory]
    [InlineData(1.0)]
    [InlineData(6.0)]
    public void Both_ends_restrained_with_a_mid_span_torque(double length)
    {
        double t = 2000, gj = 81e9 * J, a = Math.Sqrt(210e9 * Iw / gj);
        var r = WarpingMemberSolver.Solve(Member([0, length / 2, length], [new PointTorque("B", t)], ["A", "C"],
            new() { ["A"] = WarpingEnd.Restrained, ["C"] = WarpingEnd.Restrained }));
        Tol.Rel(t / (2 * gj) * (length / 2 - 2 * a * Math.Tanh(length / (4 * a))), r.Stations[1].Rotation, 1e-9, "Vlasov ch. 5, derived");
        Tol.Abs(0, r.Stations[1].RateOfTwist, 1e-12, "symmetry");
        Tol.Rel(-t / 2, r.Stations[0].ReactionTorque, 1e-9, "symmetry");
        Assert.DoesNotContain(r.Warnings, w => w.StartsWith("warping is free"));
    }

    // Limits: a -> 0 gives Saint-Venant torsion T L / (G J); a -> infinity gives pure warping torsion, the cantilever
    // twist T L^3 / (3 E Iw) (the bending analogy; Timoshenko and Gere, Theory of Elastic Stability, 2nd ed., sec. 5.2).
    [Fact]
    public void Limits_of_the_warping_length_are_reached()
    {
        double t = 100, l = 3, gj = 81e9 * J;
        var sv = WarpingMemberSolver.Solve(Member([0, l], [new PointTorque("B", t)], ["A"], new() { ["A"] = WarpingEnd.Restrained }, iw: 1e-16));
        Tol.Rel(t * l / gj, sv.Stations[1].Rotation, 1e-4, "Saint-Venant, a -> 0");
        var pw = WarpingMemberSolver.Solve(Member([0, l], [new PointTorque("B", t)], ["A"], new() { ["A"] = WarpingEnd.Restrained }, iw: 1e-2));
        Tol.Rel(t * l * l * l / (3 * 210e9 * 1e-2), pw.Stations[1].Rotation, 1e-4, "pure warping, a -> infinity");
    }

    // A warping spring of zero stiffness is free warping; a very stiff one is a full restraint (common practice, no source).
    [Fact]
    public void Warping_springs_span_free_to_restrained()
    {
        double t = 500, l = 2;
        WarpingMemberResult Run(WarpingEnd e) => WarpingMemberSolver.Solve(Member([0, l], [new PointTorque("B", t)], ["A"], new() { ["A"] = e }));
        double free = Run(WarpingEnd.Free).Stations[1].Rotation, fixedEnd = Run(WarpingEnd.Restrained).Stations[1].Rotation;
        Tol.Rel(t * l / (81e9 * J), free, 1e-9, "free warping is Saint-Venant torsion");
        Tol.Rel(free, Run(WarpingEnd.Spring(0)).Stations[1].Rotation, 1e-9, "zero spring");
        Tol.Rel(fixedEnd, Run(WarpingEnd.Spring(1e15)).Stations[1].Rotation, 1e-6, "stiff spring");
        double mid = Run(WarpingEnd.Spring(1e4)).Stations[1].Rotation;
        Assert.InRange(mid, fixedEnd, free);
        Assert.Contains(Run(WarpingEnd.Free).Warnings, w => w.StartsWith("warping is free"));
    }

    // A warping spring takes the bimoment K phi' (the definition of the spring): the station's bimoment reaction is that
    // bimoment, equal and opposite to the member's own bimoment at the root (statics, exact), not 0.
    [Fact]
    public void A_warping_spring_reports_the_bimoment_it_takes()
    {
        double t = 500, l = 2, ks = 2.5e4;
        var r = WarpingMemberSolver.Solve(Member([0, l], [new PointTorque("B", t)], ["A"], new() { ["A"] = WarpingEnd.Spring(ks) }));
        var root = r.Stations[0];
        Assert.NotEqual(0, root.RateOfTwist);
        Tol.Rel(ks * Math.Abs(root.RateOfTwist), Math.Abs(root.ReactionBimoment), 1e-9, "spring bimoment K phi'");
        Tol.Rel(Math.Abs(r.Segments[0].Points[0].Bimoment), Math.Abs(root.ReactionBimoment), 1e-9, "the member's bimoment at the root");
        Assert.Equal(-Math.Sign(root.RateOfTwist), Math.Sign(root.ReactionBimoment));
    }

    // Uniform torque m on a cantilever restrained at the root and free at the tip: the root reaction is -m L
    // (equilibrium) and, as a -> 0, phi(L) -> m L^2 / (2 G J) (Saint-Venant torsion under a uniform torque, common
    // practice, no source).
    [Fact]
    public void Uniform_torque_balances_and_tends_to_Saint_Venant()
    {
        double m = 300, l = 4;
        var r = WarpingMemberSolver.Solve(Member([0, l], [new DistributedTorque("A", "B", m)], ["A"], new() { ["A"] = WarpingEnd.Restrained }));
        Tol.Rel(-m * l, r.Stations[0].ReactionTorque, 1e-9, "equilibrium");
        var sv = WarpingMemberSolver.Solve(Member([0, l], [new DistributedTorque("A", "B", m)], ["A"], new() { ["A"] = WarpingEnd.Restrained }, iw: 1e-16));
        Tol.Rel(m * l * l / (2 * 81e9 * J), sv.Stations[1].Rotation, 1e-4, "Saint-Venant limit");
        Assert.True(r.Stations[1].Rotation < sv.Stations[1].Rotation, "restraint stiffens");
    }
}
