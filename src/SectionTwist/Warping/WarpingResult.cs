using SectionTwist.Geometry;

namespace SectionTwist.Warping;

/// <summary>
/// Warping properties of a cross-section from the Saint-Venant warping function (SI: m, m^2, m^4, m^6). The normalized
/// warping function omega (also called the principal sectorial coordinate) is taken about the shear centre and is
/// orthogonal to 1, x and y (Trefftz's definition); the axial warping displacement under a twist rate theta is
/// w = theta omega. See docs/theory.md, section "Warping".
/// </summary>
public sealed record WarpingResult
{
    /// <summary>Shear centre (centre of twist under Trefftz's definition), m.</summary>
    public required Point2 ShearCentre { get; init; }
    /// <summary>Warping constant Iw (also written C_w) about the shear centre, integral of omega^2 dA, m^6.</summary>
    public required double WarpingConstant { get; init; }
    /// <summary>Largest |omega| over the section, m^2 (the warping normal stress is E omega phi'' there).</summary>
    public required double MaxSectorialCoordinate { get; init; }
    /// <summary>Where |omega| is largest, m (one of the symmetric places when there are several).</summary>
    public required Point2 MaxSectorialCoordinateLocation { get; init; }
    /// <summary>
    /// Warping shear factor q_w = max |grad chi|, m^3, where Laplacian(chi) = omega with d chi/dn = 0 on the boundary: the
    /// warping shear stress of non-uniform torsion is tau_w = E |phi'''| q_w at its worst point. For thin walls
    /// |grad chi| = S_w / t with the sectorial statical moment S_w, so q_w = max S_w / t (the thin-walled
    /// tau_w = E S_w phi''' / t; Vlasov, Thin-Walled Elastic Beams, ch. 1). See docs/theory.md, section "Warping".
    /// </summary>
    public double WarpingShearFactor { get; init; }
    /// <summary>Where <see cref="WarpingShearFactor"/> occurs, m.</summary>
    public Point2 WarpingShearFactorLocation { get; init; }
    /// <summary>
    /// Torsion constant from the warping function, Ip - integral |grad psi|^2, m^4: an upper bound on the same mesh where
    /// the stress-function value is a lower bound. For thin open sections it carries the cancellation of Ip against
    /// the energy and is less accurate than the stress-function J.
    /// </summary>
    public required double TorsionConstantUpperBound { get; init; }
    /// <summary>Estimated errors (absolute, SI) of the warping properties.</summary>
    public required WarpingErrorEstimate EstimatedError { get; init; }
    /// <summary>
    /// The dimensionless warping ratio Iw / (J rp^2), rp^2 = Ip / A (polar radius of gyration squared). Solid and
    /// closed sections stay well below 1 (a thin flat bar 0.25, a circle 0); open thin-walled I and channel sections are
    /// of order 10 to 100.
    /// </summary>
    public required double WarpingRatio { get; init; }
    /// <summary>Whether restrained warping matters for members of this section (<see cref="WarpingRatio"/> at least 1).</summary>
    public required WarpingClass Classification { get; init; }
    /// <summary>
    /// The warping length a = sqrt(E Iw / (G J)) for steel (E / G = 2 (1 + nu) = 2.6, nu = 0.3), m: restrained warping
    /// changes twist and stresses over a few a from a restrained end.
    /// </summary>
    public required double SteelWarpingLength { get; init; }
    /// <summary>The normalized warping function omega at each node of <see cref="Torsion.SectionResult.Field"/>, m^2 (for plots).</summary>
    public required IReadOnlyList<double> Omega { get; init; }

    /// <summary>E / G of steel used for <see cref="SteelWarpingLength"/> (2 (1 + 0.3)).</summary>
    public const double SteelModulusRatio = 2.6;

    /// <summary>Warping ratio at and above which a section is classed as <see cref="WarpingClass.WarpingSensitive"/>.</summary>
    public const double SensitiveRatio = 1.0;
}

/// <summary>Estimated absolute errors of the warping properties (the change between the last two meshes).</summary>
/// <param name="ShearCentre">Distance, m.</param>
/// <param name="WarpingConstant">Of Iw, m^6.</param>
/// <param name="MaxSectorialCoordinate">Of the largest |omega|, m^2.</param>
public sealed record WarpingErrorEstimate(double ShearCentre, double WarpingConstant, double MaxSectorialCoordinate)
{
    /// <summary>Of the warping shear factor, m^3 (NaN when not estimated).</summary>
    public double WarpingShearFactor { get; init; } = double.NaN;
}

/// <summary>How much restrained warping matters for members of a section.</summary>
public enum WarpingClass
{
    /// <summary>Solid or closed section: warping torsion is negligible; Saint-Venant torsion (T L / (G J)) applies.</summary>
    WarpingNegligible,
    /// <summary>Open thin-walled section: restrained warping at supports or loads changes twist and adds normal stresses.</summary>
    WarpingSensitive,
}
