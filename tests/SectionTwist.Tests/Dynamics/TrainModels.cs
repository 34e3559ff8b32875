using SectionTwist.Dynamics;
using SectionTwist.Shaft;

namespace SectionTwist.Tests.Dynamics;

/// <summary>Small drivetrains for the dynamics tests (test data, not demo data).</summary>
internal static class TrainModels
{
    public static readonly Material Steel = new("steel", 79.3e9, null, null, "test") { Density = 7850 };

    /// <summary>A shaft of stations joined by springs only (massless shaft).</summary>
    public static ShaftBranch SpringChain(string name, string[] stations, double[] springs) => new(name, new ShaftModel
    {
        Stations = [.. stations.Select((s, i) => new Station(s, i * 0.1))],
        Segments = [],
        Springs = [.. springs.Select((k, i) => new TorsionalSpring(stations[i], stations[i + 1], k))],
    });

    /// <summary>A uniform round shaft of one segment.</summary>
    public static ShaftBranch Uniform(string name, double length, double diameter, Material material, string a = "A", string b = "B") => new(name, new ShaftModel
    {
        Stations = [new Station(a, 0), new Station(b, length)],
        Segments = [new ShaftSegment(a, b, SectionStiffness.Round(diameter), material)],
    });

    public static IReadOnlyList<PointInertia> Inertias(params (string Station, double J)[] items) => [.. items.Select(x => new PointInertia(x.Station, x.J))];
}
