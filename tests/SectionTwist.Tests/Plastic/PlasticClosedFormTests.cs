using SectionTwist.Geometry;
using SectionTwist.Plastic;
using SectionTwist.Profiles;
using SectionTwist.Torsion;
using SectionTwist.Units;

namespace SectionTwist.Tests.Plastic;

/// <summary>
/// Fully plastic torque, first yield and the elastic-plastic torque-twist curve against closed forms.
/// Fully plastic torques from the sand-heap analogy: Nadai, Theory of Flow and Fracture of Solids, vol. 1, 2nd ed.
/// (1950), ch. 35, and Hill, The Mathematical Theory of Plasticity (1950), ch. IV sec. 6 (T_p = 2 x heap volume);
/// chapter numbers from memory. The heap volumes are elementary solids (cone, frustum, roof, pyramid).
/// </summary>
public sealed class PlasticClosedFormTests
{
    private const double TauY = 200e6;
    private static readonly PlasticOptions Fast = new() { TwistRatios = [1, 2] };

    private static PlasticResult Run(string spec, PlasticOptions? o = null) =>
        PlasticAnalyzer.Analyze(SectionAnalyzer.Analyze(ProfileTemplates.Create(spec, LengthUnit.Millimetre)), TauY, o ?? Fast);

    [Fact]
    public void Solid_circle_fully_plastic_torque_is_2_pi_r3_tau_over_3_and_shape_factor_4_3()
    {
        // Cone of radius r and height r: T_p = 2 pi r^3 tau_y / 3 (Nadai; Hill). First yield T_y = pi r^3 tau_y / 2
        // (Timoshenko and Goodier, Theory of Elasticity, 3rd ed., sec. 101), so T_p / T_y = 4/3 exactly.
        var r = Run("circle:d=40");
        double rad = 0.020;
        double exact = 2 * Math.PI * Math.Pow(rad, 3) * TauY / 3;
        Tol.Rel(exact, r.FullyPlasticTorque, 1e-4, "Nadai sand heap: cone");
        Assert.True(Tol.RelErr(exact, r.FullyPlasticTorque) <= r.FullyPlasticTorqueError, "the estimate bounds the true error");
        Tol.Rel(Math.PI * Math.Pow(rad, 3) * TauY / 2, r.FirstYieldTorque, 1e-4, "Timoshenko and Goodier sec. 101");
        Tol.Rel(4.0 / 3, r.ShapeFactor, 2e-4, "shape factor of the circle 4/3");
    }

    [Fact]
    public void Round_tube_fully_plastic_torque_is_2_pi_tau_ro3_minus_ri3_over_3()
    {
        // Frustum of the cone cut at height ro - ri with the hole as a plateau: T_p = 2 pi tau_y (ro^3 - ri^3) / 3.
        var r = Run("tube:D=40,d=24", new PlasticOptions { TwistRatios = [1] });
        double exact = 2 * Math.PI * TauY * (Math.Pow(0.020, 3) - Math.Pow(0.012, 3)) / 3;
        Tol.Rel(exact, r.FullyPlasticTorque, 1e-4, "Nadai sand heap: frustum with plateau");
        Assert.True(Tol.RelErr(exact, r.FullyPlasticTorque) <= r.FullyPlasticTorqueError + 1e-6, "the estimate bounds the true error");
    }

    [Fact]
    public void Rectangle_fully_plastic_torque_is_tau_h2_3b_minus_h_over_6()
    {
        // Roof over a b x h rectangle (b >= h): volume h^2 (3b - h) / 12, T_p = tau_y h^2 (3b - h) / 6.
        var r = Run("rect:b=60,h=20");
        double b = 0.060, h = 0.020;
        double exact = TauY * h * h * (3 * b - h) / 6;
        Tol.Rel(exact, r.FullyPlasticTorque, 3e-4, "Nadai sand heap: roof");
        Assert.True(Tol.RelErr(exact, r.FullyPlasticTorque) <= r.FullyPlasticTorqueError, "the estimate bounds the true error");
    }

    [Fact]
    public void Equilateral_triangle_fully_plastic_torque_is_tau_a3_over_12()
    {
        // Pyramid of height a / (2 sqrt 3) (the in-radius) over the triangle: volume a^3 / 24, T_p = tau_y a^3 / 12.
        var r = Run("triangle:a=50");
        double exact = TauY * Math.Pow(0.050, 3) / 12;
        Tol.Rel(exact, r.FullyPlasticTorque, 3e-4, "Nadai sand heap: pyramid");
        Assert.True(Tol.RelErr(exact, r.FullyPlasticTorque) <= r.FullyPlasticTorqueError, "the estimate bounds the true error");
    }

