namespace SectionTwist.Shaft;

/// <summary>
/// A named point on the shaft axis where loads, supports, springs and segment ends attach.
/// One rotation unknown belongs to each station.
/// </summary>
/// <param name="Name">A unique name, e.g. <c>A</c> or <c>coupling</c>.</param>
/// <param name="Position">Axial position, m. The axis runs from the station with the smallest position to the one with the largest.</param>
public sealed record Station(string Name, double Position);
