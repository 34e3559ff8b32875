using SectionTwist.Units;

namespace SectionTwist.Shaft;

/// <summary>A shaft file read into a model, with the units its results are shown in.</summary>
/// <param name="Path">The file, as given.</param>
/// <param name="Model">The shaft model (SI).</param>
/// <param name="Units">
/// Display units of the human-readable results: the standard system that matches the file's length unit
/// (<see cref="UnitSystem.For"/>) with the units its <c>units</c> block names for torque, stress, modulus, power and speed;
/// replace it (<c>doc with { Units = UnitSystem.US }</c>, the command's <c>--units</c>) to show the results in another system.
/// </param>
public sealed record ShaftDocument(string Path, ShaftModel Model, UnitSystem Units)
{
    /// <summary>The file's <c>dynamics</c> block (inertias, further shafts, stages, excitations), or null when it has none.</summary>
    public Dynamics.DynamicsInput? Dynamics { get; init; }
}
