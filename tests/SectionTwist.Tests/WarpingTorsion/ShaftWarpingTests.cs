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

    // Restrained warping with a coupling spring is refused with a message naming the spring, its stations and the remedy
    // (the house rule for bad input; common practice, no source).
    [Fact]
    public void Restrained_warping_with_a_spring_names_the_spring_and_the_remedy()
    {
        string text = Beam.Replace("  - {name: B, after: 1200}", "  - {name: B, after: 1200}\n  - {name: C, after: 100}", StringComparison.Ordinal)
            .Replace("  - {at: B, torque: 300}", "  - {at: C, torque: 300}", StringComparison.Ordinal)
            + "springs:\n  - {name: coupling, between: [B, C], stiffness: 20 kN*m/rad}\nwarping: {A: restrained}\n";
        var ex = Assert.Throws<SectionTwistException>(() => Solve(text));
        Assert.Contains("spring coupling (stations B and C)", ex.Message, StringComparison.Ordinal);
        Assert.Contains("warping: free", ex.Message, StringComparison.Ordinal);
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
