namespace SectionTwist.Shaft;

/// <summary>
/// The torsion values of one prismatic cross-section: the torsion constant and the peak shear stress per unit torque.
/// They come from the section analysis (<c>SectionResult.TorsionConstant</c> and <c>MaxShearPerTorque</c>),
/// from a handbook, or from the exact round and tube formulas below.
/// </summary>
/// <param name="TorsionConstant">Torsion constant J, m^4 (the twist rate is T / (G J)).</param>
/// <param name="ShearPerTorque">Peak shear stress per unit torque, 1/m^3 (Pa per N*m).</param>
/// <param name="Description">Optional text for tables and drawings, e.g. <c>keyed d=40 mm</c>.</param>
/// <param name="OuterDiameter">Optional outer diameter, m, for drawings.</param>
public sealed record SectionStiffness(double TorsionConstant, double ShearPerTorque, string? Description = null, double? OuterDiameter = null)
{
    /// <summary>Warping constant Iw about the shear centre, m^6, when the warping function was solved; else null.</summary>
    public double? WarpingConstant { get; init; }

    /// <summary>Largest |sectorial coordinate| of the section, m^2, when the warping function was solved; else null.</summary>
    public double? MaxSectorialCoordinate { get; init; }

    /// <summary>Warping shear factor q_w of the section, m^3 (warping shear = E |phi'''| q_w), when the warping function was solved; else null.</summary>
    public double? WarpingShearFactor { get; init; }

    /// <summary>True for an open thin-walled section whose members are sensitive to restrained warping (see <c>WarpingResult.Classification</c>).</summary>
    public bool WarpingSensitive { get; init; }

    /// <summary>
    /// True when the section's theoretical peak shear is unbounded (a sharp re-entrant corner: a keyseat floor or spline root
    /// without radius). <see cref="ShearPerTorque"/> is then only the value on the analysis mesh, which grows without bound
    /// under refinement: segments with this section get no factor of safety and the check <c>unbounded</c>.
    /// </summary>
    public bool PeakShearUnbounded { get; init; }

    /// <summary>
    /// A composite section's effective torsional rigidity (G J)_eff, N m^2; null for a homogeneous section. A segment
    /// takes J = (G J)_eff / G of its own material, so its stiffness is the composite one whatever material it names.
    /// </summary>
    public double? TorsionalRigidity { get; init; }

    /// <summary>A composite section's peak shear per unit torque in each material (each checked against its own limit); null for a homogeneous section.</summary>
    public IReadOnlyList<MaterialShear>? MaterialShears { get; init; }

    /// <summary>Warnings of the section analysis, each naming the section (empty for exact and given sections).</summary>
    public IReadOnlyList<Torsion.AnalysisWarning> Warnings { get; init; } = [];

    /// <summary>
    /// The values of an analysed section: J and peak shear per unit torque, whether the peak is unbounded (a sharp
    /// re-entrant corner: infinite estimated error of the peak), the analysis warnings, prefixed with
    /// <paramref name="description"/> when one is given, and the warping values when the analysis solved them.
    /// </summary>
    /// <param name="result">The section analysis.</param>
    /// <param name="description">Text for tables, e.g. <c>keyed d=40 mm</c>; also names the section in its warnings.</param>
    /// <param name="outerDiameter">Outer diameter for drawings, m, or null.</param>
    public static SectionStiffness FromAnalysis(Torsion.SectionResult result, string? description = null, double? outerDiameter = null)
    {
        ArgumentNullException.ThrowIfNull(result);
        return new(result.TorsionConstant, result.MaxShearPerTorque, description, outerDiameter)
        {
            PeakShearUnbounded = double.IsPositiveInfinity(result.EstimatedRelativeError.MaxShear) || result.Warnings.Any(w => w.Code == "sharp-reentrant-corner"),
            Warnings = result.Warnings.Select(w => description is null ? w : new Torsion.AnalysisWarning(w.Code, $"section '{description}': {w.Message}")).ToList().AsReadOnly(),
            WarpingConstant = result.Warping?.WarpingConstant,
            MaxSectorialCoordinate = result.Warping?.MaxSectorialCoordinate,
            WarpingShearFactor = result.Warping?.WarpingShearFactor,
            WarpingSensitive = result.Warping?.Classification == Warping.WarpingClass.WarpingSensitive,
            PolarMoment = result.PolarMoment,
            Profile = result.Profile,
        };
    }

