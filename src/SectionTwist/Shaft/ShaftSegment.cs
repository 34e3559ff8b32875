namespace SectionTwist.Shaft;

/// <summary>
/// A piece of shaft between two stations, either prismatic (<see cref="Section"/>) or a linearly tapered solid round
/// (<see cref="Taper"/>). Exactly one of the two is set.
/// </summary>
public sealed record ShaftSegment
{
    /// <summary>A prismatic segment.</summary>
    /// <param name="from">Station name at one end.</param>
    /// <param name="to">Station name at the other end.</param>
    /// <param name="section">The cross-section's torsion values.</param>
    /// <param name="material">The material.</param>
    public ShaftSegment(string from, string to, SectionStiffness section, Material material)
    {
        From = from; To = to; Section = section; Material = material;
    }

    /// <summary>A linearly tapered solid round segment.</summary>
    /// <param name="from">Station name at one end (diameter <see cref="RoundTaper.StartDiameter"/>).</param>
    /// <param name="to">Station name at the other end (diameter <see cref="RoundTaper.EndDiameter"/>).</param>
    /// <param name="taper">The two diameters.</param>
    /// <param name="material">The material.</param>
    public ShaftSegment(string from, string to, RoundTaper taper, Material material)
    {
        From = from; To = to; Taper = taper; Material = material;
    }

    /// <summary>Station at one end.</summary>
    public string From { get; init; }
    /// <summary>Station at the other end.</summary>
    public string To { get; init; }
    /// <summary>The prismatic section, or null for a tapered segment.</summary>
    public SectionStiffness? Section { get; init; }
    /// <summary>The taper, or null for a prismatic segment.</summary>
    public RoundTaper? Taper { get; init; }
    /// <summary>The material.</summary>
    public Material Material { get; init; }
    /// <summary>Optional display name; defaults to <c>From-To</c>.</summary>
    public string? Name { get; init; }

    /// <summary>The display name.</summary>
    public string Label => Name ?? $"{From}-{To}";
}
