using SectionTwist.Dynamics;
using SectionTwist.Shaft;
using Xunit;

namespace SectionTwist.Tests.Dynamics;

/// <summary>Geared and branched trains against their single-shaft equivalents and hand-derived equations.</summary>
public class GearStageTests
{
    [Theory]
    [InlineData(StageKind.External, 3.7)]
    [InlineData(StageKind.Belt, 0.45)]
    public void Geared_train_equals_the_single_shaft_train_with_inertia_and_stiffness_times_ratio_squared(StageKind kind, double n)
    {
        // referral to the driving shaft: I' = I / n^2, k' = k / n^2 with n = speed ratio driving / driven (Rao, Mechanical
        // Vibrations, torsional systems with gears; Thomson, Theory of Vibration, geared systems)
        double im = 0.05, k1 = 8e3, ip = 0.004, iw = 0.09, k2 = 5e4, il = 2.2;
        var geared = new DrivetrainModel
        {
            Shafts = [TrainModels.SpringChain("motor", ["m", "p"], [k1]), TrainModels.SpringChain("output", ["w", "load"], [k2])],
            Stages = [new GearStage("p", "w", n) { Kind = kind }],
            Inertias = TrainModels.Inertias(("m", im), ("p", ip), ("w", iw), ("load", il)),
        };
        var single = new DrivetrainModel
        {
            Shafts = [TrainModels.SpringChain("eq", ["m", "pw", "load"], [k1, k2 / (n * n)])],
            Inertias = TrainModels.Inertias(("m", im), ("pw", ip + iw / (n * n)), ("load", il / (n * n))),
        };
        var g = ModalAnalysis.Solve(geared, new ModalOptions { ModeCount = 2 });
        var s = ModalAnalysis.Solve(single, new ModalOptions { ModeCount = 2 });
        Assert.Equal(1, g.RigidBodyModes);
        for (int q = 1; q <= 2; q++)
        {
            Tol.Rel(s.Modes[q].Frequency, g.Modes[q].Frequency, 1e-11, "referral by the ratio squared");
            // the load's rotation referred to the motor shaft equals the equivalent system's load rotation
            Tol.Rel(s.Modes[q].Stations[2].ReferredRotation, g.Modes[q].Stations[3].ReferredRotation, 1e-9, "referred mode shape");
        }
        double t = (kind == StageKind.External ? -1 : 1) / n;
        Tol.Rel(t, g.Stations.Single(x => x.Name == "load").SpeedRatio, 1e-14, "speed ratio of the driven shaft");
        Tol.Rel(im + ip + (iw + il) / (n * n), g.ReferredInertia, 1e-12, "total inertia referred to the motor shaft");
    }

