using SectionTwist.Shaft;

namespace SectionTwist.Tests.Shaft;

/// <summary>
/// Static torsion of shafts joined by gear stages (<see cref="GearedShaftSolver"/>). References: the power balance of a
/// lossless stage, T_1 omega_1 + T_2 omega_2 = 0, with omega_1 / omega_2 = z_2 / z_1 (Shigley's Mechanical Engineering
/// Design, gear trains; common practice); a round shaft tau = 16 T / (pi d^3) and twist T L / (G J) (Timoshenko and
/// Goodier, Theory of Elasticity, ch. 10).
/// </summary>
public class GearedShaftTests
{
    private const string Main = """
        units: {length: mm, torque: N*m}
        materials: {s: {G: 80 GPa, allowableShear: 100 MPa}}
        stations: [{name: W, at: 0}, {name: D, after: 400}]
        segments: [{from: W, to: D, section: {round: 50}, material: s}]

        """;

    /// <summary>The main shaft free and balanced, driven through a 15:60 gear stage from a motor shaft fixed at its end.</summary>
    private const string SupportedMotorByTeeth = """
        loads: [{at: W, torque: 600}, {at: D, torque: -600}]
        supports: free
        dynamics:
          shafts:
            - name: motor
              stations: [{name: R, at: 0}, {name: P, after: 200}]
              segments: [{from: R, to: P, section: {round: 20}, material: s}]
              supports: {fixed: [R]}
          stages: [{name: g1, driving: P, driven: W, teeth: [15, 60]}]
        """;

    private static GearedShaftResult Solve(string yaml)
    {
        var doc = ShaftFile.Parse(yaml);
        return GearedShaftSolver.Solve(doc.Dynamics!.Drivetrain);
    }

    [Fact]
    public void A_supported_motor_shaft_receives_the_written_stage_torque_through_the_ratio()
    {
        var g = Solve(Main + SupportedMotorByTeeth);
        var b = Assert.Single(g.Branches);
        double t = 600.0 * 15 / 60;   // power balance, ratio z2 / z1 = 4
        Tol.Rel(t, b.StageTorque, 1e-12, "T_p = T_w z_p / z_w (lossless stage)");
        Tol.Rel(-4, b.SpeedRatio, 1e-12, "external pair reverses: n_motor / n_main = -z_w / z_p");
        Tol.Rel(-t, ShaftTestModels.Reaction(b.Result, "R"), 1e-9, "the rotor's support reacts the stage torque");
        var seg = Assert.Single(b.Result.Segments);
        Tol.Rel(16 * t / (Math.PI * Math.Pow(0.02, 3)), seg.MaxShear, 1e-9, "tau = 16 T / (pi d^3)");
        Tol.Rel(t * 0.2 / (80e9 * ShaftTestModels.JRound(0.02)), Math.Abs(seg.Twist), 1e-9, "twist = T L / (G J)");
        Assert.Empty(g.Warnings);
        Tol.Rel(600, Math.Abs(g.Main.Segments[0].TorqueAtFrom), 1e-12, "the main shaft is solved as written");
    }

    [Fact]
    public void An_unsupported_motor_shaft_refers_its_own_load_to_the_main_shaft()
    {
        // the motor torque is written on the motor shaft; the main shaft is held at the drum D
        var g = Solve(Main + """
            supports: {fixed: [D]}
            dynamics:
              shafts:
                - name: motor
                  stations: [{name: R, at: 0}, {name: P, after: 200}]
                  segments: [{from: R, to: P, section: {round: 20}, material: s}]
                  loads: [{at: R, torque: 50}]
              stages: [{name: g1, driving: P, driven: W, ratio: 3, kind: belt}]
            """);
        var b = Assert.Single(g.Branches);
        Assert.True(b.TorqueFromOwnLoads);
        Tol.Rel(-50, b.StageTorque, 1e-12, "the stage balances the motor shaft");
        Tol.Rel(50, Math.Abs(b.Result.Segments[0].TorqueAtFrom), 1e-9, "the whole motor torque passes the motor shaft");
        // belt: same sense, n_main = n_motor / 3, so the main shaft receives +150 N*m at W and the drum reacts -150 N*m
        Tol.Rel(150, g.Main.Stations.Single(s => s.Name == "W").AppliedTorque, 1e-12, "T_w = T_m ratio (power balance)");
        Tol.Rel(-150, ShaftTestModels.Reaction(g.Main, "D"), 1e-9, "the drum reacts the referred torque");
    }

