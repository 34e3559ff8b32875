using SectionTwist.Shaft;
using SectionTwist.WarpingTorsion;

namespace SectionTwist.Tests.WarpingTorsion;

/// <summary>The shaft file's <c>warping:</c> key and the open-section warning.</summary>
public class ShaftWarpingTests
{
    private const string Beam = """
        units: {length: mm, torque: N*m}
        materials:
          frame: {library: steel-s355}
        sections:
          beam: {template: "ibeam:h=200,b=100,tw=5.6,tf=8.5,r=12"}
        stations:
          - {name: A, at: 0}
          - {name: B, after: 1200}
        segments:
          - {from: A, to: B, section: beam, material: frame}
        loads:
          - {at: B, torque: 300}
        supports:
          fixed: [A]

        """;

    /// <summary>The head of a shaft file in mm and N*m with steel S355 and one section 'beam' of the template.</summary>
    private static string Frame(string template) =>
        $"units: {{length: mm, torque: N*m}}\nmaterials:\n  frame: {{library: steel-s355}}\nsections:\n  beam: {{template: \"{template}\"}}\n";

    private static readonly SectionTwist.Torsion.AnalysisOptions Coarse = new() { Accuracy = 1e-3 };

    private static ShaftResult Solve(string text) =>
        ShaftSolver.Solve(ShaftFile.Parse(text, resolver: ShaftSections.CreateResolver(Coarse)).Model);

    [Fact]
    public void Open_section_with_free_warping_is_warned_and_warping_free_silences_it()
    {
        var r = Solve(Beam);
        Assert.Contains(r.WarpingWarnings, w => w.Contains("open thin-walled section solved with free warping", StringComparison.Ordinal));
        Assert.Null(r.Warping);
        var quiet = Solve(Beam + "warping: free\n");
        Assert.Empty(quiet.WarpingWarnings);
        Assert.Null(quiet.Warping);
    }

    [Fact]
    public void Round_shafts_carry_no_warping_warning()
    {
        var r = Solve(Beam.Replace("{template: \"ibeam:h=200,b=100,tw=5.6,tf=8.5,r=12\"}", "{template: \"keyed:d=40\"}", StringComparison.Ordinal));
        Assert.Empty(r.WarpingWarnings);
    }

    // Cantilever restrained at the root: phi(L) = T/(GJ) (L - a tanh(L/a)) (Vlasov, Thin-Walled Elastic Beams, 2nd ed.,
    // ch. 5; AISC Design Guide 9, from memory), with J and Iw from the section analysis of the same file.
    [Fact]
    public void Restrained_root_in_a_shaft_file_matches_the_closed_form()
    {
        var r = Solve(Beam + "warping: {A: restrained}\n");
        var m = r.Warping!;
        var sec = r.Model.Segments[0].Section!;
        double g = r.Model.Segments[0].Material.ShearModulus, e = r.Model.Segments[0].Material.YoungsModulus!.Value;
        double gj = g * sec.TorsionConstant, a = Math.Sqrt(e * sec.WarpingConstant!.Value / gj), l = 1.2;
        Tol.Rel(300 / gj * (l - a * Math.Tanh(l / a)), m.Stations[1].Rotation, 1e-9, "Vlasov ch. 5, cantilever");
        Assert.True(m.Stations[1].Rotation < r.Stations[1].Rotation, "restraint stiffens the member");
        Assert.Contains(r.WarpingWarnings, w => w.Contains("lateral-torsional buckling", StringComparison.Ordinal));
    }

    // An angle's walls meet at its shear centre: thin-walled theory gives Iw = 0 (Vlasov, Thin-Walled Elastic Beams,
    // ch. 1, from memory), so its small Iw and the restrained-warping stresses come from warping across the thickness,
    // decaying within a warping length of the order of the section (Saint-Venant's principle): the numbers are indicative.
    [Fact]
    public void A_restrained_angle_is_warned_as_warping_negligible_and_an_i_beam_is_not()
    {
        var angle = Solve(Beam.Replace("ibeam:h=200,b=100,tw=5.6,tf=8.5,r=12", "angle:h=60,b=60,t=6,r=6", StringComparison.Ordinal) + "warping: {A: restrained}\n");
        Assert.NotNull(angle.Warping);
        Assert.Contains(angle.WarpingWarnings, w => w.Contains("segment A-B: the section is warping-negligible", StringComparison.Ordinal));
        var beam = Solve(Beam + "warping: {A: restrained}\n");
        Assert.DoesNotContain(beam.WarpingWarnings, w => w.Contains("warping-negligible", StringComparison.Ordinal));
    }