    [Fact]
    public void Elastic_mesh_acts_as_a_spring_between_pinion_and_referred_wheel()
    {
        // two-rotor formula with I2 = I_wheel / n^2 and k = mesh stiffness referred to the pinion (Thomson two-rotor system)
        double ip = 0.01, iw = 0.4, n = 4, km = 3e5;
        var model = new DrivetrainModel
        {
            Shafts = [TrainModels.SpringChain("a", ["p"], []), TrainModels.SpringChain("b", ["w"], [])],
            Stages = [new GearStage("p", "w", n) { MeshStiffness = km }],
            Inertias = TrainModels.Inertias(("p", ip), ("w", iw)),
        };
        var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 1 });
        double i2 = iw / (n * n);
        Tol.Rel(Math.Sqrt(km * (ip + i2) / (ip * i2)), r.ElasticModes.First().AngularFrequency, 1e-6, "two-rotor system through the mesh");
        Assert.Equal(TrainPartKind.Mesh, r.ElasticModes.First().Parts.Single(p => p.EnergyShare > 0.99).Kind);
    }

    [Fact]
    public void Branched_train_one_motor_two_outputs_matches_the_hand_derived_characteristic_equation()
    {
        // Motor J0 drives two outputs through rigid stages of ratios n1 (external gear) and n2 (belt); each output is a
        // spring k_i to a load I_i. Referred: k_i' = k_i / n_i^2, I_i' = I_i / n_i^2. Equations of motion give (hand-derived)
        // omega^2 = 0 or J0 I1' I2' x^2 - [J0 (k1' I2' + k2' I1') + (k1' + k2') I1' I2'] x + k1' k2' (J0 + I1' + I2') = 0, x = omega^2.
        double j0 = 0.12, n1 = 2.5, n2 = 4.0, k1 = 9e3, k2 = 3e4, i1 = 0.6, i2 = 1.9;
        var model = new DrivetrainModel
        {
            Shafts =
            [
                TrainModels.SpringChain("motor", ["m"], []),
                TrainModels.SpringChain("out1", ["w1", "l1"], [k1]),
                TrainModels.SpringChain("out2", ["w2", "l2"], [k2]),
            ],
            Stages = [new GearStage("m", "w1", n1), new GearStage("m", "w2", n2) { Kind = StageKind.Belt }],
            Inertias = TrainModels.Inertias(("m", j0), ("l1", i1), ("l2", i2)),
        };
        var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 2 });
        double a1 = k1 / (n1 * n1), a2 = k2 / (n2 * n2), b1 = i1 / (n1 * n1), b2 = i2 / (n2 * n2);
        double qa = j0 * b1 * b2, qb = -(j0 * (a1 * b2 + a2 * b1) + (a1 + a2) * b1 * b2), qc = a1 * a2 * (j0 + b1 + b2);
        double disc = Math.Sqrt(qb * qb - 4 * qa * qc);
        Assert.Equal(1, r.RigidBodyModes);
        Tol.Rel(Math.Sqrt((-qb - disc) / (2 * qa)), r.Modes[1].AngularFrequency, 1e-7, "hand-derived branched-system equation");
        Tol.Rel(Math.Sqrt((-qb + disc) / (2 * qa)), r.Modes[2].AngularFrequency, 1e-7, "hand-derived branched-system equation");
    }

    [Fact]
    public void Free_free_gives_exactly_one_zero_frequency_per_chain()
    {
        // two chains not joined and not held: two rigid-body modes (common practice, no source: a free body has one)
        var steel = TrainModels.Steel;
        var model = new DrivetrainModel
        {
            Shafts = [TrainModels.Uniform("one", 1.0, 0.04, steel, "A", "B"), TrainModels.Uniform("two", 0.7, 0.03, steel, "C", "D")],
            Inertias = TrainModels.Inertias(("A", 0.3), ("D", 0.1)),
        };
        var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 3 });
        Assert.Equal(2, r.RigidBodyModes);
        Assert.True(r.Modes[0].IsRigidBody && r.Modes[1].IsRigidBody && !r.Modes[2].IsRigidBody);
        double scale = r.Modes[2].Eigenvalue;
        Assert.True(Math.Abs(r.Modes[0].Eigenvalue) < 1e-10 * scale && Math.Abs(r.Modes[1].Eigenvalue) < 1e-10 * scale, "zero to round-off");
        // one chain held at one station: no rigid-body mode
        var held = ModalAnalysis.Solve(model with { FixedStations = ["A", "C"] });
        Assert.Equal(0, held.RigidBodyModes);
        Assert.All(held.Modes, m => Assert.True(!m.IsRigidBody && m.Eigenvalue > 1e-4 * scale));
    }

    [Fact]
    public void Energy_shares_add_up_to_one_and_point_at_the_soft_part()
    {
        var steel = TrainModels.Steel;
        var shaft = new ShaftModel
        {
            Stations = [new Station("A", 0), new Station("B", 0.4), new Station("C", 0.9)],
            Segments = [new ShaftSegment("A", "B", SectionStiffness.Round(0.05), steel), new ShaftSegment("B", "C", SectionStiffness.Round(0.02), steel)],
            Springs = [new TorsionalSpring("A", "B", 5e5)],
        };
        var r = ModalAnalysis.Solve(new DrivetrainModel { Shafts = [new ShaftBranch("s", shaft)], Inertias = TrainModels.Inertias(("A", 0.5), ("C", 0.8)) });
        foreach (var m in r.ElasticModes) Tol.Rel(1, m.Parts.Sum(p => p.EnergyShare), 1e-10, "energy shares are a partition");
        Assert.Equal("B-C", r.ElasticModes.First().Parts.MaxBy(p => p.EnergyShare)!.Name);
    }

    [Fact]
    public void Inconsistent_stage_loop_is_refused()
    {
        var model = new DrivetrainModel
        {
            Shafts = [TrainModels.SpringChain("a", ["p", "q"], [1e4]), TrainModels.SpringChain("b", ["w", "x"], [1e4])],
            Stages = [new GearStage("p", "w", 2), new GearStage("q", "x", 3)],
            Inertias = TrainModels.Inertias(("p", 1), ("x", 1)),
        };
        var e = Assert.Throws<SectionTwistException>(() => ModalAnalysis.Solve(model));
        Assert.Contains("loop", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Body_inertias_follow_their_definitions()
    {
        // hollow cylinder J = rho pi L (D^4 - d^4) / 32 (Meriam and Kraige, Dynamics, Table D/4); GD^2 / 4 with GD^2 in kgf*m^2
        Tol.Rel(7850 * Math.PI * 0.05 * (Math.Pow(0.3, 4) - Math.Pow(0.1, 4)) / 32, PointInertia.Cylinder("a", 0.3, 0.1, 0.05, 7850).Inertia, 1e-14);
        Tol.Rel(0.25, PointInertia.FromGD2("a", 1.0).Inertia, 1e-15, "J = GD^2 / 4");
        Tol.Rel(1 / (4 * 9.80665), PointInertia.FromGD2Newton("a", 1.0).Inertia, 1e-15, "J = GD^2 / (4 g)");
    }
}
