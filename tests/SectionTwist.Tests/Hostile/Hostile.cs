using System.Diagnostics;

namespace SectionTwist.Tests.Hostile;

/// <summary>
/// Helpers for the hostile-input regression tests: an input must end in the documented one-line error, quickly, without
/// echoing itself. The time bounds (a few seconds on a loaded 2-core machine) are common practice, no source.
/// </summary>
internal static class Hostile
{
    /// <summary>Runs <paramref name="act"/>, asserts a <see cref="SectionTwistException"/> of one short line within <paramref name="seconds"/>, returns it.</summary>
    public static SectionTwistException Refused(Action act, double seconds = 5, string? code = null)
    {
        var clock = Stopwatch.StartNew();
        var e = Assert.Throws<SectionTwistException>(act);
        Assert.True(clock.Elapsed.TotalSeconds < seconds, $"refused after {clock.Elapsed.TotalSeconds:F1} s (limit {seconds} s): {e.Message}");
        Assert.DoesNotContain('\n', e.Message);
        Assert.True(e.Message.Length < 600, $"message of {e.Message.Length} characters: {e.Message[..Math.Min(200, e.Message.Length)]}...");
        if (code is not null) Assert.Equal(code, e.Code);
        return e;
    }

    /// <summary>The minimal valid shaft file around one segment section and one load, with fixed end A.</summary>
    public static string Shaft(string section = "{round: 40 mm}", string load = "{at: B, torque: 100 N*m}", string stationB = "{name: B, at: 1 m}") => $"""
        stations:
          - {"{"}name: A, at: 0 m{"}"}
          - {stationB}
        segments:
          - {"{"}from: A, to: B, section: {section}, material: steel-1045-cd{"}"}
        loads:
          - {load}
        supports: {"{"}fixed: [A]{"}"}
        """;
}
