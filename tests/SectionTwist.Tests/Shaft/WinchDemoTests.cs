using SectionTwist.Shaft;

namespace SectionTwist.Tests.Shaft;

/// <summary>The demo shaft file (sample-profiles/winch-shaft.yaml) reads, solves and agrees with a hand check.</summary>
public class WinchDemoTests
{
    private static string DemoPath()
    {
        var dir = new DirectoryInfo(AppContext.BaseDirectory);
        while (dir is not null && !File.Exists(Path.Combine(dir.FullName, "sample-profiles", "winch-shaft.yaml"))) dir = dir.Parent;
        return Path.Combine(dir?.FullName ?? throw new InvalidOperationException("sample-profiles not found"), "sample-profiles", "winch-shaft.yaml");
    }

    // Hand check (statics of a free shaft, T = P / omega; tube J = pi (D^4 - d^4) / 32, tau = 16 T D / (pi (D^4 - d^4)),
    // Timoshenko and Goodier ch. 10): 5.5 kW at 120 rpm = 437.68 N*m through every section; the coupling winds up T / k.
    // The keyed and splined sections come from the section analysis of their templates at the default accuracy; each J
    // must agree with an independent solve of the same template written here at 1e-5 within the two stated estimates.
    [Fact]
    public void Demo_shaft_solves_and_matches_hand_check()
    {
        var notes = new List<string>();
        var doc = ShaftFile.Load(DemoPath(), ShaftSections.CreateResolver(notes: notes.Add));
        var r = ShaftSolver.Solve(doc.Model);
        double t = 5500 / (120 * 2 * Math.PI / 60);
        Tol.Rel(437.676, t, 1e-5, "hand calculation");
        Assert.Empty(r.Reactions);
        Assert.Equal("motor", r.ReferenceStation);
        foreach (var s in r.Segments) Tol.Rel(-t, s.TorqueAtFrom, 1e-9, "free shaft: the whole input torque passes every section");
        Tol.Abs(0, r.Segments[^1].TorqueAtTo, 1e-9, "the drum takes it all off along the spline");
        Tol.Rel(-t / 12e3, ShaftTestModels.Rotation(r, "A"), 1e-9, "coupling wind-up T / k");
        var middle = r.Segments.Single(s => s.Label == "middle");
        double j = Math.PI * (Math.Pow(0.06, 4) - Math.Pow(0.04, 4)) / 32;
        Tol.Rel(-t * 0.42 / (79.3e9 * j), middle.Twist, 1e-9);
        Tol.Rel(16 * t * 0.06 / (Math.PI * (Math.Pow(0.06, 4) - Math.Pow(0.04, 4))), middle.MaxShear, 1e-9);
        foreach (var (segment, spec) in new[] { ("input", DemoSectionReferences.Keyed), ("spline", DemoSectionReferences.Spline) })
        {
            var section = doc.Model.Segments.Single(s => s.Name == segment).Section!;
            var (demo, fine) = DemoSectionReferences.For(spec);
            Tol.Rel(fine.TorsionConstant, section.TorsionConstant, demo.EstimatedRelativeError.TorsionConstant + fine.EstimatedRelativeError.TorsionConstant, $"{spec} solved at 1e-5");
            Tol.Rel(fine.MaxShearPerTorque, section.ShearPerTorque, demo.EstimatedRelativeError.MaxShear + fine.EstimatedRelativeError.MaxShear, $"{spec} solved at 1e-5");
        }
        Assert.False(r.AnyLimitExceeded);
        Assert.Contains(notes, n => n.Contains("section 'input-keyed'", StringComparison.Ordinal));
    }
}
