using System.Globalization;
using FsCheck;
using FsCheck.Xunit;
using SectionTwist.Shaft;

namespace SectionTwist.Tests.Hostile;

/// <summary>
/// Property: any finite shaft input either yields finite outputs (every rotation, torque, twist, stress, rate and reaction;
/// JSON that parses) or a clean <see cref="SectionTwistException"/> - for models built in code and for shaft-file text.
/// Values span the whole double range (m x 10^e, |e| up to 330, so 1e308 and 1e-300 appear). Common practice, no source.
/// </summary>
public class ShaftFiniteProperties
{
    private static double Value(int mantissa, short exponent) =>
        (mantissa % 1000 + (mantissa < 0 ? -0.5 : 0.5)) * Math.Pow(10, exponent % 330);

    private static bool FiniteOrClean(Func<ShaftResult> solve)
    {
        ShaftResult r;
        try { r = solve(); }
        catch (SectionTwistException e) { return !e.Message.Contains('\n', StringComparison.Ordinal); }
        bool finite = r.Stations.All(s => double.IsFinite(s.Rotation))
            && r.Segments.All(s => double.IsFinite(s.TorqueAtFrom) && double.IsFinite(s.TorqueAtTo) && double.IsFinite(s.Twist)
                                   && double.IsFinite(s.MaxShear) && double.IsFinite(s.MaxTwistRate) && double.IsFinite(s.Stiffness))
            && r.Reactions.All(x => double.IsFinite(x.Torque)) && r.Springs.All(x => double.IsFinite(x.Torque));
        string json = ShaftResultJson.Write(r);
        using var doc = System.Text.Json.JsonDocument.Parse(json);
        return finite && !json.Contains("Infinity", StringComparison.Ordinal) && !json.Contains("NaN", StringComparison.Ordinal);
    }

    [Property(MaxTest = 400)]
    public bool Models_in_code_give_finite_results_or_a_clean_error(int[] m, short[] e, bool bothFixed, bool spring)
    {
        double V(int i) => Value(m.Length == 0 ? 1 : m[i % m.Length], e.Length == 0 ? (short)0 : e[i % e.Length]);
        var steel = new Material("g", Math.Abs(V(0)), Math.Abs(V(1)) is var a && a > 0 ? a : null, null, "property test");
        var model = new ShaftModel
        {
            Stations = [new Station("A", V(2)), new Station("B", V(3)), new Station("C", V(4))],
            Segments =
            [
                new ShaftSegment("A", "B", new SectionStiffness(Math.Abs(V(5)), Math.Abs(V(6))), steel),
                new ShaftSegment("B", "C", new SectionStiffness(Math.Abs(V(7)), Math.Abs(V(8))), steel),
            ],
            Loads = [new PointTorque("B", V(9)), new DistributedTorque("B", "C", V(10))],
            FixedStations = bothFixed ? ["A", "C"] : ["A"],
            Springs = spring ? [new TorsionalSpring("A", "C", Math.Abs(V(11)))] : [],
            TwistRateLimit = Math.Abs(V(12)),
        };
        return FiniteOrClean(() => ShaftSolver.Solve(model));
    }

    [Property(MaxTest = 300)]
    public bool Shaft_file_text_gives_finite_results_or_a_clean_error(int[] m, short[] e, byte units)
    {
        string V(int i) => Value(m.Length == 0 ? 1 : m[i % m.Length], e.Length == 0 ? (short)0 : e[i % e.Length]).ToString("R", CultureInfo.InvariantCulture);
        string[] u = ["mm", "m", "in"];
        string lu = u[units % u.Length];
        string text = $"""
            units: {"{"}length: {lu}, torque: N*m, power: kW, speed: rpm{"}"}
            materials:
              s: {"{"}G: {V(0)} GPa, allowableShear: {V(1)} MPa{"}"}
            stations:
              - {"{"}name: A, at: {V(2)}{"}"}
              - {"{"}name: B, after: {V(3)}{"}"}
              - {"{"}name: C, after: {V(4)}{"}"}
            segments:
              - {"{"}from: A, to: B, section: {"{"}round: {V(5)}{"}"}, material: s{"}"}
              - {"{"}from: B, to: C, section: {"{"}J: {V(6)} mm^4, shearFactor: {V(7)} 1/mm^3{"}"}, material: s{"}"}
            loads:
              - {"{"}at: B, torque: {V(8)}{"}"}
              - {"{"}at: C, power: {V(9)}, speed: {V(10)}{"}"}
              - {"{"}from: A, to: B, torquePerLength: {V(11)} N*m/m{"}"}
            supports: {"{"}fixed: [A]{"}"}
            springs:
              - {"{"}between: [A, C], stiffness: {V(12)} N*m/rad{"}"}
            twistLimit: {V(13)} deg/m
            """;
        return FiniteOrClean(() => ShaftSolver.Solve(ShaftFile.Parse(text, "property.yaml").Model));
    }
}
