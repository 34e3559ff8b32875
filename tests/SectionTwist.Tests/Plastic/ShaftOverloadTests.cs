using SectionTwist.Plastic;
using SectionTwist.Shaft;

namespace SectionTwist.Tests.Plastic;

/// <summary>
/// The shaft file's overload checks against the fully plastic torque. Closed forms of the sand-heap analogy (Nadai, Theory
/// of Flow and Fracture of Solids, vol. 1, 2nd ed., ch. 35; Hill, The Mathematical Theory of Plasticity, ch. IV; chapter
/// numbers from memory): solid circle T_p = 2 pi r^3 tau_y / 3, round tube 2 pi tau_y (ro^3 - ri^3) / 3, rectangle b &gt;= h
/// tau_y h^2 (3 b - h) / 6; first yield of a circle T_y = pi r^3 tau_y / 2 (Timoshenko and Goodier, Theory of Elasticity,
/// ch. 10), so its shape factor is 4/3.
/// </summary>
public class ShaftOverloadTests
{
    private const string File = """
        units: {length: mm, torque: N*m}
        materials:
          m: {G: 80 GPa, shearYield: 200 MPa}
          t: {G: 80 GPa, yield: 400 MPa}
        stations: [{name: A, at: 0}, {name: B, after: 100}, {name: C, after: 100}, {name: D, after: 100}]
        segments:
          - {name: solid, from: A, to: B, section: {round: 40}, material: m}
          - {name: tube, from: B, to: C, section: {tube: {outer: 40, inner: 24}}, material: t}
          - {name: bar, from: C, to: D, section: {template: "rect:b=60,h=20"}, material: m}
        loads: [{at: D, torque: 1000}]
        supports: {fixed: [A]}
        overload:
          factor: 1.25
          cases:
            - {name: stall, scale: 2.6}
            - {name: jam, torque: 9 kN*m, segments: [solid, bar]}
        """;

    private static OverloadResult Solve(string text) =>
        ShaftSolver.Solve(ShaftFile.Parse(text, resolver: ShaftSections.CreateResolver()).Model).Overload!;

    [Fact]
    public void Fully_plastic_torques_first_yield_and_margins_follow_the_closed_forms()
    {
        var o = Solve(File);
        Assert.Equal(1.25, o.Factor);
        var solid = o.Segments.Single(s => s.Segment == "solid");
        double r = 0.020, tau = 200e6;
        Tol.Rel(2 * Math.PI * r * r * r * tau / 3, solid.FullyPlasticTorque!.Value, 1e-12, "Nadai sand heap: cone, T_p = 2 pi r^3 tau_y / 3");
        Tol.Rel(Math.PI * r * r * r * tau / 2, solid.FirstYieldTorque!.Value, 1e-12, "T_y = pi r^3 tau_y / 2 (Timoshenko and Goodier ch. 10)");
        Tol.Rel(4.0 / 3, solid.ShapeFactor!.Value, 1e-12, "shape factor of the circle 4/3");
        // stall: 2.6 x 1000 N*m; margin = T_p / (1.25 x 2600) - 1 (the definition of the check), T_p = 3351 N*m
        var stall = solid.Checks.Single(c => c.Case == "stall");
        Tol.Rel(2600, stall.Torque, 1e-9, "2.6 x the solved torque");
        Tol.Rel(solid.FullyPlasticTorque.Value / (1.25 * 2600) - 1, stall.Margin!.Value, 1e-12);
        Assert.True(stall.Yields, "2600 N*m exceeds T_y = 2513 N*m");
        Assert.Equal("ok", stall.Check);
        // jam: 9 kN*m > T_p / 1.25 = 2681 N*m
        var jam = solid.Checks.Single(c => c.Case == "jam");
        Assert.Equal("over plastic capacity", jam.Check);
        Assert.True(jam.Margin < 0);

        var tube = o.Segments.Single(s => s.Segment == "tube");
        double tauT = 0.577 * 400e6;   // distortion energy, Shigley ch. 5
        Tol.Rel(tauT, tube.YieldShear!.Value, 1e-12, "tau_y = 0.577 S_y");
        Tol.Rel(2 * Math.PI * tauT * (Math.Pow(0.020, 3) - Math.Pow(0.012, 3)) / 3, tube.FullyPlasticTorque!.Value, 1e-12, "Nadai sand heap: frustum with plateau");
        Assert.DoesNotContain(tube.Checks, c => c.Case == "jam");   // the jam names other segments

        var bar = o.Segments.Single(s => s.Segment == "bar");
        double exact = tau * 0.020 * 0.020 * (3 * 0.060 - 0.020) / 6;
        Tol.Rel(exact, bar.FullyPlasticTorque!.Value, 3e-4, "Nadai sand heap: roof, T_p = tau_y h^2 (3b - h) / 6");
        Assert.True(Tol.RelErr(exact, bar.FullyPlasticTorque.Value) <= bar.FullyPlasticTorqueError!.Value, "the estimate bounds the true error");
        Assert.True(o.AnyOverCapacity);
        Assert.Empty(o.Warnings);
    }

