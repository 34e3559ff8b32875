using SectionTwist.Bending;
using SectionTwist.Shaft;

namespace SectionTwist.Tests.Bending;

/// <summary>Small shaft models for the bending tests (steel-like E, no torque unless given).</summary>
internal static class BendingTestModels
{
    public const double E = 200e9;

    public static Material Steel => new("test steel", 80e9, null, null, "test") { YoungsModulus = E, Density = 7850, YieldStrength = 400e6, UltimateStrength = 600e6 };

    /// <summary>Stations at the given positions named S0, S1, ...; round segments of the given diameters between them.</summary>
    public static ShaftModel MakeShaft(double[] x, double[] d, BendingModel bending, IReadOnlyList<ShaftLoad>? torques = null, bool free = true)
    {
        var stations = x.Select((p, i) => new Station($"S{i}", p)).ToArray();
        var segs = d.Select((di, i) => new ShaftSegment($"S{i}", $"S{i + 1}", SectionStiffness.Round(di), Steel)).ToArray();
        return new ShaftModel
        {
            Stations = stations, Segments = segs, Loads = torques ?? [],
            FixedStations = free ? [] : ["S0"], Bending = bending,
        };
    }

    public static double I(double d) => Math.PI * Math.Pow(d, 4) / 64;

    public static BendingSample At(BendingResult r, double x) => r.Samples.Where(s => Math.Abs(s.Position - x) < 1e-12).MaxBy(s => s.Moment)!;
}