    /// <summary>
    /// Fully plastic torque per unit shear yield stress, T_p / tau_y, m^3, when known in closed form (round: pi d^3 / 12;
    /// tube: pi (D^3 - d^3) / 12; sand-heap analogy, Nadai, Theory of Flow and Fracture of Solids, ch. 35); null otherwise.
    /// </summary>
    public double? PlasticTorquePerYield { get; init; }

    /// <summary>The analysed outline, when the values come from a section analysis (the overload check finds T_p on it; for a composite section the outline of all parts); else null.</summary>
    public Geometry.Profile? Profile { get; init; }

    /// <summary>
    /// Polar second moment of area about the centroid, Ix + Iy, m^4 (not J: it sets the rotational inertia rho Ip per unit
    /// length); null when not known (a handbook section without <c>polarMoment</c>).
    /// </summary>
    public double? PolarMoment { get; init; }

    /// <summary>
    /// Exact values for a solid round of diameter <paramref name="diameter"/> (m): J = pi d^4 / 32, tau = 16 T / (pi d^3)
    /// (Timoshenko and Goodier, Theory of Elasticity, ch. 10).
    /// </summary>
    public static SectionStiffness Round(double diameter)
    {
        if (!(diameter > 0) || !double.IsFinite(diameter))
            throw new SectionTwistException("bad-section", $"round section: diameter {diameter} m must be positive");
        return new(Math.PI * Math.Pow(diameter, 4) / 32, 16 / (Math.PI * diameter * diameter * diameter),
            $"round d={diameter * 1e3:G6} mm", diameter) { Bending = SectionTwist.Bending.BendingSection.Round(diameter), PolarMoment = Math.PI * Math.Pow(diameter, 4) / 32, PlasticTorquePerYield = Math.PI * diameter * diameter * diameter / 12 };
    }

    /// <summary>
    /// Exact values for a round tube: J = pi (D^4 - d^4) / 32, tau = 16 T D / (pi (D^4 - d^4))
    /// (Timoshenko and Goodier, Theory of Elasticity, ch. 10).
    /// </summary>
    /// <param name="outerDiameter">D, m.</param>
    /// <param name="innerDiameter">d, m, 0 &lt;= d &lt; D.</param>
    public static SectionStiffness Tube(double outerDiameter, double innerDiameter)
    {
        if (!(outerDiameter > 0) || !double.IsFinite(outerDiameter))
            throw new SectionTwistException("bad-section", $"tube section: outer diameter {outerDiameter} m must be positive");
        if (!(innerDiameter >= 0 && innerDiameter < outerDiameter))
            throw new SectionTwistException("bad-section",
                $"tube section: inner diameter {innerDiameter} m must be at least 0 and smaller than the outer diameter {outerDiameter} m");
        double d4 = Math.Pow(outerDiameter, 4) - Math.Pow(innerDiameter, 4);
        return new(Math.PI * d4 / 32, 16 * outerDiameter / (Math.PI * d4),
            $"tube D={outerDiameter * 1e3:G6} mm d={innerDiameter * 1e3:G6} mm", outerDiameter) { Bending = SectionTwist.Bending.BendingSection.Tube(outerDiameter, innerDiameter), PolarMoment = Math.PI * d4 / 32,
            PlasticTorquePerYield = Math.PI * (Math.Pow(outerDiameter, 3) - Math.Pow(innerDiameter, 3)) / 12 };
    }

    /// <summary>
    /// Area properties and boundary shear samples for the bending and combined-stress checks; null when the section is known
    /// only by its torsion values (then a shaft with transverse loads cannot be checked).
    /// </summary>
    public SectionTwist.Bending.BendingSection? Bending { get; init; }

    /// <summary>Checks the values; throws a <see cref="SectionTwistException"/> naming <paramref name="where"/> otherwise.</summary>
    internal void Validate(string where)
    {
        if (!(TorsionConstant > 0) || !double.IsFinite(TorsionConstant))
            throw new SectionTwistException("bad-section", $"{where}: torsion constant J = {TorsionConstant} m^4 must be positive and finite");
        if (!(ShearPerTorque > 0) || !double.IsFinite(ShearPerTorque))
            throw new SectionTwistException("bad-section", $"{where}: peak shear per unit torque {ShearPerTorque} 1/m^3 must be positive and finite");
    }
}