    [Fact]
    public void Square_tube_with_sharp_corners_fully_plastic_torque_is_tau_a3_minus_ai3_over_3()
    {
        // Square a x a with a concentric square hole a_i = a - 2t: the heap of the full square (pyramid of height a/2)
        // cut at height t, the hole a plateau at c = tau_y t; frustum volume (a^3 - a_i^3) / 6, T_p = tau_y (a^3 - a_i^3) / 3.
        // Thin-wall limit 4 a^2 t tau_y = 2 A_m t tau_y (derived here from the sand heap).
        double a = 0.050, t = 0.003, ai = a - 2 * t;
        var outer = LoopBuilder.Polygon([new(0, 0), new(a, 0), new(a, a), new(0, a)]);
        var hole = LoopBuilder.Polygon([new(t, t), new(a - t, t), new(a - t, a - t), new(t, a - t)]);
        var elastic = SectionAnalyzer.Analyze(new Profile([new Region(outer, [hole])], LengthUnit.Millimetre), new AnalysisOptions { Accuracy = 1e-3 });
        var r = PlasticAnalyzer.Analyze(elastic, TauY, new PlasticOptions { TwistRatios = [1] });
        double exact = TauY * (a * a * a - ai * ai * ai) / 3;
        Tol.Rel(exact, r.FullyPlasticTorque, 3e-4, "Nadai sand heap: truncated pyramid with plateau");
        Assert.True(Tol.RelErr(exact, r.FullyPlasticTorque) <= r.FullyPlasticTorqueError + 1e-6, "the estimate bounds the true error");
    }

    // A thick tube (D 50, d 20): elastic core radius R theta_y / theta as for the solid bar (same sources as the circle
    // below), so the plastic area is (R^2 - max(R theta_y / theta, r_i)^2) / (R^2 - r_i^2): 0 at first yield, 42.9 % at
    // 1.25, 89.3 % at 2, all of it from 2.5 on; and the yielded area never shrinks as the twist grows.
    [Fact]
    public void Thick_tube_yielded_area_follows_the_elastic_core_and_never_shrinks()
    {
        var r = Run("tube:D=50,d=20", new PlasticOptions { TwistRatios = [1, 1.25, 2, 3] });
        const double ro = 25, ri = 10;
        foreach (var p in r.Curve)
        {
            double core = Math.Max(ro / p.TwistRatio, ri);
            Tol.Abs((ro * ro - core * core) / (ro * ro - ri * ri), p.PlasticFraction, 0.02, $"elastic core at theta/theta_y = {p.TwistRatio}");
        }
        Assert.Equal(0, r.Curve[0].PlasticFraction);
        Assert.True(r.Curve.Zip(r.Curve.Skip(1)).All(q => q.Second.PlasticFraction >= q.First.PlasticFraction), "the plastic zone only grows");
    }

    [Fact]
    public void Circle_torque_twist_curve_matches_the_elastic_plastic_closed_form()
    {
        // Elastic core of radius rho = r theta_y / theta: T / T_y = 4/3 (1 - (theta_y / theta)^3 / 4)
        // (Beer, Johnston and DeWolf, Mechanics of Materials, sec. 3.9 "elastoplastic deformations in circular shafts";
        // section number from memory). Plastic area fraction 1 - (theta_y / theta)^2.
        var r = Run("circle:d=40", new PlasticOptions { TwistRatios = [1, 1.5, 2, 4, 10] });
        foreach (var p in r.Curve)
        {
            double exact = 4.0 / 3 * (1 - 0.25 / Math.Pow(p.TwistRatio, 3));
            Tol.Rel(exact, p.TorqueRatio, 3e-4, $"Beer et al. sec. 3.9, theta/theta_y = {p.TwistRatio}");
            Assert.True(Tol.RelErr(exact, p.TorqueRatio) <= p.EstimatedRelativeError + 2e-4,
                $"estimate {p.EstimatedRelativeError:E2} vs error {Tol.RelErr(exact, p.TorqueRatio):E2} at {p.TwistRatio} (plus the first-yield error)");
            Tol.Abs(1 - 1 / (p.TwistRatio * p.TwistRatio), p.PlasticFraction, 0.03, "plastic annulus area fraction (approximate: the border is resolved to about an element)");
        }
        Assert.True(r.Curve.Zip(r.Curve.Skip(1)).All(q => q.Second.Torque > q.First.Torque), "torque rises with twist");
        Assert.True(r.Curve[^1].Torque < r.FullyPlasticTorque * (1 + 1e-4), "never above the fully plastic torque");
    }

    [Fact]
    public void Tube_becomes_fully_plastic_at_twist_ratio_ro_over_ri()
    {
        // Shear proportional to the radius: the bore yields when theta / theta_y = ro / ri; from there on T = T_p
        // (closed form from the elastic-perfectly-plastic tube, common practice, no source).
        var r = Run("tube:D=40,d=20", new PlasticOptions { TwistRatios = [1, 2.2] });
        Tol.Rel(1, r.Curve[0].TorqueRatio, 2e-4, "elastic up to first yield");
        Tol.Rel(r.FullyPlasticTorque, r.Curve[1].Torque, 2e-4, "fully plastic beyond ro/ri");
        Tol.Rel(2 * Math.PI * TauY * (8e-6 - 1e-6) / 3, r.Curve[1].Torque, 2e-4, "Nadai sand heap: frustum with plateau");
    }
}
