using SectionTwist.Geometry;
using SectionTwist.Shaft;

namespace SectionTwist.Composite;

/// <summary>The share of a composite section made of one material.</summary>
public sealed record CompositeMaterialResult
{
    /// <summary>The material.</summary>
    public required Material Material { get; init; }

    /// <summary>Names of the parts made of it.</summary>
    public required IReadOnlyList<string> Parts { get; init; }

    /// <summary>Its area, m^2.</summary>
    public required double Area { get; init; }

    /// <summary>
    /// Largest shear stress in this material per unit torque on the section, 1/m^3 (for a concentric bar and tube
    /// G_i r_i / (G J)_eff; Gere, Mechanics of Materials, sec. 3.8, composite bars, from memory of the section number).
    /// </summary>
    public required double MaxShearPerTorque { get; init; }

    /// <summary>Where the largest shear in this material occurs, metres.</summary>
    public required Point2 MaxShearLocation { get; init; }

    /// <summary>Fraction of the section's torque this material carries (the shares add to 1).</summary>
    public required double TorqueShare { get; init; }

    /// <summary>Estimated relative error of <see cref="MaxShearPerTorque"/> (difference between the two meshes).</summary>
    public required double EstimatedRelativeError { get; init; }

    /// <summary>
    /// True when the peak shear does not settle between the two meshes (it changes by more than
    /// <see cref="CompositeAnalyzer.PeakTolerance"/>): a sharp corner of the outline or of an interface makes the stress
    /// singular there, and <see cref="MaxShearPerTorque"/> is only the mesh value, no bound. No allowable torque or factor
    /// of safety is given for such a material.
    /// </summary>
    public bool MaxShearUnbounded { get; init; }
}
