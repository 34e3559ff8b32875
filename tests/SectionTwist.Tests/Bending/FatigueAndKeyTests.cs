using SectionTwist.Bending;
using SectionTwist.Fatigue;
using SectionTwist.Keys;

namespace SectionTwist.Tests.Bending;

public class FatigueAndKeyTests
{
    private const double LbfIn = 0.1129848290276167, Kpsi = 6.894757293168361e6, Inch = 0.0254;

    // Budynas and Nisbett, Shigley's Mechanical Engineering Design, 10th ed., Example 7-1 (quoted from memory): machined
    // shoulder, d = 1.100 in, M = 1260 lbf in fully reversed, T = 1100 lbf in steady, S_ut = 105 kpsi, S_y = 82 kpsi,
    // reliability 0.99; K_t = 1.68, K_ts = 1.42, q = 0.85, q_s = 0.92 from the figures. Printed: k_a = 0.787, k_b = 0.870,
    // k_e = 0.814, S_e = 29.3 kpsi, K_f = 1.58, K_fs = 1.39; DE-Goodman n = 1.62, DE-ASME elliptic n = 1.88, yield n_y = 4.48.
    [Fact]
    public void Shigley_example_7_1_shoulder()
    {
        double d = 1.1 * Inch, sut = 105 * Kpsi, sy = 82 * Kpsi;
        var settings = new FatigueSettings { Surface = SurfaceFinish.Machined, Reliability = 0.99 };
        var se = EnduranceLimit.Compute(settings, sut, d);
        Tol.Rel(0.787, se.Factors[0].Value, 2e-3, "k_a");
        Tol.Rel(0.870, se.Factors[1].Value, 2e-3, "k_b");
        Tol.Rel(0.814, se.Factors[4].Value, 1e-9, "k_e");
        Tol.Rel(29.3 * Kpsi, se.Value, 3e-3, "S_e");
        double kf = 1 + 0.85 * (1.68 - 1), kfs = 1 + 0.92 * (1.42 - 1);
        var s = BendingSection.Round(d);
        var g = FatigueEvaluator.Evaluate(s, 0, 1260 * LbfIn, 1100 * LbfIn, kf, kfs, se.Value, sut, sy, FatigueCriterion.Goodman);
        Tol.Rel(1.62, g.N, 5e-3, "DE-Goodman n");
        Tol.Rel(4.48, g.NYield, 5e-3, "yield n_y");
        var e = FatigueEvaluator.Evaluate(s, 0, 1260 * LbfIn, 1100 * LbfIn, kf, kfs, se.Value, sut, sy, FatigueCriterion.AsmeElliptic);
        Tol.Rel(1.88, e.N, 5e-3, "DE-ASME elliptic n");
    }

    // Notch sensitivity, Shigley 10th ed., Fig. 6-20 / eq. 6-34 (from memory): S_ut = 100 kpsi, r = 0.1 in gives
    // sqrt(a) = 0.062 sqrt(in) and q = 0.84 (read from the chart: about 0.84).
    [Fact]
    public void Neuber_sensitivity_at_100_kpsi()
    {
        double q = NotchFactors.Sensitivity(100 * Kpsi, 0.1 * Inch, torsion: false)!.Value;
        Tol.Rel(1 / (1 + 0.0622 / Math.Sqrt(0.1)), q, 2e-3, "eq. 6-34 form");
        Assert.Null(NotchFactors.Sensitivity(20 * Kpsi, 0.001, false));
    }

    // Parallel key: tau = 2T/(d l b), hub pressure 2T/(d l (h - t1)), shaft pressure 2T/(d l t1)
    // (Shigley 10th ed., sec. 7-7; DIN 6892 method C; from memory). Key 10 x 8, t1 = 5 mm, l = 40 mm on d = 35 mm.
    [Fact]
    public void Parallel_key_forms()
    {
        var k = new ParallelKey("A-B", 0.010, 0.008, 0.005, 0.040) { AllowablePressure = 100e6, AllowableShear = 60e6 };
        var r = ConnectionCalculator.Evaluate(k, -250, 0.035);
        Tol.Rel(2 * 250 / (0.035 * 0.040 * 0.010), r.Shear!.Value, 1e-12);
        Tol.Rel(2 * 250 / (0.035 * 0.040 * 0.003), r.Pressure, 1e-12);
        Tol.Rel(2 * 250 / (0.035 * 0.040 * 0.005), r.ShaftPressure!.Value, 1e-12);
        Assert.True(r.Exceeds);   // 119 MPa > 100 MPa on the hub side
        Assert.Throws<SectionTwistException>(() => ConnectionCalculator.Evaluate(k with { ShaftDepth = 0.009 }, 250, 0.035));
    }
}