    [Fact]
    public void Unreached_shafts_loops_and_silent_stages_are_reported()
    {
        var lost = Assert.Throws<SectionTwistException>(() => Solve(Main + """
            supports: {fixed: [D]}
            dynamics:
              shafts:
                - name: motor
                  stations: [{name: R, at: 0}, {name: P, after: 200}]
                  segments: [{from: R, to: P, section: {round: 20}, material: s}]
            """));
        Assert.Contains("shaft 'motor' is joined to shaft 'main' by no stage", lost.Message, StringComparison.Ordinal);

        var loop = Assert.Throws<SectionTwistException>(() => Solve(Main + """
            supports: {fixed: [D]}
            dynamics:
              shafts:
                - name: motor
                  stations: [{name: R, at: 0}, {name: P, after: 200}]
                  segments: [{from: R, to: P, section: {round: 20}, material: s}]
              stages: [{name: g1, driving: P, driven: W, ratio: 2}, {name: g2, driving: R, driven: D, ratio: 2}]
            """));
        Assert.Contains("stage 'g2'", loop.Message, StringComparison.Ordinal);

        var quiet = Solve(Main + """
            supports: {fixed: [D]}
            dynamics:
              shafts:
                - name: motor
                  stations: [{name: R, at: 0}, {name: P, after: 200}]
                  segments: [{from: R, to: P, section: {round: 20}, material: s}]
              stages: [{name: g1, driving: P, driven: W, ratio: 2}]
            """);
        var w = Assert.Single(quiet.Warnings);
        Assert.Equal("stage-no-torque", w.Code);
        Assert.Contains("stage 'g1'", w.Message, StringComparison.Ordinal);
        Assert.Single(quiet.Branches);
    }

    [Fact]
    public void Torques_that_cannot_balance_are_refused_naming_the_stage_or_the_shaft()
    {
        // a free main shaft whose written torques balance, plus a motor shaft's own 50 N*m referred through the stage: loose
        var loose = Assert.Throws<SectionTwistException>(() => Solve(Main + """
            loads: [{at: W, torque: 600}, {at: D, torque: -600}]
            supports: free
            dynamics:
              shafts:
                - name: motor
                  stations: [{name: R, at: 0}, {name: P, after: 200}]
                  segments: [{from: R, to: P, section: {round: 20}, material: s}]
                  loads: [{at: R, torque: 50}]
              stages: [{name: g1, driving: P, driven: W, ratio: 4}]
            """));
        Assert.Equal("loose-shaft", loose.Code);
        Assert.Contains("stage 'g1' (shaft 'motor')", loose.Message, StringComparison.Ordinal);

        // a further shaft with a station joined to nothing: the shaft solver's refusal, prefixed with the shaft and stage
        var dangling = Assert.Throws<SectionTwistException>(() => Solve(Main + """
            supports: {fixed: [D]}
            loads: [{at: W, torque: 600}]
            dynamics:
              shafts:
                - name: motor
                  stations: [{name: R, at: 0}, {name: P, after: 200}, {name: Q, after: 50}]
                  segments: [{from: R, to: P, section: {round: 20}, material: s}]
                  supports: {fixed: [R]}
              stages: [{name: g1, driving: P, driven: W, ratio: 4}]
            """));
        Assert.StartsWith("shaft 'motor' (beyond stage 'g1'): ", dangling.Message, StringComparison.Ordinal);

        // a further shaft of springs only (a coupling model) has nothing the static solve can check: refused naming it and the stage
        var springs = Assert.Throws<SectionTwistException>(() => Solve(Main + """
            supports: {fixed: [D]}
            loads: [{at: W, torque: 600}]
            dynamics:
              shafts:
                - name: coupling
                  stations: [{name: X, at: 0}, {name: Y, at: 0}]
                  springs: [{between: [X, Y], stiffness: 5 kN*m/rad}]
              stages: [{name: g1, driving: Y, driven: W, ratio: 3}]
            """));
        Assert.Contains("shaft 'coupling' (beyond stage 'g1') has springs but no segments", springs.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Shaft_command_prints_and_writes_every_shaft_of_a_geared_file()
    {
        string dir = Path.Combine(Path.GetTempPath(), "st-geared-" + Guid.NewGuid().ToString("N"));
        Directory.CreateDirectory(dir);
        try
        {
            string path = Path.Combine(dir, "geared.yaml");
            File.WriteAllText(path, Main + SupportedMotorByTeeth + """

                  inertias: [{at: R, inertia: 0.01 kg*m^2}, {at: D, inertia: 0.5 kg*m^2}]
                """);
            var (code, output, err) = SectionTwist.Tests.Cli.CliRunner.Run("shaft", path);
            Assert.True(code == 0, err);
            Assert.Contains("shaft 'motor' beyond stage 'g1'", output, StringComparison.Ordinal);
            Assert.Contains("reaction at 'R': -150 N·m", output, StringComparison.Ordinal);   // 600 x 15 / 60, power balance
            var (jcode, json, jerr) = SectionTwist.Tests.Cli.CliRunner.Run("shaft", path, "--json");
            Assert.True(jcode == 0, jerr);
            var node = System.Text.Json.Nodes.JsonNode.Parse(json)!;
            Tol.Rel(150, (double)node["branches"]![0]!["stageTorque"]!, 1e-12, "T_p = T_w z_p / z_w");
            Assert.Equal("motor", (string?)node["branches"]![0]!["shaft"]);
        }
        finally { try { Directory.Delete(dir, true); } catch (IOException) { } }
    }
}
