using SectionTwist.Geometry;
using SectionTwist.Shaft;
using SectionTwist.Units;
using SectionTwist.WarpingTorsion;

namespace SectionTwist.Verification;

/// <summary>
/// Verification cases of the warping analysis: the ellipse's warping constant from its exact warping function
/// (Timoshenko and Goodier, Theory of Elasticity, 3rd ed., sec. 105: psi = -(a^2 - b^2)/(a^2 + b^2) x y, so
/// Iw = k^2 pi a^3 b^3 / 24 with k = (a^2 - b^2)/(a^2 + b^2)), and the cantilever of open section in non-uniform torsion,
/// warping restrained at the root and free at the tip under an end torque T: phi(L) = T / (G J) (L - a tanh(L/a)),
/// a = sqrt(E Iw / (G J)) (Vlasov, Thin-Walled Elastic Beams, 2nd ed., ch. 5; the same case in the steel institutes'
/// torsion design guides, e.g. AISC Design Guide 9, from memory).
/// </summary>
internal static class WarpingCases
{
    private const string Ellipse = "Timoshenko & Goodier sec. 105 (exact warping function of the ellipse)";
    private const string Cantilever = "Vlasov, Thin-Walled Elastic Beams, ch. 5: phi(L) = T/(GJ) (L - a tanh(L/a)) (closed form)";

    /// <summary>The cases.</summary>
    public static IEnumerable<VerificationCase> Build()
    {
        foreach (double ratio in new[] { 2.0, 4.0 })
        {
            double a = 0.020, b = a / ratio, k = (a * a - b * b) / (a * a + b * b);
            yield return new VerificationCase(FormattableString.Invariant($"ellipse {ratio}:1 a=20mm Iw"), VerifiedQuantity.WarpingConstant,
                k * k * Math.PI * Math.Pow(a * b, 3) / 24, 1e-4, Ellipse,
                () => new Profile([new Region(new Loop([EllipticalArcSegment.Full(default, a, b)]), [])], LengthUnit.Millimetre, "verification"));
        }
        // Section values of the order of a 200 mm parallel-flange I-beam (inputs of the check, not table values):
        // J = 7e-8 m^4, Iw = 1.3e-8 m^6; steel E = 210 GPa, G = 81 GPa; T = 1 kN*m. Lengths of 0.5, 2 and 8 warping
        // lengths cover the warping-dominated, mixed and Saint-Venant-dominated ranges.
        const double j = 7e-8, iw = 1.3e-8, e = 210e9, g = 81e9, t = 1000;
        double aw = Math.Sqrt(e * iw / (g * j));
        foreach (double n in new[] { 0.5, 2.0, 8.0 })
        {
            double l = n * aw;
            yield return new VerificationCase(FormattableString.Invariant($"cantilever I restrained L={n:0.#}a twist"), VerifiedQuantity.MemberRotation,
                t / (g * j) * (l - aw * Math.Tanh(l / aw)), 1e-9, Cantilever,
                () => Profiles.ProfileTemplates.Create("ibeam:h=200,b=100,tw=5.6,tf=8.5,r=12"))
            {
                Evaluate = () => Twist(l, j, iw, e, g, t),
            };
        }
    }

    private static double Twist(double l, double j, double iw, double e, double g, double t)
    {
        var steel = new Material("steel", g, null, null, "verification") { YoungsModulus = e };
        var member = new WarpingMember
        {
            Stations = [new Station("root", 0), new Station("mid", 0.4 * l), new Station("tip", l)],
            Segments =
            [
                new WarpingSegment("root", "mid", new WarpingSection(j, iw, 0, 0), steel),
                new WarpingSegment("mid", "tip", new WarpingSection(j, iw, 0, 0), steel),
            ],
            Loads = [new PointTorque("tip", t)],
            FixedStations = ["root"],
            Warping = new Dictionary<string, WarpingEnd> { ["root"] = WarpingEnd.Restrained },
        };
        return WarpingMemberSolver.Solve(member).Stations[2].Rotation;
    }
}
