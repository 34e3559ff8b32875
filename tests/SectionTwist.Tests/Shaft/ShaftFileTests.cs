using SectionTwist.Shaft;

namespace SectionTwist.Tests.Shaft;

public class ShaftFileTests
{
    internal const string Good = """
        units: {length: mm, torque: N*m, modulus: GPa, stress: MPa}
        materials:
          steel: {G: 79.3, allowableShear: 60}
        sections:
          s40: {round: 40}
        stations:
          - {name: A, at: 0}
          - {name: B, after: 300}
          - {name: C, after: 200}
        segments:
          - {from: A, to: B, section: s40, material: steel}
          - {from: B, to: C, section: {round: 30}, material: steel}
        loads:
          - {at: C, torque: 100}
        supports: {fixed: [A]}
        """;

    // Each broken file: the line (1-based) and key the message must name.
    public static TheoryData<string, string, int, string, string> Broken => new()
    {
        { "unknown key", Good.Replace("{from: A, to: B, section: s40", "{form: A, to: B, section: s40", StringComparison.Ordinal), 11, "form", "did you mean 'from'" },
        { "missing unit", Good.Replace("units: {length: mm, torque: N*m, modulus: GPa, stress: MPa}", "units: {length: mm, modulus: GPa, stress: MPa}", StringComparison.Ordinal), 14, "torque", "has no unit" },
        { "unknown station", Good.Replace("{at: C, torque", "{at: X, torque", StringComparison.Ordinal), 14, "at", "no station named 'X'" },
        { "negative length", Good.Replace("after: 200", "after: -200", StringComparison.Ordinal), 9, "after", "negative" },
        { "unknown material", Good.Replace("section: {round: 30}, material: steel", "section: {round: 30}, material: stel", StringComparison.Ordinal), 12, "material", "unknown material 'stel'; did you mean 'steel'" },
        { "zero diameter", Good.Replace("{round: 40}", "{round: 0}", StringComparison.Ordinal), 5, "round", "must be positive" },
        { "bad unit kind", Good.Replace("torque: 100", "torque: 100 mm", StringComparison.Ordinal), 14, "torque", "not a unit of this kind" },
        { "unknown section", Good.Replace("section: s40", "section: s04", StringComparison.Ordinal), 11, "section", "did you mean 's40'" },
    };

