using SectionTwist.Shaft;
using static SectionTwist.Tests.Shaft.ShaftTestModels;

namespace SectionTwist.Tests.Shaft;

public class ShaftClosedFormTests
{
    private static double Sig4(double v) => double.Parse(v.ToString("G4", System.Globalization.CultureInfo.InvariantCulture), System.Globalization.CultureInfo.InvariantCulture);

    // Statically determinate cantilever, phi_end = sum T_i L_i / (J_i G_i) with T_i the internal torque of segment i
    // (Gere and Goodno, Mechanics of Materials, nonuniform torsion, eq. 3-19 form).
    [Fact]
    public void Cantilever_with_several_torques_matches_sum_of_segment_twists()
    {
        double[] l = [0.3, 0.45, 0.2];
        double[] d = [0.05, 0.04, 0.03];
        double[] g = [79.3e9, 26e9, 41e9];
        double tb = 300, tc = -120, td = 80;
        var model = new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", l[0]), ("C", l[0] + l[1]), ("D", l[0] + l[1] + l[2])),
            Segments =
            [
                new ShaftSegment("A", "B", SectionStiffness.Round(d[0]), WithG(g[0])),
                new ShaftSegment("B", "C", SectionStiffness.Round(d[1]), WithG(g[1])),
                new ShaftSegment("C", "D", SectionStiffness.Round(d[2]), WithG(g[2])),
            ],
            Loads = [new PointTorque("B", tb), new PointTorque("C", tc), new PointTorque("D", td)],
            FixedStations = ["A"],
        };
        var r = ShaftSolver.Solve(model);
        double[] internalT = [tb + tc + td, tc + td, td]; // torque of everything beyond the cut
        double phi = 0;
        for (int i = 0; i < 3; i++) phi += internalT[i] * l[i] / (JRound(d[i]) * g[i]);
        Tol.Rel(phi, Rotation(r, "D"), 1e-12, "sum T_i L_i / (J_i G_i)");
        Tol.Rel(internalT[0], Segment(r, "A", "B").TorqueAtFrom, 1e-12);
        Tol.Rel(internalT[1], Segment(r, "B", "C").TorqueAtTo, 1e-12);
        Tol.Rel(internalT[2], Segment(r, "C", "D").TorqueAtFrom, 1e-12);
        Tol.Rel(-(tb + tc + td), Reaction(r, "A"), 1e-12, "statics: reaction balances the applied torques");
        Tol.Rel(16 * Math.Abs(internalT[2]) / (Math.PI * Math.Pow(d[2], 3)), Segment(r, "C", "D").MaxShear, 1e-12, "tau = 16 T / (pi d^3)");
        Assert.Equal("A", r.ReferenceStation);
    }

    // Two segments fixed at both ends, torque T at the joint: T1 = T k1 / (k1 + k2), k_i = G_i J_i / L_i
    // (docs/references.md; Gere and Goodno, statically indeterminate torsional members).
    [Fact]
    public void Two_segments_fixed_at_both_ends_share_torque_by_stiffness()
    {
        double t = 2500, l1 = 0.7, l2 = 0.25, d1 = 0.06, d2 = 0.045, g = 79.3e9;
        var r = ShaftSolver.Solve(new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", l1), ("C", l1 + l2)),
            Segments = [new ShaftSegment("A", "B", SectionStiffness.Round(d1), Steel), new ShaftSegment("B", "C", SectionStiffness.Round(d2), Steel)],
            Loads = [new PointTorque("B", t)],
            FixedStations = ["A", "C"],
        });
        double k1 = g * JRound(d1) / l1, k2 = g * JRound(d2) / l2;
        Tol.Rel(t * k1 / (k1 + k2), Segment(r, "A", "B").InternalTorque, 1e-12, "T1 = T k1/(k1+k2)");
        Tol.Rel(-t * k2 / (k1 + k2), Segment(r, "B", "C").InternalTorque, 1e-12, "T2 = -T k2/(k1+k2)");
        Tol.Rel(t / (k1 + k2), Rotation(r, "B"), 1e-12);
        Tol.Abs(0, Reaction(r, "A") + Reaction(r, "C") + t, 1e-9, "statics");
    }

    // Philpot, Mechanics of Materials, worked example (docs/references.md): both ends fixed, 1000 N*m at B;
    // hollow 50/40 mm x 1500 mm, G = 75 GPa; solid 50 mm x 1000 mm, G = 40 GPa.
    // Internal torques 424.63 and -575.37 N*m, shear 29.30 and 23.44 MPa, rotation at B 0.02344 rad, to 4 significant figures.
    [Fact]
    public void Both_ends_fixed_worked_example_to_four_significant_figures()
    {
        var r = ShaftSolver.Solve(new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", 1.5), ("C", 2.5)),
            Segments =
            [
                new ShaftSegment("A", "B", SectionStiffness.Tube(0.050, 0.040), WithG(75e9)),
                new ShaftSegment("B", "C", SectionStiffness.Round(0.050), WithG(40e9)),
            ],
            Loads = [new PointTorque("B", 1000)],
            FixedStations = ["A", "C"],
        });
        var s1 = Segment(r, "A", "B"); var s2 = Segment(r, "B", "C");
        Assert.Equal(424.6, Sig4(s1.InternalTorque));
        Assert.Equal(-575.4, Sig4(s2.InternalTorque));
        Assert.Equal(29.30, Sig4(s1.MaxShear / 1e6));
        Assert.Equal(23.44, Sig4(s2.MaxShear / 1e6));
        Assert.Equal(0.02344, Sig4(Rotation(r, "B")));
        Tol.Rel(424.63, s1.InternalTorque, 2e-5, "Philpot example, 5 figures");
        Tol.Rel(-575.37, s2.InternalTorque, 2e-5, "Philpot example, 5 figures");
    }

    // Philpot, Mechanics of Materials, worked example (docs/references.md): brass cantilever 32 mm x 1800 mm,
    // G = 37 GPa, 50 N*m at the free end: twist 0.02363 rad.
    [Fact]
    public void Cantilever_worked_example_to_four_significant_figures()
    {
        var brass = new Material("brass", 37e9, null, null, "docs/references.md");
        var r = ShaftSolver.Solve(new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", 1.8)),
            Segments = [new ShaftSegment("A", "B", SectionStiffness.Round(0.032), brass)],
            Loads = [new PointTorque("B", 50)],
            FixedStations = ["A"],
        });
        Assert.Equal(0.02363, Sig4(Segment(r, "A", "B").Twist));
        Assert.Equal(0.02363, Sig4(r.EndToEndTwist));
    }
}
