using SectionTwist.Shaft;
using SectionTwist.Tests.Cli;

namespace SectionTwist.Tests.Composite;

/// <summary>
/// A shaft file segment with a composite section: its stiffness is (G J)_eff / L and each material is checked against its
/// own allowable. Reference: the exact bonded bar, (G J)_eff = G1 J1 + G2 J2, tau_i = G_i r_i T / (G J)_eff (Gere,
/// Mechanics of Materials, sec. 3.8, from memory of the section number); library moduli and allowables as in
/// ShaftMaterials (steel-1045-cd 79.3 GPa, allowable min(0.3 S_y, 0.18 S_u) = 113.4 MPa; brass 37 GPa, no strength).
/// </summary>
public sealed class CompositeShaftTests : IDisposable
{
    private readonly string _dir = CliRunner.TempDir();

    public void Dispose() => Directory.Delete(_dir, recursive: true);

    private const string Yaml = """
        units: {length: mm, torque: N*m}
        materials:
          bush: {G: 37 GPa, allowableShear: 20 MPa}
        sections:
          sleeved: {template: "sleeved:d=40,t=5", materials: {core: steel-1045-cd, sleeve: bush}}
        stations:
          - {name: A, at: 0}
          - {name: B, after: 500}
        segments:
          - {from: A, to: B, section: sleeved, material: steel-1045-cd}
        loads:
          - {at: B, torque: 1500}
        supports:
          fixed: [A]
        """;

    private static double Ring(double a, double b) => Math.PI * (Math.Pow(b, 4) - Math.Pow(a, 4)) / 2;

    [Fact]
    public void Composite_segment_has_the_effective_stiffness_and_per_material_checks()
    {
        var doc = ShaftFile.Parse(Yaml, "sleeved.yaml", _dir, ShaftSections.CreateResolver(new SectionTwist.Torsion.AnalysisOptions { Accuracy = 1e-3 }));
        var r = ShaftSolver.Solve(doc.Model);
        var s = Assert.Single(r.Segments);
        double gj = 79.3e9 * Ring(0, 0.020) + 37e9 * Ring(0.020, 0.025);
        const string src = "exact bonded bar (Gere sec. 3.8, from memory of the section)";
        Tol.Rel(gj / 0.5, s.Stiffness, 1e-5, src);
        Tol.Rel(1500 * 0.5 / gj, Math.Abs(s.Twist), 1e-5, src);
        Assert.Equal(2, s.MaterialChecks.Count);
        double tauCore = 1500 * 79.3e9 * 0.020 / gj, tauSleeve = 1500 * 37e9 * 0.025 / gj;
        Tol.Rel(tauCore, s.MaterialChecks[0].MaxShear, 5e-3, src);
        Tol.Rel(tauSleeve, s.MaterialChecks[1].MaxShear, 5e-3, src);
        // the bush (allowable 20 MPa) is over its limit at about 41.6 MPa, the steel core (113.4 MPa) is not
        Assert.True(s.MaterialChecks[1].Exceeds);
        Assert.False(s.MaterialChecks[0].Exceeds);
        Assert.True(s.ExceedsShearLimit);
        Tol.Rel(20e6 / tauSleeve, s.SafetyFactor!.Value, 5e-3, src);
        Assert.Contains("in bush", s.Check);
        Assert.Contains(r.Warnings, w => w.Code == "composite-bonding");
    }

    [Fact]
    public void Shaft_json_with_a_composite_segment_matches_its_schema()
    {
        string path = Path.Combine(_dir, "sleeved.yaml");
        File.WriteAllText(path, Yaml);
        var n = JsonSchemaCheck.Valid("shaft", "shaft", path, "--json");
        var checks = n["segments"]![0]!["materialChecks"]!.AsArray();
        Assert.Equal(2, checks.Count);
        Assert.True((bool)checks[1]!["exceedsShearLimit"]!);
        var (code, text, _) = CliRunner.Run("shaft", path);
        Assert.Equal(0, code);
        Assert.Contains("composite A-B", text);
        Assert.Contains("bonded", text);
    }

    [Fact]
    public void A_bending_block_with_a_composite_section_is_refused_as_composite_not_as_a_shapeless_section()
    {
        // the message said "known only by J and its shear factor ... use 'template'" for a template section. Common
        // practice, no source: an advice must be one the user can follow.
        string path = Path.Combine(_dir, "bent.yaml");
        File.WriteAllText(path, Yaml + "\nbending:\n  bearings: [{at: A}, {at: B}]\n  loads: [{at: B, force: {y: 0, z: -1 kN}}]\n");
        var (code, _, err) = CliRunner.Run("shaft", path);
        Assert.Equal(2, code);
        Assert.Contains("is composite", err);
        Assert.DoesNotContain("known only by J", err);
        Assert.DoesNotContain("   at ", err);
    }

    [Fact]
    public void A_composite_template_without_materials_is_refused_at_its_line()
    {
        var bad = Yaml.Replace(", materials: {core: steel-1045-cd, sleeve: bush}", "", StringComparison.Ordinal);
        var ex = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse(bad, "sleeved.yaml", _dir, ShaftSections.CreateResolver()));
        Assert.Contains("sleeved.yaml:5", ex.Message);
        Assert.Contains("composite template", ex.Message);
    }

    [Fact]
    public void Drawing_layers_that_share_an_edge_make_a_composite_segment()
    {
        // the clad strip sample: steel 60 x 2.5 mm (CORE) and brass 60 x 1.5 mm (SKIN) bonded along the long edge
        string sample = Path.Combine(RepoPaths.SampleProfiles, "composite", "winch-clad-strip.dxf");
        File.Copy(sample, Path.Combine(_dir, "clad.dxf"));
        string yaml = Yaml.Replace("""sleeved: {template: "sleeved:d=40,t=5", materials: {core: steel-1045-cd, sleeve: bush}}""",
            "sleeved: {dxf: clad.dxf, materials: {CORE: steel-1045-cd, SKIN: bush}}", StringComparison.Ordinal);
        var doc = ShaftFile.Parse(yaml, "clad.yaml", _dir, ShaftSections.CreateResolver(new SectionTwist.Torsion.AnalysisOptions { Accuracy = 1e-3 }));
        var r = ShaftSolver.Solve(doc.Model);
        var s = Assert.Single(r.Segments);
        var section = SectionTwist.Composite.CompositeSources.Load(Path.Combine(_dir, "clad.dxf"),
            [new("CORE", ShaftMaterials.All["steel-1045-cd"]), new("SKIN", new Material("bush", 37e9, 20e6, null, "test"))]);
        var direct = SectionTwist.Composite.CompositeAnalyzer.Analyze(section, null, new SectionTwist.Torsion.AnalysisOptions { Accuracy = 1e-3 });
        // the segment's stiffness is (G J)_eff / L of the same section analysed directly (derived in the test)
        Tol.Rel(direct.TorsionalRigidity / 0.5, s.Stiffness, 1e-4, "the composite analysis of the same section (within the accuracy 1e-3 and its estimate)");
        Assert.Equal(2, s.MaterialChecks.Count);
        Assert.Contains(r.Warnings, w => w.Code == "composite-bonding");
    }
}