    [Theory]
    [MemberData(nameof(Broken))]
    public void File_errors_name_file_line_and_key(string kind, string text, int line, string key, string expect)
    {
        var e = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse(text, "design.yaml"));
        Assert.StartsWith($"design.yaml:{line}:", e.Message, StringComparison.Ordinal);
        Assert.Contains($": {key}: ", e.Message, StringComparison.Ordinal);
        Assert.Contains(expect, e.Message, StringComparison.Ordinal);
        Assert.DoesNotContain("\n", e.Message, StringComparison.Ordinal);
        Assert.False(string.IsNullOrEmpty(kind));
    }

    [Fact]
    public void Good_file_gives_the_same_result_as_the_code_model()
    {
        var doc = ShaftFile.Parse(Good, "design.yaml");
        var r = ShaftSolver.Solve(doc.Model);
        var g = 79.3e9;
        double phi = 100 * 0.3 / (g * ShaftTestModels.JRound(0.04)) + 100 * 0.2 / (g * ShaftTestModels.JRound(0.03));
        Tol.Rel(phi, ShaftTestModels.Rotation(r, "C"), 1e-12, "cantilever sum T L / (G J)");
        Assert.Equal("mm", doc.Units.Length.Symbol);
        Tol.Rel(60e6, r.Segments[0].ShearLimit!.Value, 1e-15);
    }

    // Unit conversions (exact definitions): 1 in = 25.4 mm; 1 lbf*in = 0.112984829 N*m; 1 psi = 6894.757 Pa;
    // hp is the mechanical horsepower 745.69987 W (ShaftPower.MechanicalHorsepower); 1 rpm = 2 pi / 60 rad/s.
    [Fact]
    public void Values_carry_their_own_units()
    {
        const string text = """
            materials:
              m: {G: 11.5e6 psi, shearYield: 30 ksi}
              e: {E: 200 GPa, poisson: 0.25}
            stations:
              - {name: A, at: 0 in}
              - {name: B, at: 4.5 in}
              - {name: C, at: 250 mm}
            segments:
              - {from: A, to: B, section: {J: 0.05 in^4, shearFactor: 20 1/in^3}, material: m}
              - {from: B, to: C, section: {J: 2e4 mm^4, torsionalModulus: 1000 mm^3}, material: e}
            loads:
              - {at: B, torque: 1800 lbf*in}
              - {at: C, power: 1 hp, speed: 1000 rpm}
              - {from: B, to: C, torquePerLength: 50 N*m/m}
            supports: {fixed: A}
            twistLimit: 0.25 deg/ft
            """;
        var m = ShaftFile.Parse(text, "u.yaml").Model;
        Tol.Rel(0.1143, m.Stations[1].Position, 1e-14);
        var seg0 = m.Segments[0];
        Tol.Rel(11.5e6 * 6894.757293168, seg0.Material.ShearModulus, 1e-9);
        Tol.Rel(30e3 * 6894.757293168, seg0.Material.ShearYield!.Value, 1e-9);
        Tol.Rel(0.05 * Math.Pow(0.0254, 4), seg0.Section!.TorsionConstant, 1e-9);
        Tol.Rel(20 / Math.Pow(0.0254, 3), seg0.Section.ShearPerTorque, 1e-12);
        Tol.Rel(200e9 / 2.5, m.Segments[1].Material.ShearModulus, 1e-14, "G = E / (2 (1 + nu))");
        Tol.Rel(1 / 1e-6, m.Segments[1].Section!.ShearPerTorque, 1e-12);
        Tol.Rel(1800 * 0.112984829027617, ((PointTorque)m.Loads[0]).Torque, 1e-9);
        Tol.Rel(ShaftPower.TorqueFromHorsepower(1, 1000), ((PointTorque)m.Loads[1]).Torque, 1e-10);
        Tol.Rel(50, ((DistributedTorque)m.Loads[2]).TorquePerLength, 1e-14);
        Tol.Rel(0.25 * Math.PI / 180 / 0.3048, m.TwistRateLimit!.Value, 1e-12);
        Assert.Equal(["A"], m.FixedStations);
    }

    [Fact]
    public void Template_and_dxf_sections_go_through_the_resolver_once_each()
    {
        string text = Good.Replace("s40: {round: 40}", "s40: {template: \"keyed:d=40\"}\n  pro: {dxf: parts/spline.dxf, layer: SECTION, part: \"2\"}", StringComparison.Ordinal)
            .Replace("section: {round: 30}", "section: pro", StringComparison.Ordinal);
        var seen = new List<SectionSource>();
        SectionStiffness Resolve(SectionSource s) { seen.Add(s); return SectionStiffness.Round(s.TemplateSpec is null ? 0.03 : 0.04) with { Description = null }; }
        var doc = ShaftFile.Parse(text, "design.yaml", "/work/designs", Resolve);
        Assert.Equal(2, seen.Count);
        Assert.Equal("keyed:d=40", seen[0].TemplateSpec);
        Assert.Equal("/work/designs/parts/spline.dxf", seen[1].DxfPath);
        Assert.Equal("SECTION", seen[1].Layer);
        Assert.Equal("2", seen[1].Part);
        Assert.StartsWith("design.yaml:", seen[1].Location, StringComparison.Ordinal);
        Assert.Equal("keyed:d=40", doc.Model.Segments[0].Section!.Description);
        var noResolver = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse(text, "design.yaml"));
        Assert.Contains("design.yaml:5:", noResolver.Message, StringComparison.Ordinal);
        Assert.Contains("give 'J' and 'shearFactor' directly", noResolver.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Library_material_brings_its_source_and_derived_allowables()
    {
        var doc = ShaftFile.Parse(Good.Replace("material: steel}", "material: steel-1045-cd}", StringComparison.Ordinal), "design.yaml");
        var mat = doc.Model.Segments[1].Material;
        // S_sy = 0.577 S_y (Shigley); allowable = min(0.3 S_y, 0.18 S_u) (ASME shafting code, from memory), S_y 530, S_u 630 MPa (Shigley Table A-20, from memory).
        Tol.Rel(0.577 * 530e6, mat.ShearYield!.Value, 1e-12);
        Tol.Rel(Math.Min(0.3 * 530e6, 0.18 * 630e6), mat.AllowableShear!.Value, 1e-12);
        Assert.Contains("from memory", mat.Source, StringComparison.Ordinal);
    }

    [Fact]
    public void Invalid_yaml_reports_the_position()
    {
        var e = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse("stations:\n  - {name: A, at: 0\nsegments: []\n", "bad.yaml"));
        Assert.StartsWith("bad.yaml:2:", e.Message, StringComparison.Ordinal);
        Assert.Contains("not valid YAML", e.Message, StringComparison.Ordinal);
    }
}
