using SectionTwist.Dynamics;
using SectionTwist.Shaft;
using Xunit;

namespace SectionTwist.Tests.Dynamics;

/// <summary>Natural frequencies against exact solutions of textbook systems.</summary>
public class ModalClosedFormTests
{
    [Fact]
    public void Two_discs_on_a_massless_shaft_match_the_two_rotor_formula()
    {
        // omega^2 = k (I1 + I2) / (I1 I2): Thomson, Theory of Vibration with Applications, two-rotor torsional system;
        // Rao, Mechanical Vibrations, torsional two-degree-of-freedom system (free-free, one rigid-body mode).
        double k = 2.4e4, i1 = 0.35, i2 = 1.2;
        var model = new DrivetrainModel
        {
            Shafts = [TrainModels.SpringChain("s", ["a", "b"], [k])],
            Inertias = TrainModels.Inertias(("a", i1), ("b", i2)),
        };
        var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 1 });
        Assert.Equal(1, r.RigidBodyModes);
        Assert.True(r.Modes[0].IsRigidBody);
        Tol.Rel(Math.Sqrt(k * (i1 + i2) / (i1 * i2)), r.Modes[1].AngularFrequency, 1e-12, "Thomson / Rao two-rotor system");
        // node: amplitudes in inverse ratio of the inertias, opposite signs
        Tol.Rel(-i1 / i2, r.Modes[1].Stations[1].Rotation / r.Modes[1].Stations[0].Rotation, 1e-10, "two-rotor mode shape");
        Tol.Rel(1, r.Modes[1].Parts[0].EnergyShare, 1e-12, "only one spring");
    }

    [Fact]
    public void Two_discs_on_an_elastic_shaft_of_tiny_density_use_k_equal_GJ_over_L()
    {
        // as above with k = G J / L of a round shaft (Timoshenko and Goodier, ch. 10) whose own inertia is negligible
        var light = TrainModels.Steel with { Density = 1e-6 };
        double d = 0.03, l = 0.6, i1 = 0.2, i2 = 0.5;
        var model = new DrivetrainModel { Shafts = [TrainModels.Uniform("s", l, d, light)], Inertias = TrainModels.Inertias(("A", i1), ("B", i2)) };
        var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 1 });
        double k = light.ShearModulus * Math.PI * Math.Pow(d, 4) / 32 / l;
        Tol.Rel(Math.Sqrt(k * (i1 + i2) / (i1 * i2)), r.ElasticModes.First().AngularFrequency, 1e-9, "Thomson two-rotor system");
    }

    [Fact]
    public void A_shaft_with_one_end_disc_lists_the_modes_asked_for_and_its_second_mode_meets_the_frequency_equation()
    {
        // fixed-free shaft with a disc I_d at the free end: beta tan beta = rho Ip L / I_d, beta = omega L / c (the wave
        // equation of torsion with an inertia boundary; Rao, Mechanical Vibrations, torsional vibration of shafts, and
        // Blevins, Formulas for Natural Frequency and Mode Shape; from memory). One station unknown alone gave one mode
        // although six are asked for by default.
        var steel = TrainModels.Steel;
        double l = 0.8, d = 0.03, disc = 0.5, c = Math.Sqrt(steel.ShearModulus / steel.Density!.Value);
        double ip = Math.PI * Math.Pow(d, 4) / 32, mu = steel.Density.Value * ip * l / disc;
        var model = new DrivetrainModel { Shafts = [TrainModels.Uniform("s", l, d, steel)], Inertias = TrainModels.Inertias(("B", disc)), FixedStations = ["A"] };
        var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 3 });
        var elastic = r.ElasticModes.ToList();
        Assert.Equal(3, elastic.Count);
        double Root(double guess)
        {
            double b = guess;
            for (int i = 0; i < 50; i++) b -= (b * Math.Tan(b) - mu) / (Math.Tan(b) + b / (Math.Cos(b) * Math.Cos(b)));
            return b;
        }
        Tol.Rel(Root(Math.Sqrt(mu)) * c / l, elastic[0].AngularFrequency, 1e-3, "beta tan beta = mu, first root");
        Tol.Rel(Root(Math.PI + mu / Math.PI) * c / l, elastic[1].AngularFrequency, 2e-3, "beta tan beta = mu, second root");
    }

    public static TheoryData<bool> Ends => new() { true, false };

    [Theory]
    [MemberData(nameof(Ends))]
    public void Uniform_shaft_converges_at_second_order_to_the_wave_solution(bool fixedFree)
    {
        // exact: fixed-free f_n = (2n - 1) c / (4 L), fixed-fixed f_n = n c / (2 L), c = sqrt(G / rho) (wave equation of
        // torsion; Rao, Mechanical Vibrations, torsional vibration of shafts; Thomson, ch. on continuous systems)
        var steel = TrainModels.Steel;
        double l = 1.5, c = Math.Sqrt(steel.ShearModulus / steel.Density!.Value);
        var model = new DrivetrainModel { Shafts = [TrainModels.Uniform("s", l, 0.05, steel)], FixedStations = fixedFree ? ["A"] : ["A", "B"] };
        double Exact(int n) => fixedFree ? (2 * n - 1) * c / (4 * l) : n * c / (2 * l);
        double[] errs = new double[3];
        int[] counts = [8, 16, 32];
        for (int q = 0; q < 3; q++)
        {
            var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 3, ElementsPerSegment = counts[q] });
            Assert.Equal(0, r.RigidBodyModes);
            for (int n = 1; n <= 3; n++) Assert.True(r.Modes[n - 1].Frequency > Exact(n), "consistent-mass frequencies are upper bounds (Rayleigh-Ritz)");
            errs[q] = Tol.RelErr(Exact(3), r.Modes[2].Frequency);
            // leading error term (k h)^2 / 24 of the linear element with consistent mass (dispersion relation)
            double kh = 2 * Math.PI * Exact(3) / c * l / counts[q];
            Tol.Rel(kh * kh / 24, errs[q], 0.15, "dispersion of the linear consistent-mass element");
            Tol.Rel(errs[q], r.Modes[2].EstimatedError, 0.2, "the reported error estimate");
        }
        Tol.Rel(4, errs[0] / errs[1], 0.05, "second-order convergence: halving h divides the error by 4");
        Tol.Rel(4, errs[1] / errs[2], 0.02, "second-order convergence");
    }

    [Fact]
    public void Automatic_subdivision_meets_the_tolerance_for_every_listed_mode()
    {
        var steel = TrainModels.Steel;
        double l = 2.0, c = Math.Sqrt(steel.ShearModulus / steel.Density!.Value);
        var model = new DrivetrainModel { Shafts = [TrainModels.Uniform("s", l, 0.05, steel)], FixedStations = ["A"] };
        var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 6, Tolerance = 1e-3 });
        for (int n = 1; n <= 6; n++)
        {
            double err = Tol.RelErr((2 * n - 1) * c / (4 * l), r.Modes[n - 1].Frequency);
            Assert.True(err <= 1e-3, $"mode {n}: error {err:E2} over the tolerance (exact wave solution, fixed-free)");
        }
        Assert.True(r.EstimatedError <= 1e-3);
    }

    [Fact]
    public void Three_discs_free_free_match_the_characteristic_equation_and_a_Holzer_table()
    {
        // Free-free three-rotor system: omega^2 [I1 I2 I3 omega^4 - (k1 I3 (I1 + I2) + k2 I1 (I2 + I3)) omega^2
        // + k1 k2 (I1 + I2 + I3)] = 0 (hand-derived from the equations of motion; the same system is the standard
        // three-rotor example of Den Hartog, Mechanical Vibrations, ch. on torsional systems, from memory).
        double i1 = 0.8, i2 = 0.3, i3 = 1.5, k1 = 6e4, k2 = 2.5e4;
        var model = new DrivetrainModel
        {
            Shafts = [TrainModels.SpringChain("s", ["a", "b", "c"], [k1, k2])],
            Inertias = TrainModels.Inertias(("a", i1), ("b", i2), ("c", i3)),
        };
        var r = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 2 });
        double qa = i1 * i2 * i3, qb = -(k1 * i3 * (i1 + i2) + k2 * i1 * (i2 + i3)), qc = k1 * k2 * (i1 + i2 + i3);
        double disc = Math.Sqrt(qb * qb - 4 * qa * qc);
        double w1 = Math.Sqrt((-qb - disc) / (2 * qa)), w2 = Math.Sqrt((-qb + disc) / (2 * qa));
        Tol.Rel(w1, r.Modes[1].AngularFrequency, 1e-11, "three-rotor characteristic equation");
        Tol.Rel(w2, r.Modes[2].AngularFrequency, 1e-11, "three-rotor characteristic equation");
        // Holzer tabulation (Holzer's method, e.g. Thomson, Theory of Vibration, sec. on Holzer's method): start with
        // theta1 = 1, carry the inertia torque along the chain; the residual torque past the last disc vanishes at a natural frequency.
        foreach (var w in new[] { r.Modes[1].AngularFrequency, r.Modes[2].AngularFrequency })
        {
            double[] inertia = [i1, i2, i3], k = [k1, k2];
            double theta = 1, torque = 0;
            for (int j = 0; j < 3; j++)
            {
                torque += inertia[j] * w * w * theta;
                if (j < 2) theta -= torque / k[j];
            }
            Assert.True(Math.Abs(torque) < 1e-9 * (i1 + i2 + i3) * w * w, $"Holzer residual {torque:E3} at {w:G6} rad/s");
        }
    }
}
