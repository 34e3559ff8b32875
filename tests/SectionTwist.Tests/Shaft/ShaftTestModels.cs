using SectionTwist.Shaft;

namespace SectionTwist.Tests.Shaft;

/// <summary>Small helpers to build shaft models in tests.</summary>
internal static class ShaftTestModels
{
    public static Material Steel { get; } = new("steel", 79.3e9, 60e6, 200e6, "Gere, Mechanics of Materials (G); allowables invented for the test");

    public static Material WithG(double g) => new($"G={g:G3}", g, null, null, "test");

    public static Station[] Stations(params (string Name, double X)[] s) => [.. s.Select(p => new Station(p.Name, p.X))];

    /// <summary>Polar moment of a solid round, pi d^4 / 32.</summary>
    public static double JRound(double d) => Math.PI * Math.Pow(d, 4) / 32;

    public static SegmentResult Segment(ShaftResult r, string from, string to) => r.Segments.Single(s => s.From == from && s.To == to);

    public static double Rotation(ShaftResult r, string station) => r.Stations.Single(s => s.Name == station).Rotation;

    public static double Reaction(ShaftResult r, string station) => r.Reactions.Single(s => s.Station == station).Torque;
}
