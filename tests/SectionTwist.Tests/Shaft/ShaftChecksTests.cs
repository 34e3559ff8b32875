using SectionTwist.Shaft;
using static SectionTwist.Tests.Shaft.ShaftTestModels;

namespace SectionTwist.Tests.Shaft;

/// <summary>Checks with consequences: loose shafts and mechanisms are errors; exceeded limits are flags. Common practice, no source.</summary>
public class ShaftChecksTests
{
    private static ShaftModel Free(params ShaftLoad[] loads) => new()
    {
        Stations = Stations(("in", 0), ("mid", 0.3), ("out", 0.5)),
        Segments = [new ShaftSegment("in", "mid", SectionStiffness.Round(0.04), Steel), new ShaftSegment("mid", "out", SectionStiffness.Round(0.035), Steel)],
        Loads = loads,
    };

    [Fact]
    public void Loose_shaft_names_the_net_torque_and_suggests_a_support()
    {
        var e = Assert.Throws<SectionTwistException>(() => ShaftSolver.Solve(Free(new PointTorque("in", 300) { Description = "motor" }, new PointTorque("out", -250))));
        Assert.Equal("loose-shaft", e.Code);
        Assert.Contains("net torque 50 N·m", e.Message, StringComparison.Ordinal);
        Assert.Contains("motor at 'in' 300 N·m", e.Message, StringComparison.Ordinal);
        Assert.Contains("add a fixed support", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Free_shaft_with_balanced_torques_solves_relative_to_the_first_station()
    {
        var r = ShaftSolver.Solve(Free(new PointTorque("in", 300), new PointTorque("out", -300)));
        Assert.Equal("in", r.ReferenceStation);
        Assert.Empty(r.Reactions);
        Tol.Rel(-300, r.Segments[0].InternalTorque, 1e-12, "statics: -(torque on the part nearer the first station)");
        Tol.Rel(-300, r.Segments[1].InternalTorque, 1e-12);
        double k1 = 79.3e9 * JRound(0.04) / 0.3, k2 = 79.3e9 * JRound(0.035) / 0.2;
        Tol.Rel(-300 / k1 - 300 / k2, Rotation(r, "out"), 1e-12);
    }

    [Fact]
    public void Station_joined_to_nothing_is_a_mechanism()
    {
        var m = Free() with { Stations = [.. Free().Stations, new Station("stray", 0.8)], FixedStations = ["in"] };
        var e = Assert.Throws<SectionTwistException>(() => ShaftSolver.Solve(m));
        Assert.Equal("mechanism", e.Code);
        Assert.Contains("'stray'", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Part_without_support_is_a_mechanism()
    {
        var m = new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", 0.2), ("C", 0.3), ("D", 0.5)),
            Segments = [new ShaftSegment("A", "B", SectionStiffness.Round(0.04), Steel), new ShaftSegment("C", "D", SectionStiffness.Round(0.04), Steel)],
            Loads = [new PointTorque("D", 10)],
            FixedStations = ["A"],
        };
        var e = Assert.Throws<SectionTwistException>(() => ShaftSolver.Solve(m));
        Assert.Equal("mechanism", e.Code);
        Assert.Contains("'C', 'D'", e.Message, StringComparison.Ordinal);
        Assert.Contains("fix one of its stations", e.Message, StringComparison.Ordinal);
    }

    [Fact]
    public void Model_errors_name_the_entity()
    {
        var bad = Free() with { Segments = [new ShaftSegment("in", "nowhere", SectionStiffness.Round(0.04), Steel)], FixedStations = ["in"] };
        var e = Assert.Throws<SectionTwistException>(() => ShaftSolver.Solve(bad));
        Assert.Equal("unknown-station", e.Code);
        Assert.Contains("'nowhere'", e.Message, StringComparison.Ordinal);
        var overlap = Free() with { Segments = [.. Free().Segments, new ShaftSegment("in", "out", SectionStiffness.Round(0.04), Steel)], FixedStations = ["in"] };
        Assert.Equal("overlapping-segments", Assert.Throws<SectionTwistException>(() => ShaftSolver.Solve(overlap)).Code);
    }

    // tau = 16 T / (pi d^3) = 16 * 1000 / (pi 0.03^3) = 188.6 MPa > 60 MPa allowable; twist rate T / (G J) = 0.159 rad/m.
    [Fact]
    public void Exceeded_limits_are_flagged_not_thrown()
    {
        var m = new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", 0.4), ("C", 0.6)),
            Segments = [new ShaftSegment("A", "B", SectionStiffness.Round(0.06), Steel), new ShaftSegment("B", "C", SectionStiffness.Round(0.03), Steel)],
            Loads = [new PointTorque("C", 1000)],
            FixedStations = ["A"],
            TwistRateLimit = 0.25 * Math.PI / 180,
        };
        var r = ShaftSolver.Solve(m);
        var thin = Segment(r, "B", "C");
        Assert.True(thin.ExceedsShearLimit);
        Assert.True(thin.ExceedsTwistRateLimit);
        Tol.Rel(60e6 / (16 * 1000 / (Math.PI * 0.03 * 0.03 * 0.03)), thin.SafetyFactor!.Value, 1e-12);
        Assert.Same(thin, r.GoverningSegment);
        Assert.Same(thin, r.GoverningTwistSegment);
        Assert.True(r.AnyLimitExceeded);
        var thick = Segment(r, "A", "B");
        Assert.False(thick.ExceedsShearLimit);
        Assert.True(thick.SafetyFactor > 2);
    }
}
