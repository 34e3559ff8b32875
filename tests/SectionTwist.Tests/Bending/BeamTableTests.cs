using SectionTwist.Bending;
using SectionTwist.Shaft;
using static SectionTwist.Tests.Bending.BendingTestModels;

namespace SectionTwist.Tests.Bending;

public class BeamTableTests
{
    // Simply supported beam, concentrated load W at midspan: R = W/2, M_max = W l / 4, y_max = W l^3 / (48 E I),
    // end slope W l^2 / (16 E I). Roark's Formulas for Stress and Strain, 7th ed., Table 8.1, case 1e (both ends simply
    // supported, concentrated intermediate load), a = l/2 (from memory).
    [Fact]
    public void Simply_supported_centre_load_matches_Roark_table_8_1_case_1e()
    {
        double l = 0.8, d = 0.04, w = 2500;
        var b = new BendingModel { Bearings = [new Bearing("S0"), new Bearing("S2")], Loads = [new PointForce("S1", 0, -w)] };
        var r = ShaftSolver.Solve(MakeShaft([0, l / 2, l], [d, d], b)).Bending!;
        double ei = E * I(d);
        Tol.Rel(w / 2, r.Bearings[0].ForceZ, 1e-12, "R = W/2");
        Tol.Rel(w / 2, r.Bearings[1].ForceZ, 1e-12, "R = W/2");
        Tol.Rel(w * l / 4, At(r, l / 2).Moment, 1e-12, "M = W l / 4");
        Tol.Rel(-w * l * l * l / (48 * ei), At(r, l / 2).DeflectionZ, 1e-10, "y = W l^3 / 48 E I");
        Tol.Rel(w * l * l / (16 * ei), r.Bearings[0].Slope, 1e-10, "theta = W l^2 / 16 E I");
        Assert.Equal(0, r.Bearings[0].ForceY);
        // the round reduces to sigma = 32 M / (pi d^3)
        Tol.Rel(32 * (w * l / 4) / (Math.PI * d * d * d), At(r, l / 2).Stress.VonMises, 1e-12, "32 M / (pi d^3)");
    }

    // A force and the weight straight down (-90 deg, the default gravity direction) load the Z plane only: the Y plane
    // carries nothing, so its bearing forces are exactly 0, not the 6E-17 of cos(-90 deg) times the load (statics, exact).
    [Fact]
    public void Loads_along_an_axis_leave_the_other_plane_exactly_unloaded()
    {
        double l = 3, d = 0.05;
        var b = new BendingModel
        {
            Bearings = [new Bearing("S0"), new Bearing("S2")], SelfWeight = true,
            Loads = [PointForce.Polar("S1", 1e4, -Math.PI / 2), PointForce.Polar("S1", 10, 3 * Math.PI / 2)],
        };
        var r = ShaftSolver.Solve(MakeShaft([0, l / 2, l], [d, d], b)).Bending!;
        Assert.All(r.Bearings, x => Assert.Equal(0, x.ForceY));
        Assert.All(r.Samples, x => Assert.True(x.MomentY == 0 && x.ShearY == 0 && x.DeflectionY == 0, $"Y plane loaded at {x.Position}"));
        Assert.All(r.Samples, x => Assert.False(double.IsNegative(x.AxialForce), "no axial load: +0, not -0 (a '-0' CSV cell)"));
        Tol.Rel((1e4 + 10 + 7850 * 9.80665 * Math.PI * d * d / 4 * l) / 2, r.Bearings[0].ForceZ, 1e-12, "R = W/2");
    }

    // Uniform load w on a simple span: M_max = w l^2 / 8, y_max = 5 w l^4 / (384 E I). Roark's, 7th ed., Table 8.1,
    // case 2e with w_a = w_l (uniform), from memory. Here the load is the shaft's own weight rho g A.
    [Fact]
    public void Self_weight_on_simple_span_matches_uniform_load_case()
    {
        double l = 2.0, d = 0.05;
        var b = new BendingModel { Bearings = [new Bearing("S0"), new Bearing("S2")], SelfWeight = true };
        var r = ShaftSolver.Solve(MakeShaft([0, l / 2, l], [d, d], b)).Bending!;
        double q = 7850 * 9.80665 * Math.PI * d * d / 4, ei = E * I(d);
        Tol.Rel(q * l * l / 8, At(r, l / 2).Moment, 1e-12, "w l^2 / 8");
        Tol.Rel(-5 * q * Math.Pow(l, 4) / (384 * ei), At(r, l / 2).DeflectionZ, 1e-10, "5 w l^4 / 384 E I");
        Tol.Rel(q * l / 2, r.Bearings[0].ForceZ, 1e-12, "R = w l / 2");
    }

