using SectionTwist.Shaft;

namespace SectionTwist.Dynamics;

/// <summary>
/// One shaft of a drivetrain: its stations, segments and springs (a <see cref="ShaftModel"/>; loads, supports and limits
/// of that model are not used by the dynamics). Station names must be unique over the whole drivetrain.
/// </summary>
/// <param name="Name">Shaft name, e.g. <c>motor shaft</c>.</param>
/// <param name="Model">The shaft's stations, segments and springs.</param>
public sealed record ShaftBranch(string Name, ShaftModel Model);
