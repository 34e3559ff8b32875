namespace SectionTwist.Units;

/// <summary>
/// One display unit per <see cref="Measure"/>: the single place that decides how human-readable output (text tables, the
/// HTML report, CSV files, pictures) writes a quantity. Three standard systems: <see cref="SiMillimetre"/> (<c>SI-mm</c>),
/// <see cref="SiMetre"/> (<c>SI-m</c>) and <see cref="US"/> (<c>US</c>); <see cref="For(LengthUnit)"/> picks the one that
/// matches an input's length unit, and <see cref="With"/> replaces single units (a shaft file's own <c>units</c> block).
/// JSON output stays in SI base units and does not use this class.
/// </summary>
public sealed class UnitSystem
{
    private readonly DisplayUnit[] _units;

    private UnitSystem(string name, DisplayUnit[] units)
    {
        Name = name;
        _units = units;
    }

    private const double Inch = 0.0254, Foot = 0.3048, PoundForce = 4.4482216152605, Psi = PoundForce / (Inch * Inch);
    private const double Degree = Math.PI / 180, Pound = 0.45359237;

    /// <summary>
    /// SI with millimetres (<c>SI-mm</c>): mm, mm², mm⁴, mm³, mm⁶, N·m, MPa, GPa, deg, deg/m, MPa per kN·m, N·m/m, N·m/rad,
    /// kW, rpm, N, N·m², Hz, kg·m². The default for drawings and specs in mm or cm and for shaft files in mm.
    /// </summary>
    public static UnitSystem SiMillimetre { get; } = new("SI-mm", Build(LengthUnit.Millimetre, new("N·m", 1), new("MPa", 1e6), new("GPa", 1e9),
        new("deg/m", Degree), new("MPa per kN·m", 1e3), new("kW", 1e3), new("N", 1), new("N·m²", 1), new("kg·m²", 1)));

    /// <summary>SI with metres (<c>SI-m</c>): m, m², m⁴, m³, m⁶, N·m, MPa, GPa, deg, deg/m, MPa per kN·m, N·m/m, N·m/rad, kW, rpm, N, N·m², Hz, kg·m².</summary>
    public static UnitSystem SiMetre { get; } = new("SI-m", Build(LengthUnit.Metre, new("N·m", 1), new("MPa", 1e6), new("GPa", 1e9),
        new("deg/m", Degree), new("MPa per kN·m", 1e3), new("kW", 1e3), new("N", 1), new("N·m²", 1), new("kg·m²", 1)));

    /// <summary>
    /// US customary (<c>US</c>): in, in², in⁴, in³, in⁶, lbf·in, psi, Mpsi (10⁶ psi), deg, deg/ft, psi per lbf·in (= 1/in³),
    /// lbf·in/in, lbf·in/rad, hp (550 ft·lbf/s), rpm, lbf, lbf·in², Hz, lb·in² (pound-mass; lb = 0.45359237 kg exactly, NIST SP 811, appendix B).
    /// </summary>
    public static UnitSystem US { get; } = new("US", Build(LengthUnit.Inch, new("lbf·in", PoundForce * Inch), new("psi", Psi), new("Mpsi", 1e6 * Psi),
        new("deg/ft", Degree / Foot), new("psi per lbf·in", 1 / (Inch * Inch * Inch)), new("hp", 745.69987158227022),
        new("lbf", PoundForce), new("lbf·in²", PoundForce * Inch * Inch), new("lb·in²", Pound * Inch * Inch)));

    /// <summary>The three standard systems, in the order <c>--units</c> lists them.</summary>
    public static IReadOnlyList<UnitSystem> Standard { get; } = [SiMillimetre, SiMetre, US];

    /// <summary>The system's name: <c>SI-mm</c>, <c>SI-m</c>, <c>US</c>, or one of them followed by the changed units.</summary>
    public string Name { get; }

    /// <summary>The display unit of <paramref name="measure"/>.</summary>
    public DisplayUnit this[Measure measure] => _units[(int)measure];

