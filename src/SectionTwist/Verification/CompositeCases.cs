using SectionTwist.Composite;
using SectionTwist.Geometry;
using SectionTwist.Shaft;
using SectionTwist.Units;

namespace SectionTwist.Verification;

/// <summary>
/// The verification case of the composite analysis: a round bar bonded inside a round tube of another material. Each
/// circle stays plane and turns as a whole, so (G J)_eff = G1 J1 + G2 J2 and the shear in material i is
/// tau_i = G_i r T / (G J)_eff, largest at its outer radius (exact elasticity: Timoshenko and Goodier, Theory of
/// Elasticity, 3rd ed., torsion chapter, with the piecewise modulus; Lekhnitskii, Torsion of Anisotropic and
/// Non-Homogeneous Beams, the compound circular bar). The equivalent torsion constant refers to the core's material.
/// </summary>
internal static class CompositeCases
{
    private const string Source = "Timoshenko & Goodier torsion chapter / Lekhnitskii, compound circular bar (exact)";

    /// <summary>Core diameter, tube outer diameter (m) and the two shear moduli (Pa) of the case.</summary>
    public const double CoreDiameter = 0.030, TubeDiameter = 0.040, CoreModulus = 80e9, TubeModulus = 40e9;

    /// <summary>The cases: J_ref (of the core's material) and the peak shear per unit torque in each material.</summary>
    public static IEnumerable<VerificationCase> Build()
    {
        double j1 = Math.PI * Math.Pow(CoreDiameter, 4) / 32, j2 = Math.PI * (Math.Pow(TubeDiameter, 4) - Math.Pow(CoreDiameter, 4)) / 32;
        double gj = CoreModulus * j1 + TubeModulus * j2;
        const string name = "bonded bar/tube 30/40mm";
        Func<Profile> envelope = () => Section().Envelope;
        yield return new VerificationCase(name + " J", VerifiedQuantity.TorsionConstant, gj / CoreModulus, 1e-4, Source, envelope) { BuildComposite = Section };
        yield return new VerificationCase(name + " core peak shear", VerifiedQuantity.MaxShear, CoreModulus * CoreDiameter / 2 / gj, 5e-3, Source, envelope)
        { BuildComposite = Section, MaterialIndex = 0 };
        yield return new VerificationCase(name + " tube peak shear", VerifiedQuantity.MaxShear, TubeModulus * TubeDiameter / 2 / gj, 5e-3, Source, envelope)
        { BuildComposite = Section, MaterialIndex = 1 };
    }

    private static CompositeSection Section()
    {
        var unit = LengthUnit.Millimetre;
        var core = new Material("core G=80GPa", CoreModulus, null, null, "verification");
        var tube = new Material("tube G=40GPa", TubeModulus, null, null, "verification");
        var inner = LoopBuilder.Circle(default, CoreDiameter / 2);
        return new CompositeSection(
        [
            new CompositePart("core", new Profile([new Region(inner)], unit, "core"), core),
            new CompositePart("tube", new Profile([new Region(LoopBuilder.Circle(default, TubeDiameter / 2), [inner])], unit, "tube"), tube),
        ], "verification");
    }
}
