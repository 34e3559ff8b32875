namespace SectionTwist.Dynamics;

/// <summary>
/// A torsional drivetrain: one or more shafts (branches) with lumped inertias at stations, joined by gear or belt stages.
/// The shafts' own inertia is distributed along their segments (density times polar second moment of area).
/// All values SI. Analyse it with <see cref="ModalAnalysis.Solve"/>.
/// </summary>
public sealed record DrivetrainModel
{
    /// <summary>The shafts; the first is the reference shaft unless <see cref="ReferenceShaft"/> names another.</summary>
    public required IReadOnlyList<ShaftBranch> Shafts { get; init; }

    /// <summary>Lumped inertias at stations.</summary>
    public IReadOnlyList<PointInertia> Inertias { get; init; } = [];

    /// <summary>Gear and belt stages between shafts.</summary>
    public IReadOnlyList<GearStage> Stages { get; init; } = [];

    /// <summary>Stations held against rotation (ground). Empty: a free train, which has one rigid-body mode per connected chain.</summary>
    public IReadOnlyList<string> FixedStations { get; init; } = [];

    /// <summary>The shaft whose speed the others are referred to; null for the first.</summary>
    public string? ReferenceShaft { get; init; }

    /// <summary>Optional title for reports.</summary>
    public string? Title { get; init; }
}