    /// <summary>Lengths and positions.</summary>
    public DisplayUnit Length => this[Measure.Length];
    /// <summary>Areas.</summary>
    public DisplayUnit Area => this[Measure.Area];
    /// <summary>Second moments and torsion constants.</summary>
    public DisplayUnit SecondMoment => this[Measure.SecondMoment];
    /// <summary>Section moduli.</summary>
    public DisplayUnit SectionModulus => this[Measure.SectionModulus];
    /// <summary>Warping constants.</summary>
    public DisplayUnit WarpingConstant => this[Measure.WarpingConstant];
    /// <summary>Torques.</summary>
    public DisplayUnit Torque => this[Measure.Torque];
    /// <summary>Stresses.</summary>
    public DisplayUnit Stress => this[Measure.Stress];
    /// <summary>Moduli G and E.</summary>
    public DisplayUnit Modulus => this[Measure.Modulus];
    /// <summary>Angles and rotations (degrees).</summary>
    public DisplayUnit Angle => this[Measure.Angle];
    /// <summary>Twist rates.</summary>
    public DisplayUnit TwistRate => this[Measure.TwistRate];
    /// <summary>Peak shear per unit torque.</summary>
    public DisplayUnit ShearPerTorque => this[Measure.ShearPerTorque];
    /// <summary>Distributed torques.</summary>
    public DisplayUnit TorquePerLength => this[Measure.TorquePerLength];
    /// <summary>Torsional stiffness.</summary>
    public DisplayUnit RotationalStiffness => this[Measure.RotationalStiffness];
    /// <summary>Power.</summary>
    public DisplayUnit Power => this[Measure.Power];
    /// <summary>Rotational speed.</summary>
    public DisplayUnit Speed => this[Measure.Speed];
    /// <summary>Forces.</summary>
    public DisplayUnit Force => this[Measure.Force];
    /// <summary>Bimoments.</summary>
    public DisplayUnit Bimoment => this[Measure.Bimoment];
    /// <summary>Frequencies (SI value in Hz).</summary>
    public DisplayUnit Frequency => this[Measure.Frequency];
    /// <summary>Mass moments of inertia.</summary>
    public DisplayUnit Inertia => this[Measure.Inertia];
    /// <summary>Torsional rigidity G J (N·m² in SI, lbf·in² in US: the bimoment's units).</summary>
    public DisplayUnit TorsionalRigidity => this[Measure.TorsionalRigidity];

    /// <summary>An SI value of <paramref name="measure"/> in this system, without the unit (house number style).</summary>
    public string Format(double si, Measure measure, int digits = 5) => this[measure].Format(si, digits);

    /// <summary>An SI value of <paramref name="measure"/> in this system followed by its unit, e.g. <c>81.5 MPa</c>.</summary>
    public string Text(double si, Measure measure, int digits = 5) => this[measure].Text(si, digits);

    /// <summary>
    /// The standard system that matches a length unit, with lengths (and areas, moments, moduli of sections) in that unit:
    /// inches and feet give <see cref="US"/>, metres <see cref="SiMetre"/>, anything else <see cref="SiMillimetre"/>.
    /// </summary>
    public static UnitSystem For(LengthUnit unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        var baseSystem = unit == LengthUnit.Inch || unit == LengthUnit.Foot ? US : unit == LengthUnit.Metre ? SiMetre : SiMillimetre;
        return baseSystem.WithLength(unit);
    }

    /// <summary>
    /// This system with lengths in <paramref name="unit"/>: length, area, second moment, section modulus and warping constant follow the new
    /// unit, and so do the torque per length (torque unit per length unit).
    /// </summary>
    public UnitSystem WithLength(LengthUnit unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        if (Math.Abs(unit.Metres - Length.SiPerUnit) <= 1e-15 * unit.Metres) return this;
        var u = (DisplayUnit[])_units.Clone();
        SetLength(u, unit);
        u[(int)Measure.TorquePerLength] = new($"{Torque.Symbol}/{unit.Symbol}", Torque.SiPerUnit / unit.Metres);
        return new UnitSystem($"{Name} ({unit.Symbol})", u);
    }

