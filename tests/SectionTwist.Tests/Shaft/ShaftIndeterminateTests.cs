using SectionTwist.Shaft;
using static SectionTwist.Tests.Shaft.ShaftTestModels;

namespace SectionTwist.Tests.Shaft;

public class ShaftIndeterminateTests
{
    // Three fixed supports A, D, F. The hand derivation below uses the force (flexibility) method, independent of the
    // stiffness method in the solver (Gere and Goodno, Mechanics of Materials, statically indeterminate torsional
    // members: release a support, compute its rotation, restore compatibility with the redundant torque).
    // Span A-D: torques at B and C on three segments. Span D-F: a uniform distributed torque on D-E, none on E-F.
    [Fact]
    public void Three_supports_match_force_method_hand_derivation()
    {
        double g = 79.3e9;
        double[] l = [0.2, 0.3, 0.25, 0.4, 0.15];
        double[] d = [0.04, 0.05, 0.035, 0.045, 0.03];
        double tB = 600, tC = -250, q = 900; // N*m, N*m, N*m/m on D-E
        double[] x = new double[6];
        for (int i = 0; i < 5; i++) x[i + 1] = x[i] + l[i];
        string[] names = ["A", "B", "C", "D", "E", "F"];
        var model = new ShaftModel
        {
            Stations = [.. names.Select((n, i) => new Station(n, x[i]))],
            Segments = [.. Enumerable.Range(0, 5).Select(i => new ShaftSegment(names[i], names[i + 1], SectionStiffness.Round(d[i]), Steel))],
            Loads = [new PointTorque("B", tB), new PointTorque("C", tC), new DistributedTorque("D", "E", q)],
            FixedStations = ["A", "D", "F"],
        };
        var r = ShaftSolver.Solve(model);

        double[] k = [.. Enumerable.Range(0, 5).Select(i => g * JRound(d[i]) / l[i])];
        // Span A-D, released at D: cantilever from A; a torque at a station turns everything beyond it by T times the flexibility up to it.
        double phiD0 = tB / k[0] + tC * (1 / k[0] + 1 / k[1]);
        double fD = 1 / k[0] + 1 / k[1] + 1 / k[2];
        double rD1 = -phiD0 / fD;               // part of the reaction at D coming from span A-D
        double rA = -(tB + tC + rD1);
        // Span D-F released at F: cantilever from D with q on D-E: internal torque q (L4 - s), twist at E = q L4^2 / (2 G J4).
        double phiF0 = q * l[3] * l[3] / (2 * g * JRound(d[3]));
        double fF = 1 / k[3] + 1 / k[4];
        double rF = -phiF0 / fF;
        double rD2 = -(q * l[3] + rF);

        Tol.Rel(rA, Reaction(r, "A"), 1e-10, "force method, span A-D");
        Tol.Rel(rD1 + rD2, Reaction(r, "D"), 1e-10, "force method, both spans");
        Tol.Rel(rF, Reaction(r, "F"), 1e-10, "force method, span D-F");
        // Internal torques: minus the sum of the torques on the part nearer A.
        Tol.Rel(-rA, Segment(r, "A", "B").InternalTorque, 1e-10);
        Tol.Rel(-(rA + tB), Segment(r, "B", "C").InternalTorque, 1e-10);
        Tol.Rel(rD1, Segment(r, "C", "D").InternalTorque, 1e-10);
        var de = Segment(r, "D", "E");
        Tol.Rel(rF + q * l[3], de.TorqueAtFrom, 1e-10, "D-E carries the redundant plus the whole distributed torque at D");
        Tol.Rel(rF, de.TorqueAtTo, 1e-10);
        Tol.Rel(rF, Segment(r, "E", "F").InternalTorque, 1e-10);
        // Rotations: B from span A-B, E from span E-F.
        Tol.Rel(-rA / k[0], Rotation(r, "B"), 1e-10);
        Tol.Rel(-rF / k[4], Rotation(r, "E"), 1e-10);
        Tol.Abs(0, Rotation(r, "D"), 1e-15);
        // Peak shear in D-E is at the end with the larger |T|.
        Tol.Rel(16 * Math.Max(Math.Abs(rF + q * l[3]), Math.Abs(rF)) / (Math.PI * Math.Pow(d[3], 3)), de.MaxShear, 1e-10);
    }

    // A flexible coupling (spring) between two shafts, each fixed at its far end: the torque splits in proportion to the
    // stiffness of each path, springs in series adding flexibilities (common practice).
    [Fact]
    public void Spring_in_series_with_a_segment_shares_torque_by_path_stiffness()
    {
        double ks = 4000, t = 150;
        var r = ShaftSolver.Solve(new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", 0.5), ("B2", 0.5), ("C", 0.9)),
            Segments = [new ShaftSegment("A", "B", SectionStiffness.Round(0.03), Steel), new ShaftSegment("B2", "C", SectionStiffness.Round(0.03), Steel)],
            Springs = [new TorsionalSpring("B", "B2", ks) { Name = "coupling" }],
            Loads = [new PointTorque("B", t)],
            FixedStations = ["A", "C"],
        });
        double k1 = 79.3e9 * JRound(0.03) / 0.5, k2 = 79.3e9 * JRound(0.03) / 0.4;
        double kPath2 = 1 / (1 / ks + 1 / k2);
        Tol.Rel(t * k1 / (k1 + kPath2), Segment(r, "A", "B").InternalTorque, 1e-12);
        Tol.Rel(-t * kPath2 / (k1 + kPath2), r.Springs.Single().Torque, 1e-12);
        Assert.Equal("coupling", r.Springs.Single().Label);
    }
}
