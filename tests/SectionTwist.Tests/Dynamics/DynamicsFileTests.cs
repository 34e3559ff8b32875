using SectionTwist.Dynamics;
using SectionTwist.Shaft;
using Xunit;

namespace SectionTwist.Tests.Dynamics;

/// <summary>The shaft file's dynamics block: units of inertia, bodies, stages, errors with line numbers.</summary>
public class DynamicsFileTests
{
    private const string Head = """
        units: {length: mm, torque: N*m}
        stations: [{name: A, at: 0}, {name: B, at: 500}]
        segments: [{from: A, to: B, section: {round: 40}, material: steel-s355}]
        supports: {fixed: A}

        """;

    private static DynamicsInput Read(string dynamics) => ShaftFile.Parse(Head + dynamics).Dynamics!;

    [Theory]
    // conversion factors: lb = 0.45359237 kg, in = 0.0254 m (exact, international yard and pound), lbf = 4.4482216152605 N
    [InlineData("2 kg*m^2", 2.0)]
    [InlineData("150 kg*cm^2", 0.015)]
    [InlineData("100 lb*in^2", 100 * 0.45359237 * 0.0254 * 0.0254)]
    [InlineData("3 lbf*in*s^2", 3 * 4.4482216152605 * 0.0254)]
    public void Inertia_units_convert_to_kg_m2(string text, double expected)
    {
        var d = Read($"dynamics: {{inertias: [{{at: B, inertia: {text}}}]}}");
        Tol.Rel(expected, d.Drivetrain.Inertias[0].Inertia, 1e-12, "exact unit definitions");
    }

    [Fact]
    public void GD2_and_bodies_follow_their_definitions()
    {
        var d = Read("""
            dynamics:
              inertias:
                - {at: B, GD2: 0.8 kgf*m^2}
                - {at: B, GD2: 9.80665 N*m^2}
                - {at: B, body: {outer: 300 mm, inner: 100 mm, length: 50 mm, density: 7850 kg/m^3}}
                - {at: B, body: {outer: 300 mm, length: 50 mm, material: steel-s355}}
            """);
        Tol.Rel(0.2, d.Drivetrain.Inertias[0].Inertia, 1e-14, "J = GD^2 / 4 (GD^2 in kgf*m^2)");
        Tol.Rel(0.25, d.Drivetrain.Inertias[1].Inertia, 1e-14, "J = GD^2 / (4 g)");
        Tol.Rel(7850 * Math.PI * 0.05 * (Math.Pow(0.3, 4) - Math.Pow(0.1, 4)) / 32, d.Drivetrain.Inertias[2].Inertia, 1e-12, "hollow cylinder, Meriam and Kraige Table D/4");
        Tol.Rel(7850 * Math.PI * 0.05 * Math.Pow(0.3, 4) / 32, d.Drivetrain.Inertias[3].Inertia, 1e-12, "solid disc");
        Assert.Equal(["A"], d.Drivetrain.FixedStations);   // the static support by default
    }

    [Fact]
    public void Branch_shafts_stages_and_orders_are_read()
    {
        var d = Read("""
            dynamics:
              shaft: output
              shafts:
                - name: input
                  stations: [{name: P, at: 0}, {name: Q, after: 80}]
                  segments: [{from: P, to: Q, section: {round: 20}, material: steel-s355}]
              stages: [{name: s1, driving: Q, driven: A, teeth: [15, 60], kind: external, meshStiffness: 2e5 N*m/rad}]
              inertias: [{at: P, inertia: 0.01 kg*m^2}, {at: B, inertia: 1 kg*m^2}]
              fixed: free
              modes: 3
              tolerance: 0.05 %
              speeds: {shaft: input, from: 900 rpm, to: 1000 rpm}
              orders: [{order: 1}, {stage: s1}]
              bands: [5 %, 15 %]
            """);
        Assert.Equal(["output", "input"], d.Drivetrain.Shafts.Select(s => s.Name));
        var g = Assert.Single(d.Drivetrain.Stages);
        Assert.Equal(4.0, g.Ratio);
        Assert.Equal(15, g.DrivingTeeth);
        Assert.Empty(d.Drivetrain.FixedStations);
        Assert.Equal(3, d.Options.ModeCount);
        Assert.Equal(0.0005, d.Options.Tolerance, 15);
        Assert.Equal(15, d.Excitation!.Orders[1].Order);
        Assert.Equal("input", d.Excitation.Orders[1].Shaft);
        Assert.Equal(0.05, d.Excitation.InnerBand, 15);
        var r = ModalAnalysis.Solve(d.Drivetrain, d.Options);
        Assert.Equal(1, r.RigidBodyModes);
        Assert.Equal(4, r.ElasticModes.Count() + 1);
    }

    [Theory]
    [InlineData("dynamics: {inertias: [{at: X, inertia: 1 kg*m^2}]}", "no station named 'X'")]
    [InlineData("dynamics: {inertias: [{at: B, inertia: 1 kg}]}", "'kg' is not a unit here")]
    [InlineData("dynamics: {inertias: [{at: B, inertia: 1 kg*m^2, GD2: 1 kgf*m^2}]}", "exactly one of")]
    [InlineData("dynamics: {stages: [{driving: A, driven: B, ratio: 2}]}", "a stage joins two shafts")]
    [InlineData("dynamics: {orders: [{order: 1}]}", "needs the operating range")]
    [InlineData("dynamics: {modes: 0}", "whole number of modes")]
    [InlineData("dynamics: {inertia: []}", "did you mean 'inertias'")]
    public void Errors_name_the_line_and_a_remedy(string dynamics, string message)
    {
        var e = Assert.Throws<SectionTwistException>(() => Read(dynamics));
        Assert.Contains(message, e.Message, StringComparison.Ordinal);
        Assert.StartsWith("shaft.yaml:5:", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void A_handbook_section_without_polar_moment_is_refused_for_dynamics()
    {
        var doc = ShaftFile.Parse("""
            units: {length: mm, torque: N*m}
            stations: [{name: A, at: 0}, {name: B, at: 500}]
            segments: [{from: A, to: B, section: {J: 2e5, shearFactor: 1e-4}, material: steel-s355}]
            dynamics: {inertias: [{at: B, inertia: 1 kg*m^2}]}
            """);
        var e = Assert.Throws<SectionTwistException>(() => ModalAnalysis.Solve(doc.Dynamics!.Drivetrain));
        Assert.Contains("polarMoment", e.Message, StringComparison.Ordinal);
    }
}