    [Fact]
    public void Sections_without_outline_or_materials_without_yield_are_not_checked_and_say_so()
    {
        var o = Solve("""
            units: {length: mm, torque: N*m}
            materials: {m: {G: 80 GPa, shearYield: 200 MPa}, soft: {G: 80 GPa}}
            sections: {given: {J: 250000 mm^4, shearFactor: 8e-5 1/mm^3}}
            stations: [{name: A, at: 0}, {name: B, after: 100}, {name: C, after: 100}]
            segments:
              - {from: A, to: B, section: given, material: m}
              - {from: B, to: C, section: {round: 30}, material: soft}
            loads: [{at: C, torque: 100}]
            supports: {fixed: [A]}
            overload: {cases: [{name: stall, scale: 2}]}
            """);
        Assert.All(o.Segments, s => Assert.Equal("not checked", Assert.Single(s.Checks).Check));
        Assert.Contains(o.Warnings, w => w.Code == "no-plastic-torque" && w.Message.Contains("segment 'A-B'", StringComparison.Ordinal));
        Assert.Contains(o.Warnings, w => w.Code == "no-yield-strength" && w.Message.Contains("material 'soft'", StringComparison.Ordinal));
        Assert.False(o.AnyOverCapacity);
    }

    [Fact]
    public void A_composite_section_gets_the_first_yield_of_its_weaker_material_and_a_lower_bound_plastic_torque()
    {
        // steel core d = 40 (tau_y 200 MPa) bonded in a bronze sleeve t = 5 (tau_y 100 MPa). Exact, concentric rounds:
        // first yield where G_i r / (G J)_eff * T reaches tau_y,i; T_p = 2 pi / 3 (200 MPa 20^3 + 100 MPa (25^3 - 20^3))
        // (each part at its own tau_y); the lower bound used is the whole outline at 100 MPa, 2 pi 25^3 100 MPa / 3
        // (Hill ch. IV, static theorem; Nadai ch. 35, sand heap of the circle).
        const string text = """
            units: {length: mm, torque: N*m}
            materials:
              core: {G: 80 GPa, shearYield: 200 MPa}
              bronze: {G: 40 GPa, shearYield: 100 MPa}
            stations: [{name: A, at: 0}, {name: B, after: 100}]
            segments:
              - {name: bushed, from: A, to: B, section: {template: "sleeved:d=40,t=5", materials: {core: core, sleeve: bronze}}, material: core}
            loads: [{at: B, torque: 1000}]
            supports: {fixed: [A]}
            overload: {cases: [{name: stall, scale: 2}]}
            """;
        var o = Solve(text);
        var s = o.Segments.Single();
        double gj = 80e9 * Math.PI * Math.Pow(0.040, 4) / 32 + 40e9 * Math.PI * (Math.Pow(0.050, 4) - Math.Pow(0.040, 4)) / 32;
        double tyCore = 200e6 * gj / (80e9 * 0.020), tySleeve = 100e6 * gj / (40e9 * 0.025);
        Tol.Rel(Math.Min(tyCore, tySleeve), s.FirstYieldTorque!.Value, 2e-3, "first yield in the material that reaches its own tau_y first");
        Tol.Rel(100e6, s.YieldShear!.Value, 1e-12, "the weaker material's tau_y");
        double lower = 2 * Math.PI * Math.Pow(0.025, 3) * 100e6 / 3;
        double exact = 2 * Math.PI / 3 * (200e6 * Math.Pow(0.020, 3) + 100e6 * (Math.Pow(0.025, 3) - Math.Pow(0.020, 3)));
        Tol.Rel(lower, s.FullyPlasticTorque!.Value, 5e-3, "lower bound: the outline at the weakest tau_y");
        Assert.True(s.FullyPlasticTorque < exact, "a lower bound of the exact composite T_p");
        Assert.True(s.FullyPlasticTorqueIsLowerBound);
        Assert.Null(s.ShapeFactor);
        Assert.Contains(o.Warnings, w => w.Code == "composite-plastic-lower-bound" && w.Message.Contains("'bushed'", StringComparison.Ordinal));
        Assert.DoesNotContain(o.Warnings, w => w.Code == "no-plastic-torque");
    }

