using SectionTwist.Bending;
using SectionTwist.Shaft;

namespace SectionTwist.Tests.Bending;

public class BendingFileTests
{
    private const string Head = """
        units: {length: mm, torque: N*m}
        materials:
          steel: {library: steel-1045-cd}
        stations:
          - {name: A, at: 0}
          - {name: B, after: 100}
          - {name: C, after: 150}
          - {name: D, after: 150}
        segments:
          - {from: A, to: B, section: {round: 40}, material: steel}
          - {from: B, to: C, section: {round: 50}, material: steel}
          - {from: C, to: D, section: {round: 50}, material: steel}
        loads:
          - {at: A, torque: 300}
          - {at: C, torque: -300}
        supports: free
        """;

    private static ShaftResult Solve(string bending) => ShaftSolver.Solve(ShaftFile.Parse(Head + "\n" + bending).Model);

    // Helical gear forces (Budynas and Nisbett, Shigley's Mechanical Engineering Design, 10th ed., sec. 13-17, from memory):
    // W_t = T / r, W_r = W_t tan(phi_n) / cos(psi), W_a = W_t tan(psi); the thrust goes to the locating bearing and the
    // bearings' radial forces balance the mesh force (statics).
    [Fact]
    public void Helical_gear_forces_and_thrust_from_the_file()
    {
        var r = Solve("""
            bending:
              bearings: [{at: B}, {at: D, thrust: true}]
              loads:
                - {at: C, gear: {pitchDiameter: 120, pressureAngle: 20 deg, helixAngle: 15 deg, meshAngle: 0 deg}}
            """).Bending!;
        double wt = 300 / 0.06, psi = 15 * Math.PI / 180;
        var g = r.Loads.Single();
        Tol.Rel(-wt * Math.Tan(20 * Math.PI / 180) / Math.Cos(psi), g.ForceY, 1e-12, "radial, toward the axis");
        Tol.Rel(-wt, g.ForceZ, 1e-12, "tangential gives the applied torque -300 N*m at r = 60 mm");
        Tol.Rel(-wt * Math.Tan(psi), g.AxialForce, 1e-12, "W_a = W_t tan(psi)");
        Tol.Rel(wt * Math.Tan(psi), r.Bearings.Single(b => b.Station == "D").AxialForce, 1e-12, "thrust bearing");
        Tol.Rel(-g.ForceY, r.Bearings.Sum(b => b.ForceY), 1e-10, "statics");
        Tol.Rel(-g.ForceZ, r.Bearings.Sum(b => b.ForceZ), 1e-10, "statics");
        // A-B carries no axial force, B-C is in compression or tension by W_a: the sign follows the thrust bearing on the far side
        Assert.All(r.Samples.Where(s => s.Position < 0.1), s => Assert.Equal(0, s.AxialForce));
    }

    [Theory]
    [InlineData("bending:\n  bearings: [{at: B}, {at: D}]\n  loads:\n    - {at: C, gear: {pitchDiameter: 120, helixAngle: 10 deg, meshAngle: 0 deg}}", "thrust: true")]
    [InlineData("bending:\n  bearings: [{at: B}, {at: D}]\n  lods: []", "did you mean 'loads'")]
    [InlineData("bending:\n  bearings: [{at: B}, {at: D}]\n  loads:\n    - {at: C, force: 2 kN}", "direction")]
    [InlineData("bending:\n  bearings: [{at: B}]\n  loads:\n    - {at: C, force: {z: -2 kN}}", "at least two bearings")]
    [InlineData("bending:\n  bearings: [{at: B}, {at: D}]\n  fatigue: {reliability: 0.98}", "0.999")]
    public void Bad_bending_input_names_the_remedy(string bending, string remedy)
    {
        var e = Assert.Throws<SectionTwistException>(() => Solve(bending));
        Assert.Contains(remedy, e.Message);
        Assert.DoesNotContain("\n", e.Message);
    }

    [Fact]
    public void A_section_known_only_by_J_is_refused_for_bending()
    {
        string yaml = Head.Replace("section: {round: 40}", "section: {J: 2.5e5 mm^4, shearFactor: 8e-5 1/mm^3}") + "\nbending:\n  bearings: [{at: B}, {at: D}]\n";
        var e = Assert.Throws<SectionTwistException>(() => ShaftSolver.Solve(ShaftFile.Parse(yaml).Model));
        Assert.Contains("use 'round', 'tube', 'template' or 'dxf'", e.Message);
    }
}
