using SectionTwist.Geometry;
using SectionTwist.Units;

namespace SectionTwist.Torsion;

/// <summary>
/// The torsion result for one cross-section (Saint-Venant, linear elastic). All values are SI:
/// lengths in m, J in m^4, shear per unit torque in 1/m^3 (multiply by a torque in N*m to get Pa).
/// </summary>
public sealed record SectionResult
{
    /// <summary>The analysed profile.</summary>
    public required Profile Profile { get; init; }
    /// <summary>Exact area properties of the profile.</summary>
    public required SectionProperties Properties { get; init; }
    /// <summary>Torsion constant J, m^4: the twist rate is T / (G J).</summary>
    public required double TorsionConstant { get; init; }
    /// <summary>Peak shear stress per unit torque, 1/m^3 (Pa per N*m).</summary>
    public required double MaxShearPerTorque { get; init; }
    /// <summary>Where the peak shear occurs, m.</summary>
    public required Point2 MaxShearLocation { get; init; }
    /// <summary>Estimated relative errors of J and of the peak shear.</summary>
    public required ErrorEstimate EstimatedRelativeError { get; init; }
    /// <summary>Size and quality of the mesh used.</summary>
    public required MeshSummary Mesh { get; init; }
    /// <summary>Warnings about the result (e.g. a sharp re-entrant corner with a singular peak shear).</summary>
    public required IReadOnlyList<AnalysisWarning> Warnings { get; init; }
    /// <summary>The solved fields, for plots.</summary>
    public required SectionField Field { get; init; }
    /// <summary>The torsion constant of each region, m^4 (their sum is <see cref="TorsionConstant"/>).</summary>
    public required IReadOnlyList<double> RegionTorsionConstants { get; init; }
    /// <summary>
    /// Warping properties (shear centre, warping constant, sectorial coordinate); null when not requested
    /// (<see cref="AnalysisOptions.Warping"/>) or when the profile has more than one separate region.
    /// </summary>
    public Warping.WarpingResult? Warping { get; init; }
    /// <summary>The unit the profile was given in (display only).</summary>
    public LengthUnit LengthUnit => Profile.Unit;
    /// <summary>The polar moment about the centroid, m^4, for comparison with J.</summary>
    public double PolarMoment => Properties.PolarMoment;
    /// <summary>Torsional section modulus T / tau_max, m^3.</summary>
    public double TorsionalModulus => 1.0 / MaxShearPerTorque;
}

/// <summary>Estimated relative errors (fractions, not percent).</summary>
/// <param name="TorsionConstant">Relative error estimate of J.</param>
/// <param name="MaxShear">Relative error estimate of the peak shear.</param>
public sealed record ErrorEstimate(double TorsionConstant, double MaxShear);

/// <summary>Mesh size and quality.</summary>
/// <param name="Nodes">Number of nodes (corner and mid-side).</param>
/// <param name="Elements">Number of 6-node triangles.</param>
/// <param name="MinAngleDeg">Smallest triangle angle, degrees.</param>
public sealed record MeshSummary(int Nodes, int Elements, double MinAngleDeg);

/// <summary>A warning attached to a result.</summary>
/// <param name="Code">Stable short code, e.g. <c>sharp-reentrant-corner</c>.</param>
/// <param name="Message">One-line explanation with the remedy.</param>
public sealed record AnalysisWarning(string Code, string Message);
