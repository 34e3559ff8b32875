namespace SectionTwist.Keys;

/// <summary>The result of a key or spline check, Pa and N*m.</summary>
public sealed record ConnectionResult
{
    /// <summary>Display name.</summary>
    public required string Label { get; init; }
    /// <summary><c>parallel key</c>, <c>straight spline</c> or <c>involute spline</c>.</summary>
    public required string Kind { get; init; }
    /// <summary>Segment.</summary>
    public required string Segment { get; init; }
    /// <summary>Largest torque magnitude of the segment, N*m.</summary>
    public required double Torque { get; init; }
    /// <summary>Key shear stress, Pa (keys only).</summary>
    public double? Shear { get; init; }
    /// <summary>Flank pressure on the hub side (spline: mean flank pressure), Pa.</summary>
    public required double Pressure { get; init; }
    /// <summary>Flank pressure on the shaft side (keys only), Pa.</summary>
    public double? ShaftPressure { get; init; }
    /// <summary>Allowed pressure, Pa, or null.</summary>
    public double? AllowablePressure { get; init; }
    /// <summary>Allowed key shear, Pa, or null.</summary>
    public double? AllowableShear { get; init; }
    /// <summary>The formulas and factors used, with their sources.</summary>
    public required string Method { get; init; }
    /// <summary>Lowest allowable / actual ratio, or null without allowables.</summary>
    public double? SafetyFactor
    {
        get
        {
            double? f = null;
            if (AllowablePressure is { } ap) f = ap / Math.Max(Pressure, ShaftPressure ?? 0);
            if (AllowableShear is { } asr && Shear is { } sh) f = Math.Min(f ?? double.PositiveInfinity, asr / sh);
            return f;
        }
    }
    /// <summary>True when a pressure or the shear exceeds its allowable.</summary>
    public bool Exceeds => SafetyFactor < 1;
}
