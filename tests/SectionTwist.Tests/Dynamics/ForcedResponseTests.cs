using SectionTwist.Dynamics;
using Xunit;

namespace SectionTwist.Tests.Dynamics;

/// <summary>Steady forced response against the damped single-degree-of-freedom solution.</summary>
public class ForcedResponseTests
{
    [Theory]
    [InlineData(0.3, 0.02)]
    [InlineData(1.0, 0.05)]
    [InlineData(2.5, 0.01)]
    public void Two_free_discs_driven_at_one_match_the_relative_coordinate_oscillator(double frequencyRatio, double zeta)
    {
        // Relative twist delta = theta1 - theta2 of two free discs obeys mu delta'' + c delta' + k delta = mu F / I1,
        // mu = I1 I2 / (I1 + I2) (hand-derived); steady amplitude of the spring torque k |delta| =
        // k mu F / I1 / |k - mu Omega^2 + i c Omega| with c = 2 zeta sqrt(k mu) (damped SDOF, Thomson, Theory of Vibration, ch. 3).
        double k = 4e4, i1 = 0.2, i2 = 0.9, f = 150;
        var model = new DrivetrainModel
        {
            Shafts = [TrainModels.SpringChain("s", ["a", "b"], [k])],
            Inertias = TrainModels.Inertias(("a", i1), ("b", i2)),
        };
        var modes = ModalAnalysis.Solve(model, new ModalOptions { ModeCount = 1 });
        double mu = i1 * i2 / (i1 + i2), wn = Math.Sqrt(k / mu), w = frequencyRatio * wn, c = 2 * zeta * Math.Sqrt(k * mu);
        var r = ForcedResponse.Compute(modes, new HarmonicTorque("a", f, w), zeta);
        double expected = k * mu * f / i1 / Math.Sqrt(Math.Pow(k - mu * w * w, 2) + Math.Pow(c * w, 2));
        Tol.Rel(expected, r.Parts[0].TorqueAmplitude, 1e-9, "damped SDOF in the relative coordinate");
        Assert.Equal(2, r.ModesUsed);
    }

    [Fact]
    public void Slow_forcing_of_a_held_shaft_gives_the_static_torque_and_shear()
    {
        // Omega -> 0: the alternating torque in a segment between a held end and the load is the applied torque (statics),
        // shear = T 16 / (pi d^3) (Timoshenko and Goodier, ch. 10)
        var steel = TrainModels.Steel;
        var model = new DrivetrainModel { Shafts = [TrainModels.Uniform("s", 0.8, 0.04, steel)], Inertias = TrainModels.Inertias(("B", 0.5)), FixedStations = ["A"] };
        var modes = ModalAnalysis.Solve(model);
        var r = ForcedResponse.Compute(modes, new HarmonicTorque("B", 100, 1e-3 * modes.Modes[0].AngularFrequency), 0.02);
        Tol.Rel(100, r.Parts[0].TorqueAmplitude, 1e-5, "static limit");
        Tol.Rel(100 * 16 / (Math.PI * Math.Pow(0.04, 3)), r.Parts[0].ShearAmplitude!.Value, 1e-5, "tau = 16 T / (pi d^3)");
    }
}
