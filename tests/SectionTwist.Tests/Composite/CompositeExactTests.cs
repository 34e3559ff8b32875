using SectionTwist.Composite;
using SectionTwist.Geometry;
using SectionTwist.Shaft;
using SectionTwist.Torsion;

namespace SectionTwist.Tests.Composite;

/// <summary>
/// Concentric composite round bars against the exact solution: each ring twists as a whole, so the shear is
/// tau = G_i r theta, (G J)_eff = sum G_i J_i and the torque shares are G_i J_i / (G J)_eff (Gere, Mechanics of Materials,
/// sec. 3.8 on bars of two bonded materials, from memory of the section number; Timoshenko and Goodier, Theory of
/// Elasticity, sec. 101, for J of a ring).
/// </summary>
public class CompositeExactTests
{
    internal static readonly Material Steel = new("steel", 79.3e9, 200e6, null, "test");
    internal static readonly Material Brass = new("brass", 37e9, 60e6, null, "test");

    private static double Ring(double a, double b) => Math.PI * (Math.Pow(b, 4) - Math.Pow(a, 4)) / 2;

    internal static CompositeSection CoreAndSleeve(double a, double b, Material core, Material sleeve) => new(
    [
        new CompositePart("core", new Profile([new Region(LoopBuilder.Circle(default, a))]), core),
        new CompositePart("sleeve", new Profile([new Region(LoopBuilder.Circle(default, b), [LoopBuilder.Circle(default, a)])]), sleeve),
    ], "core and sleeve");

    [Fact]
    public void Steel_core_in_brass_sleeve_matches_the_exact_composite_bar()
    {
        double a = 0.010, b = 0.015;
        var r = CompositeAnalyzer.Analyze(CoreAndSleeve(a, b, Steel, Brass), Steel);
        double gj1 = Steel.ShearModulus * Ring(0, a), gj2 = Brass.ShearModulus * Ring(a, b), gj = gj1 + gj2;
        const string src = "exact: GJ = G1 J1 + G2 J2, tau_i = G_i r T / GJ (Gere sec. 3.8, from memory of the section)";
        Tol.Rel(gj, r.TorsionalRigidity, 1e-6, src);
        Tol.Rel(gj / Steel.ShearModulus, r.EquivalentTorsionConstant, 1e-6, src);
        Tol.Rel(Steel.ShearModulus * a / gj, r.Materials[0].MaxShearPerTorque, 5e-3, src);
        Tol.Rel(Brass.ShearModulus * b / gj, r.Materials[1].MaxShearPerTorque, 5e-3, src);
        Tol.Rel(gj1 / gj, r.Materials[0].TorqueShare, 1e-5, src);
        Tol.Rel(gj2 / gj, r.Materials[1].TorqueShare, 1e-5, src);
        // the core's peak is on the interface, the sleeve's on the outside
        Tol.Rel(a, r.Materials[0].MaxShearLocation.Length, 1e-6, src);
        Tol.Rel(b, r.Materials[1].MaxShearLocation.Length, 1e-6, src);
        Tol.Rel(Math.PI * a * a, r.Materials[0].Area, 1e-6, "area of a circle");
        Assert.Equal(["core"], r.Materials[0].Parts);
        Assert.True(r.EstimatedRelativeError < 1e-4, $"estimate {r.EstimatedRelativeError}");
        Assert.DoesNotContain(r.Warnings, w => w.Code == "composite-peak-unconverged");
    }

    [Fact]
    public void Equivalent_constant_refers_to_the_chosen_material()
    {
        double a = 0.010, b = 0.015;
        var s = CoreAndSleeve(a, b, Steel, Brass);
        var r = CompositeAnalyzer.Analyze(s, Brass, new AnalysisOptions { Accuracy = 1e-3 });
        double gj = Steel.ShearModulus * Ring(0, a) + Brass.ShearModulus * Ring(a, b);
        Tol.Rel(gj / Brass.ShearModulus, r.EquivalentTorsionConstant, 1e-5, "exact: J_ref = GJ / G_ref (Gere sec. 3.8, from memory of the section)");
        Tol.Rel(gj, r.TorsionalRigidity, 1e-5, "exact: GJ = G1 J1 + G2 J2");
    }

    [Fact]
    public void Brass_liner_in_a_steel_tube_with_a_bore_matches_the_exact_composite_tube()
    {
        double r0 = 0.012, r1 = 0.015, r2 = 0.020;
        var s = new CompositeSection(
        [
            new CompositePart("liner", new Profile([new Region(LoopBuilder.Circle(default, r1), [LoopBuilder.Circle(default, r0)])]), Brass),
            new CompositePart("tube", new Profile([new Region(LoopBuilder.Circle(default, r2), [LoopBuilder.Circle(default, r1)])]), Steel),
        ], "lined tube");
        var r = CompositeAnalyzer.Analyze(s, Steel);
        double gjL = Brass.ShearModulus * Ring(r0, r1), gjT = Steel.ShearModulus * Ring(r1, r2), gj = gjL + gjT;
        const string src = "exact: GJ = G1 J1 + G2 J2 for bonded rings (Gere sec. 3.8, from memory of the section)";
        Tol.Rel(gj, r.TorsionalRigidity, 1e-6, src);
        Tol.Rel(Brass.ShearModulus * r1 / gj, r.Materials[0].MaxShearPerTorque, 5e-3, src);
        Tol.Rel(Steel.ShearModulus * r2 / gj, r.Materials[1].MaxShearPerTorque, 5e-3, src);
        Tol.Rel(gjL / gj, r.Materials[0].TorqueShare, 1e-5, src);
        Tol.Rel(1.0, r.Materials.Sum(m => m.TorqueShare), 1e-6, "the shares add to the whole torque (equilibrium)");
    }
}