    /// <summary>
    /// This system with <paramref name="unit"/> for <paramref name="measure"/>. Changing the torque also changes the torque
    /// per length and the torsional stiffness, so those stay in step.
    /// </summary>
    public UnitSystem With(Measure measure, DisplayUnit unit)
    {
        ArgumentNullException.ThrowIfNull(unit);
        var u = (DisplayUnit[])_units.Clone();
        u[(int)measure] = unit;
        if (measure == Measure.Torque)
        {
            u[(int)Measure.TorquePerLength] = new($"{unit.Symbol}/{Length.Symbol}", unit.SiPerUnit / Length.SiPerUnit);
            u[(int)Measure.RotationalStiffness] = new($"{unit.Symbol}/rad", unit.SiPerUnit);
        }
        return new UnitSystem(Name, u);
    }

    /// <summary>Finds a standard system by name (<c>SI-mm</c>, <c>SI-m</c>, <c>US</c>; case and the dash do not matter).</summary>
    public static bool TryParse(string? text, out UnitSystem system)
    {
        string key = (text ?? "").Trim().Replace("-", "", StringComparison.Ordinal).Replace("_", "", StringComparison.Ordinal).ToUpperInvariant();
        system = key switch
        {
            "SIMM" or "SI" => SiMillimetre,
            "SIM" => SiMetre,
            "US" or "USC" => US,
            _ => null!,
        };
        return system is not null;
    }

    /// <summary>Finds a standard system by name; throws a one-line <see cref="SectionTwistException"/> naming the choices (and the nearest one) otherwise.</summary>
    /// <param name="text">The name typed.</param>
    /// <param name="option">The option or key it came from, for the message.</param>
    public static UnitSystem Parse(string text, string option = "--units")
    {
        ArgumentNullException.ThrowIfNull(text);
        if (TryParse(text, out var s)) return s;
        throw new SectionTwistException("unknown-unit-system",
            $"{option}: unknown unit system '{text}'{Suggest.DidYouMean(text, Standard.Select(x => x.Name))}; use one of {string.Join(", ", Standard.Select(x => x.Name))}");
    }

    /// <inheritdoc />
    public override string ToString() => Name;

    private static DisplayUnit[] Build(LengthUnit length, DisplayUnit torque, DisplayUnit stress, DisplayUnit modulus, DisplayUnit twistRate,
        DisplayUnit shearPerTorque, DisplayUnit power, DisplayUnit force, DisplayUnit bimoment, DisplayUnit inertia)
    {
        var u = new DisplayUnit[Enum.GetValues<Measure>().Length];
        SetLength(u, length);
        u[(int)Measure.Torque] = torque;
        u[(int)Measure.Stress] = stress;
        u[(int)Measure.Modulus] = modulus;
        u[(int)Measure.Angle] = new("deg", Degree);
        u[(int)Measure.TwistRate] = twistRate;
        u[(int)Measure.ShearPerTorque] = shearPerTorque;
        u[(int)Measure.TorquePerLength] = new($"{torque.Symbol}/{length.Symbol}", torque.SiPerUnit / length.Metres);
        u[(int)Measure.RotationalStiffness] = new($"{torque.Symbol}/rad", torque.SiPerUnit);
        u[(int)Measure.Power] = power;
        u[(int)Measure.Speed] = new("rpm", 2 * Math.PI / 60);
        u[(int)Measure.Force] = force;
        u[(int)Measure.Bimoment] = bimoment;
        u[(int)Measure.TorsionalRigidity] = bimoment; // G J: N·m² / lbf·in², spelled as the bimoment
        u[(int)Measure.Frequency] = new("Hz", 1);
        u[(int)Measure.Inertia] = inertia;
        return u;
    }

    private static void SetLength(DisplayUnit[] u, LengthUnit length)
    {
        string s = length.Symbol;
        double m = length.Metres;
        u[(int)Measure.Length] = new(s, m);
        u[(int)Measure.Area] = new($"{s}²", m * m);
        u[(int)Measure.SecondMoment] = new($"{s}⁴", m * m * m * m);
        u[(int)Measure.SectionModulus] = new($"{s}³", m * m * m);
        u[(int)Measure.WarpingConstant] = new($"{s}⁶", m * m * m * m * m * m);
    }
}