    // Bending and warping normal stresses add (superposition in linear elasticity; the thin-walled normal stress
    // N/A + M y / I + B omega / Iw, Vlasov ch. 1): the reported sum is at least each part and at most the sum of their
    // maxima.
    [Fact]
    public void Bending_and_warping_normal_stresses_are_combined()
    {
        string text = Beam.Replace("  - {name: B, after: 1200}", "  - {name: M, after: 600}\n  - {name: B, after: 600}", StringComparison.Ordinal)
            .Replace("  - {from: A, to: B, section: beam, material: frame}", "  - {from: A, to: M, section: beam, material: frame}\n  - {from: M, to: B, section: beam, material: frame}", StringComparison.Ordinal)
            + "warping: {A: restrained}\nbending:\n  bearings: [{at: A}, {at: B}]\n  loads:\n    - {at: M, force: {y: 0, z: -5 kN}}\n";
        var r = Solve(text);
        Assert.NotNull(r.Bending);
        foreach (var s in r.Warping!.Segments)
        {
            double bendMax = r.Bending!.Samples.Where(b => b.Segment == s.Label).Max(b => Math.Abs(b.Stress.Normal));
            double combined = s.MaxCombinedNormalStress!.Value;
            Assert.True(combined >= s.MaxWarpingNormalStress * (1 - 1e-12) && combined >= bendMax * (1 - 1e-12), $"{s.Label}: {combined} below a part");
            Assert.True(combined <= (s.MaxWarpingNormalStress + bendMax) * (1 + 1e-12), $"{s.Label}: {combined} above the sum of the maxima");
        }
        Assert.Null(Solve(Beam + "warping: {A: restrained}\n").Warping!.Segments[0].MaxCombinedNormalStress);
    }

    // An I-beam with a bending block and the default 'rotating: true' is checked about its weak axis at every point (each
    // boundary point at its worst angle): the output says so and names 'rotating: false' for a member that does not rotate
    // (common practice, no source: structural members of open section do not rotate). With 'rotating: false' no note.
    [Fact]
    public void An_open_section_bent_as_a_rotating_shaft_draws_a_note()
    {
        string text = Beam.Replace("  - {name: B, after: 1200}", "  - {name: M, after: 600}\n  - {name: B, after: 600}", StringComparison.Ordinal)
            .Replace("  - {from: A, to: B, section: beam, material: frame}", "  - {from: A, to: M, section: beam, material: frame}\n  - {from: M, to: B, section: beam, material: frame}", StringComparison.Ordinal)
            + "warping: {A: restrained}\nbending:\n  bearings: [{at: A}, {at: B}]\n  loads:\n    - {at: M, force: {y: 0, z: -5 kN}}\n";
        Assert.Contains(Solve(text).WarpingWarnings, w => w.Contains("write 'rotating: false'", StringComparison.Ordinal) && w.StartsWith("segments A-M, M-B:", StringComparison.Ordinal));
        Assert.DoesNotContain(Solve(text + "  rotating: false\n").WarpingWarnings, w => w.Contains("rotating", StringComparison.Ordinal));
        Assert.DoesNotContain(Solve(Beam + "warping: {A: restrained}\n").WarpingWarnings, w => w.Contains("rotating", StringComparison.Ordinal));
    }

    /// <summary>The stiffness of an open cantilever restrained at its root and free to warp at its tip: T / phi(L) = G J / (L - a tanh(L/a)).</summary>
    private static double CantileverStiffness(ShaftSegment seg, double l)
    {
        var sec = seg.Section!;
        double g = seg.Material.ShearModulus, e = seg.Material.YoungsModulus!.Value, gj = g * sec.TorsionConstant;
        double a = Math.Sqrt(e * sec.WarpingConstant!.Value / gj);
        return gj / (l - a * Math.Tanh(l / a));
    }

