namespace SectionTwist.Shaft;

/// <summary>
/// A shaft material: shear modulus and the shear stress limits torsion results are checked against, plus the optional
/// tensile, stiffness and mass data that bending, warping, fatigue and dynamics checks need. All values are SI
/// (Pa, kg/m^3).
/// </summary>
/// <param name="Name">Display name.</param>
/// <param name="ShearModulus">Shear modulus G, Pa.</param>
/// <param name="AllowableShear">Allowable shear stress, Pa (already contains the design safety margin); null when not given.</param>
/// <param name="ShearYield">Shear yield strength S_sy, Pa; null when not given.</param>
/// <param name="Source">Where the values come from (book and table, standard, or "from memory").</param>
public sealed record Material(string Name, double ShearModulus, double? AllowableShear, double? ShearYield, string Source)
{
    /// <summary>Distortion-energy ratio of shear yield to tensile yield, S_sy = 0.577 S_y (Budynas and Nisbett, Shigley's Mechanical Engineering Design, ch. 5).</summary>
    public const double DistortionEnergyShearRatio = 0.577;

    /// <summary>Young's modulus E, Pa; null when not given (bending, warping torsion and composite sections need it).</summary>
    public double? YoungsModulus { get; init; }

    /// <summary>Mass density, kg/m^3; null when not given (shaft weight and rotational inertia need it).</summary>
    public double? Density { get; init; }

    /// <summary>Tensile yield strength S_y, Pa; null when not given.</summary>
    public double? YieldStrength { get; init; }

    /// <summary>Tensile (ultimate) strength S_u, Pa; null when not given.</summary>
    public double? UltimateStrength { get; init; }

    /// <summary>
    /// What the strength values are: <see cref="MaterialBasis.SpecifiedMinimum"/> (a standard's guaranteed minimum),
    /// <see cref="MaterialBasis.Typical"/> (a typical value: not a design value, outputs say so) or
    /// <see cref="MaterialBasis.User"/> (given by the user).
    /// </summary>
    public MaterialBasis StrengthBasis { get; init; } = MaterialBasis.User;

    /// <summary>
    /// The stress the factor of safety is measured against: the allowable shear when given, otherwise the shear yield;
    /// null when neither is known.
    /// </summary>
    public double? LimitShear => AllowableShear ?? ShearYield;

    /// <summary>Names the basis of <see cref="LimitShear"/>: <c>allowable</c>, <c>yield</c> or <c>none</c>.</summary>
    public string LimitBasis => AllowableShear is not null ? "allowable" : ShearYield is not null ? "yield" : "none";

    /// <summary>Shear modulus from Young's modulus and Poisson's ratio of an isotropic material, G = E / (2 (1 + nu)).</summary>
    /// <param name="youngsModulus">E, Pa.</param>
    /// <param name="poissonRatio">nu, between -1 and 0.5.</param>
    public static double ShearModulusFrom(double youngsModulus, double poissonRatio)
    {
        if (!(youngsModulus > 0) || !double.IsFinite(youngsModulus))
            throw new SectionTwistException("bad-material", $"Young's modulus {youngsModulus} Pa must be positive");
        if (!(poissonRatio > -1 && poissonRatio < 0.5))
            throw new SectionTwistException("bad-material", $"Poisson's ratio {poissonRatio} must lie between -1 and 0.5");
        return youngsModulus / (2 * (1 + poissonRatio));
    }

    /// <summary>Checks that the values are physically meaningful; throws a <see cref="SectionTwistException"/> naming the material otherwise.</summary>
    internal void Validate()
    {
        if (!(ShearModulus > 0) || !double.IsFinite(ShearModulus))
            throw new SectionTwistException("bad-material", $"material '{Name}': shear modulus G = {ShearModulus} Pa must be positive and finite");
        Positive(AllowableShear, "allowable shear");
        Positive(ShearYield, "shear yield");
        Positive(YoungsModulus, "Young's modulus");
        Positive(Density, "density");
        Positive(YieldStrength, "yield strength");
        Positive(UltimateStrength, "ultimate strength");
    }

    private void Positive(double? value, string what)
    {
        if (value is { } v && !(v > 0 && double.IsFinite(v)))
            throw new SectionTwistException("bad-material", $"material '{Name}': {what} {v} must be positive and finite");
    }
}

/// <summary>What a material's strength values are.</summary>
public enum MaterialBasis
{
    /// <summary>Given by the user (file or code).</summary>
    User,
    /// <summary>A standard's specified (guaranteed) minimum.</summary>
    SpecifiedMinimum,
    /// <summary>A typical value, not a guaranteed minimum: check it against the certificate before design use.</summary>
    Typical,
}
