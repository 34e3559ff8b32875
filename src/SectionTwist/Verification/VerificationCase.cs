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
}

/// <summary>A built-in check of the solver against a published reference value.</summary>
/// <param name="Name">Short name, e.g. <c>circle J</c>.</param>
/// <param name="Quantity">What is compared.</param>
/// <param name="Reference">The reference value (SI: m^4 or 1/m^3).</param>
/// <param name="Tolerance">Allowed relative error.</param>
/// <param name="Source">Where the reference comes from.</param>
/// <param name="Build">Creates the profile.</param>
public sealed record VerificationCase(string Name, VerifiedQuantity Quantity, double Reference, double Tolerance, string Source, Func<Profile> Build);

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