    // A coupling carries torque, not bimoment: the beam ends at the coupling as a free-warping tip, so
    // phi_B = T (L - a tanh(L/a)) / (G J) (Vlasov, Thin-Walled Elastic Beams, 2nd ed., ch. 5) and the far side turns by
    // T / k more (a spring in series; statics, exact).
    [Fact]
    public void A_coupling_at_the_tip_of_a_restrained_cantilever_adds_its_wind_up_to_the_closed_form()
    {
        string text = Beam.Replace("  - {name: B, after: 1200}", "  - {name: B, after: 1200}\n  - {name: C, at: 1200}", StringComparison.Ordinal)
            .Replace("  - {at: B, torque: 300}", "  - {at: C, torque: 300}", StringComparison.Ordinal)
            + "springs:\n  - {name: coupling, between: [B, C], stiffness: 20 kN*m/rad}\nwarping: {A: restrained}\n";
        var r = Solve(text);
        var m = r.Warping!;
        double phiB = 300 / CantileverStiffness(r.Model.Segments[0], 1.2);
        Tol.Rel(phiB, m.Stations.Single(s => s.Name == "B").Rotation, 1e-9, "Vlasov ch. 5, cantilever with a free tip");
        Tol.Rel(phiB + 300 / 20e3, m.Stations.Single(s => s.Name == "C").Rotation, 1e-9, "spring in series");
        var sp = Assert.Single(m.Springs);
        Tol.Rel(300, sp.Torque, 1e-9, "statics");
        Assert.Equal(0, m.Stations.Single(s => s.Name == "C").RateOfTwist);
    }

    // Two restrained cantilevers joined by a coupling and held at both ends, torque at the coupling's first side: the
    // first beam (k1) in parallel with the spring and the second beam in series, k1 + 1 / (1/k + 1/k2) (statics and
    // compatibility, exact), each beam's stiffness from the closed form above; the coupling passes no bimoment.
    [Fact]
    public void Two_restrained_beams_joined_by_a_coupling_share_the_torque_by_their_closed_form_stiffnesses()
    {
        string text = Frame("ibeam:h=200,b=100,tw=5.6,tf=8.5,r=12") + """
            stations:
              - {name: A, at: 0}
              - {name: B, after: 1200}
              - {name: C, at: 1200}
              - {name: D, after: 800}
            segments:
              - {from: A, to: B, section: beam, material: frame}
              - {from: C, to: D, section: beam, material: frame}
            springs:
              - {between: [B, C], stiffness: 50 kN*m/rad}
            loads:
              - {at: B, torque: 400}
            supports:
              fixed: [A, D]
            warping: {A: restrained, D: restrained}

            """;
        var r = Solve(text);
        double k1 = CantileverStiffness(r.Model.Segments[0], 1.2), k2 = CantileverStiffness(r.Model.Segments[1], 0.8);
        double phiB = 400 / (k1 + 1 / (1 / 50e3 + 1 / k2));
        var m = r.Warping!;
        Tol.Rel(phiB, m.Stations.Single(s => s.Name == "B").Rotation, 1e-9, "parallel and series stiffnesses");
        Tol.Rel(-k1 * phiB, m.Stations.Single(s => s.Name == "A").ReactionTorque, 1e-9, "share of the first beam");
        Tol.Rel(-(400 - k1 * phiB), m.Stations.Single(s => s.Name == "D").ReactionTorque, 1e-9, "share through the coupling");
        Tol.Rel(-(400 - k1 * phiB), m.Springs[0].Torque, 1e-9, "coupling torque");
    }