    [Theory]
    [InlineData("overload: {cases: [{name: x, scale: 2, torque: 5}]}", "exactly one of 'scale'")]
    [InlineData("overload: {cases: [{name: x, torque: 5, segments: [sold]}]}", "did you mean 'solid'")]
    [InlineData("overload: {factor: 0.8, cases: [{name: x, scale: 2}]}", "from 1 to 100")]
    [InlineData("overload: {cases: [{name: x, scale: 2, segments: [solid]}]}", "'segments' goes with 'torque'")]
    public void Bad_overload_entries_are_refused_at_their_line(string block, string expected)
    {
        string text = File[..File.IndexOf("overload:", StringComparison.Ordinal)] + block + "\n";
        var e = Assert.Throws<SectionTwistException>(() => ShaftFile.Parse(text, resolver: ShaftSections.CreateResolver()));
        Assert.Contains(expected, e.Message, StringComparison.Ordinal);
        Assert.Matches(@"^shaft\.yaml:\d+:\d+: ", e.Message);
    }

    [Fact]
    public void Shaft_command_prints_the_overload_table_and_writes_overload_csv()
    {
        string dir = Path.Combine(Path.GetTempPath(), "st-overload-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            string path = Path.Combine(dir, "shaft.yaml");
            System.IO.File.WriteAllText(path, File);
            var (code, output, err) = SectionTwist.Tests.Cli.CliRunner.Run("shaft", path, "--csv", Path.Combine(dir, "csv"));
            Assert.True(code == 0, err);
            Assert.Contains("overload checks (fully plastic torque T_p", output, StringComparison.Ordinal);
            Assert.Contains("!! OVER PLASTIC CAPACITY", output, StringComparison.Ordinal);
            Assert.Contains("no strain hardening", output, StringComparison.Ordinal);
            // solid 40 mm, tau_y 200 MPa: T_p = 2 pi r^3 tau_y / 3 = 3351 N*m (Nadai sand heap), printed to 4 digits
            Assert.Contains(SectionTwist.Units.NumberText.Format(2 * Math.PI * 8e-6 * 200e6 / 3, 4), output, StringComparison.Ordinal);
            var rows = System.IO.File.ReadAllLines(Path.Combine(dir, "csv", "overload.csv"));
            Assert.StartsWith("segment,section,yield_shear_MPa,first_yield_torque_Nm", rows[0], StringComparison.Ordinal);
            Assert.Equal(1 + 2 + 1 + 2, rows.Length);   // header; solid: stall and jam; tube: stall; bar: stall and jam
        }
        finally { try { Directory.Delete(dir, true); } catch (IOException) { } }
    }
}
