namespace SectionTwist.Units;

/// <summary>
/// The kinds of value that SectionTwist shows to people. A <see cref="UnitSystem"/> gives one display unit for each, so
/// every table, report, CSV file and picture writes a quantity in the same unit and the same spelling.
/// </summary>
public enum Measure
{
    /// <summary>Lengths, positions and diameters (SI: m).</summary>
    Length,
    /// <summary>Areas (m²).</summary>
    Area,
    /// <summary>Second moments of area and torsion constants (m⁴).</summary>
    SecondMoment,
    /// <summary>Section moduli, e.g. the torsional modulus T/τmax (m³).</summary>
    SectionModulus,
    /// <summary>Warping constants Iw (m⁶).</summary>
    WarpingConstant,
    /// <summary>Torques and moments (N·m).</summary>
    Torque,
    /// <summary>Stresses: shear stress, allowables, yield strengths (Pa).</summary>
    Stress,
    /// <summary>Elastic moduli G and E (Pa).</summary>
    Modulus,
    /// <summary>Angles and rotations (rad).</summary>
    Angle,
    /// <summary>Twist per length (rad/m).</summary>
    TwistRate,
    /// <summary>Peak shear stress per unit torque (Pa per N·m = 1/m³).</summary>
    ShearPerTorque,
    /// <summary>Distributed torque (N·m/m).</summary>
    TorquePerLength,
    /// <summary>Torsional stiffness of a spring or segment (N·m/rad).</summary>
    RotationalStiffness,
    /// <summary>Power (W).</summary>
    Power,
    /// <summary>Rotational speed (rad/s).</summary>
    Speed,
    /// <summary>Forces: bearing reactions, transverse and axial loads (N).</summary>
    Force,
    /// <summary>Bimoments of warping torsion (N·m²).</summary>
    Bimoment,
    /// <summary>Frequencies of vibration and excitation (Hz; SI value in Hz, not rad/s).</summary>
    Frequency,
    /// <summary>Mass moments of inertia of rotating parts (kg·m²).</summary>
    Inertia,
    /// <summary>Torsional rigidity G J of a section, e.g. the effective rigidity of a composite section (N·m²; the same units as the bimoment).</summary>
    TorsionalRigidity,
}