    // A round taper does not warp: it twists by 32 T L (dA^2 + dA dB + dB^2) / (3 pi G dA^3 dB^3) (Young and Budynas,
    // Roark's Formulas, 7th ed., Table 10.1, tapered solid round), inside it by the same formula over the part, and its
    // shear is 16 T / (pi d^3); the beam before it is a free-warping tip (Vlasov ch. 5 as above).
    [Fact]
    public void A_taper_after_a_restrained_beam_twists_by_the_closed_form_of_a_tapered_round()
    {
        string text = Beam.Replace("  - {name: B, after: 1200}", "  - {name: B, after: 1200}\n  - {name: C, after: 400}", StringComparison.Ordinal)
            .Replace("  - {from: A, to: B, section: beam, material: frame}", "  - {from: A, to: B, section: beam, material: frame}\n  - {from: B, to: C, taper: {from: 60, to: 50}, material: frame}", StringComparison.Ordinal)
            .Replace("  - {at: B, torque: 300}", "  - {at: C, torque: 300}", StringComparison.Ordinal)
            + "warping: {A: restrained}\n";
        var r = Solve(text);
        var m = r.Warping!;
        double g = r.Model.Segments[1].Material.ShearModulus;
        static double Twist(double t, double l, double g, double da, double db) => 32 * t * l * (da * da + da * db + db * db) / (3 * Math.PI * g * da * da * da * db * db * db);
        double phiB = 300 / CantileverStiffness(r.Model.Segments[0], 1.2);
        Tol.Rel(phiB, m.Stations.Single(s => s.Name == "B").Rotation, 1e-9, "Vlasov ch. 5");
        Tol.Rel(phiB + Twist(300, 0.4, g, 0.060, 0.050), m.Stations.Single(s => s.Name == "C").Rotation, 1e-12, "Roark Table 10.1, tapered round");
        var taper = m.Segments.Single(s => s.Label == "B-C");
        var mid = taper.Points[taper.Points.Count / 2];
        Tol.Rel(phiB + Twist(300, 0.2, g, 0.060, 0.055), mid.Rotation, 1e-12, "Roark Table 10.1 over half the taper");
        Tol.Rel(16 * 300 / (Math.PI * Math.Pow(0.050, 3)), taper.MaxSaintVenantShear, 1e-12, "16 T / (pi d^3) at the thin end");
        Assert.Equal(0, taper.WarpingLength);
        Assert.Equal(0, taper.MaxBimoment);
        // the free-warping solve gives the same taper twist (its own exact element)
        Tol.Rel(r.Segments.Single(s => s.Label == "B-C").Twist, m.Stations.Single(s => s.Name == "C").Rotation - m.Stations.Single(s => s.Name == "B").Rotation, 1e-12, "same element");
        // a restraint where only the taper ends has nothing to act on, and says so
        var idle = Solve(text.Replace("warping: {A: restrained}", "warping: {A: restrained, C: restrained}", StringComparison.Ordinal));
        Assert.Contains(idle.WarpingWarnings, w => w.StartsWith("station C: the warping condition changes nothing", StringComparison.Ordinal));
        Assert.Equal(m.Stations.Single(s => s.Name == "C").Rotation, idle.Warping!.Stations.Single(s => s.Name == "C").Rotation);
    }

    // Held at both ends with warping restrained at the far end only. The rate of twist is continuous through the loaded
    // station, so next to it the long far segment has the rate of twist of the short, heavily loaded near segment: its
    // Saint-Venant torque G J phi' exceeds its whole torque there, balanced by a warping torque of opposite sign (Vlasov,
    // Thin-Walled Elastic Beams, ch. 5; the reactions still balance the load: statics). Its combined shear then exceeds
    // its free-warping peak, and the shear check must use it (the house rule that a segment marked ok is ok; common
    // practice, no source).
    [Fact]
    public void The_shear_check_covers_a_torque_share_moved_by_restrained_warping()
    {
        string text = Frame("channel:h=120,b=55,tw=7,tf=9,r=9") + """
            stations:
              - {name: A, at: 0}
              - {name: B, after: 300}
              - {name: C, after: 2700}
            segments:
              - {from: A, to: B, section: beam, material: frame}
              - {from: B, to: C, section: beam, material: frame}
            loads:
              - {at: B, torque: 300}
            supports:
              fixed: [A, C]
            warping: {C: restrained}

            """;
        var r = Solve(text);
        var m = r.Warping!;
        Tol.Rel(-300, m.Stations.Sum(s => s.ReactionTorque), 1e-12, "statics");
        var farPoints = m.Segments.Single(s => s.Label == "B-C").Points;
        Assert.True(farPoints.Max(p => Math.Abs(p.SaintVenantTorque)) > 1.2 * Math.Abs(m.Stations[2].ReactionTorque), "Saint-Venant torque above the segment's whole torque");
        var far = r.Segments.Single(s => s.Label == "B-C");
        var near = r.Segments.Single(s => s.Label == "A-B");
        Assert.True(far.ShearFromRestrainedWarping);
        Assert.Equal(m.Segments.Single(s => s.Label == "B-C").MaxCombinedShear, far.MaxShear);
        Tol.Rel(far.ShearLimit!.Value / far.MaxShear, far.SafetyFactor!.Value, 1e-15, "factor of safety of the combined shear");
        Assert.False(near.ShearFromRestrainedWarping);
        Assert.Same(near, r.GoverningSegment);
    }