    // Beam overhanging one support, load P at the end of the overhang a, span l: R1 = -P a / l, R2 = P (l + a) / l,
    // M at R2 = P a, tip deflection P a^2 (l + a) / (3 E I). AISC Steel Construction Manual, 13th ed., Table 3-23,
    // case 26 (from memory).
    [Fact]
    public void Overhung_end_load_matches_AISC_case_26()
    {
        double l = 0.5, a = 0.15, d = 0.035, p = 1200;
        var b = new BendingModel { Bearings = [new Bearing("S0"), new Bearing("S1")], Loads = [PointForce.Polar("S2", p, Math.PI / 2)] };
        var r = ShaftSolver.Solve(MakeShaft([0, l, l + a], [d, d], b)).Bending!;
        Tol.Rel(p * a / l, r.Bearings[0].ForceZ, 1e-10, "R1 = P a / l");
        Tol.Rel(-p * (l + a) / l, r.Bearings[1].ForceZ, 1e-10, "R2");
        Tol.Rel(p * a, At(r, l).Moment, 1e-10, "M = P a");
        Tol.Rel(p * a * a * (l + a) / (3 * E * I(d)), At(r, l + a).DeflectionZ, 1e-10, "P a^2 (l + a) / 3 E I");
        // the plane Y result of a Z load is zero
        Assert.All(r.Samples, s => Assert.True(Math.Abs(s.MomentY) < 1e-12 * p * a));
    }

    // Cantilever (one clamped bearing), end load P: M = P l at the clamp, tip deflection P l^3 / (3 E I), tip slope
    // P l^2 / (2 E I). Roark's, 7th ed., Table 8.1, case 1a (from memory). Shear deformation adds P l / (k G A) to the
    // deflection (Timoshenko and Gere, Mechanics of Materials, shear deflection of beams).
    [Fact]
    public void Clamped_bearing_cantilever_with_and_without_shear_deformation()
    {
        double l = 0.3, d = 0.03, p = 500;
        foreach (bool shear in new[] { false, true })
        {
            var b = new BendingModel { Bearings = [new Bearing("S0") { Clamped = true }], Loads = [new PointForce("S1", p, 0)], ShearDeformation = shear };
            var r = ShaftSolver.Solve(MakeShaft([0, l], [d], b)).Bending!;
            double nu = E / (2 * 80e9) - 1, k = 6 * (1 + nu) / (7 + 6 * nu);
            double expected = p * l * l * l / (3 * E * I(d)) + (shear ? p * l / (k * 80e9 * Math.PI * d * d / 4) : 0);
            Tol.Rel(expected, At(r, l).DeflectionY, 1e-10, "P l^3 / 3 E I (+ P l / k G A)");
            Tol.Rel(-p * l, r.Bearings[0].MomentY, 1e-10, "clamp moment");
            Tol.Rel(p * l * l / (2 * E * I(d)), At(r, l).SlopeY, 1e-10, "P l^2 / 2 E I");
        }
    }

    // Three bearings at 0, L, 2L, load P at L/2. Hand compatibility (written here): remove the middle bearing; the
    // simply supported span 2L deflects at x = L under P at a = L/2 by P a (l - x)(2 l x - x^2 - a^2) / (6 E I l) with l = 2L
    // (Roark's Table 8.1 case 1e, x > a), and under a unit load at midspan by l^3 / (48 E I); the middle reaction restores
    // zero deflection: R = 11 P / 16.
    [Fact]
    public void Three_bearing_shaft_matches_compatibility_solution()
    {
        double span = 0.4, d = 0.04, p = 3000;
        var b = new BendingModel { Bearings = [new Bearing("S0"), new Bearing("S2"), new Bearing("S3")], Loads = [new PointForce("S1", 0, -p)] };
        var r = ShaftSolver.Solve(MakeShaft([0, span / 2, span, 2 * span], [d, d, d], b)).Bending!;
        double ei = E * I(d), ll = 2 * span, a = span / 2, x = span;
        double deltaP = p * a * (ll - x) * (2 * ll * x - x * x - a * a) / (6 * ei * ll);
        double deltaUnit = ll * ll * ll / (48 * ei);
        double rMid = deltaP / deltaUnit;
        Tol.Rel(11.0 / 16 * p, rMid, 1e-12, "hand result 11 P / 16");
        Tol.Rel(rMid, r.Bearings[1].ForceZ, 1e-10, "middle reaction");
        Tol.Rel(p, r.Bearings.Sum(q => q.ForceZ), 1e-12, "statics: reactions balance the load");
    }
}
