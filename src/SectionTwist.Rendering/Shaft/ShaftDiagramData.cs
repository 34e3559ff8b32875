using SectionTwist.Units;

namespace SectionTwist.Rendering.Shaft;

/// <summary>
/// What a shaft diagram shows, in SI units (m, N*m, Pa, degrees for rotations); the picture writes them in
/// <see cref="Units"/>. Signs: torques and rotations are axial
/// vectors by the right-hand rule about the axis from the first station to the last; the internal torque is positive when
/// its vector points out of the cut face of the part nearer the first station.
/// </summary>
public sealed record ShaftDiagramData
{
    /// <summary>Heading above the diagram.</summary>
    public string Title { get; init; } = "Shaft";
    /// <summary>Length unit for the axis labels (used when <see cref="Units"/> is null).</summary>
    public LengthUnit Unit { get; init; } = LengthUnit.Millimetre;
    /// <summary>Display units of the axes and labels (torque, stress, length); null: the standard system of <see cref="Unit"/>.</summary>
    public UnitSystem? Units { get; init; }
    /// <summary>The units the picture uses: <see cref="Units"/>, else the standard system of <see cref="Unit"/>.</summary>
    internal UnitSystem DisplayUnits => Units ?? UnitSystem.For(Unit);
    /// <summary>Stations (any order; drawn by position).</summary>
    public required IReadOnlyList<DiagramStation> Stations { get; init; }
    /// <summary>Segments between stations.</summary>
    public required IReadOnlyList<DiagramSegment> Segments { get; init; }
    /// <summary>Torques spread uniformly along a stretch of the shaft (drawn as a row of small vectors).</summary>
    public IReadOnlyList<DiagramDistributedTorque> DistributedTorques { get; init; } = [];
}

/// <summary>A torque spread uniformly from <paramref name="From"/> to <paramref name="To"/>.</summary>
/// <param name="From">Start position, m.</param>
/// <param name="To">End position, m.</param>
/// <param name="Total">The whole torque (intensity times length), N*m, signed like the station torques.</param>
/// <param name="Label">What it is, e.g. <c>drum</c>; may be null.</param>
public sealed record DiagramDistributedTorque(double From, double To, double Total, string? Label = null);

/// <summary>How a station is held.</summary>
public enum SupportKind
{
    /// <summary>Free to rotate.</summary>
    None,
    /// <summary>Held against rotation (a torsional restraint): drawn as a hatched wall.</summary>
    Fixed,
    /// <summary>A radial bearing, free to rotate: drawn as a bearing symbol.</summary>
    Bearing,
}

/// <summary>A station on the shaft.</summary>
/// <param name="Name">Station name.</param>
/// <param name="Position">Axial position, m.</param>
/// <param name="RotationDeg">Rotation relative to the reference station, degrees.</param>
/// <param name="AppliedTorque">Sum of the torques applied here, N*m (0 for none).</param>
/// <param name="Support">How the station is held.</param>
/// <param name="Reaction">Torque the support applies to the shaft, N*m (fixed stations; 0 otherwise).</param>
public sealed record DiagramStation(string Name, double Position, double RotationDeg, double AppliedTorque = 0,
    SupportKind Support = SupportKind.None, double Reaction = 0);

/// <summary>A segment between two positions.</summary>
public sealed record DiagramSegment
{
    /// <summary>Display name.</summary>
    public required string Label { get; init; }
    /// <summary>Start position (nearer the first station), m.</summary>
    public required double From { get; init; }
    /// <summary>End position, m.</summary>
    public required double To { get; init; }
    /// <summary>Outer diameter (or largest outer size) at the start, m.</summary>
    public required double OuterStart { get; init; }
    /// <summary>Outer diameter at the end, m (differs from the start for a taper).</summary>
    public required double OuterEnd { get; init; }
    /// <summary>Bore diameter, m (0 for a solid segment).</summary>
    public double Inner { get; init; }
    /// <summary>Internal torque at the start, N*m.</summary>
    public required double TorqueStart { get; init; }
    /// <summary>Internal torque at the end, N*m (differs from the start under a distributed torque).</summary>
    public required double TorqueEnd { get; init; }
    /// <summary>Peak shear stress at the start, Pa.</summary>
    public required double ShearStart { get; init; }
    /// <summary>Peak shear stress at the end, Pa.</summary>
    public required double ShearEnd { get; init; }
    /// <summary>Allowable shear stress, Pa, or null for none.</summary>
    public double? Allowable { get; init; }
    /// <summary>True when the section's peak shear is unbounded (a sharp re-entrant corner): the shear is drawn dashed and labelled so.</summary>
    public bool PeakShearUnbounded { get; init; }

    /// <summary>True when the peak shear is above the allowable.</summary>
    public bool Exceeds => Allowable is { } a && Math.Max(ShearStart, ShearEnd) > a;
}
