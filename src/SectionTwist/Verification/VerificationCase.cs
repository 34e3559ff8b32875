using SectionTwist.Geometry;
using SectionTwist.Torsion;

namespace SectionTwist.Verification;

/// <summary>Which result a verification case checks.</summary>
public enum VerifiedQuantity
{
    /// <summary>The torsion constant J.</summary>
    TorsionConstant,
    /// <summary>The peak shear stress per unit torque.</summary>
    MaxShear,
    /// <summary>The warping constant Iw (section analysed with its warping function).</summary>
    WarpingConstant,
    /// <summary>A rotation of a member in non-uniform torsion (<see cref="VerificationCase.Evaluate"/>).</summary>
    MemberRotation,
}

/// <summary>A built-in check of the solver against a published reference value.</summary>
/// <param name="Name">Short name, e.g. <c>circle J</c>.</param>
/// <param name="Quantity">What is compared.</param>
/// <param name="Reference">The reference value (SI: m^4, 1/m^3, m^6 or rad).</param>
/// <param name="Tolerance">Allowed relative error.</param>
/// <param name="Source">Where the reference comes from.</param>
/// <param name="Build">Creates the profile (for a member case, the section whose values the member uses).</param>
public sealed record VerificationCase(string Name, VerifiedQuantity Quantity, double Reference, double Tolerance, string Source, Func<Profile> Build)
{
    /// <summary>For member cases: computes the value directly (no section analysis), SI.</summary>
    public Func<double>? Evaluate { get; init; }

    /// <summary>For composite cases: creates the composite section, analysed with its first part's material as the reference (<see cref="Build"/> gives its outline).</summary>
    public Func<Composite.CompositeSection>? BuildComposite { get; init; }

    /// <summary>For the peak shear of a composite case: the index of the material (in <see cref="Composite.CompositeSection.Materials"/>).</summary>
    public int? MaterialIndex { get; init; }

    /// <summary>The quantity's JSON name: <c>torsionConstant</c>, <c>maxShearPerTorque</c>, <c>warpingConstant</c> or <c>memberRotation</c>.</summary>
    public string QuantityKey => Quantity switch
    {
        VerifiedQuantity.TorsionConstant => "torsionConstant",
        VerifiedQuantity.MaxShear => "maxShearPerTorque",
        VerifiedQuantity.WarpingConstant => "warpingConstant",
        _ => "memberRotation",
    };

    /// <summary>The SI unit in ASCII: <c>m^4</c>, <c>1/m^3</c>, <c>m^6</c> or <c>rad</c>.</summary>
    public string UnitAscii => Quantity switch
    {
        VerifiedQuantity.TorsionConstant => "m^4",
        VerifiedQuantity.MaxShear => "1/m^3",
        VerifiedQuantity.WarpingConstant => "m^6",
        _ => "rad",
    };

    /// <summary>The SI unit as printed: <c>m⁴</c>, <c>1/m³</c>, <c>m⁶</c> or <c>rad</c>.</summary>
    public string UnitSymbol => Quantity switch
    {
        VerifiedQuantity.TorsionConstant => "m⁴",
        VerifiedQuantity.MaxShear => "1/m³",
        VerifiedQuantity.WarpingConstant => "m⁶",
        _ => "rad",
    };
}

/// <summary>The outcome of one verification case.</summary>
/// <param name="Case">The case.</param>
/// <param name="Computed">The computed value (SI).</param>
/// <param name="RelativeError">|computed - reference| / |reference|.</param>
/// <param name="EstimatedRelativeError">The solver's own error estimate for that quantity.</param>
/// <param name="Tolerance">The tolerance applied: the case's own at the default accuracy, tighter when a finer accuracy was asked for.</param>
public sealed record VerificationOutcome(VerificationCase Case, double Computed, double RelativeError, double EstimatedRelativeError, double Tolerance)
{
    /// <summary>True when the relative error is within <see cref="Tolerance"/>.</summary>
    public bool Passed => RelativeError <= Tolerance;
}
