namespace SectionTwist.Shaft;

/// <summary>
/// A torsional spring between two stations, e.g. a flexible coupling: it carries k (phi_B - phi_A).
/// The two stations may be at the same position.
/// </summary>
/// <param name="StationA">One station.</param>
/// <param name="StationB">The other station.</param>
/// <param name="Stiffness">Torsional stiffness, N*m/rad, positive.</param>
public sealed record TorsionalSpring(string StationA, string StationB, double Stiffness)
{
    /// <summary>Optional display name.</summary>
    public string? Name { get; init; }

    /// <summary>The display name.</summary>
    public string Label => Name ?? $"{StationA}~{StationB}";
}