    // A warping spring takes its unit: 20 kN*m^3 = 20 kN*m^2 per rad/m = 2e4 N*m^3, 1 lbf*in^3 = 4.4482216152605 N x
    // (0.0254 m)^3 (exact definitions of the pound-force and the inch); a plain number is N*m^3 only where the file is SI.
    [Theory]
    [InlineData("20 kN*m^3", 2e4)]
    [InlineData("2e4 N*m^3", 2e4)]
    [InlineData("20 kN*m^2/(rad/m)", 2e4)]
    [InlineData("2e13 N*mm^3", 2e4)]
    [InlineData("1 lbf*in^3", 4.4482216152605 * 0.0254 * 0.0254 * 0.0254)]
    public void A_warping_spring_reads_its_unit(string value, double si)
    {
        var r = ShaftFile.Parse(Beam + $"warping: {{A: {{spring: {value}}}}}\n", resolver: ShaftSections.CreateResolver(Coarse)).Model;
        Tol.Rel(si, r.Warping!["A"].Stiffness, 1e-12, "unit definitions");
    }

    [Fact]
    public void A_plain_warping_spring_needs_its_unit_in_a_file_that_is_not_si()
    {
        var ex = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse(Beam + "warping: {A: {spring: 2e4}}\n", resolver: ShaftSections.CreateResolver(Coarse)));
        Assert.Contains("has no unit and this file's units are not metres and N*m (only there is a plain number N*m^3); write the unit, e.g. '2e4 N*m^3'", ex.Message, StringComparison.Ordinal);
        var bad = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse(Beam + "warping: {A: {spring: 20 kN*m}}\n", resolver: ShaftSections.CreateResolver(Coarse)));
        Assert.Contains("'kN*m' is not a unit of this kind; use one of N*m^3", bad.Message, StringComparison.Ordinal);
        string si = Beam.Replace("units: {length: mm, torque: N*m}", "units: {length: m, torque: N*m}", StringComparison.Ordinal).Replace("after: 1200", "after: 1.2", StringComparison.Ordinal);
        Assert.Equal(2e4, ShaftFile.Parse(si + "warping: {A: {spring: 2e4}}\n", resolver: ShaftSections.CreateResolver(Coarse)).Model.Warping!["A"].Stiffness);
    }

    // A material without E cannot carry restrained warping (E Iw): named at its own entry, where the remedy goes, before
    // any solve (the house rule for bad input; common practice, no source).
    [Fact]
    public void A_material_without_e_is_named_at_its_line_when_warping_is_restrained()
    {
        string text = Beam.Replace("  frame: {library: steel-s355}", "  frame: {G: 80 GPa, allowableShear: 80 MPa}", StringComparison.Ordinal) + "warping: {A: restrained}\n";
        var ex = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse(text, resolver: ShaftSections.CreateResolver(Coarse)));
        Assert.Contains("shaft.yaml:3:", ex.Message, StringComparison.Ordinal);
        Assert.Contains("material 'frame' has no Young's modulus, which the restrained warping of segment A-B needs", ex.Message, StringComparison.Ordinal);
        // free warping needs no E
        Assert.Null(ShaftFile.Parse(text.Replace("warping: {A: restrained}", "warping: free", StringComparison.Ordinal), resolver: ShaftSections.CreateResolver(Coarse)).Model.Segments[0].Material.YoungsModulus);
    }

    [Fact]
    public void A_bad_warping_value_names_the_line_and_the_remedy()
    {
        var ex = Assert.Throws<SectionTwistException>(() => Solve(Beam + "warping: {A: clamped}\n"));
        Assert.Contains("shaft.yaml:", ex.Message, StringComparison.Ordinal);
        Assert.Contains("expected 'free', 'restrained' or '{spring: K}'", ex.Message, StringComparison.Ordinal);
        var ex2 = Assert.Throws<SectionTwistException>(() => Solve(Beam + "warping: {Q: restrained}\n"));
        Assert.Contains("no station named 'Q'", ex2.Message, StringComparison.Ordinal);
    }
}
