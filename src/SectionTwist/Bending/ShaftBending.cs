using SectionTwist.Shaft;

namespace SectionTwist.Bending;

/// <summary>
/// Solves the transverse side of a shaft whose torsion is solved: bearing reactions, shear force, bending moment, deflection and
/// slope in two planes, the combined stress point by point on every real section, the static check against yield, the fatigue
/// check at notched locations and the key and spline checks. <see cref="ShaftSolver.Solve"/> calls it when the model has
/// <see cref="ShaftModel.Bending"/>.
/// </summary>
public static class ShaftBending
{
    /// <summary>Solves the bending of <paramref name="torsion"/>'s model.</summary>
    /// <exception cref="SectionTwistException">Missing bearings, a mechanism, sections or materials without the needed data.</exception>
    public static BendingResult Solve(ShaftResult torsion)
    {
        ArgumentNullException.ThrowIfNull(torsion);
        return new BendingAnalysis(torsion.Model, torsion).Compute();
    }
}
