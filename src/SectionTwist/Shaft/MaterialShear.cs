namespace SectionTwist.Shaft;

/// <summary>The peak shear per unit torque in one material of a composite section (see <c>CompositeResult</c>).</summary>
/// <param name="Material">The material, whose own limit shear its peak is checked against.</param>
/// <param name="ShearPerTorque">Largest shear stress in this material per unit torque on the section, 1/m^3.</param>
public sealed record MaterialShear(Material Material, double ShearPerTorque);

/// <summary>A composite segment's check of one material against its own limit shear.</summary>
/// <param name="Material">The material.</param>
/// <param name="MaxShear">Its peak shear stress in the segment, Pa.</param>
/// <param name="SafetyFactor">Its limit shear over <paramref name="MaxShear"/>; +infinity without torque; null when the material has no limit.</param>
public sealed record MaterialShearCheck(Material Material, double MaxShear, double? SafetyFactor)
{
    /// <summary>True when the peak exceeds the material's limit shear.</summary>
    public bool Exceeds => SafetyFactor is < 1;
}
