using SectionTwist.Shaft;
using static SectionTwist.Tests.Shaft.ShaftTestModels;

namespace SectionTwist.Tests.Shaft;

/// <summary>
/// The sign convention (right-hand rule about the axis from the first station to the last; internal torque positive when its
/// vector points out of the cut face of the part nearer the first station) checked by symmetry, no reference values needed.
/// </summary>
public class ShaftSignConventionTests
{
    private static ShaftModel Model(double sign = 1, bool mirror = false, string? reference = null, bool reverseList = false)
    {
        double total = 1.2;
        double X(double x) => mirror ? total - x : x;
        var stations = Stations(("A", X(0)), ("B", X(0.4)), ("C", X(0.7)), ("D", X(total)));
        if (reverseList) Array.Reverse(stations);
        return new ShaftModel
        {
            Stations = stations,
            Segments =
            [
                new ShaftSegment("A", "B", SectionStiffness.Round(0.04), Steel),
                new ShaftSegment("B", "C", new RoundTaper(0.04, 0.03), Steel),
                new ShaftSegment("C", "D", SectionStiffness.Tube(0.05, 0.03), Steel),
            ],
            Loads = [new PointTorque("B", sign * 400), new DistributedTorque("C", "D", sign * -300), new PointTorque("C", sign * 90)],
            FixedStations = ["A", "D"],
            ReferenceStation = reference,
        };
    }

    [Fact]
    public void Mirroring_every_torque_flips_every_sign()
    {
        var a = ShaftSolver.Solve(Model());
        var b = ShaftSolver.Solve(Model(sign: -1));
        for (int i = 0; i < a.Stations.Count; i++) Tol.Abs(-a.Stations[i].Rotation, b.Stations[i].Rotation, 1e-15);
        for (int i = 0; i < a.Segments.Count; i++)
        {
            Tol.Rel(-a.Segments[i].TorqueAtFrom, b.Segments[i].TorqueAtFrom, 1e-12);
            Tol.Rel(-a.Segments[i].TorqueAtTo, b.Segments[i].TorqueAtTo, 1e-12);
            Tol.Rel(a.Segments[i].MaxShear, b.Segments[i].MaxShear, 1e-12);
        }
        for (int i = 0; i < a.Reactions.Count; i++) Tol.Rel(-a.Reactions[i].Torque, b.Reactions[i].Torque, 1e-12);
    }

    // Reversing the station order (x -> L - x) with the same physical loads: the loads' numbers change sign because the
    // axis now points the other way; internal torques keep their sign (the convention is tied to the cut face, not the
    // axis), rotations and reactions flip, segment ends swap.
    [Fact]
    public void Reversing_the_axis_keeps_internal_torques_and_flips_rotations_and_reactions()
    {
        var a = ShaftSolver.Solve(Model());
        var b = ShaftSolver.Solve(Model(sign: -1, mirror: true));
        Assert.Equal(["A", "B", "C", "D"], a.Stations.Select(s => s.Name));
        Assert.Equal(["D", "C", "B", "A"], b.Stations.Select(s => s.Name));
        foreach (var sa in a.Segments)
        {
            var sb = b.Segments.Single(s => s.From == sa.To && s.To == sa.From);
            Tol.Rel(sa.TorqueAtFrom, sb.TorqueAtTo, 1e-12);
            Tol.Rel(sa.TorqueAtTo, sb.TorqueAtFrom, 1e-12);
            Tol.Rel(sa.Twist, sb.Twist, 1e-12);
            Tol.Rel(sa.MaxShear, sb.MaxShear, 1e-12);
        }
        foreach (var s in a.Stations) Tol.Abs(-s.Rotation, Rotation(b, s.Name), 1e-15);
        foreach (var re in a.Reactions) Tol.Rel(-re.Torque, Reaction(b, re.Station), 1e-12);
    }

    [Fact]
    public void Listing_the_stations_in_another_order_changes_nothing()
    {
        var a = ShaftSolver.Solve(Model());
        var b = ShaftSolver.Solve(Model(reverseList: true));
        Assert.Equal(a.Stations.Select(s => s.Name), b.Stations.Select(s => s.Name));
        for (int i = 0; i < a.Segments.Count; i++) Tol.Rel(a.Segments[i].TorqueAtFrom, b.Segments[i].TorqueAtFrom, 1e-12);
    }

    [Fact]
    public void Another_reference_station_shifts_all_rotations_by_one_amount()
    {
        var a = ShaftSolver.Solve(Model());
        var b = ShaftSolver.Solve(Model(reference: "C"));
        Assert.Equal("A", a.ReferenceStation);
        Assert.Equal("C", b.ReferenceStation);
        double shift = Rotation(a, "C");
        Assert.NotEqual(0, shift);
        foreach (var s in a.Stations) Tol.Abs(s.Rotation - shift, Rotation(b, s.Name), 1e-15);
        Tol.Abs(0, Rotation(b, "C"), 0);
        for (int i = 0; i < a.Segments.Count; i++) Tol.Rel(a.Segments[i].Twist, b.Segments[i].Twist, 1e-12);
    }

    // A positive torque at the free end of a cantilever fixed at the first station: the part nearer the first station
    // carries it out of its cut face, so the internal torque is positive and the end turns positively (right-hand rule).
    [Fact]
    public void Positive_end_torque_on_cantilever_gives_positive_internal_torque_and_rotation()
    {
        var r = ShaftSolver.Solve(new ShaftModel
        {
            Stations = Stations(("A", 0), ("B", 1)),
            Segments = [new ShaftSegment("A", "B", SectionStiffness.Round(0.03), Steel)],
            Loads = [new PointTorque("B", 10)],
            FixedStations = ["A"],
        });
        Assert.True(r.Segments[0].InternalTorque > 0);
        Assert.True(Rotation(r, "B") > 0);
        Assert.True(Reaction(r, "A") < 0);
        var fixedAtEnd = ShaftSolver.Solve(r.Model with { FixedStations = ["B"], Loads = [new PointTorque("A", 10)] });
        Assert.True(fixedAtEnd.Segments[0].InternalTorque < 0, "a positive torque at the first station of a shaft fixed at its far end puts it in negative internal torque");
        Assert.True(Rotation(fixedAtEnd, "A") > 0);
    }
}
